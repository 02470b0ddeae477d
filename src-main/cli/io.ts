/**
 * What a command may touch: text out, text in from a file. Tests pass an in-memory version; the real one
 * writes to the process streams and reads with the size-capped, UTF-8-strict reader of src-main/files.
 */
import nodePath from 'node:path';
import { readTextFile } from '../files/read-text.ts';

export interface CliIo {
  out(text: string): void;
  err(text: string): void;
  /** Reads a text file (relative paths against `cwd`); a failure is a sentence naming the file. */
  readText(path: string): Promise<{ ok: true; text: string } | { ok: false; message: string }>;
}

/** Exit codes of every command (documented in src-main/cli/README.md). */
export const EXIT = { ok: 0, invalidDesign: 1, usage: 2, internal: 3 } as const;
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

export function processIo(cwd: string = process.cwd()): CliIo {
  return {
    out: (text) => void process.stdout.write(text.endsWith('\n') ? text : `${text}\n`),
    err: (text) => void process.stderr.write(text.endsWith('\n') ? text : `${text}\n`),
    readText: async (path) => {
      const result = await readTextFile(nodePath.resolve(cwd, path));
      return result.ok ? { ok: true, text: result.text } : { ok: false, message: result.message };
    },
  };
}
