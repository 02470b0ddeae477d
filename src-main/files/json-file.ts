/**
 * Small JSON files the app keeps in its user-data folder (recent list, window state, recovery).
 * Reading never throws: a missing, corrupt, oversized or not-regular file reads as null (the reader is
 * the bounded one of read-text.ts). Writing goes through the atomic save.
 */
import nodeFs from 'node:fs/promises';
import { saveAtomically, type AtomicSaveResult, type SaveFs } from './atomic-save.ts';
import { readTextFile } from './read-text.ts';

export interface JsonFileFs {
  readText(path: string): Promise<string>;
  mkdir(path: string): Promise<void>;
  saveFs?: SaveFs;
}

export const nodeJsonFs: JsonFileFs = {
  async readText(path) {
    const read = await readTextFile(path);
    if (!read.ok) throw new Error(read.message);
    return read.text;
  },
  mkdir: async (path) => {
    await nodeFs.mkdir(path, { recursive: true });
  },
};

export async function readJsonFile(path: string, fs: JsonFileFs = nodeJsonFs): Promise<unknown> {
  try {
    return JSON.parse(await fs.readText(path)) as unknown;
  } catch {
    return null;
  }
}

export async function writeJsonFile(folder: string, path: string, value: unknown, fs: JsonFileFs = nodeJsonFs): Promise<AtomicSaveResult> {
  try {
    await fs.mkdir(folder);
  } catch {
    // saveAtomically reports the real problem with a sentence.
  }
  return saveAtomically(path, `${JSON.stringify(value, null, 2)}\n`, { backup: false, ...(fs.saveFs ? { fs: fs.saveFs } : {}) });
}
