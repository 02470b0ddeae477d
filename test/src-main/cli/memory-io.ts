/**
 * In-memory terminal for running CLI commands inside a test: files are given as text.
 */
import nodePath from 'node:path';
import { DEMO_DESIGNS } from '../../../shared-model/index.ts';
import type { CliIo } from '../../../src-main/cli/io.ts';

export function memoryIo(files: Record<string, string> = {}): CliIo & { stdout: string; stderr: string } {
  const io = {
    stdout: '',
    stderr: '',
    out: (t: string) => void (io.stdout += `${t}\n`),
    err: (t: string) => void (io.stderr += `${t}\n`),
    readText: async (path: string) => {
      const text = files[path];
      return text === undefined ? { ok: false as const, message: `Could not open "${nodePath.basename(path)}".` } : { ok: true as const, text };
    },
  };
  return io;
}

export const demoText = (id: string): string => JSON.stringify(DEMO_DESIGNS.find((d) => d.id === id)?.json);
