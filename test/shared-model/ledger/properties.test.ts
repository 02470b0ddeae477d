/**
 * Property tests of the ledger over random valid designs (fast-check, seeded and reproducible):
 * finiteness, power balance, efficiency range, non-negative terms, and the physical monotonicities.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign, type Design, type Evaluation } from '../../../shared-model/index.ts';
import { arbitraryDesign } from '../../helpers/ledger-designs.ts';

const SEED = 42;
const RUNS = 120;
const loadFraction = fc.double({ min: 0.02, max: 1.2, noNaN: true });

function validated(d: Design): Design | undefined {
  const v = validateDesign(d);
  return v.ok ? v.design : undefined;
}

function nonFinitePaths(x: unknown, path = ''): string[] {
  if (typeof x === 'number') return Number.isFinite(x) ? [] : [path];
  if (x === null || typeof x !== 'object') return [];
  return Object.entries(x).flatMap(([k, v]) => nonFinitePaths(v, `${path}.${k}`));
}

const tempOf = (e: Evaluation, part: string) => e.temperatures.find((t) => t.part === part)!.celsius;
const lossOf = (e: Evaluation, part: string, mechanism: string) =>
  e.losses.find((t) => t.part === part && t.mechanism === mechanism)!.watts;

/** Copies the design and scales every thermal resistance by k. */
function scaleTheta(d: Design, k: number): Design {
  const c = structuredClone(d);
  for (const p of Object.values(c.thermal.paths)) {
    if (!p) continue;
    if (p.kind === 'direct') p.thetaJaKPerW *= k;
    else if (p.kind === 'rise') p.riseK *= k;
    else p.thetaCsKPerW *= k;
  }
  for (const h of c.thermal.heatsinks) h.thetaSaKPerW *= k;
  if (c.parts.switch.thetaJcKPerW > 0) c.parts.switch.thetaJcKPerW *= k;
  if (c.parts.rectifier.thetaJcKPerW > 0) c.parts.rectifier.thetaJcKPerW *= k;
  return c;
}

describe('ledger properties over random valid designs (fast-check, seed 42)', () => {
  it('every output is finite; input = output + Σ terms; efficiency in (0, 1); every term ≥ 0', () => {
    fc.assert(
      fc.property(arbitraryDesign, loadFraction, (d0, lf) => {
        const d = validated(d0);
        if (!d) return;
        const e = evaluate(d, { loadA: d.spec.ratedLoadA * lf });
        expect(nonFinitePaths(e)).toEqual([]);
        const sum = e.losses.reduce((a, t) => a + t.watts, 0);
        // Energy conservation over one period (docs/methods.md §1; issue 3: 1e-9 relative): the input power is
        // Vin × the source current of the branch waveforms (ledger/solve-point.ts), the right side the loss
        // models' terms — closed by the duty solver, so with the solver disabled this fails (tried).
        expect(Math.abs(e.conditions.vinV * e.operatingPoint.waveforms.inputA - e.outputPower - sum)).toBeLessThanOrEqual(1e-9 * e.inputPower);
        expect(e.efficiency).toBeGreaterThan(0);
        expect(e.efficiency).toBeLessThan(1);
        for (const t of e.losses) expect(t.watts).toBeGreaterThanOrEqual(0);
        if (!e.converged) expect(e.warnings.some((w) => w.code === 'thermal-runaway' || w.code === 'not-converged')).toBe(true);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('conduction loss rises with RDS(on), and the switch never gets colder when its own loss rises', () => {
    fc.assert(
      fc.property(arbitraryDesign, loadFraction, fc.double({ min: 1.1, max: 3, noNaN: true }), (d0, lf, k) => {
        const d = validated(d0);
        if (!d) return;
        const worse = structuredClone(d);
        worse.parts.switch.rdsOn25Ohm *= k;
        const load = { loadA: d.spec.ratedLoadA * lf };
        const a = evaluate(d, load);
        const b = evaluate(worse, load);
        if (!a.converged || !b.converged) return;
        expect(lossOf(b, 'switch', 'conduction')).toBeGreaterThan(lossOf(a, 'switch', 'conduction'));
        expect(tempOf(b, 'switch')).toBeGreaterThanOrEqual(tempOf(a, 'switch') - 1e-6);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('the inductor never gets colder when its own winding loss rises (higher DCR)', () => {
    fc.assert(
      fc.property(arbitraryDesign, loadFraction, fc.double({ min: 1.1, max: 3, noNaN: true }), (d0, lf, k) => {
        const d = validated(d0);
        if (!d) return;
        const worse = structuredClone(d);
        worse.parts.inductor.dcr20Ohm *= k;
        const load = { loadA: d.spec.ratedLoadA * lf };
        const a = evaluate(d, load);
        const b = evaluate(worse, load);
        if (!a.converged || !b.converged) return;
        expect(tempOf(b, 'inductor')).toBeGreaterThanOrEqual(tempOf(a, 'inductor') - 1e-6);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('temperatures rise with the thermal resistances and with the ambient', () => {
    fc.assert(
      fc.property(arbitraryDesign, loadFraction, fc.double({ min: 1.05, max: 2, noNaN: true }), fc.double({ min: 1, max: 30, noNaN: true }), (d0, lf, k, dT) => {
        const d = validated(d0);
        if (!d) return;
        const load = d.spec.ratedLoadA * lf;
        const base = evaluate(d, { loadA: load });
        const hotter = evaluate(scaleTheta(d, k), { loadA: load });
        const warmer = evaluate(d, { loadA: load, ambientC: d.spec.ambientC + dT });
        if (!base.converged || !hotter.converged || !warmer.converged) return;
        for (const t of base.temperatures) {
          expect(tempOf(hotter, t.part)).toBeGreaterThanOrEqual(t.celsius - 1e-6);
          expect(tempOf(warmer, t.part)).toBeGreaterThan(t.celsius);
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });
});

/** Every numeric leaf path of a JSON-like tree. */
function numericPaths(x: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (typeof x === 'number') return [prefix];
  if (x === null || typeof x !== 'object') return [];
  return Object.entries(x).flatMap(([k, v]) => numericPaths(v, [...prefix, Array.isArray(x) ? Number(k) : k]));
}

function scaled(d: Design, path: (string | number)[], factor: number): Design {
  const c = structuredClone(d) as unknown as Record<string | number, unknown>;
  let here = c;
  for (const key of path.slice(0, -1)) here = here[key] as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  here[last] = (here[last] as number) * factor;
  return c as unknown as Design;
}

describe('evaluate on anything the validator accepts (fast-check, seed 42)', () => {
  it('never throws and never returns a non-finite number, whatever one field is scaled by', () => {
    fc.assert(
      fc.property(arbitraryDesign, fc.nat(), fc.double({ min: -3, max: 3, noNaN: true }), loadFraction, (d0, pick, exponent, lf) => {
        const paths = numericPaths(d0).filter((p) => !['version'].includes(String(p[0])));
        const mutated = scaled(d0, paths[pick % paths.length]!, 10 ** exponent);
        const v = validateDesign(mutated);
        if (!v.ok) return;
        const e = evaluate(v.design, { loadA: v.design.spec.ratedLoadA * lf });
        expect(nonFinitePaths(e)).toEqual([]);
        expect(Math.abs(e.inputPower - e.outputPower - e.totalLoss)).toBeLessThanOrEqual(1e-9 * e.inputPower);
        for (const t of e.losses) expect(t.watts).toBeGreaterThanOrEqual(0);
      }),
      { seed: SEED, numRuns: 300 },
    );
  });
});
