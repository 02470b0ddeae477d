/**
 * Issue 10 "Done when": no JSON the command line prints contains null (or NaN, or an infinity) where a
 * number belongs, for any design the validator accepts and any override it accepts; no surface
 * temperature below ambient. Random valid designs (edge-designs.ts, written as the app saves them) run
 * through the command line's own code path (runCli, in this process), `evaluate --json` and
 * `sweep --json`, with condition overrides drawn anywhere in the ranges the options accept. An override
 * the validator refuses must be refused by the command (exit 2) and one it accepts must be answered (exit 0).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CONDITION_RANGES, checkConditionOverrides, serializeDesign, type Conditions } from '../../shared-model/index.ts';
import { runCli } from '../../src-main/cli/main.ts';
import { memoryIo } from '../src-main/cli/memory-io.ts';
import { nonFinite } from './checks.ts';
import { designPool } from './edge-designs.ts';

const SEED = 3007; // any seed, fixed so a failure reproduces
const RUNS = 400;

/** A range's bound (every condition range has both, design/numbers.ts). */
const bound = (x: number | undefined): number => {
  if (x === undefined) throw new Error('a condition range without a bound');
  return x;
};
const logBetween = (lo: number, hi: number, u: number) => lo * (hi / lo) ** u;

/** Every surface temperature in a command's JSON that is below its ambient. */
function coldSurfaces(json: Record<string, unknown>, command: string): string[] {
  const out: string[] = [];
  if (command === 'evaluate') {
    const ambient = (json.conditions as Conditions).ambientC;
    for (const t of json.temperatures as { part: string; celsius: number; surfaceC: number }[]) {
      if (!(t.surfaceC >= ambient - 1e-9)) out.push(`${t.part} surface ${t.surfaceC} °C < ambient ${ambient} °C`);
      if (!(t.celsius >= ambient - 1e-9)) out.push(`${t.part} ${t.celsius} °C < ambient ${ambient} °C`);
    }
    for (const h of (json.hazards ?? []) as { part: string; surfaceC: number }[]) {
      if (!(h.surfaceC >= ambient - 1e-9)) out.push(`${h.part} touchable surface ${h.surfaceC} °C < ambient ${ambient} °C`);
    }
  } else {
    const ambient = (json.conditions as Conditions).ambientC;
    for (const p of json.points as { load: number; steadyState?: boolean; reason?: string; temperatures?: Record<string, number> }[]) {
      // A runaway point is a gap with a reason (src-main/cli/README.md): no temperatures to check, but a reason.
      if (p.steadyState === false) {
        if (!(typeof p.reason === 'string' && p.reason.length > 0)) out.push(`${p.load} A: no steady state and no reason`);
        continue;
      }
      for (const [part, c] of Object.entries(p.temperatures ?? {})) if (!(c >= ambient - 1e-9)) out.push(`${p.load} A: ${part} ${c} °C < ambient ${ambient} °C`);
      if (p.temperatures === undefined) out.push(`${p.load} A: a steady point without temperatures`);
    }
  }
  return out;
}

describe(`command-line JSON over random valid designs and accepted overrides (seed ${SEED}, ${RUNS} runs)`, () => {
  it('no null, NaN or infinity where a number belongs; nothing below ambient; overrides refused exactly when the validator refuses them', async () => {
    const pool = designPool(SEED, 200);
    const texts = pool.designs.map((d) => {
      const s = serializeDesign(d);
      if (!s.ok) throw new Error(`${d.name} does not serialise`);
      return s.text;
    });
    const draws = fc.sample(
      fc.record({
        index: fc.nat({ max: texts.length - 1 }),
        sweep: fc.boolean(),
        which: fc.subarray(['vin', 'load', 'fs', 'ambient'] as const),
        u: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 4, maxLength: 4 }),
      }),
      { numRuns: RUNS, seed: SEED },
    );
    const R = CONDITION_RANGES;
    const tally = { answered: 0, refused: 0, mismatched: [] as string[], bad: [] as string[] };
    for (const r of draws) {
      const d = pool.designs[r.index]!;
      const o: Partial<Conditions> = {};
      const args: string[] = [];
      for (const key of r.which) {
        if (key === 'load' && r.sweep) continue; // a sweep sets its own loads
        const [name, value] =
          key === 'vin' ? ['--vin', (o.vinV = logBetween(bound(R.vinV.min), bound(R.vinV.max), r.u[0]!))]
          : key === 'load' ? ['--load', (o.loadA = r.u[1]! < 0.1 ? 0 : logBetween(1e-6, bound(R.loadA.max), r.u[1]!))]
          : key === 'fs' ? ['--fs', (o.switchingFrequencyHz = logBetween(bound(R.switchingFrequencyHz.min), bound(R.switchingFrequencyHz.max), r.u[2]!))]
          : ['--ambient', (o.ambientC = bound(R.ambientC.min) + (bound(R.ambientC.max) - bound(R.ambientC.min)) * r.u[3]!)];
        args.push(name, String(value));
      }
      const command = r.sweep ? 'sweep' : 'evaluate';
      const io = memoryIo({ 'design.json': texts[r.index]! });
      const code = await runCli([command, 'design.json', '--json', ...(r.sweep ? ['--points', '8'] : []), ...args], io);
      const accepted = checkConditionOverrides(d, o).length === 0;
      const what = `${d.name} ${command} ${args.join(' ')}`;
      if (accepted !== (code === 0)) tally.mismatched.push(`${what}: exit ${code} ${io.stderr.slice(0, 200)}`);
      if (code !== 0) {
        tally.refused += 1;
        continue;
      }
      tally.answered += 1;
      const json = JSON.parse(io.stdout) as Record<string, unknown>;
      const bad = [...nonFinite(json), ...coldSurfaces(json, command)];
      if (bad.length > 0) tally.bad.push(`${what}: ${bad.slice(0, 4).join('; ')}`);
    }
    console.info(`CLI JSON: ${tally.answered} answered, ${tally.refused} refused (pool ${pool.designs.length}/${pool.drawn} valid)`);
    expect(tally.bad).toEqual([]); // issue 10 Done when: no null where a number belongs, no surface below ambient
    expect(tally.mismatched).toEqual([]); // the command's options pass the validator's gate (design/overrides.ts)
    expect(tally.answered).toBeGreaterThan(RUNS / 2); // most drawn overrides are valid questions
  });
});
