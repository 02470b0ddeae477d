/**
 * Atomic save: the new content goes to a temporary file in the SAME folder, is flushed to disk (fsync)
 * and then renamed over the target, so at every instant the target holds either the complete previous
 * version or the complete new one (rename within one file system replaces atomically: POSIX rename(2),
 * and ReplaceFile/MoveFileEx semantics behind Node's fs.rename on Windows).
 * Before the rename, the previous version is copied to `<name>.bak` (itself written the same way).
 * On any failure the temporary file is removed, the target is untouched, and the caller gets one clear
 * sentence; nothing throws.
 *
 * The file system is a small facade so tests can inject a full disk, a refused rename or a crash in
 * the middle of writing.
 */
import nodeFs from 'node:fs/promises';
import nodePath from 'node:path';
import { randomBytes } from 'node:crypto';
import { describeFsError, errorCode } from './fs-errors.ts';

export interface WritableFile {
  /** Writes some or all of `data`; returns how many bytes were written. */
  write(data: Uint8Array): Promise<number>;
  sync(): Promise<void>;
  close(): Promise<void>;
}

export interface SaveFs {
  /** Creates a new file; fails if it exists. */
  create(path: string, mode: number): Promise<WritableFile>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
  /** The file's permission bits, or null when it does not exist. */
  modeOf(path: string): Promise<number | null>;
  readFile(path: string): Promise<Uint8Array>;
  /** Flushes a folder's entry table so a completed rename survives a power cut; best effort. */
  syncFolder(path: string): Promise<void>;
}

export const nodeSaveFs: SaveFs = {
  async create(path, mode) {
    const handle = await nodeFs.open(path, 'wx', mode);
    return {
      write: async (data) => (await handle.write(data)).bytesWritten,
      sync: () => handle.sync(),
      close: () => handle.close(),
    };
  },
  rename: (from, to) => nodeFs.rename(from, to),
  unlink: (path) => nodeFs.unlink(path),
  async modeOf(path) {
    try {
      return (await nodeFs.stat(path)).mode & 0o777;
    } catch (error) {
      if (errorCode(error) === 'ENOENT') return null;
      throw error;
    }
  },
  readFile: async (path) => new Uint8Array(await nodeFs.readFile(path)),
  async syncFolder(path) {
    let handle: nodeFs.FileHandle | undefined;
    try {
      handle = await nodeFs.open(path, 'r');
      await handle.sync();
    } catch {
      // Windows cannot open a folder for syncing; its rename is already durable enough.
    } finally {
      await handle?.close().catch(() => undefined);
    }
  },
};

export interface SaveOptions {
  /** Keep the previous version as `<path>.bak` (designs: yes; exports and snapshots: no). */
  backup: boolean;
  fs?: SaveFs;
  /** Suffix source for the temporary name; injectable for tests. */
  token?: () => string;
}

export type AtomicSaveResult = { ok: true; path: string; backupPath: string | null } | { ok: false; message: string };

export function backupPathFor(path: string): string {
  return `${path}.bak`;
}

export function temporaryPathFor(path: string, token: string): string {
  return nodePath.join(nodePath.dirname(path), `.${nodePath.basename(path)}.${token}.tmp`);
}

async function writeFully(fs: SaveFs, path: string, data: Uint8Array, mode: number): Promise<void> {
  const file = await fs.create(path, mode);
  try {
    let offset = 0;
    while (offset < data.length) {
      const written = await file.write(data.subarray(offset));
      if (written <= 0) throw new Error('the disk accepted no more data');
      offset += written;
    }
    await file.sync();
  } finally {
    await file.close();
  }
}

/** Writes `data` to a temporary sibling and renames it over `target`. Throws; cleans its temporary. */
async function replaceAtomically(fs: SaveFs, target: string, data: Uint8Array, mode: number, token: string): Promise<void> {
  const temporary = temporaryPathFor(target, token);
  try {
    await writeFully(fs, temporary, data, mode);
    await fs.rename(temporary, target);
  } catch (error) {
    await fs.unlink(temporary).catch(() => undefined);
    throw error;
  }
}

export async function saveAtomically(target: string, content: string | Uint8Array, options: SaveOptions): Promise<AtomicSaveResult> {
  const fs = options.fs ?? nodeSaveFs;
  const nextToken = options.token ?? (() => randomBytes(6).toString('hex'));
  const data = typeof content === 'string' ? new TextEncoder().encode(content) : content;
  const name = nodePath.basename(target);
  let stage = 'prepare';
  let existed = true;
  try {
    const previousMode = await fs.modeOf(target);
    existed = previousMode !== null;
    const mode = previousMode ?? 0o644;
    let backupPath: string | null = null;
    if (options.backup && previousMode !== null) {
      stage = 'backup';
      backupPath = backupPathFor(target);
      await replaceAtomically(fs, backupPath, await fs.readFile(target), mode, nextToken());
    }
    stage = 'write';
    await replaceAtomically(fs, target, data, mode, nextToken());
    await fs.syncFolder(nodePath.dirname(target));
    return { ok: true, path: target, backupPath };
  } catch (error) {
    const what = stage === 'backup' ? `keeping the previous version as ${nodePath.basename(backupPathFor(target))} failed` : describeFsError(error);
    const why = stage === 'backup' ? `${what}: ${describeFsError(error)}` : what;
    const onDisk = existed ? 'The previous version on disk is unchanged.' : 'No file was created.';
    return { ok: false, message: `Could not save "${name}": ${why}. ${onDisk}` };
  }
}
