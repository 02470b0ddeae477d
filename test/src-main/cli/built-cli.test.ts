/**
 * The command line as shipped (issue 14: plain JavaScript, no loader compiling TypeScript at run time;
 * issue 15 §2–3: files that are not files, endless devices and deep nesting), run as real processes.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BIN, ROOT, wattledger } from './spawn.ts';

const pkg = JSON.parse(readFileSync(nodePath.join(ROOT, 'package.json'), 'utf8')) as { bin: Record<string, string>; scripts: Record<string, string> };
const posix = process.platform !== 'win32';

let folder: string;
beforeAll(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-built-cli-'));
});
afterAll(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

describe('the built command line', () => {
  it('is what package.json "bin" names: one plain ES module for Node that loads no TypeScript loader', () => {
    expect(nodePath.join(ROOT, pkg.bin['wattledger'] ?? '')).toBe(BIN);
    const source = readFileSync(BIN, 'utf8');
    expect(source.startsWith('#!/usr/bin/env node\n')).toBe(true); // POSIX shebang for npm's bin link
    expect(source).not.toMatch(/from ["']tsx|import\(["']tsx|["']tsx\/esm/); // no loader
    expect(source).not.toMatch(/^import .*\.ts["'];?$/m); // and nothing left to compile
    expect(pkg.scripts['prepare']).toBe('tsx src-main/dev/build-package.ts'); // built on npm install, no network
  });

  it.runIf(posix)('refuses /dev/zero at once instead of reading it forever', async () => {
    const run = await wattledger('evaluate', '/dev/zero');
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/"zero": it is a device, not a file/);
  });

  it.runIf(posix)('refuses a named pipe instead of hanging', async () => {
    const fifo = nodePath.join(folder, 'design.json');
    execFileSync('mkfifo', [fifo]);
    const run = await wattledger('evaluate', fifo);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/it is a named pipe \(FIFO\), not a file/);
  });

  it('reads a design with an unknown key nested 5 000 levels deep and prints JSON naming the key', async () => {
    const demo = readFileSync(nodePath.join(ROOT, 'assets/designs/synchronous-buck.json'), 'utf8').trimEnd();
    const file = nodePath.join(folder, 'deep.json');
    await nodeFs.writeFile(file, `${demo.slice(0, -1)}, "extraKey": ${'{"k":'.repeat(5000)}1${'}'.repeat(5000)}}`);
    for (const command of ['evaluate', 'point']) {
      const run = await wattledger(command, '--json', file);
      expect(run.code, run.stderr).toBe(0); // issue 15: was exit 3, "Maximum call stack size exceeded"
      expect(JSON.parse(run.stdout).designNotices).toContainEqual({ path: 'extraKey', value: '(an object with 1 key, nested 5,000 levels deep; not shown)', message: 'extraKey is not a WattLedger key and was ignored (misspelt?).' });
    }
  });
});
