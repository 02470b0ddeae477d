/**
 * Reads a design (or any text file the user chose) for the renderer and the command line: only a
 * regular file (a symbolic link is followed to its target), at most MAX_OPEN_BYTES, strict UTF-8.
 * A named pipe, a device (/dev/zero), a socket or a folder is refused with a sentence instead of hanging
 * or filling memory. The file is opened without blocking (O_NONBLOCK, so opening a FIFO returns at once),
 * checked on the open handle (fstat: no window between the check and the read), and read in chunks
 * that stop one byte past the limit, whatever size the file claims.
 */
import nodeFs from 'node:fs/promises';
import { constants as fsConstants } from 'node:fs';
import nodePath from 'node:path';
import { describeFsError } from './fs-errors.ts';
import { describeKind, kindOf, type FileKind } from './file-kind.ts';
import { firstInvalidUtf8, lineOfByte } from './utf8.ts';
import { MAX_TEXT_CHARS } from '../ipc/payloads.ts';


export interface OpenedHandle {
  kind(): Promise<FileKind>;
  /** Reads into `buffer` at `offset`; returns the bytes read, 0 at the end of the file. */
  read(buffer: Uint8Array, offset: number, length: number): Promise<number>;
  close(): Promise<void>;
}

export interface ReadFs {
  open(path: string): Promise<OpenedHandle>;
}

/** O_NONBLOCK where the platform has it (not on Windows, which has no FIFOs to hang on). */
const OPEN_FLAGS = fsConstants.O_RDONLY | (fsConstants.O_NONBLOCK ?? 0);

export const nodeReadFs: ReadFs = {
  async open(path) {
    const handle = await nodeFs.open(path, OPEN_FLAGS);
    return {
      kind: async () => kindOf(await handle.stat()),
      read: async (buffer, offset, length) => (await handle.read(buffer, offset, length, null)).bytesRead,
      close: () => handle.close(),
    };
  },
};

export type ReadResult = { ok: true; path: string; name: string; text: string } | { ok: false; message: string };

/** Largest file opened, in bytes: UTF-8 can take up to 4 bytes per character. */
export const MAX_OPEN_BYTES = MAX_TEXT_CHARS;

const CHUNK_BYTES = 1 << 20;

type Bounded = { ok: true; bytes: Uint8Array } | { ok: false; tooLarge: true };

/** Reads until the end or until one byte past `limit`, in chunks (never trusting the size fstat claims). */
async function readBounded(handle: OpenedHandle, limit: number): Promise<Bounded> {
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const chunk = new Uint8Array(Math.min(CHUNK_BYTES, limit + 1 - total));
    const read = await handle.read(chunk, 0, chunk.length);
    if (read === 0) break;
    chunks.push(chunk.subarray(0, read));
    total += read;
    if (total > limit) return { ok: false, tooLarge: true };
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.length;
  }
  return { ok: true, bytes };
}

export async function readTextFile(path: string, fs: ReadFs = nodeReadFs, limit: number = MAX_OPEN_BYTES): Promise<ReadResult> {
  const name = nodePath.basename(path);
  let handle: OpenedHandle | undefined;
  try {
    handle = await fs.open(path);
    const kind = await handle.kind();
    if (kind !== 'file') return { ok: false, message: `Could not open "${name}": it is ${describeKind(kind)}, not a file. Choose a design file (.json).` };
    const read = await readBounded(handle, limit);
    if (!read.ok) return { ok: false, message: `Could not open "${name}": it is larger than ${limit / 1e6} MB, the most a design file may be. Is it the right file?` };
    const bad = firstInvalidUtf8(read.bytes);
    if (bad >= 0) {
      return { ok: false, message: `Could not open "${name}": it is not a UTF-8 text file (line ${lineOfByte(read.bytes, bad)} holds a byte that is not UTF-8, at byte ${bad + 1}). Is it the right file?` };
    }
    const text = new TextDecoder('utf-8').decode(read.bytes);
    return { ok: true, path, name, text: text.startsWith('\uFEFF') ? text.slice(1) : text };
  } catch (error) {
    return { ok: false, message: `Could not open "${name}": ${describeFsError(error)}.` };
  } finally {
    await handle?.close().catch(() => undefined);
  }
}
