/**
 * The three rooms and their doors (BRIEF "Architecture"): shared-model imports no Node, DOM, Electron,
 * Svelte or Chart.js; the renderer never imports electron or node:*; main never imports the renderer.
 * Temporary files that cross a door are written into the real folders (so the real lint config and
 * tsconfig apply), checked, and always deleted.
 */
import { randomBytes } from 'node:crypto';
import nodeFs from 'node:fs/promises';
import nodePath from 'node:path';
import { ESLint } from 'eslint';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = nodePath.resolve(import.meta.dirname, '../..');

interface Probe {
  folder: string;
  source: string;
}

async function withProbes<T>(probes: Probe[], check: (files: string[]) => Promise<T>): Promise<T> {
  const tag = `${process.pid}-${randomBytes(4).toString('hex')}`;
  const files = probes.map((probe, index) => nodePath.join(ROOT, probe.folder, `__door-check-${tag}-${index}.ts`));
  try {
    await Promise.all(probes.map((probe, index) => nodeFs.writeFile(files[index] ?? '', probe.source)));
    return await check(files);
  } finally {
    await Promise.all(files.map((file) => nodeFs.rm(file, { force: true })));
  }
}

async function restrictedImportMessages(probes: Probe[]): Promise<string[][]> {
  return withProbes(probes, async (files) => {
    const results = await new ESLint({ cwd: ROOT }).lintFiles(files);
    return files.map((file) => (results.find((result) => result.filePath === file)?.messages ?? []).filter((message) => message.ruleId === 'no-restricted-imports' && message.severity === 2).map((message) => message.message));
  });
}

describe('lint doors (eslint no-restricted-imports)', () => {
  it('refuses every crossing', async () => {
    const crossings: Probe[] = [
      { folder: 'shared-model', source: "import { readFileSync } from 'node:fs';\nexport const f = readFileSync;\n" },
      { folder: 'shared-model', source: "import { app } from 'electron';\nexport const a = app;\n" },
      { folder: 'shared-model', source: "import { mount } from 'svelte';\nexport const m = mount;\n" },
      { folder: 'shared-model', source: "import { Chart } from 'chart.js';\nexport const c = Chart;\n" },
      { folder: 'src-renderer', source: "import { ipcRenderer } from 'electron';\nexport const i = ipcRenderer;\n" },
      { folder: 'src-renderer', source: "import { readFile } from 'node:fs/promises';\nexport const r = readFile;\n" },
      { folder: 'src-renderer', source: "import { designSchema } from '../shared-model/design/schema.ts';\nexport const d = designSchema;\n" },
      { folder: 'src-main', source: "import '../src-renderer/main.ts';\nexport const x = 1;\n" },
    ];
    const messages = await restrictedImportMessages(crossings);
    messages.forEach((found, index) => expect(found, crossings[index]?.source).toHaveLength(1));
    expect(messages[0]?.[0]).toContain('shared-model is pure: no Node APIs.');
    expect(messages[4]?.[0]).toContain('The renderer never imports electron');
    expect(messages[7]?.[0]).toContain('Main never imports the renderer.');
  }, 120_000);

  it('lets the allowed imports through (control)', async () => {
    const allowed: Probe[] = [
      { folder: 'src-main', source: "import { readFileSync } from 'node:fs';\nimport type { DesktopApi } from '../shared-model/index.ts';\nexport const f = readFileSync;\nexport type A = DesktopApi;\n" },
      { folder: 'src-renderer', source: "import type { DesktopApi } from '../shared-model/index.ts';\nexport type A = DesktopApi;\n" },
      { folder: 'shared-model', source: "import { z } from 'zod';\nexport const s = z.number();\n" },
    ];
    expect(await restrictedImportMessages(allowed)).toEqual([[], [], []]);
  }, 120_000);

  it('keeps Chart.js set up in one place: a chart wrapper takes Chart from chart-kit.ts, never from chart.js (types are free)', async () => {
    const probes: Probe[] = [
      { folder: 'src-renderer/charts', source: "import { Chart } from 'chart.js';\nexport const c = Chart;\n" },
      { folder: 'src-renderer/charts/report', source: "import { Chart } from 'chart.js';\nexport const c = Chart;\n" },
      { folder: 'src-renderer/charts', source: "import annotationPlugin from 'chartjs-plugin-annotation';\nexport const a = annotationPlugin;\n" },
      { folder: 'src-renderer/charts/report', source: "import type { Chart } from 'chart.js';\nimport { Chart as Kit } from '../chart-kit.ts';\nexport type C = Chart;\nexport const k = Kit;\n" },
    ];
    const messages = await restrictedImportMessages(probes);
    expect(messages.slice(0, 3).map((m) => m.length)).toEqual([1, 1, 1]);
    expect(messages[0]?.[0]).toContain('chart-kit.ts');
    expect(messages[3]).toEqual([]); // control: a type import and the kit's Chart pass
  }, 120_000);
});

/** Type-checks one file with the compiler options of a folder's tsconfig.json. */
function diagnosticsWith(tsconfigFolder: string, file: string): ts.Diagnostic[] {
  const configPath = nodePath.join(ROOT, tsconfigFolder, 'tsconfig.json');
  const read = ts.readConfigFile(configPath, (path) => ts.sys.readFile(path));
  const parsed = ts.parseJsonConfigFileContent(read.config, ts.sys, nodePath.dirname(configPath));
  const program = ts.createProgram({ rootNames: [file], options: parsed.options });
  const source = program.getSourceFile(file);
  return source ? [...program.getSemanticDiagnostics(source), ...program.getSyntacticDiagnostics(source)] : [];
}

describe('type-check doors (per-folder tsconfig)', () => {
  it('shared-model has no DOM and no Node globals; the renderer has the DOM', async () => {
    const probes: Probe[] = [
      { folder: 'shared-model', source: 'export const title: string = document.title;\n' },
      { folder: 'shared-model', source: "export const home: string | undefined = process.env['HOME'];\n" },
      { folder: 'src-renderer', source: 'export const title: string = document.title;\n' },
    ];
    await withProbes(probes, async ([dom, node, renderer]) => {
      const domErrors = diagnosticsWith('shared-model', dom ?? '').map((d) => ts.flattenDiagnosticMessageText(d.messageText, '\n'));
      expect(domErrors.some((text) => text.includes("Cannot find name 'document'"))).toBe(true); // TypeScript diagnostic TS2584/TS2304 for a missing lib "DOM"
      const nodeErrors = diagnosticsWith('shared-model', node ?? '').map((d) => ts.flattenDiagnosticMessageText(d.messageText, '\n'));
      expect(nodeErrors.some((text) => text.includes("Cannot find name 'process'"))).toBe(true); // TypeScript TS2580: no @types/node in shared-model
      expect(diagnosticsWith('src-renderer', renderer ?? '')).toEqual([]); // control: same line compiles where lib DOM is on
    });
  }, 120_000);
});
