/**
 * The one in-memory terminal for running CLI commands inside a test: files are given as text, and
 * out/err end each text with one line break exactly as processIo (src-main/cli/io.ts) does.
 */
import nodePath from 'node:path';
import type { CliIo } from '../../../src-main/cli/io.ts';

const line = (text: string): string => (text.endsWith('\n') ? text : `${text}\n`);

export function memoryIo(files: Record<string, string> = {}): CliIo & { stdout: string; stderr: string } {
  const io = {
    stdout: '',
    stderr: '',
    out: (t: string) => void (io.stdout += line(t)),
    err: (t: string) => void (io.stderr += line(t)),
    readText: async (path: string) => {
      const text = files[path];
      return text === undefined ? { ok: false as const, message: `Could not open "${nodePath.basename(path)}": the file or its folder does not exist (ENOENT).` } : { ok: true as const, text };
    },
  };
  return io;
}

