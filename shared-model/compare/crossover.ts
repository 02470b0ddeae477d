/**
 * Crossovers between curves sampled at the same loads (lower is better, e.g. total loss): the loads
 * where the best curve changes. Between two neighbouring loads where the winner changes from curve a to
 * curve b, the crossover is the root of a − b, found on the engine (Illinois regula falsi) or by
 * straight-line interpolation of the difference.
 * Check: two loss curves P0a + ka·I + Ra·I² and P0b + kb·I + Rb·I² cross where
 * (Ra − Rb)·I² + (ka − kb)·I + (P0a − P0b) = 0.
 */
import { findRoot, interpolateCrossing } from '../landmarks/search.ts';

export interface Crossover {
  load: number;
  /** Index of the curve that wins just below the crossover. */
  from: number;
  /** Index of the curve that wins just above it. */
  to: number;
  method: 'refined' | 'interpolated';
}

/**
 * Index of the smallest value at each point (ties go to the lower index). A value that is not finite
 * (a point that may not stand for its design: unregulated or without a steady state) never wins; a
 * point where no curve has a finite value gets −1.
 */
export function winnersOf(curves: readonly (readonly number[])[]): number[] {
  if (curves.length === 0) return [];
  return curves[0].map((_, i) => {
    let best = -1;
    for (let k = 0; k < curves.length; k++) {
      const v = curves[k][i];
      if (Number.isFinite(v) && (best < 0 || v < curves[best][i])) best = k;
    }
    return best;
  });
}

/**
 * Crossovers of `curves` over `loads`. `probe(k, load)` evaluates curve k at any load, for refinement.
 */
export function findCrossovers(
  loads: readonly number[],
  curves: readonly (readonly number[])[],
  probe?: (curve: number, load: number) => number,
): Crossover[] {
  const win = winnersOf(curves);
  const out: Crossover[] = [];
  for (let i = 1; i < win.length; i++) {
    const a = win[i - 1];
    const b = win[i];
    if (a === b || a < 0 || b < 0) continue;
    const x0 = loads[i - 1];
    const x1 = loads[i];
    const d0 = curves[a][i - 1] - curves[b][i - 1];
    const d1 = curves[a][i] - curves[b][i];
    // A change of winner because one part stops (or starts) counting is no crossing of two losses.
    if (!Number.isFinite(d0) || !Number.isFinite(d1)) continue;
    const load = probe
      ? findRoot((x) => probe(a, x) - probe(b, x), x0, x1, d0, d1)
      : interpolateCrossing(x0, d0, x1, d1, 0);
    out.push({ load, from: a, to: b, method: probe ? 'refined' : 'interpolated' });
  }
  return out;
}
