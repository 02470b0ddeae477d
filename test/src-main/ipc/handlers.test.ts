import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { SaveOutcome } from '../../../shared-model/index.ts';
import { GrantedPaths } from '../../../src-main/files/granted-paths.ts';
import { RecentFiles } from '../../../src-main/files/recent-files.ts';
import { RecoveryStore } from '../../../src-main/files/recovery.ts';
import { INVOKE_CHANNELS } from '../../../src-main/ipc/channels.ts';
import { createHandlers, type HandlerDeps } from '../../../src-main/ipc/handlers.ts';
import { nodeSaveFs, type SaveFs } from '../../../src-main/files/atomic-save.ts';
import { mulberry32 } from '../../reference/prng.ts';
import { journalingFs } from '../files/failing-fs.ts';

let folder: string;
let deps: HandlerDeps<string> & { saved: SaveOutcome[]; errors: string[] };
let nextSavePath: string | null;
let nextOpenPath: string | null;

beforeEach(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-ipc-'));
  nextSavePath = null;
  nextOpenPath = null;
  const userData = nodePath.join(folder, 'user-data');
  const saved: SaveOutcome[] = [];
  const errors: string[] = [];
  deps = {
    saved,
    errors,
    chooseFileToOpen: vi.fn(async () => nextOpenPath),
    chooseSavePath: vi.fn(async () => nextSavePath),
    showError: async (_sender, message) => void errors.push(message),
    printPage: vi.fn(async () => new TextEncoder().encode('%PDF-1.7 fake')),
    grants: new GrantedPaths('linux'),
    recent: new RecentFiles(userData, { platform: 'linux' }),
    recentLibraries: new RecentFiles(userData, { platform: 'linux', fileName: 'recent-libraries.json' }),
    recovery: new RecoveryStore(userData),
    designSaved: (_sender, outcome) => void saved.push(outcome),
    documentStateChanged: vi.fn(),
    recentChanged: vi.fn(),
  };
});
afterEach(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

const design = (name: string): string => JSON.stringify({ format: 'wattledger.design', version: 1, name });

describe('saveDesign', () => {
  it('refuses to write a path the user never picked (a compromised renderer cannot choose files)', async () => {
    const victim = nodePath.join(folder, 'victim.txt');
    const outcome = await createHandlers(deps).invoke.saveDesign('w', { path: victim, suggestedName: 'x.json', text: 'pwned' });
    expect(outcome).toMatchObject({ ok: false, cancelled: false });
    if (!outcome.ok) expect(outcome.message).toMatch(/only writes files you opened or chose in this session/);
    await expect(nodeFs.access(victim)).rejects.toThrow();
  });

  it('asks for a path when there is none, saves, remembers it and clears the recovery snapshot', async () => {
    nextSavePath = nodePath.join(folder, 'buck.json');
    const handlers = createHandlers(deps);
    await handlers.invoke.writeRecovery('w', design('draft'));
    const outcome = await handlers.invoke.saveDesign('w', { path: null, suggestedName: 'buck', text: design('first') });
    expect(deps.chooseSavePath).toHaveBeenCalledWith('w', 'buck.json', [{ name: 'WattLedger design', extensions: ['json'] }]);
    expect(outcome).toEqual({ ok: true, path: nextSavePath, name: 'buck.json' });
    expect(deps.saved).toEqual([outcome]);
    expect(await nodeFs.readFile(nextSavePath, 'utf8')).toBe(design('first'));
    expect(await handlers.invoke.listRecent()).toEqual([nextSavePath]);
    expect(await handlers.invoke.readRecovery()).toBeNull();
    // Saving again to the same path needs no dialog now, and keeps a .bak.
    const again = await handlers.invoke.saveDesign('w', { path: nextSavePath, suggestedName: 'buck.json', text: design('second') });
    expect(again.ok).toBe(true);
    expect(await nodeFs.readFile(`${nextSavePath}.bak`, 'utf8')).toBe(design('first'));
  });

  it('reports a cancelled dialog as cancelled, without writing', async () => {
    const outcome = await createHandlers(deps).invoke.saveDesign('w', { path: null, suggestedName: 'buck.json', text: '{}' });
    expect(outcome).toEqual({ ok: false, cancelled: true, message: 'Save cancelled.' });
    expect(deps.saved).toEqual([outcome]);
  });

  it('keeps the file and says the changes are still unsaved when the disk refuses the rename', async () => {
    const path = nodePath.join(folder, 'buck.json');
    await nodeFs.writeFile(path, design('on disk'));
    deps.grants.grant(path);
    deps.saveFs = journalingFs({ refuseRenameTo: path });
    const outcome = await createHandlers(deps).invoke.saveDesign('w', { path, suggestedName: 'buck.json', text: design('edited') });
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.message).toBe('Could not save "buck.json": the operating system did not allow it (EPERM). The previous version on disk is unchanged. Your changes are still open and unsaved.');
    expect(await nodeFs.readFile(path, 'utf8')).toBe(design('on disk'));
  });
});

describe('overlapping saves (issue 15: 14 of 200 runs lost the newer edit without serialising)', () => {
  it('200 runs of two saves in flight with 0–4 ms jitter at every step: the later request is always on disk', async () => {
    const path = nodePath.join(folder, 'buck.json');
    await nodeFs.writeFile(path, design('start'));
    deps.grants.grant(path);
    const random = mulberry32(15);
    const jitter = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, Math.floor(random() * 5)));
    const jittery: SaveFs = {
      ...nodeSaveFs,
      create: async (p, mode) => {
        await jitter();
        const file = await nodeSaveFs.create(p, mode);
        return { write: async (d) => (await jitter(), file.write(d)), sync: () => file.sync(), close: () => file.close() };
      },
      rename: async (from, to) => (await jitter(), nodeSaveFs.rename(from, to)),
      readFile: async (p) => (await jitter(), nodeSaveFs.readFile(p)),
    };
    deps.saveFs = jittery;
    const handlers = createHandlers(deps);
    let lost = 0;
    for (let run = 0; run < 200; run += 1) {
      const older = handlers.invoke.saveDesign('w', { path, suggestedName: 'buck.json', text: design(`older ${run}`) });
      const newer = handlers.invoke.saveDesign('w', { path, suggestedName: 'buck.json', text: design(`newer ${run}`) });
      const outcomes = await Promise.all([older, newer]);
      expect(outcomes.every((o) => o.ok)).toBe(true);
      if ((await nodeFs.readFile(path, 'utf8')) !== design(`newer ${run}`)) lost += 1;
    }
    expect(lost).toBe(0); // the newest request wins every time
  }, 60_000);

  it('says a read-only file is read-only, so the window can offer Save As', async () => {
    if (process.platform === 'win32') return;
    const path = nodePath.join(folder, 'locked.json');
    await nodeFs.writeFile(path, design('locked'));
    await nodeFs.chmod(path, 0o444);
    deps.grants.grant(path);
    const outcome = await createHandlers(deps).invoke.saveDesign('w', { path, suggestedName: 'locked.json', text: design('edited') });
    expect(outcome).toMatchObject({ ok: false, cancelled: false, readOnly: true });
    expect(await nodeFs.readFile(path, 'utf8')).toBe(design('locked'));
  });
});

describe('recent files and write grants', () => {
  it('a path listed as recent is not writable until the user opens it again', async () => {
    const path = nodePath.join(folder, 'listed.json');
    await nodeFs.writeFile(path, design('listed'));
    await deps.recent.add(path);
    const handlers = createHandlers(deps);
    expect(await handlers.invoke.listRecent()).toEqual([path]);
    const refused = await handlers.invoke.saveDesign('w', { path, suggestedName: 'listed.json', text: design('overwritten') });
    expect(refused.ok).toBe(false);
    expect(await nodeFs.readFile(path, 'utf8')).toBe(design('listed'));
    expect(await handlers.invoke.openRecent('w', path)).toMatchObject({ name: 'listed.json' });
    expect((await handlers.invoke.saveDesign('w', { path, suggestedName: 'listed.json', text: design('saved') })).ok).toBe(true);
  });

  it('the renderer cannot add a path to the recent list: no call takes a path that lands there unopened', async () => {
    const handlers = createHandlers(deps);
    const invented = nodePath.join(folder, 'invented.json');
    await handlers.invoke.openRecent('w', invented); // not in the list: refused, nothing added
    await handlers.invoke.saveDesign('w', { path: invented, suggestedName: 'invented.json', text: '{}' }); // not granted: refused
    expect(await handlers.invoke.listRecent()).toEqual([]);
    await expect(nodeFs.access(invented)).rejects.toThrow();
  });
});

describe('opening', () => {
  it('opens the picked file and grants it for later saves', async () => {
    nextOpenPath = nodePath.join(folder, 'boost.json');
    await nodeFs.writeFile(nextOpenPath, design('boost'));
    const handlers = createHandlers(deps);
    expect(await handlers.invoke.openDesign('w')).toEqual({ path: nextOpenPath, name: 'boost.json', text: design('boost') });
    expect(deps.grants.has(nextOpenPath)).toBe(true);
    expect(await handlers.invoke.openRecent('w', nextOpenPath)).toMatchObject({ name: 'boost.json' });
  });

  it('shows a clear error and returns nothing when the picked file cannot be read', async () => {
    nextOpenPath = nodePath.join(folder, 'missing.json');
    expect(await createHandlers(deps).invoke.openDesign('w')).toBeNull();
    expect(deps.errors).toEqual(['Could not open "missing.json": the file or its folder does not exist (ENOENT).']);
  });

  it('opens a recent file only if it is in the list, and drops it from the list when it is gone', async () => {
    const handlers = createHandlers(deps);
    expect(await handlers.invoke.openRecent('w', '/etc/passwd')).toEqual({ error: '"passwd" is not in the recent files list.' });
    const path = nodePath.join(folder, 'old.json');
    await deps.recent.add(path);
    expect(await handlers.invoke.openRecent('w', path)).toEqual({ error: 'Could not open "old.json": the file or its folder does not exist (ENOENT).' });
    expect(await deps.recent.has(path)).toBe(false);
  });
});

describe('export and print', () => {
  it('writes exported base64 content byte for byte', async () => {
    nextSavePath = nodePath.join(folder, 'chart.png');
    const bytes = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature, ISO/IEC 15948 §5.2
    const outcome = await createHandlers(deps).invoke.exportFile('w', { suggestedName: 'chart', content: Buffer.from(bytes).toString('base64'), encoding: 'base64', filterName: 'PNG image', extensions: ['png'] });
    expect(outcome).toEqual({ ok: true, path: nextSavePath, name: 'chart.png' });
    expect(deps.chooseSavePath).toHaveBeenCalledWith('w', 'chart.png', [{ name: 'PNG image', extensions: ['png'] }]);
    expect(new Uint8Array(await nodeFs.readFile(nextSavePath))).toEqual(bytes);
  });

  it('prints the window to PDF with the requested page size and saves it atomically', async () => {
    nextSavePath = nodePath.join(folder, 'review.pdf');
    const outcome = await createHandlers(deps).invoke.printToPdf('w', { suggestedName: 'review', pageSize: 'A4' });
    expect(outcome.ok).toBe(true);
    expect(deps.printPage).toHaveBeenCalledWith('w', { suggestedName: 'review', pageSize: 'A4' });
    expect(await nodeFs.readFile(nextSavePath, 'utf8')).toBe('%PDF-1.7 fake');
  });
});

describe('recovery through IPC', () => {
  it('writes, reads back and clears a snapshot', async () => {
    const handlers = createHandlers(deps);
    await handlers.invoke.writeRecovery('w', design('draft'));
    expect((await handlers.invoke.readRecovery())?.text).toBe(design('draft'));
    await handlers.invoke.clearRecovery();
    expect(await handlers.invoke.readRecovery()).toBeNull();
  });
});

describe('routes()', () => {
  it('routes every invoke channel and the document-state message', () => {
    const { invoke, send } = createHandlers(deps).routes();
    expect(invoke.map((route) => route.channel).sort()).toEqual(Object.values(INVOKE_CHANNELS).sort());
    expect(send.map((route) => route.method)).toEqual(['setDocumentState']);
    send[0]?.run('w', [{ name: 'a.json', dirty: true }] as never[]);
    expect(deps.documentStateChanged).toHaveBeenCalledWith('w', { name: 'a.json', dirty: true });
  });
});

const library = (name: string): string => JSON.stringify({ format: 'wattledger.parts', version: 2, id: 'team', name, notes: '', parts: [] });

describe('parts library files', () => {
  it('opens a library from the dialog with the library filter, and lists it among recent libraries only', async () => {
    nextOpenPath = nodePath.join(folder, 'team-parts.json');
    await nodeFs.writeFile(nextOpenPath, library('Team parts'));
    const handlers = createHandlers(deps);
    const opened = await handlers.invoke.openLibrary('w');
    expect(deps.chooseFileToOpen).toHaveBeenCalledWith('w', [{ name: 'WattLedger parts library', extensions: ['json'] }]);
    expect(opened).toEqual({ path: nextOpenPath, name: 'team-parts.json', text: library('Team parts') });
    expect(await handlers.invoke.listRecentLibraries()).toEqual([nextOpenPath]);
    expect(await handlers.invoke.listRecent()).toEqual([]); // the design list is not crowded by libraries
    expect(deps.recentChanged).not.toHaveBeenCalled(); // the File menu lists designs only
  });

  it('saves a library it opened atomically with a .bak, and refuses a path the user never picked', async () => {
    nextOpenPath = nodePath.join(folder, 'team-parts.json');
    await nodeFs.writeFile(nextOpenPath, library('v1'));
    const handlers = createHandlers(deps);
    await handlers.invoke.openLibrary('w');
    const saved = await handlers.invoke.saveLibrary('w', { path: nextOpenPath, suggestedName: 'team-parts.json', text: library('v2') });
    expect(saved).toEqual({ ok: true, path: nextOpenPath, name: 'team-parts.json' });
    expect(await nodeFs.readFile(nextOpenPath, 'utf8')).toBe(library('v2'));
    expect(await nodeFs.readFile(`${nextOpenPath}.bak`, 'utf8')).toBe(library('v1'));
    expect(deps.saved).toEqual([]); // a library save is not a design save (title, close guard)
    const victim = nodePath.join(folder, 'other.json');
    const refused = await handlers.invoke.saveLibrary('w', { path: victim, suggestedName: 'other.json', text: library('x') });
    expect(refused).toMatchObject({ ok: false, cancelled: false });
    await expect(nodeFs.access(victim)).rejects.toThrow();
  });

  it('saves a new library where the user chooses, adding .json', async () => {
    nextSavePath = nodePath.join(folder, 'new-parts.json');
    const outcome = await createHandlers(deps).invoke.saveLibrary('w', { path: null, suggestedName: 'new-parts', text: library('new') });
    expect(deps.chooseSavePath).toHaveBeenCalledWith('w', 'new-parts.json', [{ name: 'WattLedger parts library', extensions: ['json'] }]);
    expect(outcome.ok).toBe(true);
    expect(await createHandlers(deps).invoke.listRecentLibraries()).toEqual([nextSavePath]);
  });

  it('reopens a recent library, and drops one that is gone with a message naming it', async () => {
    const path = nodePath.join(folder, 'gone.json');
    await nodeFs.writeFile(path, library('gone'));
    nextOpenPath = path;
    const handlers = createHandlers(deps);
    await handlers.invoke.openLibrary('w');
    expect(await handlers.invoke.openRecentLibrary('w', path)).toMatchObject({ name: 'gone.json' });
    await nodeFs.rm(path);
    const missing = await handlers.invoke.openRecentLibrary('w', path);
    expect('error' in missing && missing.error).toMatch(/gone\.json/);
    expect(await handlers.invoke.listRecentLibraries()).toEqual([]);
    expect(await handlers.invoke.openRecentLibrary('w', nodePath.join(folder, 'never.json'))).toEqual({ error: '"never.json" is not in the recent libraries list.' });
  });

  it('tells a dialog read failure in an error box and returns null', async () => {
    nextOpenPath = nodePath.join(folder, 'missing.json');
    expect(await createHandlers(deps).invoke.openLibrary('w')).toBeNull();
    expect(deps.errors).toHaveLength(1);
  });
});

describe('openSpreadsheet', () => {
  it('reads a CSV chosen in the dialog without granting it for writing or listing it as recent', async () => {
    nextOpenPath = nodePath.join(folder, 'approved.csv');
    await nodeFs.writeFile(nextOpenPath, 'Part No.,Rds(on) (mOhm)\nINV-1,8\n');
    const handlers = createHandlers(deps);
    const opened = await handlers.invoke.openSpreadsheet('w');
    expect(deps.chooseFileToOpen).toHaveBeenCalledWith('w', [{ name: 'Spreadsheet as CSV or tab-separated text', extensions: ['csv', 'tsv', 'txt'] }]);
    expect(opened).toEqual({ path: nextOpenPath, name: 'approved.csv', text: 'Part No.,Rds(on) (mOhm)\nINV-1,8\n' });
    expect(deps.grants.has(nextOpenPath)).toBe(false);
    expect(await handlers.invoke.listRecent()).toEqual([]);
    expect(await handlers.invoke.listRecentLibraries()).toEqual([]);
  });
});
