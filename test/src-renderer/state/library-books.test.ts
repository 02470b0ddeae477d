/**
 * Issue 17 §1 in the renderer: several part libraries open at once (the app's own plus the user's
 * files), each part's library shown, and a design's links to them: same, differs (with the one-action
 * update), part missing, library missing. Every part is invented.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { linkStatus, validatePartsLibrary } from '../../../shared-model/index.ts';
import type { Part, SaveOutcome, SaveRequest } from '../../../shared-model/index.ts';
import type { FileAccess } from '../../../src-renderer/desktop/file-access.ts';
import { choiceValue, updatePartFromLibrary, usePart } from '../../../src-renderer/state/design-actions.ts';
import { Workspace } from '../../../src-renderer/state/workspace.svelte.ts';
import { saveLibraryFile } from '../../../src-renderer/library/library-files.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';
import { stubFiles } from '../../helpers/stub-files.ts';

/** localStorage as the browser has it (Web Storage: getItem/setItem/removeItem on strings). */
function memoryStorage(): Storage {
  const items = new Map<string, string>();
  return {
    get length() { return items.size; },
    clear: () => items.clear(),
    getItem: (key) => items.get(key) ?? null,
    key: (i) => [...items.keys()][i] ?? null,
    removeItem: (key) => void items.delete(key),
    setItem: (key, value) => void items.set(key, String(value)),
  };
}

function files(saves: SaveRequest[]): FileAccess {
  return stubFiles({
    saveLibrary: async (request: SaveRequest): Promise<SaveOutcome> => {
      saves.push(request);
      return { ok: true, path: request.path ?? `/lib/${request.suggestedName}`, name: request.suggestedName };
    },
  });
}

const inductor = (id: string, name: string, dcr20Ohm: number): Part => {
  const base = demoParts().find((p) => p.kind === 'inductor')!;
  return { ...base, id, name, dcr20Ohm, invented: true } as Part;
};

/** A version 1 library file (no id): the format the issue says must still open. */
const v1Text = JSON.stringify({ format: 'wattledger.parts', version: 1, name: 'Bench approved', notes: '', parts: [inductor('ind-a', 'Invented choke A', 0.012)] });

let saved: Storage | undefined;
beforeEach(() => {
  saved = (globalThis as { localStorage?: Storage }).localStorage;
  (globalThis as { localStorage?: Storage }).localStorage = memoryStorage();
});
afterEach(() => {
  (globalThis as { localStorage?: Storage }).localStorage = saved;
});

describe('several part libraries', () => {
  it('opens a library file beside the app library and shows it, each part under its own library', () => {
    const ws = new Workspace(files([]), demoDesign(), demoParts());
    const opened = ws.library.openText(v1Text, { path: '/lib/bench.json', name: 'bench.json' });
    expect(opened.ok).toBe(true);
    expect(ws.library.books.map((b) => b.library.name)).toEqual(['My WattLedger parts', 'Bench approved']);
    expect(ws.library.shown.library.name).toBe('Bench approved'); // the opened file is shown
    expect(ws.library.parts.map((p) => p.id)).toEqual(['ind-a']);
    expect(ws.library.books[0]?.library.parts).toHaveLength(demoParts().length); // the app library is untouched
  });

  it('refuses a second library with the same id from another file, naming the id, and reads the same file again', () => {
    const ws = new Workspace(files([]), demoDesign(), demoParts());
    ws.library.openText(v1Text, { path: '/lib/bench.json', name: 'bench.json' });
    const twin = ws.library.openText(v1Text, { path: '/other/bench.json', name: 'bench.json' });
    expect(twin.ok).toBe(false);
    if (!twin.ok) expect(twin.message).toContain('“bench-approved”'); // the id made from the name (parts-library-migrate.ts)
    const again = ws.library.openText(v1Text.replace('0.012', '0.015'), { path: '/lib/bench.json', name: 'bench.json' });
    expect(again.ok).toBe(true);
    expect(ws.library.books).toHaveLength(2);
    expect((ws.library.parts[0] as Extract<Part, { kind: 'inductor' }>).dcr20Ohm).toBe(0.015);
  });

  it('names the problem of a file that is not a library and opens nothing', () => {
    const ws = new Workspace(files([]), demoDesign(), demoParts());
    const bad = ws.library.openText('{"format":"wattledger.parts","version":2,"id":"x","name":"X","notes":"","parts":[{"kind":"inductor"}]}', { path: '/x.json', name: 'x.json' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.details.join(' ')).toContain('parts[0]'); // the failing entry by its place in the file
    expect(ws.library.books).toHaveLength(1);
  });

  it('marks a changed file library unsaved, saves it to its own path, and writes text the engine reads back', async () => {
    const saves: SaveRequest[] = [];
    const ws = new Workspace(files(saves), demoDesign(), demoParts());
    ws.library.openText(v1Text, { path: '/lib/bench.json', name: 'bench.json' });
    ws.library.add(inductor('ind-b', 'Invented choke B', 0.02));
    expect(ws.library.shown.dirty).toBe(true);
    expect(localStorage.getItem('wattledger.library.v1')).toBeNull(); // a file library never goes into app storage
    await saveLibraryFile(ws, 'bench-approved', false);
    expect(saves[0]?.path).toBe('/lib/bench.json'); // Save writes where it was opened
    expect(ws.library.shown.dirty).toBe(false);
    const back = validatePartsLibrary(JSON.parse(saves[0]!.text));
    expect(back.ok && back.library.parts.map((p) => p.id)).toEqual(['ind-a', 'ind-b']);
    expect(back.ok && back.library.version).toBe(2); // written as the current version
  });

  it('keeps a new library apart until saved as a file, and closes it without touching the app library', async () => {
    const saves: SaveRequest[] = [];
    const ws = new Workspace(files(saves), demoDesign(), demoParts());
    const book = ws.library.create('Library 2');
    expect(book.place).toEqual({ kind: 'file', path: null, fileName: 'library-2.json' });
    await saveLibraryFile(ws, book.library.id, false);
    expect(saves[0]?.path).toBeNull(); // never saved: the dialog asks where
    expect(ws.library.shown.place).toEqual({ kind: 'file', path: '/lib/library-2.json', fileName: 'library-2.json' });
    ws.library.close(book.library.id);
    expect(ws.library.books.map((b) => b.library.id)).toEqual(['my-wattledger-parts']);
    ws.library.close('my-wattledger-parts');
    expect(ws.library.books).toHaveLength(1); // the app's own library cannot be closed
  });
});

describe('a design linked to a library file', () => {
  it('goes same → differs (both values) → same after the update, then part missing and library missing', () => {
    const ws = new Workspace(files([]), demoDesign(), demoParts());
    ws.library.openText(v1Text, { path: '/lib/bench.json', name: 'bench.json' });
    usePart(ws, 'inductor', choiceValue('bench-approved', 'ind-a'));
    const state = () => linkStatus(ws.doc.design, ws.library.libraries).find((l) => l.role === 'inductor');
    expect(state()?.state).toBe('same');
    expect(ws.doc.design.parts.inductor.dcr20Ohm).toBe(0.012);

    ws.library.update('ind-a', inductor('ind-a', 'Invented choke A', 0.018));
    expect(state()?.state).toBe('differs');
    expect(state()?.differences.map((d) => [d.path, d.design, d.library])).toEqual([['dcr20Ohm', 0.012, 0.018]]);
    expect(ws.doc.design.parts.inductor.dcr20Ohm).toBe(0.012); // the design keeps its own copy until asked

    updatePartFromLibrary(ws, 'inductor');
    expect(ws.doc.design.parts.inductor.dcr20Ohm).toBe(0.018);
    expect(state()?.state).toBe('same');
    ws.doc.undo();
    expect(ws.doc.design.parts.inductor.dcr20Ohm).toBe(0.012); // one undo step

    ws.library.remove('ind-a');
    expect(state()?.state).toBe('part-missing');
    ws.library.close('bench-approved');
    expect(state()?.state).toBe('library-missing');
    expect(ws.doc.problems).toEqual([]); // still a valid design that evaluates from its copy
  });
});
