/**
 * Static security scan of the whole app — main process, preload and renderer (src-main and
 * src-renderer, scanned together so the global checks see main's handlers) — with
 * @doyensec/electronegativity. The tool always exits 0, so its SARIF report is parsed here. Every
 * finding must be justified in the code by a comment
 *   // security-scan-allow RULE_ID [RULE_ID…]: reason          (on the line, or the comment block just above)
 *   // security-scan-allow-global RULE_ID: reason              (findings without a location)
 *   <!-- security-scan-allow RULE_ID: reason -->              (in HTML, just above the finding)
 * and every such comment must still match a finding (no stale excuses).
 * A deliberately insecure window is scanned alongside as a control, so the test fails if the scanner
 * silently stops finding things.
 * The Electron-releases check is skipped (-x): it downloads the release list, and this machine is offline;
 * the Electron version is pinned in package.json. The tool also tries to fetch translations and falls
 * back to its bundled English ones.
 */
import { execFile } from 'node:child_process';
import nodeFs from 'node:fs/promises';
import { createRequire } from 'node:module';
import os from 'node:os';
import nodePath from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const ROOT = nodePath.resolve(import.meta.dirname, '../..');
const SCANNER = nodePath.join(nodePath.dirname(createRequire(import.meta.url).resolve('@doyensec/electronegativity/package.json')), 'dist', 'index.js');
const ELECTRON_VERSION = '40.8.5';
const CONTROL_FILE = 'zz-insecure-control.ts';
const CONTROL_SOURCE = `import { BrowserWindow, shell } from 'electron';
export const bad = new BrowserWindow({ webPreferences: { contextIsolation: false, sandbox: false } });
export const worse = new BrowserWindow({ webPreferences: { nodeIntegration: true, contextIsolation: true } });
export const leak = (url: string) => shell.openExternal(url);
`;
const MIN_REASON_CHARS = 30;

interface Finding {
  rule: string;
  file: string | null;
  line: number;
  message: string;
}

interface Allowance {
  file: string;
  line: number;
  rules: string[];
  reason: string;
  global: boolean;
}

let workDir: string;
let findings: Finding[];
let allowances: Allowance[];

async function listFiles(folder: string): Promise<string[]> {
  const entries = await nodeFs.readdir(folder, { recursive: true, withFileTypes: true });
  return entries.filter((entry) => entry.isFile() && /\.(ts|js|cjs|mjs|html)$/.test(entry.name)).map((entry) => nodePath.relative(folder, nodePath.join(entry.parentPath, entry.name)));
}

/** Reads allow comments: the rule list up to ':' and the reason, continued on following comment lines. */
function parseAllowances(file: string, source: string): Allowance[] {
  const lines = source.split('\n');
  const result: Allowance[] = [];
  lines.forEach((text, index) => {
    const match = /(?:\/\/|<!--)\s*security-scan-allow(-global)?\s+([A-Z0-9_ ]+):\s*(.*?)(?:-->)?$/.exec(text);
    if (!match) return;
    let reason = match[3] ?? '';
    for (let next = index + 1; next < lines.length && /^\s*\/\/(?!\s*security-scan-allow)/.test(lines[next] ?? ''); next += 1) {
      reason += ` ${(lines[next] ?? '').replace(/^\s*\/\/\s*/, '')}`;
    }
    result.push({ file, line: index + 1, rules: (match[2] ?? '').trim().split(/\s+/), reason: reason.trim(), global: match[1] === '-global' });
  });
  return result;
}

/** The allowance covering a finding: same file, on the finding's line or in the comment block right above it. */
function allowanceFor(finding: Finding, sources: Map<string, string[]>): Allowance | undefined {
  if (finding.file === null) return allowances.find((allow) => allow.global && allow.rules.includes(finding.rule));
  const lines = sources.get(finding.file) ?? [];
  let first = finding.line - 1;
  while (first - 1 >= 1 && /^\s*(\/\/|<!--)/.test(lines[first - 1] ?? '')) first -= 1;
  return allowances.find((allow) => !allow.global && allow.file === finding.file && allow.rules.includes(finding.rule) && allow.line >= first && allow.line <= finding.line);
}

let sources: Map<string, string[]>;

beforeAll(async () => {
  workDir = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-scan-'));
  const input = nodePath.join(workDir, 'app');
  // The vendored Electron type declarations (src-main/types) are Electron's own, not our code.
  await nodeFs.cp(nodePath.join(ROOT, 'src-main'), nodePath.join(input, 'src-main'), { recursive: true, filter: (source) => !source.includes(`${nodePath.sep}types`) });
  await nodeFs.cp(nodePath.join(ROOT, 'src-renderer'), nodePath.join(input, 'src-renderer'), { recursive: true });
  await nodeFs.writeFile(nodePath.join(input, CONTROL_FILE), CONTROL_SOURCE);
  const sarifPath = nodePath.join(workDir, 'scan.sarif');
  await promisify(execFile)(process.execPath, [SCANNER, '-i', input, '-o', sarifPath, '-r', '-e', ELECTRON_VERSION, '-x', 'AvailableSecurityFixesGlobalCheck'], { cwd: workDir, timeout: 110_000, maxBuffer: 16 * 1024 * 1024 });
  const sarif = JSON.parse(await nodeFs.readFile(sarifPath, 'utf8')) as {
    runs: { results: { ruleId: string; message: { text: string }; locations: { physicalLocation: { artifactLocation: { uri: string }; region: { startLine: number } } }[] }[] }[];
  };
  findings = (sarif.runs[0]?.results ?? []).map((result) => {
    const location = result.locations[0]?.physicalLocation;
    const uri = location?.artifactLocation.uri ?? 'file:///';
    const file = uri === 'file:///' || uri === 'N/A' ? null : nodePath.relative(input, nodePath.resolve(input, uri.replace(/^file:\/\//, '')));
    return { rule: result.ruleId, file, line: location?.region.startLine ?? 0, message: result.message.text };
  });
  sources = new Map();
  allowances = [];
  for (const file of await listFiles(input)) {
    const source = await nodeFs.readFile(nodePath.join(input, file), 'utf8');
    sources.set(file, source.split('\n'));
    if (file !== CONTROL_FILE) allowances.push(...parseAllowances(file, source));
  }
}, 120_000);

afterAll(async () => {
  await nodeFs.rm(workDir, { recursive: true, force: true });
});

describe('electronegativity scan of main, preload and renderer', () => {
  it('still detects an insecure window (control file)', () => {
    const control = new Set(findings.filter((finding) => finding.file === CONTROL_FILE).map((finding) => finding.rule));
    // Rule ids from electronegativity's checks: NODE_INTEGRATION_JS_CHECK, CONTEXT_ISOLATION_JS_CHECK, SANDBOX_JS_CHECK (node_modules/@doyensec/electronegativity/src/finder/checks)
    expect([...control]).toEqual(expect.arrayContaining(['NODE_INTEGRATION_JS_CHECK', 'CONTEXT_ISOLATION_JS_CHECK', 'SANDBOX_JS_CHECK', 'OPEN_EXTERNAL_JS_CHECK']));
  });

  it('has no finding in our code without a justification comment', () => {
    const unjustified = findings
      .filter((finding) => finding.file !== CONTROL_FILE && !allowanceFor(finding, sources))
      .map((finding) => `${finding.rule} at ${finding.file ?? '(global)'}:${finding.line} — ${finding.message}`);
    expect(unjustified).toEqual([]);
  });

  it('every justification gives a real reason and still matches a finding', () => {
    for (const allow of allowances) {
      expect(allow.reason.length, `${allow.file}:${allow.line}`).toBeGreaterThanOrEqual(MIN_REASON_CHARS);
      for (const rule of allow.rules) {
        const used = findings.some((finding) => finding.rule === rule && allowanceFor(finding, sources) === allow);
        expect(used, `stale allowance ${rule} at ${allow.file}:${allow.line}`).toBe(true);
      }
    }
  });
});
