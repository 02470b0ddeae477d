/**
 * The recent-files list: newest first, at most MAX_RECENT entries, no duplicates (paths compare
 * case-insensitively on Windows and macOS, whose usual file systems do), files that no longer exist are
 * pruned whenever the list is read. Stored as JSON in the user-data folder.
 */
import nodePath from 'node:path';
import nodeFs from 'node:fs/promises';
import { z } from 'zod';
import { readJsonFile, writeJsonFile, type JsonFileFs, nodeJsonFs } from './json-file.ts';

export const MAX_RECENT = 10;
const FORMAT = 'wattledger.recent-files';

const storedSchema = z.object({ format: z.literal(FORMAT), version: z.literal(1), paths: z.array(z.string()) });

export function samePath(a: string, b: string, platform: NodeJS.Platform): boolean {
  const fold = platform === 'win32' || platform === 'darwin';
  const left = nodePath.resolve(a);
  const right = nodePath.resolve(b);
  return fold ? left.toLowerCase() === right.toLowerCase() : left === right;
}

export function addRecent(list: readonly string[], path: string, platform: NodeJS.Platform, max = MAX_RECENT): string[] {
  const resolved = nodePath.resolve(path);
  return [resolved, ...list.filter((entry) => !samePath(entry, resolved, platform))].slice(0, max);
}

export function removeRecent(list: readonly string[], path: string, platform: NodeJS.Platform): string[] {
  return list.filter((entry) => !samePath(entry, path, platform));
}

export async function pruneMissing(list: readonly string[], exists: (path: string) => Promise<boolean>): Promise<string[]> {
  const present = await Promise.all(list.map((entry) => exists(entry)));
  return list.filter((_, index) => present[index]);
}

/** Reads a stored list; anything malformed (wrong format, relative paths, too many) is cleaned, never fatal. */
export function parseStoredRecent(json: unknown, platform: NodeJS.Platform, max = MAX_RECENT): string[] {
  const parsed = storedSchema.safeParse(json);
  if (!parsed.success) return [];
  let list: string[] = [];
  for (const entry of [...parsed.data.paths].reverse()) {
    if (nodePath.isAbsolute(entry) && !entry.includes('\0')) list = addRecent(list, entry, platform, max);
  }
  return list;
}

export async function fileExists(path: string): Promise<boolean> {
  try {
    return (await nodeFs.stat(path)).isFile();
  } catch {
    return false;
  }
}

export interface RecentFilesOptions {
  platform?: NodeJS.Platform;
  max?: number;
  exists?: (path: string) => Promise<boolean>;
  fs?: JsonFileFs;
  /** The file in the folder that holds the list (one per kind of document). */
  fileName?: string;
}

export class RecentFiles {
  readonly #folder: string;
  readonly #file: string;
  readonly #platform: NodeJS.Platform;
  readonly #max: number;
  readonly #exists: (path: string) => Promise<boolean>;
  readonly #fs: JsonFileFs;

  constructor(folder: string, options: RecentFilesOptions = {}) {
    this.#folder = folder;
    this.#file = nodePath.join(folder, options.fileName ?? 'recent-files.json');
    this.#platform = options.platform ?? process.platform;
    this.#max = options.max ?? MAX_RECENT;
    this.#exists = options.exists ?? fileExists;
    this.#fs = options.fs ?? nodeJsonFs;
  }

  async #read(): Promise<string[]> {
    return parseStoredRecent(await readJsonFile(this.#file, this.#fs), this.#platform, this.#max);
  }

  async #write(paths: string[]): Promise<string[]> {
    await writeJsonFile(this.#folder, this.#file, { format: FORMAT, version: 1, paths }, this.#fs);
    return paths;
  }

  /** The list with missing files pruned (and the pruned list stored). */
  async list(): Promise<string[]> {
    const stored = await this.#read();
    const present = await pruneMissing(stored, this.#exists);
    return present.length === stored.length ? present : this.#write(present);
  }

  async add(path: string): Promise<string[]> {
    return this.#write(addRecent(await this.#read(), path, this.#platform, this.#max));
  }

  async remove(path: string): Promise<string[]> {
    return this.#write(removeRecent(await this.#read(), path, this.#platform));
  }

  async clear(): Promise<string[]> {
    return this.#write([]);
  }

  async has(path: string): Promise<boolean> {
    return (await this.#read()).some((entry) => samePath(entry, path, this.#platform));
  }
}
