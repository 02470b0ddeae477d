/**
 * The project's method catalogue (docs/methods.md) and every citation of it: each cited section exists,
 * each entry of the report's catalogue (shared-model/report/methods.ts) is mapped to sections that exist,
 * and nothing cites a methods file outside the repository.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import nodePath from 'node:path';
import { describe, expect, it } from 'vitest';
import { METHOD_CATALOGUE } from '../../shared-model/report/methods.ts';

const ROOT = nodePath.resolve(import.meta.dirname, '../..');
const methods = readFileSync(nodePath.join(ROOT, 'docs/methods.md'), 'utf8');
const sections = new Set([...methods.matchAll(/^## §(\d+)\./gm)].map((m) => Number(m[1])));

function filesUnder(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    if (name === 'node_modules' || name === 'out' || name.startsWith('.')) continue;
    const path = nodePath.join(dir, name);
    if (statSync(path).isDirectory()) filesUnder(path, out);
    else if (/\.(ts|svelte|md|js|cjs|json)$/.test(name)) out.push(path);
  }
  return out;
}

/** Every "§N", "§N–M" and "§N and §M" cited after a methods reference on one line. */
function citedSections(line: string): number[] {
  const found: number[] = [];
  for (const m of line.matchAll(/(?:docs\/methods\.md|WattLedger methods)((?:[\s,;:and]*§\d+(?:[–-]\d+)?)+)/g)) {
    for (const r of m[1]!.matchAll(/§(\d+)(?:[–-](\d+))?/g)) {
      const from = Number(r[1]);
      const to = r[2] ? Number(r[2]) : from;
      for (let n = from; n <= to; n++) found.push(n);
    }
  }
  return found;
}

describe('docs/methods.md', () => {
  it('numbers its sections from §1 without gaps', () => {
    const sorted = [...sections].sort((a, b) => a - b);
    expect(sorted).toEqual(sorted.map((_, i) => i + 1));
  });

  it('has every section that a file of the project cites', () => {
    const missing: string[] = [];
    for (const file of filesUnder(ROOT)) {
      readFileSync(file, 'utf8').split('\n').forEach((line, i) => {
        for (const n of citedSections(line)) if (!sections.has(n)) missing.push(`${nodePath.relative(ROOT, file)}:${i + 1} cites §${n}`);
      });
    }
    expect(missing).toEqual([]);
  });

  it('maps every entry of the report\'s method catalogue to sections that exist, and lists no other entry', () => {
    const table = methods.slice(methods.indexOf('| catalogue entry | section |'));
    const rows = [...table.matchAll(/^\| ([a-z][a-z-]*) \| ([^|]+) \|$/gm)].map((m) => ({ id: m[1]!, cited: [...m[2]!.matchAll(/§(\d+)/g)].map((x) => Number(x[1])) }));
    expect(rows.map((r) => r.id).sort()).toEqual(METHOD_CATALOGUE.map((e) => e.id).sort());
    for (const r of rows) {
      expect(r.cited.length, r.id).toBeGreaterThan(0);
      for (const n of r.cited) expect(sections.has(n), `${r.id} → §${n}`).toBe(true);
    }
  });

  it('is the only methods file the project cites: nothing names the upper-case METHODS file outside the repository', () => {
    const outside = filesUnder(ROOT).filter((f) => !f.endsWith('methods-catalogue.test.ts') && readFileSync(f, 'utf8').includes('METHODS' + '.md'));
    expect(outside.map((f) => nodePath.relative(ROOT, f))).toEqual([]);
  });
});
