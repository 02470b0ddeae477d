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

describe('readTextFile()', () => {
  it('reads UTF-8 text and drops a byte-order mark', async () => {
    const path = nodePath.join(folder, 'boost.json');
    await nodeFs.writeFile(path, '\uFEFF{"name":"Lüfter 5 µH"}');
    expect(await readTextFile(path)).toEqual({ ok: true, path, name: 'boost.json', text: '{"name":"Lüfter 5 µH"}' }); // Unicode standard §23.8: U+FEFF as BOM is not content
  });

  it('refuses binary content with a sentence instead of mojibake', async () => {
    const path = nodePath.join(folder, 'photo.json');
    await nodeFs.writeFile(path, Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10])); // JPEG SOI marker is not valid UTF-8 (RFC 3629)
    expect(await readTextFile(path)).toEqual({ ok: false, message: 'Could not open "photo.json": it is not a UTF-8 text file. Is it the right file?' });
  });

  it('refuses a file that is far too large before reading it', async () => {
    const result = await readTextFile('/x/huge.json', { sizeOf: async () => MAX_OPEN_BYTES + 1, readFile: async () => { throw new Error('must not read'); } });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/^Could not open "huge\.json": it is 20\.0 MB, and a design file is at most 20 MB\./);
  });

  it('names the file and the reason when it is missing', async () => {
    expect(await readTextFile(nodePath.join(folder, 'gone.json'))).toEqual({ ok: false, message: 'Could not open "gone.json": the file or its folder does not exist (ENOENT).' });
  });
});
