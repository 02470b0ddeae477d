import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MAX_RECENT, RecentFiles, addRecent, parseStoredRecent, pruneMissing, removeRecent } from '../../../src-main/files/recent-files.ts';

describe('recent-list rules', () => {
  it('puts the newest first, removes the older duplicate and keeps at most the bound', () => {
    let list: string[] = [];
    for (let index = 0; index < MAX_RECENT + 3; index += 1) list = addRecent(list, `/d/f${index}.json`, 'linux');
    expect(list).toHaveLength(MAX_RECENT);
    expect(list[0]).toBe(`/d/f${MAX_RECENT + 2}.json`);
    list = addRecent(list, '/d/f5.json', 'linux');
    expect(list[0]).toBe('/d/f5.json');
    expect(list.filter((entry) => entry === '/d/f5.json')).toHaveLength(1);
  });

  it('compares paths case-insensitively on Windows and macOS only', () => {
    expect(addRecent(['/d/Buck.json'], '/d/buck.json', 'darwin')).toEqual(['/d/buck.json']); // APFS/HFS+ default case-insensitive [from memory]
    expect(addRecent(['/d/Buck.json'], '/d/buck.json', 'linux')).toEqual(['/d/buck.json', '/d/Buck.json']); // ext4 is case-sensitive
    expect(removeRecent(['/d/Buck.json', '/d/a.json'], '/d/BUCK.json', 'win32')).toEqual(['/d/a.json']);
  });

  it('prunes files that no longer exist', async () => {
    const present = new Set(['/d/a.json', '/d/c.json']);
    expect(await pruneMissing(['/d/a.json', '/d/b.json', '/d/c.json'], async (path) => present.has(path))).toEqual(['/d/a.json', '/d/c.json']);
  });

  it('cleans a stored list: wrong format is empty, relative paths and duplicates are dropped', () => {
    expect(parseStoredRecent({ paths: ['/a.json'] }, 'linux')).toEqual([]);
    expect(parseStoredRecent({ format: 'wattledger.recent-files', version: 1, paths: ['/a.json', 'rel.json', '/a.json', '/b.json'] }, 'linux')).toEqual(['/a.json', '/b.json']);
  });
});

describe('RecentFiles store', () => {
  let folder: string;
  beforeEach(async () => {
    folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-recent-'));
  });
  afterEach(async () => {
    await nodeFs.rm(folder, { recursive: true, force: true });
  });

  it('remembers across instances and prunes a deleted file when listing', async () => {
    const a = nodePath.join(folder, 'a.json');
    const b = nodePath.join(folder, 'b.json');
    await nodeFs.writeFile(a, '{}');
    await nodeFs.writeFile(b, '{}');
    const store = new RecentFiles(nodePath.join(folder, 'user-data'));
    await store.add(a);
    await store.add(b);
    expect(await new RecentFiles(nodePath.join(folder, 'user-data')).list()).toEqual([b, a]);
    await nodeFs.rm(b);
    expect(await store.list()).toEqual([a]);
    expect(await store.has(b)).toBe(false);
    expect(await store.has(a)).toBe(true);
  });
});
