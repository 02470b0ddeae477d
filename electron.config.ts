/**
 * Build configuration for WattLedger's three targets — main, preload, renderer (the renderer with a
 * second page for the standalone report) — and the `build` command behind `npm run build`:
 *   renderer — the Svelte UI (src-renderer/index.html) → out/renderer, relative base './' so it works
 *              from the app scheme and from a plain static server;
 *   report   — the standalone report page (src-renderer/report.html) → out/report, which the command
 *              line inlines into one self-contained HTML file (src-main/report/single-file.ts);
 *   main     — the Electron main process (src-main/main.ts) → out/main/main.cjs, Node target, every
 *              dependency bundled (the packaged app ships no node_modules);
 *   preload  — src-main/preload.ts → out/preload/preload.cjs, CommonJS because sandboxed preloads
 *              cannot load ES modules; its only require is 'electron'.
 * The renderer and the engine import shared-model through its index file; the `shared-model` alias
 * points at the same folder for any code that prefers the bare name.
 * Packaging settings live beside this file in electron-builder.config.cjs (`npm run dist`).
 *
 * Usage: tsx electron.config.ts build [renderer|report|main|preload ...]
 */
import nodePath from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { build, type InlineConfig } from 'vite';
import { contentSecurityPolicy } from './src-main/security/csp.ts';

export const ROOT = nodePath.dirname(fileURLToPath(import.meta.url));
const at = (...parts: string[]): string => nodePath.join(ROOT, ...parts);

export const OUT = { renderer: at('out', 'renderer'), report: at('out', 'report'), main: at('out', 'main'), preload: at('out', 'preload') } as const;

/** Electron 40 runs Node 22 and Chromium 144. */
const NODE_TARGET = 'node22';

export const sharedModelAlias = { 'shared-model': at('shared-model') };

export function rendererConfig(outDir: string = OUT.renderer): InlineConfig {
  return {
    configFile: false,
    root: at('src-renderer'),
    base: './',
    logLevel: 'warn',
    plugins: [svelte({ configFile: at('svelte.config.js') })],
    resolve: { alias: sharedModelAlias },
    server: { fs: { allow: [ROOT] } },
    // Slow-plugin timing reports are noise for `npm start` on a busy machine.
    build: { outDir, emptyOutDir: true, sourcemap: true, chunkSizeWarningLimit: 2000, rolldownOptions: { checks: { bundlerTimings: false } } },
    // Browser mode serves the same CSP header as the app scheme does in Electron.
    preview: { headers: { 'Content-Security-Policy': contentSecurityPolicy() } },
  };
}

/** The standalone report page: same renderer sources and CSP, its own HTML entry. */
export function reportConfig(outDir: string = OUT.report): InlineConfig {
  const renderer = rendererConfig(outDir);
  return { ...renderer, build: { ...renderer.build, rolldownOptions: { ...renderer.build?.rolldownOptions, input: at('src-renderer', 'report.html') } } };
}

function nodeBundle(entry: string, outDir: string, fileName: string): InlineConfig {
  return {
    configFile: false,
    root: ROOT,
    logLevel: 'warn',
    resolve: { alias: sharedModelAlias },
    ssr: { noExternal: true, target: 'node' },
    build: {
      ssr: entry,
      outDir,
      emptyOutDir: true,
      target: NODE_TARGET,
      minify: false,
      sourcemap: true,
      copyPublicDir: false,
      rolldownOptions: {
        external: ['electron', /^node:/],
        output: { format: 'cjs', entryFileNames: fileName },
      },
    },
  };
}

export const mainConfig = (outDir: string = OUT.main): InlineConfig => nodeBundle(at('src-main', 'main.ts'), outDir, 'main.cjs');
export const preloadConfig = (outDir: string = OUT.preload): InlineConfig => nodeBundle(at('src-main', 'preload.ts'), outDir, 'preload.cjs');

export const TARGETS = { renderer: rendererConfig, report: reportConfig, main: mainConfig, preload: preloadConfig } as const;
export type Target = keyof typeof TARGETS;

export function isTarget(name: string): name is Target {
  return Object.hasOwn(TARGETS, name);
}

/** Builds the targets in order; `outRoot` replaces `out/` (tests build into a temporary folder). */
export async function buildTargets(targets: readonly Target[] = ['renderer', 'report', 'main', 'preload'], outRoot?: string): Promise<void> {
  for (const target of targets) {
    const started = performance.now();
    const outDir = outRoot ? nodePath.join(outRoot, target) : OUT[target];
    await build(TARGETS[target](outDir));
    console.log(`built ${target} → ${nodePath.relative(ROOT, outDir)} in ${Math.round(performance.now() - started)} ms`);
  }
}

async function cli(args: readonly string[]): Promise<number> {
  const [command, ...names] = args;
  if (command !== 'build') {
    console.error('Usage: tsx electron.config.ts build [renderer|report|main|preload ...]');
    return 2;
  }
  const unknown = names.filter((name) => !isTarget(name));
  if (unknown.length > 0) {
    console.error(`Unknown build target ${unknown.join(', ')}; the targets are renderer, report, main and preload.`);
    return 2;
  }
  try {
    await buildTargets(names.length > 0 ? (names as Target[]) : undefined);
    return 0;
  } catch (error) {
    console.error(`Build failed: ${error instanceof Error ? error.message : String(error)}`);
    return 1;
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(nodePath.resolve(process.argv[1])).href) {
  process.exitCode = await cli(process.argv.slice(2));
}
