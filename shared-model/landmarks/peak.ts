/**
 * Peak efficiency: the load of highest efficiency and its value.
 *
 * The largest sampled efficiency brackets the peak between its neighbours; with the engine at hand the
 * peak is then found by golden-section search in that bracket, otherwise by the vertex of the parabola
 * through the three points. A peak at the first or last point is reported with a note: the true peak may
 * lie outside the swept range.
 * Check (docs/methods.md §12): loss P0 + a·Io + b·Io² has its peak at Io* = √(P0/b), η* = Vo/(Vo + a + 2√(P0·b)).
 */
import { findMaximum, parabolaVertex } from './search.ts';
import type { Landmark } from './types.ts';

export interface PeakResult extends Landmark {
  /** Index of the best sampled point (−1 when there are none). */
  index: number;
}

/**
 * Peak of `efficiency` over `loads` (ascending). `usable[i]` false excludes a point (not converged, or
 * beyond the regulation limit). `probe(load)` returns the efficiency at any load, for refinement.
 */
export function findPeak(
  loads: readonly number[],
  efficiency: readonly number[],
  usable?: readonly boolean[],
  probe?: (load: number) => number,
): PeakResult {
  let index = -1;
  for (let i = 0; i < loads.length; i++) {
    if (usable && !usable[i]) continue;
    if (index < 0 || efficiency[i] > efficiency[index]) index = i;
  }
  if (index < 0) {
    return { load: null, value: null, unit: '', reason: 'No swept point converged to a usable operating point.', note: null, method: 'none', index };
  }
  const ok = (i: number) => i >= 0 && i < loads.length && (!usable || usable[i]);
  if (!ok(index - 1) || !ok(index + 1)) {
    const where = index === 0 || !ok(index - 1) ? 'lightest' : 'heaviest';
    return {
      load: loads[index],
      value: efficiency[index],
      unit: '',
      reason: null,
      note: `The highest efficiency lies at the ${where} usable swept load; the true peak may lie outside the swept range.`,
      method: 'sweep-point',
      index,
    };
  }
  const [x0, x1, x2] = [loads[index - 1], loads[index], loads[index + 1]];
  if (probe) {
    const best = findMaximum(probe, x0, x2);
    // Never report less than a sampled point (guards a non-unimodal bracket).
    if (best.fx >= efficiency[index]) {
      return { load: best.x, value: best.fx, unit: '', reason: null, note: null, method: 'refined', index };
    }
    return { load: x1, value: efficiency[index], unit: '', reason: null, note: null, method: 'sweep-point', index };
  }
  const v = parabolaVertex(x0, efficiency[index - 1], x1, efficiency[index], x2, efficiency[index + 1]);
  return { load: v.x, value: v.y, unit: '', reason: null, note: null, method: 'interpolated', index };
}
