/**
 * Saving from the window (issue 15 §2): saves never overlap, the newest draft is written last, the
 * unsaved mark describes the file on disk, and a read-only file leads to Save As.
 */
import { describe, expect, it } from 'vitest';
import type { SaveOutcome, SaveRequest } from '../../../shared-model/index.ts';
import type { FileAccess } from '../../../src-renderer/desktop/file-access.ts';
import { saveDesign } from '../../../src-renderer/state/file-actions.ts';
import { Workspace } from '../../../src-renderer/state/workspace.svelte.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';
import { stubFiles } from '../../helpers/stub-files.ts';

/** A desktop adapter whose saves finish only when the test says so, newest first if it could. */
function slowFiles(): FileAccess & { requests: SaveRequest[]; finish(index: number, outcome?: SaveOutcome): void; inFlight: number; maxInFlight: number } {
  const pending: ((outcome: SaveOutcome) => void)[] = [];
  const files = stubFiles({
    requests: [] as SaveRequest[],
    inFlight: 0,
    maxInFlight: 0,
    save(request: SaveRequest): Promise<SaveOutcome> {
      files.requests.push(request);
      files.inFlight += 1;
      files.maxInFlight = Math.max(files.maxInFlight, files.inFlight);
      return new Promise((resolve) => pending.push((outcome) => {
        files.inFlight -= 1;
        resolve(outcome);
      }));
    },
    finish(index: number, outcome: SaveOutcome = { ok: true, path: '/d/buck.json', name: 'buck.json' }) {
      pending[index]?.(outcome);
    },
  });
  return files;
}

const tick = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

describe('saveDesign in the window', () => {
  it('sends a second save only after the first has finished, and the newest draft last', async () => {
    const files = slowFiles();
    const ws = new Workspace(files, demoDesign(), demoParts());
    ws.doc.load(ws.doc.design, 'buck.json', '/d/buck.json');
    ws.doc.edit(['spec', 'voutV'], 3.4, 'Output voltage');
    const first = saveDesign(ws, false);
    await tick();
    ws.doc.edit(['spec', 'voutV'], 3.5, 'Output voltage', null);
    const second = saveDesign(ws, false);
    await tick();
    expect(files.requests).toHaveLength(1); // the second waits
    files.finish(0);
    await first;
    await tick();
    expect(files.requests).toHaveLength(2);
    expect(JSON.parse(files.requests[1]?.text ?? '{}').spec.voutV).toBe(3.5); // the newest draft goes last
    expect(ws.doc.dirty).toBe(true); // the disk has 3.4 so far
    files.finish(1);
    await second;
    expect(ws.doc.dirty).toBe(false);
    expect(files.maxInFlight).toBe(1);
  });

  it('keeps the unsaved mark when the newer save fails after the older one succeeded', async () => {
    const files = slowFiles();
    const ws = new Workspace(files, demoDesign(), demoParts());
    ws.doc.load(ws.doc.design, 'buck.json', '/d/buck.json');
    ws.doc.edit(['spec', 'voutV'], 3.4, 'Output voltage');
    const first = saveDesign(ws, false);
    await tick(); // the first save has taken the draft with 3.4
    ws.doc.edit(['spec', 'voutV'], 3.5, 'Output voltage', null);
    const second = saveDesign(ws, false);
    await tick();
    files.finish(0);
    await first;
    await tick();
    files.finish(1, { ok: false, cancelled: false, message: 'Could not save "buck.json": the disk is full (ENOSPC).' });
    expect(await second).toBe(false);
    expect(ws.doc.dirty).toBe(true); // disk holds 3.4, the window 3.5
  });

  it('offers Save As for a read-only file and saves to the chosen file when accepted', async () => {
    const files = slowFiles();
    const ws = new Workspace(files, demoDesign(), demoParts());
    ws.doc.load(ws.doc.design, 'locked.json', '/d/locked.json');
    ws.doc.edit(['spec', 'voutV'], 3.4, 'Output voltage');
    const saving = saveDesign(ws, false);
    await tick();
    files.finish(0, { ok: false, cancelled: false, readOnly: true, message: 'Could not save "locked.json": the file is read-only.' });
    await tick();
    expect(ws.messages.question?.confirmLabel).toBe('Save As…');
    ws.messages.question?.resolve(true);
    await tick();
    expect(files.requests[1]?.path).toBeNull(); // Save As: main asks for a new path with its dialog
    files.finish(1, { ok: true, path: '/d/copy.json', name: 'copy.json' });
    expect(await saving).toBe(true);
    expect(ws.doc.filePath).toBe('/d/copy.json');
    expect(ws.doc.dirty).toBe(false);
  });
});
