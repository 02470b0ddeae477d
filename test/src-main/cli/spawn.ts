/**
 * Runs the real command line as a child process, as a user would: the built plain-JavaScript CLI that
 * package.json "bin" names (out/cli/wattledger.js, built by test/global-package.ts), no loader.
 */
import { execFile } from 'node:child_process';
import nodePath from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = nodePath.resolve(nodePath.dirname(fileURLToPath(import.meta.url)), '../../..');
export const BIN = nodePath.join(ROOT, 'out/cli/wattledger.js');

export interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

export function wattledger(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}

export const demoPath = (id: string): string => nodePath.join(ROOT, 'assets/designs', `${id}.json`);
