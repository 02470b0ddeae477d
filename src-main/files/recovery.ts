/**
 * Recovery snapshots. While a design has unsaved changes the renderer sends its text every few
 * seconds (writeRecovery); it is written atomically to the user-data folder. A clean save or a clean
 * close deletes it (clearRecovery). So a snapshot that is still there at the next start means the
 * last session ended without saving — a crash or a kill — and the renderer offers to restore it.
 */
import nodePath from 'node:path';
import nodeFs from 'node:fs/promises';
import { z } from 'zod';
import { readJsonFile, writeJsonFile, nodeJsonFs, type JsonFileFs } from './json-file.ts';
import { errorCode } from './fs-errors.ts';

const FORMAT = 'wattledger.recovery';

const snapshotSchema = z.object({
  format: z.literal(FORMAT),
  version: z.literal(1),
  savedAt: z.iso.datetime(),
  text: z.string(),
});

export interface RecoverySnapshot {
  text: string;
  /** ISO 8601 time of the snapshot. */
  savedAt: string;
}

export interface RecoveryOptions {
  now?: () => Date;
  fs?: JsonFileFs;
  unlink?: (path: string) => Promise<void>;
}

export class RecoveryStore {
  readonly #folder: string;
  readonly #file: string;
  readonly #now: () => Date;
  readonly #fs: JsonFileFs;
  readonly #unlink: (path: string) => Promise<void>;

  constructor(userDataFolder: string, options: RecoveryOptions = {}) {
    this.#folder = nodePath.join(userDataFolder, 'recovery');
    this.#file = nodePath.join(this.#folder, 'snapshot.json');
    this.#now = options.now ?? (() => new Date());
    this.#fs = options.fs ?? nodeJsonFs;
    this.#unlink = options.unlink ?? ((path) => nodeFs.unlink(path));
  }

  get filePath(): string {
    return this.#file;
  }

  /** Stores a snapshot; a failure is reported as a sentence (the document itself is unaffected). */
  async write(text: string): Promise<{ ok: true } | { ok: false; message: string }> {
    const result = await writeJsonFile(this.#folder, this.#file, { format: FORMAT, version: 1, savedAt: this.#now().toISOString(), text }, this.#fs);
    return result.ok ? { ok: true } : { ok: false, message: `Recovery snapshot not written: ${result.message}` };
  }

  /** The snapshot left by an earlier session, or null (none, or unreadable). */
  async read(): Promise<RecoverySnapshot | null> {
    const parsed = snapshotSchema.safeParse(await readJsonFile(this.#file, this.#fs));
    return parsed.success ? { text: parsed.data.text, savedAt: parsed.data.savedAt } : null;
  }

  async clear(): Promise<void> {
    try {
      await this.#unlink(this.#file);
    } catch (error) {
      if (errorCode(error) !== 'ENOENT') throw error;
    }
  }
}
