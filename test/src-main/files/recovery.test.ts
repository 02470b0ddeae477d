import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { nodeJsonFs } from '../../../src-main/files/json-file.ts';
import { RecoveryStore } from '../../../src-main/files/recovery.ts';
import { fsError, journalingFs } from './failing-fs.ts';

let userData: string;
const at = new Date('2026-03-01T10:15:00.000Z');

beforeEach(async () => {
  userData = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-recovery-'));
});
afterEach(async () => {
  await nodeFs.rm(userData, { recursive: true, force: true });
});

describe('RecoveryStore', () => {
  it('has nothing to offer on a first start', async () => {
    expect(await new RecoveryStore(userData).read()).toBeNull();
  });

  it('offers the last snapshot to the next session (as after a crash) with its time', async () => {
    await new RecoveryStore(userData, { now: () => at }).write('{"draft":1}');
    await new RecoveryStore(userData, { now: () => at }).write('{"draft":2}');
    // A new store instance stands for the next start of the app.
    expect(await new RecoveryStore(userData).read()).toEqual({ text: '{"draft":2}', savedAt: '2026-03-01T10:15:00.000Z' }); // ISO 8601 / RFC 3339 timestamp
  });

  it('has nothing to offer after a clean save or close cleared it; clearing twice is harmless', async () => {
    const store = new RecoveryStore(userData, { now: () => at });
    await store.write('{"draft":1}');
    await store.clear();
    await store.clear();
    expect(await new RecoveryStore(userData).read()).toBeNull();
  });

  it('treats a corrupt or foreign snapshot file as no snapshot', async () => {
    const store = new RecoveryStore(userData);
    await nodeFs.mkdir(nodePath.dirname(store.filePath), { recursive: true });
    await nodeFs.writeFile(store.filePath, '{"format":"wattledger.recovery","version":1,"savedAt":"yesterday"');
    expect(await store.read()).toBeNull();
    await nodeFs.writeFile(store.filePath, JSON.stringify({ format: 'other', version: 1, savedAt: at.toISOString(), text: 'x' }));
    expect(await store.read()).toBeNull();
  });

  it('keeps the previous snapshot when a new one cannot be written, and says why', async () => {
    await new RecoveryStore(userData, { now: () => at }).write('{"draft":1}');
    const full = new RecoveryStore(userData, { now: () => at, fs: { ...nodeJsonFs, saveFs: journalingFs({ failWriteFor: { name: 'snapshot.json', error: fsError('ENOSPC') } }) } });
    const result = await full.write('{"draft":2}');
    expect(result).toEqual({ ok: false, message: 'Recovery snapshot not written: Could not save "snapshot.json": the disk is full (ENOSPC). The previous version on disk is unchanged.' });
    expect((await full.read())?.text).toBe('{"draft":1}');
  });
});
