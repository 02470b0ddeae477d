/**
 * Half-typed values (issue 16 §3): typing "500" into Ambient shows "5", "50", "500" as previews; the
 * history, the committed draft, the last valid design and the recovery snapshot take only the value
 * the user meant (Enter, leaving the field, a pause, another edit, undo or save).
 */
import { describe, expect, it } from 'vitest';
import { readRecoveryText } from '../../../src-renderer/state/design-file.ts';
import { writeRecovery } from '../../../src-renderer/state/file-actions.ts';
import { Workspace } from '../../../src-renderer/state/workspace.svelte.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';
import { stubFiles } from '../../helpers/stub-files.ts';

const AMBIENT = ['spec', 'ambientC'];

function typeAmbient(ws: Workspace, digits: string): void {
  for (let i = 1; i <= digits.length; i++) ws.doc.preview(AMBIENT, Number(digits.slice(0, i)), 'Edit Ambient temperature');
}

describe('a value being typed', () => {
  it('is shown to the results but leaves the history, the committed draft and the last valid design alone', () => {
    const ws = new Workspace(stubFiles({}), demoDesign(), demoParts());
    const before = ws.doc.design.spec.ambientC;
    typeAmbient(ws, '50');
    expect(ws.doc.shown.spec.ambientC).toBe(50); // issue 16 §3: the live preview stays
    expect(ws.doc.canUndo).toBe(false); // issue 16 §3: the history is unchanged by a half-typed value
    expect(ws.doc.committed.spec.ambientC).toBe(before); // issue 16 §3: the document has not taken it
    expect(ws.doc.lastValid.spec.ambientC).toBe(before); // issue 16 §3: nor the last valid design
  });

  it('enters the history as one step with the whole value when the user means it', () => {
    const ws = new Workspace(stubFiles({}), demoDesign(), demoParts());
    const before = ws.doc.design.spec.ambientC;
    typeAmbient(ws, '50');
    ws.doc.commitPreview();
    expect(ws.doc.committed.spec.ambientC).toBe(50); // issue 16 §3: Enter or a pause commits the value typed
    ws.doc.undo();
    expect(ws.doc.design.spec.ambientC).toBe(before); // issue 16 §3: one undo takes the whole entry back, never to "5"
    expect(ws.doc.canUndo).toBe(false); // one entry, one step
  });

  it('never puts an invalid half-typed value in front of the results', () => {
    const ws = new Workspace(stubFiles({}), demoDesign(), demoParts());
    ws.doc.preview(AMBIENT, -300, 'Edit Ambient temperature'); // below the range of Ambient temperature
    expect(ws.doc.valid).toBe(false); // the field shows its problem while typing
    expect(ws.doc.shown.spec.ambientC).toBe(ws.doc.lastValid.spec.ambientC); // issue 16 §3: the results keep the last valid design
  });

  it('is kept before another field is edited, and the recovery snapshot holds only committed values', async () => {
    let written = '';
    const ws = new Workspace(stubFiles({ writeRecovery: async (text: string) => void (written = text) }), demoDesign(), demoParts());
    typeAmbient(ws, '45');
    await writeRecovery(ws);
    const snapshot = readRecoveryText(written);
    expect(snapshot?.design.spec.ambientC).toBe(demoDesign().spec.ambientC); // issue 16 §3: the snapshot takes committed values only
    ws.doc.edit(['spec', 'voutV'], 3.4, 'Edit Output voltage');
    expect(ws.doc.committed.spec.ambientC).toBe(45); // the typed value was kept first, as its own step
    ws.doc.undo();
    expect(ws.doc.committed.spec.ambientC).toBe(45); // undo takes back the later edit only
  });
});
