/**
 * The build configuration (electron.config.ts): the main and preload bundles are built for real into a
 * temporary folder and inspected; the renderer configuration is checked field by field (building it is
 * the e2e global setup's job).
 */
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import vm from 'node:vm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OUT, ROOT, buildTargets, isTarget, mainConfig, preloadConfig, rendererConfig, reportConfig, sharedModelAlias } from '../../electron.config.ts';
import { contentSecurityPolicy } from '../../src-main/security/csp.ts';

let outRoot: string;
let mainCode: string;
let preloadCode: string;

beforeAll(async () => {
  outRoot = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-build-'));
  await buildTargets(['main', 'preload'], outRoot);
  mainCode = await nodeFs.readFile(nodePath.join(outRoot, 'main', 'main.cjs'), 'utf8');
  preloadCode = await nodeFs.readFile(nodePath.join(outRoot, 'preload', 'preload.cjs'), 'utf8');
}, 120_000);
afterAll(async () => {
  await nodeFs.rm(outRoot, { recursive: true, force: true });
});

const requiredModules = (code: string): string[] => [...new Set([...code.matchAll(/\brequire\(\s*["']([^"']+)["']\s*\)/g)].map((match) => match[1] ?? ''))].sort();

describe('main bundle (out/main/main.cjs)', () => {
  it('requires only electron and Node built-ins: every dependency (zod…) is bundled for the packaged app', () => {
    const modules = requiredModules(mainCode);
    expect(modules).toContain('electron');
    for (const name of modules) expect(name === 'electron' || name.startsWith('node:'), name).toBe(true);
  });

  it('is CommonJS', () => {
    expect(mainCode).not.toMatch(/^\s*import\s|^\s*export\s/m); // Node docs: .cjs files are always CommonJS [from memory]
  });
});

describe('preload bundle (out/preload/preload.cjs)', () => {
  it("runs with a sandboxed preload's require, which only knows 'electron', and exposes window.wattledger", () => {
    const exposed: string[] = [];
    const sandboxRequire = (name: string): unknown => {
      // Electron sandbox docs: a sandboxed preload can require only electron (renderer modules), events, timers, url [from memory]
      if (name !== 'electron') throw new Error(`a sandboxed preload cannot require ${name}`);
      return { contextBridge: { exposeInMainWorld: (key: string) => exposed.push(key) }, ipcRenderer: { invoke: () => undefined, send: () => undefined, on: () => undefined, removeListener: () => undefined } };
    };
    vm.runInNewContext(preloadCode, { require: sandboxRequire });
    expect(exposed).toEqual(['wattledger']);
    expect(requiredModules(preloadCode)).toEqual(['electron']);
  });
});

describe('build configurations', () => {
  it('renderer: root src-renderer, relative base, out/renderer, svelte plugin, CSP header in preview', () => {
    const config = rendererConfig();
    expect(config.root).toBe(nodePath.join(ROOT, 'src-renderer'));
    expect(config.base).toBe('./'); // relative URLs work from wattledger://app/ and from any static folder
    expect(config.build?.outDir).toBe(OUT.renderer);
    expect(config.configFile).toBe(false);
    const names = (config.plugins ?? []).flat().map((plugin) => (plugin && typeof plugin === 'object' && 'name' in plugin ? plugin.name : ''));
    expect(names.some((name) => name.startsWith('vite-plugin-svelte'))).toBe(true);
    expect(config.preview?.headers?.['Content-Security-Policy']).toBe(contentSecurityPolicy());
  });

  it('report page: same renderer settings, its own entry and output folder', () => {
    const config = reportConfig();
    expect(config.root).toBe(nodePath.join(ROOT, 'src-renderer'));
    expect(config.build?.rolldownOptions?.input).toBe(nodePath.join(ROOT, 'src-renderer', 'report.html'));
    expect(config.build?.outDir).toBe(OUT.report);
    expect(config.preview?.headers).toEqual(rendererConfig().preview?.headers);
  });

  it('every target resolves the shared-model alias to the engine folder', () => {
    expect(sharedModelAlias['shared-model']).toBe(nodePath.join(ROOT, 'shared-model'));
    for (const config of [rendererConfig(), reportConfig(), mainConfig(), preloadConfig()]) expect(config.resolve?.alias).toEqual(sharedModelAlias);
  });

  it('main and preload are CommonJS files named .cjs with electron external', () => {
    for (const [config, file] of [[mainConfig(), 'main.cjs'], [preloadConfig(), 'preload.cjs']] as const) {
      const output = config.build?.rolldownOptions?.output;
      expect(output && !Array.isArray(output) ? [output.format, output.entryFileNames] : null).toEqual(['cjs', file]);
      expect(config.build?.rolldownOptions?.external).toContain('electron');
    }
  });

  it('knows its target names for the command line', () => {
    expect(['renderer', 'report', 'main', 'preload'].every(isTarget)).toBe(true);
    expect(isTarget('toString')).toBe(false);
  });
});
