/**
 * Builds what the package ships as plain JavaScript, with no network and no TypeScript loader at run
 * time. Run by `npm install` (the `prepare` script) and before the tests (test/global-package.ts):
 *   out/lib/wattledger.js        — the engine (shared-model/index.ts) as one ES module, zod inlined:
 *                                  `import { evaluate } from 'wattledger'` (package.json "exports");
 *   out/lib/types/shared-model/  — its type declarations (tsc), entry index.d.ts (package.json "types");
 *   out/cli/wattledger.js        — the command line (src-main/cli/entry.ts) as one ES module for Node,
 *                                  zod inlined (one file to load starts faster); only what the report
 *                                  command loads on demand stays in node_modules (package.json "bin");
 *   out/cli/pool-worker.js       — the worker thread of the command line's pool (src-main/pool).
 * With --if-stale it does nothing when every output is newer than every source it is made from.
 *
 * Usage: tsx src-main/dev/build-package.ts [--if-stale]
 */
import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import nodePath from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'esbuild';

const ROOT = nodePath.resolve(nodePath.dirname(fileURLToPath(import.meta.url)), '..', '..');
const at = (...parts: string[]): string => nodePath.join(ROOT, ...parts);

export const PACKAGE_OUT = {
  engine: at('out', 'lib', 'wattledger.js'),
  types: at('out', 'lib', 'types', 'shared-model', 'index.d.ts'),
  cli: at('out', 'cli', 'wattledger.js'),
  poolWorker: at('out', 'cli', 'pool-worker.js'),
} as const;

/** Written last: its time says when the whole build finished. */
const STAMP = at('out', 'lib', '.built');

const SOURCES = [at('shared-model'), at('src-main'), at('assets', 'designs'), at('assets', 'parts'), at('package.json'), at('tsconfig.base.json')];

function newestMtime(paths: readonly string[]): number {
  let newest = 0;
  const visit = (path: string): void => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) for (const name of readdirSync(path)) visit(nodePath.join(path, name));
    else newest = Math.max(newest, stat.mtimeMs);
  };
  for (const path of paths) visit(path);
  return newest;
}

export function isStale(): boolean {
  if (!existsSync(STAMP) || !Object.values(PACKAGE_OUT).every((file) => existsSync(file))) return true;
  return statSync(STAMP).mtimeMs < newestMtime(SOURCES);
}

async function buildEngine(): Promise<void> {
  await build({
    entryPoints: [at('shared-model', 'index.ts')],
    outfile: PACKAGE_OUT.engine,
    bundle: true,
    format: 'esm',
    platform: 'neutral',
    target: 'es2022',
    logLevel: 'warning',
    legalComments: 'eof',
    banner: { js: '// WattLedger engine, built from shared-model/index.ts by src-main/dev/build-package.ts. Do not edit.' },
  });
}

function buildTypes(): void {
  rmSync(at('out', 'lib', 'types'), { recursive: true, force: true });
  const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
  const flags = ['--noEmit', 'false', '--declaration', '--emitDeclarationOnly', '--outDir', at('out', 'lib', 'types')];
  const result = spawnSync(process.execPath, [tsc, '-p', at('shared-model'), ...flags], { cwd: ROOT, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`type declarations failed:\n${result.stdout}${result.stderr}`);
}

async function buildCli(): Promise<void> {
  await build({
    entryPoints: [at('src-main', 'cli', 'entry.ts')],
    outfile: PACKAGE_OUT.cli,
    bundle: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    // Loaded by `report` only, with import(): the page bundler and the PDF printer.
    external: ['vite', '@sveltejs/vite-plugin-svelte', 'playwright-core', 'electron'],
    logLevel: 'warning',
    banner: { js: '#!/usr/bin/env node\n// WattLedger command line, built from src-main/cli by src-main/dev/build-package.ts. Do not edit.' },
  });
  chmodSync(PACKAGE_OUT.cli, 0o755);
  // The pool's worker thread script, beside the command line (src-main/pool/worker-pool.ts looks there).
  await build({
    entryPoints: [at('src-main', 'pool', 'worker-entry.ts')],
    outfile: PACKAGE_OUT.poolWorker,
    bundle: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    logLevel: 'warning',
    banner: { js: '// WattLedger pool worker, built from src-main/pool/worker-entry.ts by src-main/dev/build-package.ts. Do not edit.' },
  });
}

export async function buildPackage(options: { ifStale?: boolean } = {}): Promise<'built' | 'fresh'> {
  if (options.ifStale && !isStale()) return 'fresh';
  mkdirSync(at('out', 'lib'), { recursive: true });
  rmSync(STAMP, { force: true });
  await Promise.all([buildEngine(), buildCli()]);
  buildTypes();
  writeFileSync(STAMP, `${new Date().toISOString()}\n`);
  return 'built';
}

if (process.argv[1] && import.meta.url === pathToFileURL(nodePath.resolve(process.argv[1])).href) {
  const started = performance.now();
  try {
    const outcome = await buildPackage({ ifStale: process.argv.includes('--if-stale') });
    const took = Math.round(performance.now() - started);
    console.log(outcome === 'built' ? `built the engine module, its types and the command line → out/lib, out/cli in ${took} ms` : 'out/lib and out/cli are up to date');
  } catch (error) {
    console.error(`Building the package failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  }
}
