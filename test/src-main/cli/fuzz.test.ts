/**
 * Fuzz test of the command line (issue 15 "Done when"): 1 200 damaged design files generated from the
 * three demos with a fixed seed — deleted keys, wrong types, extreme numbers, deep nesting, huge strings,
 * duplicated keys, truncated text, binary noise — written to real files and run through the CLI's own
 * code path (runCli with the real bounded reader, in this process so it stays fast).
 * Pass: no crash (exit 3 or a throw), no null/NaN/Infinity in any JSON output, and every refusal names
 * a field path or a line.
 */
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, serializeDesign, validateDesign } from '../../../shared-model/index.ts';
import { memoryIo } from './memory-io.ts';
import { processIo } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { mulberry32 } from '../../reference/prng.ts';
import { MUTATION_KINDS, mutate, type Mutant } from './fuzz/mutations.ts';

const SEED = 15_2026;
const PER_KIND_AND_DEMO = 50;

let folder: string;
beforeAll(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-fuzz-'));
});
afterAll(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

/** The in-memory terminal reading the real files of `cwd`. */
function capture(cwd: string): ReturnType<typeof memoryIo> {
  const io = memoryIo();
  io.readText = processIo(cwd).readText;
  return io;
}

/** Paths of every null, NaN or infinite number in parsed JSON output (iterative). */
function badValues(value: unknown): string[] {
  const out: string[] = [];
  const pending: [unknown, string][] = [[value, '$']];
  while (pending.length > 0) {
    const [here, path] = pending.pop() as [unknown, string];
    if (here === null) out.push(path);
    else if (typeof here === 'number' && !Number.isFinite(here)) out.push(path);
    else if (typeof here === 'object') for (const [k, v] of Object.entries(here)) pending.push([v, `${path}.${k}`]);
  }
  return out;
}

const NAMES_FIELD_OR_LINE = /path: (?!\(whole document\))\S+|line \d+/;

describe('command-line fuzz: 1 200 damaged design files', () => {
  it('no crash, no null in the output, every refusal names the field or the line', async () => {
    const rand = mulberry32(SEED);
    const texts = DEMO_DESIGNS.map((d) => {
      const checked = validateDesign(d.json);
      const written = checked.ok ? serializeDesign(checked.design) : null;
      if (!written?.ok) throw new Error(`demo ${d.id} does not serialise`);
      return { id: d.id, text: written.text };
    });
    const tally = { files: 0, accepted: 0, refused: 0, crashes: [] as string[], nulls: [] as string[], unnamed: [] as string[], repeatsUnreported: [] as string[] };
    const byKind = new Map<string, { accepted: number; refused: number }>();
    for (const kind of MUTATION_KINDS) {
      for (const demo of texts) {
        for (let n = 0; n < PER_KIND_AND_DEMO; n += 1) {
          const mutant: Mutant = mutate(demo.text, kind, rand);
          const name = `${demo.id}-${kind}-${n}.json`;
          await nodeFs.writeFile(nodePath.join(folder, name), mutant.bytes);
          const command = n % 3 === 0 ? 'point' : 'evaluate';
          const json = n % 5 !== 4;
          const io = capture(folder);
          let code: number;
          try {
            code = await runCli([command, name, ...(json ? ['--json'] : [])], io);
          } catch (error) {
            code = -1;
            io.stderr += String(error);
          }
          tally.files += 1;
          const what = `${name} (${mutant.label}) ${command}${json ? ' --json' : ''}`;
          const counts = byKind.get(kind) ?? { accepted: 0, refused: 0 };
          byKind.set(kind, counts);
          if (code === 0) {
            tally.accepted += 1;
            counts.accepted += 1;
            if (kind === 'duplicate-key' && !io.stdout.includes('appears more than once')) tally.repeatsUnreported.push(what);
            if (json) {
              let parsed: unknown;
              try {
                parsed = JSON.parse(io.stdout);
              } catch {
                tally.crashes.push(`${what}: output is not JSON`);
                continue;
              }
              const bad = badValues(parsed);
              if (bad.length > 0) tally.nulls.push(`${what}: ${bad.slice(0, 3).join(', ')}`);
            } else if (/\bNaN\b|\bnull\b|Infinity/.test(io.stdout)) tally.nulls.push(`${what}: NaN, null or Infinity in the table`);
          } else if (code === 1) {
            tally.refused += 1;
            counts.refused += 1;
            if (!NAMES_FIELD_OR_LINE.test(io.stderr)) tally.unnamed.push(`${what}: ${io.stderr.slice(0, 300)}`);
          } else tally.crashes.push(`${what}: exit ${code}: ${io.stderr.slice(0, 300)}`);
          await nodeFs.rm(nodePath.join(folder, name));
        }
      }
    }
    const kinds = [...byKind].map(([k, c]) => `${k} ${c.accepted}/${c.refused}`).join(', ');
    console.info(`fuzz seed ${SEED}: ${tally.files} files, ${tally.accepted} accepted, ${tally.refused} refused, ${tally.crashes.length} crashes, ${tally.nulls.length} outputs with null/NaN, ${tally.unnamed.length} refusals naming neither field nor line (accepted/refused by kind: ${kinds})`);
    expect(tally.files).toBeGreaterThanOrEqual(1000);
    expect(tally.crashes).toEqual([]);
    expect(tally.nulls).toEqual([]);
    expect(tally.unnamed).toEqual([]);
    expect(tally.repeatsUnreported).toEqual([]); // a repeated key is always reported, with its line
    // The mutations really damage files: most are refused, and every kind reaches the refusal path.
    expect(tally.refused).toBeGreaterThan(tally.files / 3);
  }, 240_000);
});
