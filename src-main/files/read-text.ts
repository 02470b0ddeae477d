/**
 * Reads a design (or any text file the user chose) for the renderer, with a size cap so a wrong pick
 * (a video, a disk image) gets a sentence instead of freezing the window. Decoding is strict UTF-8.
 */
import nodeFs from 'node:fs/promises';
import nodePath from 'node:path';
import { describeFsError } from './fs-errors.ts';
import { MAX_TEXT_CHARS } from '../ipc/payloads.ts';

export interface ReadFs {
  sizeOf(path: string): Promise<number>;
  readFile(path: string): Promise<Uint8Array>;
}

export const nodeReadFs: ReadFs = {
  sizeOf: async (path) => (await nodeFs.stat(path)).size,
  readFile: async (path) => new Uint8Array(await nodeFs.readFile(path)),
};

export type ReadResult = { ok: true; path: string; name: string; text: string } | { ok: false; message: string };

/** Largest file opened, in bytes: UTF-8 can take up to 4 bytes per character. */
export const MAX_OPEN_BYTES = MAX_TEXT_CHARS;

export async function readTextFile(path: string, fs: ReadFs = nodeReadFs): Promise<ReadResult> {
  const name = nodePath.basename(path);
  try {
    const size = await fs.sizeOf(path);
    if (size > MAX_OPEN_BYTES) {
      return { ok: false, message: `Could not open "${name}": it is ${(size / 1e6).toFixed(1)} MB, and a design file is at most ${MAX_OPEN_BYTES / 1e6} MB. Is it the right file?` };
    }
    const bytes = await fs.readFile(path);
    let text: string;
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    } catch {
      return { ok: false, message: `Could not open "${name}": it is not a UTF-8 text file. Is it the right file?` };
    }
    return { ok: true, path, name, text: text.startsWith('\uFEFF') ? text.slice(1) : text };
  } catch (error) {
    return { ok: false, message: `Could not open "${name}": ${describeFsError(error)}.` };
  }
}
