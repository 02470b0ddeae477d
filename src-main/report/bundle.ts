/**
 * The report page bundle (src-renderer/report.html → out/report/): built with Vite the first time the
 * command line needs it and again whenever a source it is made from is newer than the build. The build
 * goes to a fresh folder that replaces out/report/ in one rename, so two runs never see half a bundle.
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, renameSync, rmSync, statSync } from 'node:fs';
import nodePath from 'node:path';
import { fileURLToPath } from 'node:url';
import type { InlineConfig } from 'vite';
import type { BuiltPage } from './single-file.ts';

export const REPO_ROOT = nodePath.resolve(nodePath.dirname(fileURLToPath(import.meta.url)), '..', '..');
const at = (...parts: string[]): string => nodePath.join(REPO_ROOT, ...parts);

export const REPORT_OUT_DIR = at('out', 'report');
export const REPORT_PAGE = 'report.html';

/** Files and folders the bundle is made from (a change in any of them triggers a rebuild). */
export const REPORT_SOURCES: readonly string[] = [
  at('src-renderer', 'report.html'),
  at('src-renderer', 'report-main.ts'),
  at('src-renderer', 'report'),
  at('src-renderer', 'charts', 'report'),
  at('shared-model'),
  at('package.json'),
  at('svelte.config.js'),
];

export async function reportBundleConfig(outDir: string): Promise<InlineConfig> {
  const { svelte } = await import('@sveltejs/vite-plugin-svelte');
  return {
    configFile: false,
    root: at('src-renderer'),
    base: './',
    logLevel: 'warn',
    plugins: [svelte({ configFile: at('svelte.config.js') })],
    build: {
      outDir,
      emptyOutDir: true,
      sourcemap: false,
      modulePreload: false,
      cssCodeSplit: false,
      assetsInlineLimit: Number.MAX_SAFE_INTEGER,
      chunkSizeWarningLimit: 4000,
      rolldownOptions: { input: at('src-renderer', REPORT_PAGE), checks: { pluginTimings: false } },
    },
  };
}

/** Newest modification time (ms) of the files under the given paths. */
export function newestMtime(paths: readonly string[]): number {
  let newest = 0;
  const visit = (path: string): void => {
    if (!existsSync(path)) return;
    const s = statSync(path);
    if (s.isDirectory()) {
      for (const name of readdirSync(path)) if (name !== 'node_modules') visit(nodePath.join(path, name));
    } else newest = Math.max(newest, s.mtimeMs);
  };
  for (const p of paths) visit(p);
  return newest;
}

export function bundleIsCurrent(outDir: string = REPORT_OUT_DIR, sources: readonly string[] = REPORT_SOURCES): boolean {
  const page = nodePath.join(outDir, REPORT_PAGE);
  return existsSync(page) && statSync(page).mtimeMs >= newestMtime(sources);
}

/** Builds the bundle into `outDir` unless it is current (or `force`). */
export async function ensureReportBundle(options: { outDir?: string; force?: boolean } = {}): Promise<void> {
  const outDir = options.outDir ?? REPORT_OUT_DIR;
  if (!options.force && bundleIsCurrent(outDir)) return;
  const parent = nodePath.dirname(outDir);
  mkdirSync(parent, { recursive: true });
  const staging = mkdtempSync(nodePath.join(parent, '.report-build-'));
  try {
    const { build } = await import('vite');
    await build(await reportBundleConfig(staging));
    rmSync(outDir, { recursive: true, force: true });
    renameSync(staging, outDir);
  } finally {
    rmSync(staging, { recursive: true, force: true });
  }
}

/** The built page and a reader for the assets it references. */
export function readBuiltPage(outDir: string = REPORT_OUT_DIR): BuiltPage {
  const html = readFileSync(nodePath.join(outDir, REPORT_PAGE), 'utf8');
  return {
    html,
    readAsset: (reference) => {
      const path = nodePath.resolve(outDir, reference.replace(/^\.\//, ''));
      if (!path.startsWith(outDir + nodePath.sep)) throw new Error(`The report page refers outside its folder: ${reference}`);
      return readFileSync(path, 'utf8');
    },
  };
}
