/**
 * Atomic save: the new content goes to a temporary file in the SAME folder, is flushed to disk (fsync)
 * and then renamed over the target, so at every instant the target holds either the complete previous
 * version or the complete new one (rename within one file system replaces atomically: POSIX rename(2),
 * and ReplaceFile/MoveFileEx semantics behind Node's fs.rename on Windows).
 * Before the rename, the previous version is copied to `<name>.bak` (itself written the same way).
 * On any failure the temporary file is removed, the target is untouched, and the caller gets one clear
 * sentence; nothing throws.
 *
 * What is replaced:
 * - A symbolic link is written THROUGH: the file it points to gets the new content (temporary file and
 *   .bak beside that file), and the link stays a link. A link to nothing is refused.
 * - Only a regular file: a folder, named pipe, device or socket is refused.
 * - A read-only file (no write permission bit, or not writable by this user) is refused with
 *   `readOnly: true`, so the caller can offer Save As; rename(2) would otherwise replace it silently.
 * - Stale temporaries of the same target (left by a save that was killed between create and rename) are
 *   removed first: only names of exactly our pattern (`.<name>.<12 hex digits>.tmp`), only regular files
 *   (never a link), only when older than STALE_TEMPORARY_MS and not being written by this process.
 *
 * The file system is a small facade so tests can inject a full disk, a refused rename or a crash in
 * the middle of writing.
 */
import { constants as fsConstants } from 'node:fs';
import nodeFs from 'node:fs/promises';
import nodePath from 'node:path';
import { randomBytes } from 'node:crypto';
import { describeFsError, errorCode } from './fs-errors.ts';
import { describeKind, kindOf, type FileKind } from './file-kind.ts';

export interface WritableFile {
  /** Writes some or all of `data`; returns how many bytes were written. */
  write(data: Uint8Array): Promise<number>;
  sync(): Promise<void>;
  close(): Promise<void>;
}

/** A path as lstat sees it (a link is not followed); null when nothing is there. */
export interface PathInfo {
  kind: FileKind;
  /** Permission bits (lower 9). */
  mode: number;
  mtimeMs: number;
}

export interface SaveFs {
  /** Creates a new file; fails if it exists. */
  create(path: string, mode: number): Promise<WritableFile>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
  readFile(path: string): Promise<Uint8Array>;
  /** Flushes a folder's entry table so a completed rename survives a power cut; best effort. */
  syncFolder(path: string): Promise<void>;
  /** lstat: what is at the path itself, or null. */
  inspect(path: string): Promise<PathInfo | null>;
  /** The path with every symbolic link resolved (realpath(3)); throws ENOENT for a link to nothing. */
  realPath(path: string): Promise<string>;
  /** True when this process may write the file (access(2) W_OK). */
  canWrite(path: string): Promise<boolean>;
  /** Names in a folder ([] when it cannot be read). */
  list(folder: string): Promise<string[]>;
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
  readFile: async (path) => new Uint8Array(await nodeFs.readFile(path)),
  async inspect(path) {
    try {
      const stat = await nodeFs.lstat(path);
      return { kind: kindOf(stat), mode: stat.mode & 0o777, mtimeMs: stat.mtimeMs };
    } catch (error) {
      if (errorCode(error) === 'ENOENT') return null;
      throw error;
    }
  },
  realPath: (path) => nodeFs.realpath(path),
  async canWrite(path) {
    try {
      await nodeFs.access(path, fsConstants.W_OK);
      return true;
    } catch {
      return false;
    }
  },
  async list(folder) {
    try {
      return await nodeFs.readdir(folder);
    } catch {
      return [];
    }
  },
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

export type AtomicSaveResult =
  | { ok: true; path: string; backupPath: string | null }
  | { ok: false; message: string; readOnly?: true };

/** A temporary file younger than this may belong to a save still running in another process. */
export const STALE_TEMPORARY_MS = 30_000;
const TOKEN = /^[0-9a-f]{12}$/;
/** Temporary files this process is writing right now (never cleaned as stale). */
const inFlight = new Set<string>();

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
  inFlight.add(temporary);
  try {
    await writeFully(fs, temporary, data, mode);
    await fs.rename(temporary, target);
  } catch (error) {
    await fs.unlink(temporary).catch(() => undefined);
    throw error;
  } finally {
    inFlight.delete(temporary);
  }
}

/**
 * Removes temporaries that an interrupted save of `target` (or of its .bak) left behind; see the
 * header for what counts as stale. Returns the names removed. Never throws.
 */
export async function removeStaleTemporaries(target: string, fs: SaveFs = nodeSaveFs, now: number = Date.now()): Promise<string[]> {
  const folder = nodePath.dirname(target);
  const removed: string[] = [];
  for (const stem of [nodePath.basename(target), nodePath.basename(backupPathFor(target))]) {
    const prefix = `.${stem}.`;
    for (const name of await fs.list(folder)) {
      if (!name.startsWith(prefix) || !name.endsWith('.tmp') || !TOKEN.test(name.slice(prefix.length, -'.tmp'.length))) continue;
      const path = nodePath.join(folder, name);
      if (inFlight.has(path)) continue;
      try {
        const info = await fs.inspect(path);
        if (info?.kind !== 'file' || now - info.mtimeMs < STALE_TEMPORARY_MS) continue;
        await fs.unlink(path);
        removed.push(name);
      } catch {
        // Gone meanwhile, or not ours to remove: leave it.
      }
    }
  }
  return removed;
}

type Destination = { ok: true; path: string; existing: PathInfo | null } | { ok: false; message: string; readOnly?: true };

/** Where the bytes really go (through links), refused when it is not a writable regular file. */
async function destinationOf(fs: SaveFs, target: string): Promise<Destination> {
  const name = nodePath.basename(target);
  let path = target;
  let info = await fs.inspect(target);
  if (info?.kind === 'symlink') {
    try {
      path = await fs.realPath(target);
    } catch (error) {
      if (errorCode(error) === 'ENOENT') return { ok: false, message: `Could not save "${name}": it is a link to a file that does not exist. Nothing was written.` };
      throw error;
    }
    info = await fs.inspect(path);
  }
  if (info === null) return { ok: true, path, existing: null };
  if (info.kind !== 'file') return { ok: false, message: `Could not save "${name}": it is ${describeKind(info.kind === 'symlink' ? 'other' : info.kind)}, not a file. Nothing was written.` };
  if ((info.mode & 0o222) === 0 || !(await fs.canWrite(path)))
    return { ok: false, readOnly: true, message: `Could not save "${name}": the file is read-only. It was left unchanged; use Save As to keep your changes in another file.` };
  return { ok: true, path, existing: info };
}

export async function saveAtomically(target: string, content: string | Uint8Array, options: SaveOptions): Promise<AtomicSaveResult> {
  const fs = options.fs ?? nodeSaveFs;
  const nextToken = options.token ?? (() => randomBytes(6).toString('hex'));
  const data = typeof content === 'string' ? new TextEncoder().encode(content) : content;
  const name = nodePath.basename(target);
  let stage = 'prepare';
  let existed = true;
  try {
    const destination = await destinationOf(fs, target);
    if (!destination.ok) return destination;
    const real = destination.path;
    existed = destination.existing !== null;
    const mode = destination.existing?.mode ?? 0o644;
    await removeStaleTemporaries(real, fs);
    let backupPath: string | null = null;
    if (options.backup && existed) {
      stage = 'backup';
      backupPath = backupPathFor(real);
      await replaceAtomically(fs, backupPath, await fs.readFile(real), mode, nextToken());
    }
    stage = 'write';
    await replaceAtomically(fs, real, data, mode, nextToken());
    // The new version is in place; flushing the folder entry is best effort and cannot undo that.
    try {
      await fs.syncFolder(nodePath.dirname(real));
    } catch {
      // Not flushed: the rename stands all the same.
    }
    return { ok: true, path: target, backupPath };
  } catch (error) {
    const what = stage === 'backup' ? `keeping the previous version as ${nodePath.basename(backupPathFor(target))} failed` : describeFsError(error);
    const why = stage === 'backup' ? `${what}: ${describeFsError(error)}` : what;
    const onDisk = existed ? 'The previous version on disk is unchanged.' : 'No file was created.';
    return { ok: false, message: `Could not save "${name}": ${why}. ${onDisk}` };
  }
}
