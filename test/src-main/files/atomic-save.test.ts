import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupPathFor, saveAtomically } from '../../../src-main/files/atomic-save.ts';
import { fsError, journalingFs } from './failing-fs.ts';

let folder: string;
let target: string;
const ORIGINAL = '{"format":"wattledger.design","version":1,"name":"original"}\n';
const NEW = '{"format":"wattledger.design","version":1,"name":"edited","padding":"' + 'x'.repeat(10_000) + '"}\n';

beforeEach(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-save-'));
  target = nodePath.join(folder, 'buck.json');
});
afterEach(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

const read = (path: string): Promise<string> => nodeFs.readFile(path, 'utf8');
const leftovers = async (): Promise<string[]> => (await nodeFs.readdir(folder)).filter((name) => name.endsWith('.tmp'));

describe('saveAtomically()', () => {
  it('creates a new file without a backup', async () => {
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result).toEqual({ ok: true, path: target, backupPath: null });
    expect(await read(target)).toBe(NEW);
    expect(await leftovers()).toEqual([]);
  });

  it('replaces an existing file and keeps the previous version as .bak', async () => {
    await nodeFs.writeFile(target, ORIGINAL);
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result.ok && result.backupPath).toBe(`${target}.bak`);
    expect(await read(target)).toBe(NEW);
    expect(await read(backupPathFor(target))).toBe(ORIGINAL);
    expect(await leftovers()).toEqual([]);
  });

  it('writes to a temporary file in the same folder, flushes it, and only then renames it over the target', async () => {
    const fs = journalingFs();
    await saveAtomically(target, NEW, { backup: false, fs, token: () => 't1' });
    // Order required for a crash-safe replace: write → fsync → close → rename (POSIX rename(2) atomicity; "common practice" for atomic saves) [from memory]
    expect(fs.journal).toEqual(['create .buck.json.t1.tmp', 'write .buck.json.t1.tmp', 'sync .buck.json.t1.tmp', 'close .buck.json.t1.tmp', 'rename .buck.json.t1.tmp -> buck.json', `sync-folder ${nodePath.basename(folder)}`]);
  });

  it('keeps the file mode of the file it replaces', async () => {
    if (process.platform === 'win32') return;
    await nodeFs.writeFile(target, ORIGINAL, { mode: 0o600 });
    await nodeFs.chmod(target, 0o600);
    await saveAtomically(target, NEW, { backup: true });
    expect((await nodeFs.stat(target)).mode & 0o777).toBe(0o600); // POSIX permission bits, chmod(2)
  });

  describe('when something fails, the original survives', () => {
    beforeEach(async () => {
      await nodeFs.writeFile(target, ORIGINAL);
    });

    it('rename refused: original intact, .bak made, temporary removed, clear message', async () => {
      const result = await saveAtomically(target, NEW, { backup: true, fs: journalingFs({ refuseRenameTo: target }) });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toBe('Could not save "buck.json": the operating system did not allow it (EPERM). The previous version on disk is unchanged.');
      expect(await read(target)).toBe(ORIGINAL);
      expect(await read(backupPathFor(target))).toBe(ORIGINAL);
      expect(await leftovers()).toEqual([]);
    });

    it('disk full (write throws ENOSPC): original intact, .bak made, temporary removed', async () => {
      const fs = journalingFs({ failWriteFor: { name: 'buck.json', error: fsError('ENOSPC', 'no space left on device, write') } });
      const result = await saveAtomically(target, NEW, { backup: true, fs });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toMatch(/the disk is full \(ENOSPC\)\. The previous version on disk is unchanged\.$/);
      expect(await read(target)).toBe(ORIGINAL);
      expect(await read(backupPathFor(target))).toBe(ORIGINAL);
      expect(await leftovers()).toEqual([]);
      expect(fs.journal.some((entry) => entry.startsWith('rename') && entry.endsWith('-> buck.json'))).toBe(false);
    });

    it('crash mid-write (half the bytes written, then an error): original intact, partial file never renamed', async () => {
      const fs = journalingFs({ failWriteFor: { name: 'buck.json', error: fsError('EIO', 'i/o error, write'), writeHalfFirst: true } });
      const result = await saveAtomically(target, NEW, { backup: true, fs });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toContain('input/output error (EIO)');
      expect(await read(target)).toBe(ORIGINAL);
      expect(await leftovers()).toEqual([]);
    });

    it('backup cannot be made: nothing is replaced and the message names the .bak', async () => {
      const result = await saveAtomically(target, NEW, { backup: true, fs: journalingFs({ failReadOf: target }) });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toBe('Could not save "buck.json": keeping the previous version as buck.json.bak failed: the disk reported an input/output error (EIO). The previous version on disk is unchanged.');
      expect(await read(target)).toBe(ORIGINAL);
    });

    it('a crash that kills the process mid-write leaves at most a stray temporary, never a torn target', async () => {
      // Simulate the process dying: the partial temporary is written and nothing else happens.
      const fs = journalingFs({ failWriteFor: { name: 'buck.json', error: fsError('EIO'), writeHalfFirst: true } });
      fs.unlink = async () => undefined; // the dead process cannot clean up
      await saveAtomically(target, NEW, { backup: false, fs });
      expect(await read(target)).toBe(ORIGINAL);
      const stray = await leftovers();
      expect(stray).toHaveLength(1);
      expect((await read(nodePath.join(folder, stray[0] ?? ''))).length).toBe(Math.floor(NEW.length / 2));
    });
  });

  it('reports a missing folder for a new file as "no file was created"', async () => {
    const result = await saveAtomically(nodePath.join(folder, 'gone', 'x.json'), NEW, { backup: true });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toBe('Could not save "x.json": the file or its folder does not exist (ENOENT). No file was created.');
  });
});
