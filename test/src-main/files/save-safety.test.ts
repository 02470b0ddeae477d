/**
 * Saving never loses an edit (issue 15 §2), on the real file system: links are written through, a
 * read-only file is refused with Save As offered, anything that is not a regular file is refused,
 * temporaries left by an interrupted save are cleaned safely, and injected faults at every step of a
 * save leave the previous file intact. The kill test uses a real child process killed mid-write.
 */
import { spawn } from 'node:child_process';
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { removeStaleTemporaries, saveAtomically, STALE_TEMPORARY_MS } from '../../../src-main/files/atomic-save.ts';
import { mulberry32, pick } from '../../reference/prng.ts';
import { fsError, journalingFs } from './failing-fs.ts';

let folder: string;
let target: string;
const OLD = '{"name":"old"}\n';
const NEW = '{"name":"new"}\n';
const posix = process.platform !== 'win32';

beforeEach(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-safe-'));
  target = nodePath.join(folder, 'buck.json');
});
afterEach(async () => {
  await nodeFs.chmod(target, 0o644).catch(() => undefined);
  await nodeFs.rm(folder, { recursive: true, force: true });
});

const read = (path: string): Promise<string> => nodeFs.readFile(path, 'utf8');
const temporaries = async (): Promise<string[]> => (await nodeFs.readdir(folder)).filter((name) => name.endsWith('.tmp'));
const age = async (path: string, ms: number): Promise<void> => {
  const then = new Date(Date.now() - ms);
  await nodeFs.utimes(path, then, then);
};

describe('saving through a symbolic link', () => {
  it.runIf(posix)('writes the file the link points to and leaves the link a link', async () => {
    const realFolder = nodePath.join(folder, 'real');
    await nodeFs.mkdir(realFolder);
    const real = nodePath.join(realFolder, 'design.json');
    await nodeFs.writeFile(real, OLD);
    await nodeFs.symlink(real, target);
    expect((await saveAtomically(target, NEW, { backup: true })).ok).toBe(true);
    expect((await nodeFs.lstat(target)).isSymbolicLink()).toBe(true); // POSIX lstat(2): the link itself
    expect(await read(real)).toBe(NEW);
    expect(await read(`${real}.bak`)).toBe(OLD); // the backup sits beside the real file
  });

  it.runIf(posix)('refuses a link to nothing', async () => {
    await nodeFs.symlink(nodePath.join(folder, 'nowhere.json'), target);
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result).toEqual({ ok: false, message: 'Could not save "buck.json": it is a link to a file that does not exist. Nothing was written.' });
  });
});

describe('a read-only file', () => {
  it.runIf(posix)('is left unchanged, with a message that offers Save As', async () => {
    await nodeFs.writeFile(target, OLD);
    await nodeFs.chmod(target, 0o444); // POSIX permission bits: no write for anyone (root included, by our rule)
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result).toEqual({ ok: false, readOnly: true, message: 'Could not save "buck.json": the file is read-only. It was left unchanged; use Save As to keep your changes in another file.' });
    expect(await read(target)).toBe(OLD);
    expect(await temporaries()).toEqual([]);
  });
});

describe('anything that is not a regular file', () => {
  it('refuses a folder', async () => {
    await nodeFs.mkdir(target);
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result).toEqual({ ok: false, message: 'Could not save "buck.json": it is a folder, not a file. Nothing was written.' });
  });

  it.runIf(posix)('refuses a link to a device', async () => {
    await nodeFs.symlink('/dev/null', target);
    const result = await saveAtomically(target, NEW, { backup: true });
    expect(result).toEqual({ ok: false, message: 'Could not save "buck.json": it is a device, not a file. Nothing was written.' });
  });
});

describe('temporary files of interrupted saves', () => {
  it('are removed on the next save when stale, and only those of our own exact pattern', async () => {
    await nodeFs.writeFile(target, OLD);
    const stale = nodePath.join(folder, '.buck.json.0123456789ab.tmp');
    const staleBackup = nodePath.join(folder, '.buck.json.bak.ba9876543210.tmp');
    const fresh = nodePath.join(folder, '.buck.json.aaaaaaaaaaaa.tmp');
    const foreign = nodePath.join(folder, '.buck.json.notours.tmp');
    const other = nodePath.join(folder, '.boost.json.0123456789ab.tmp');
    for (const path of [stale, staleBackup, fresh, foreign, other]) await nodeFs.writeFile(path, 'partial');
    for (const path of [stale, staleBackup, foreign, other]) await age(path, STALE_TEMPORARY_MS + 60_000);
    expect((await saveAtomically(target, NEW, { backup: true })).ok).toBe(true);
    expect((await temporaries()).sort()).toEqual(['.boost.json.0123456789ab.tmp', '.buck.json.aaaaaaaaaaaa.tmp', '.buck.json.notours.tmp']);
  });

  it.runIf(posix)('never follows or removes a link that looks like a temporary', async () => {
    const victim = nodePath.join(folder, 'victim.txt');
    await nodeFs.writeFile(victim, 'keep');
    const trap = nodePath.join(folder, '.buck.json.0123456789ab.tmp');
    await nodeFs.symlink(victim, trap);
    await nodeFs.lutimes(trap, new Date(0), new Date(0));
    expect(await removeStaleTemporaries(target)).toEqual([]);
    expect(await read(victim)).toBe('keep');
    expect((await nodeFs.lstat(trap)).isSymbolicLink()).toBe(true);
  });

  it.runIf(posix)('a save killed mid-write (real child process, SIGKILL) leaves the previous file whole; the next save cleans up', async () => {
    await nodeFs.writeFile(target, OLD);
    const child = spawn(process.execPath, ['--import', 'tsx', nodePath.join(import.meta.dirname, 'fixtures', 'slow-save.ts'), target, String(4096 * 200)], { stdio: ['ignore', 'pipe', 'inherit'] });
    await new Promise<void>((resolve, reject) => {
      child.stdout.on('data', (chunk: Buffer) => {
        if (chunk.toString().includes('writing')) resolve();
      });
      child.on('exit', () => reject(new Error('the child finished before it could be killed')));
    });
    child.kill('SIGKILL');
    await new Promise((resolve) => child.once('close', resolve));
    expect(await read(target)).toBe(OLD); // POSIX rename(2) is the only step that replaces the target
    const left = await temporaries();
    expect(left.length).toBeGreaterThan(0); // the torn temporary is there...
    for (const name of left) await age(nodePath.join(folder, name), STALE_TEMPORARY_MS + 1000);
    expect((await saveAtomically(target, NEW, { backup: true })).ok).toBe(true);
    expect(await temporaries()).toEqual([]); // ...and the next save removed it
    expect(await read(target)).toBe(NEW);
  }, 30_000);
});

describe('fault injection at every step of a save', () => {
  const STEPS = ['create', 'write', 'sync', 'close', 'rename', 'read', 'sync-folder'] as const;
  const CODES = ['ENOSPC', 'EIO', 'EACCES', 'EPERM', 'EDQUOT'] as const;

  it('300 seeded faults: the target holds the complete old or the complete new text, never anything else', async () => {
    const random = mulberry32(20_260_415);
    let intact = 0;
    let replaced = 0;
    const runs = 300;
    for (let run = 0; run < runs; run += 1) {
      await nodeFs.writeFile(target, OLD);
      const step: string = pick(random, STEPS);
      const code: string = pick(random, CODES);
      const onBackup = random() < 0.5;
      let fired = false;
      const fs = journalingFs({
        failOn: (operation, path) => {
          const isBackup = path.includes('.bak');
          if (fired || operation !== step || (step !== 'read' && step !== 'sync-folder' && isBackup !== onBackup)) return null;
          fired = true;
          return fsError(code, `injected at ${step}`);
        },
      });
      const result = await saveAtomically(target, NEW, { backup: true, fs });
      const onDisk = await read(target);
      expect([OLD, NEW], `run ${run}: ${code} at ${step}`).toContain(onDisk);
      if (result.ok) expect(onDisk).toBe(NEW);
      else {
        expect(onDisk, `run ${run}: ${code} at ${step} (backup ${onBackup}) must leave the old file: ${result.message}`).toBe(OLD);
        expect(result.message).toMatch(/^Could not save "buck\.json": .+ The previous version on disk is unchanged\.$/);
        intact += 1;
      }
      if (result.ok) replaced += 1;
      expect(await temporaries(), `run ${run}`).toEqual([]);
      await nodeFs.rm(`${target}.bak`, { force: true });
    }
    expect(intact + replaced).toBe(runs);
    expect(intact).toBeGreaterThan(150); // most injected faults stop the save (only a failed folder flush does not)
    console.info(`save faults injected: ${runs}; failed saves with the previous file intact: ${intact}/${intact}; saves that completed despite a best-effort step failing: ${replaced}`);
  });
});
