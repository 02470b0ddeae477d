/**
 * Duty cycle from volt-second balance, and what happens when the target cannot be reached.
 *
 * The volt-second residual r(D) (shape.ts) rises with D from r(0) < 0. When the on interval delivers to
 * the output (the topology record's intervals; buck) r is monotonic, so the root
 * lies in [0, Dmax] or the duty limit is reached. Boost: r rises to a maximum and falls again (the
 * resistive drops grow as IL = Io/D'), so the ratio has a ceiling (docs/methods.md §3: 1/(2√(RL/R)) at
 * D' = √(RL/R)); the root taken is the one on the rising side (lower D).
 * When the target cannot be reached, D is held at the limit (buck: Dmax; boost: the D in [0, Dmax]
 * that gives the highest output) and the output voltage that balances the volt-seconds at the same load
 * current is reported instead of the target. A boost whose input already exceeds the target (plus the
 * rectifier drop) cannot step down: D = 0 and Vo follows Vin minus the drops.
 * Source: Erickson & Maksimović 2nd ed. ch. 3 (boost with inductor resistance) [memory]; Brent root
 * finding (roots.ts).
 */
import type { Circuit } from './circuit.ts';
import { shapeAt, type Shape } from './shape.ts';
import { brentRoot, goldenMax } from './roots.ts';

export type DutyLimit = 'none' | 'duty-limit' | 'conversion-ratio' | 'step-down';

export interface DutySolution {
  d: number;
  vo: number;
  limit: DutyLimit;
}

const D_TOL = 1e-15;

/** Output voltage that balances the volt-seconds at duty d and the circuit's load current (≥ 0). */
export function achievableVout(c: Circuit, d: number, s: Shape): number {
  const g = (vo: number) => shapeAt(c, d, vo, s).residualV;
  const g0 = g(0);
  if (!(g0 > 0)) return 0;
  let hi = Math.max(c.targetVoutV, c.vinV);
  let ghi = g(hi);
  for (let k = 0; k < 60 && ghi > 0; k++) {
    hi *= 2;
    ghi = g(hi);
  }
  if (ghi > 0) return hi;
  return brentRoot(g, 0, hi, g0, ghi, 1e-12 * hi);
}

/** Duty cycle for the target output voltage, or the limited point (see header). */
export function solveVoltSecond(c: Circuit, dMax: number, s: Shape): DutySolution {
  const vo = c.targetVoutV;
  const r = (d: number) => shapeAt(c, d, vo, s).residualV;
  const r0 = r(0);
  if (r0 === 0) return { d: 0, vo, limit: 'none' };
  if (r0 > 0) return { d: 0, vo: achievableVout(c, 0, s), limit: 'step-down' };
  const rMax = r(dMax);
  if (rMax >= 0) return { d: brentRoot(r, 0, dMax, r0, rMax, D_TOL), vo, limit: 'none' };
  // Where the inductor carries the load over the whole period (buck) the residual rises monotonically;
  // otherwise IL = Io/D' and the drops give the ratio a ceiling (boost).
  if (c.onToOutput) return { d: dMax, vo: achievableVout(c, dMax, s), limit: 'duty-limit' };
  const dPeak = goldenMax(r, 0, dMax, 1e-12);
  const rPeak = r(dPeak);
  if (rPeak >= 0) return { d: brentRoot(r, 0, dPeak, r0, rPeak, D_TOL), vo, limit: 'none' };
  const dBest = goldenMax((d) => achievableVout(c, d, s), 0, dMax, 1e-9);
  const atLimit = dMax - dBest < 1e-6;
  const d = atLimit ? dMax : dBest;
  return { d, vo: achievableVout(c, d, s), limit: atLimit ? 'duty-limit' : 'conversion-ratio' };
}

/**
 * solveVoltSecond(c, dMax, s).limit without the duty itself where it is not needed: the residual at
 * D = 0 and at Dmax decide it for a regulating point and a buck; only a boost short of its target at Dmax
 * needs the full search. `s` is left holding some trial shape.
 */
export function dutyLimitOf(c: Circuit, dMax: number, s: Shape): DutyLimit {
  const vo = c.targetVoutV;
  const r0 = shapeAt(c, 0, vo, s).residualV;
  if (r0 === 0) return 'none';
  if (r0 > 0) return 'step-down';
  if (shapeAt(c, dMax, vo, s).residualV >= 0) return 'none';
  return c.onToOutput ? 'duty-limit' : solveVoltSecond(c, dMax, s).limit;
}
