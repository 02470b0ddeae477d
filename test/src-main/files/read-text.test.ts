import { execFileSync } from 'node:child_process';
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_OPEN_BYTES, readTextFile } from '../../../src-main/files/read-text.ts';

let folder: string;
beforeAll(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-read-'));
});
afterAll(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

const posix = process.platform !== 'win32';

describe('readTextFile()', () => {
  it('reads UTF-8 text and drops a byte-order mark', async () => {
    const path = nodePath.join(folder, 'boost.json');
    await nodeFs.writeFile(path, '\uFEFF{"name":"Lüfter 5 µH"}');
    expect(await readTextFile(path)).toEqual({ ok: true, path, name: 'boost.json', text: '{"name":"Lüfter 5 µH"}' }); // Unicode standard §23.8: U+FEFF as BOM is not content
  });

  it('refuses binary content with a sentence instead of mojibake', async () => {
    const path = nodePath.join(folder, 'photo.json');
    await nodeFs.writeFile(path, Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10])); // JPEG SOI marker is not valid UTF-8 (RFC 3629)
    expect(await readTextFile(path)).toEqual({ ok: false, message: 'Could not open "photo.json": it is not a UTF-8 text file (line 1 holds a byte that is not UTF-8, at byte 1). Is it the right file?' });
  });

  it('names the line of the first byte that is not UTF-8', async () => {
    const path = nodePath.join(folder, 'noise.json');
    const bytes = new TextEncoder().encode('{\n  "name": "Lüfter",\n  "x": "?"\n}');
    bytes[bytes.indexOf(0x3f)] = 0xc0; // 0xC0 never occurs in UTF-8 (Unicode Standard §3.9, Table 3-7)
    await nodeFs.writeFile(path, bytes);
    expect(await readTextFile(path)).toMatchObject({ ok: false, message: expect.stringContaining('line 3 holds a byte that is not UTF-8') });
  });

  it('refuses a file larger than the limit after reading at most one byte past it', async () => {
    const path = nodePath.join(folder, 'huge.json');
    await nodeFs.writeFile(path, '');
    await nodeFs.truncate(path, MAX_OPEN_BYTES + 5_000_000); // sparse: no disk used
    const result = await readTextFile(path);
    expect(result).toEqual({ ok: false, message: 'Could not open "huge.json": it is larger than 20 MB, the most a design file may be. Is it the right file?' });
  });

  it('reads a file of exactly the limit (the bound is inclusive)', async () => {
    const path = nodePath.join(folder, 'edge.json');
    await nodeFs.writeFile(path, 'x'.repeat(1000));
    expect((await readTextFile(path, undefined, 1000)).ok).toBe(true);
    expect((await readTextFile(path, undefined, 999)).ok).toBe(false);
  });

  it('names the file and the reason when it is missing', async () => {
    expect(await readTextFile(nodePath.join(folder, 'gone.json'))).toEqual({ ok: false, message: 'Could not open "gone.json": the file or its folder does not exist (ENOENT).' });
  });

  it('refuses a folder', async () => {
    const path = nodePath.join(folder, 'designs.json');
    await nodeFs.mkdir(path);
    expect(await readTextFile(path)).toEqual({ ok: false, message: 'Could not open "designs.json": it is a folder, not a file. Choose a design file (.json).' });
  });

  it.runIf(posix)('refuses a named pipe at once instead of waiting forever for a writer', async () => {
    const path = nodePath.join(folder, 'pipe.json');
    execFileSync('mkfifo', [path]); // POSIX mkfifo(1): open(2) for reading blocks without O_NONBLOCK
    const started = performance.now();
    expect(await readTextFile(path)).toEqual({ ok: false, message: 'Could not open "pipe.json": it is a named pipe (FIFO), not a file. Choose a design file (.json).' });
    expect(performance.now() - started).toBeLessThan(10_000); // a hang would hit the test timeout instead
  });

  it.runIf(posix)('refuses /dev/zero (an endless device) without reading it', async () => {
    expect(await readTextFile('/dev/zero')).toEqual({ ok: false, message: 'Could not open "zero": it is a device, not a file. Choose a design file (.json).' });
  });

  it.runIf(posix)('follows a symbolic link to a regular file, and refuses one to a device', async () => {
    const target = nodePath.join(folder, 'real.json');
    await nodeFs.writeFile(target, '{"a":1}');
    const link = nodePath.join(folder, 'link.json');
    await nodeFs.symlink(target, link);
    expect(await readTextFile(link)).toEqual({ ok: true, path: link, name: 'link.json', text: '{"a":1}' });
    const toDevice = nodePath.join(folder, 'zero.json');
    await nodeFs.symlink('/dev/zero', toDevice);
    expect((await readTextFile(toDevice)).ok).toBe(false);
  });
});
