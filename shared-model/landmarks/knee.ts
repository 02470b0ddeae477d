/**
 * The light-load knee of the efficiency curve. No standard defines it, so WattLedger uses this one:
 * the lightest load at which efficiency comes within X percentage points of its peak value
 * (X is a setting, 2 points by default).
 *
 * Why this definition: it answers the question an engineer asks of a light-load curve ("from which load
 * up am I close to my best?"), uses only efficiency values (no derivative, so it is insensitive to point
 * spacing, log or linear axes and numerical noise), and has a closed form for the loss model of
 * docs/methods.md §12: with P(Io) = P0 + a·Io + b·Io² and target ηt = η* − X/100, the knee is the smaller
 * root of b·Io² + (a − Vo·(1 − ηt)/ηt)·Io + P0 = 0.
 * Method: the first sampled point at or above the target brackets the crossing with the point before it;
 * the crossing is then found on the engine (Illinois regula falsi) or by straight-line interpolation.
 */
import { findRoot, interpolateCrossing } from './search.ts';
import type { PeakResult } from './peak.ts';
import type { KneeLandmark } from './types.ts';

export const DEFAULT_KNEE_THRESHOLD_POINTS = 2;

/** Our definition of the knee, in one sentence, for the UI and the report. */
export function kneeDefinition(thresholdPoints: number = DEFAULT_KNEE_THRESHOLD_POINTS): string {
  return (
    `Light-load knee (WattLedger's own definition; no standard exists): the lightest load at which ` +
    `efficiency comes within ${thresholdPoints} percentage points of its peak value.`
  );
}

export function findKnee(
  loads: readonly number[],
  efficiency: readonly number[],
  peak: PeakResult,
  thresholdPoints: number = DEFAULT_KNEE_THRESHOLD_POINTS,
  usable?: readonly boolean[],
  probe?: (load: number) => number,
): KneeLandmark {
  const definition = kneeDefinition(thresholdPoints);
  const base = { unit: '', thresholdPoints, definition };
  if (!(thresholdPoints > 0 && thresholdPoints < 100)) {
    throw new RangeError(`knee threshold must lie between 0 and 100 percentage points, got ${thresholdPoints}`);
  }
  if (peak.value === null || peak.load === null) {
    return { ...base, load: null, value: null, reason: 'There is no efficiency peak to measure the knee from.', note: null, method: 'none' };
  }
  const target = peak.value - thresholdPoints / 100;
  let first = -1;
  for (let i = 0; i <= peak.index; i++) {
    if (usable && !usable[i]) continue;
    if (efficiency[i] >= target) {
      first = i;
      break;
    }
  }
  if (first < 0) {
    return { ...base, load: null, value: null, reason: 'No usable point below the peak reaches the threshold.', note: null, method: 'none' };
  }
  let previous = first - 1;
  while (previous >= 0 && usable && !usable[previous]) previous -= 1;
  if (previous < 0) {
    return {
      ...base,
      load: null,
      value: null,
      reason:
        `Efficiency is already within ${thresholdPoints} percentage points of its peak at the lightest ` +
        `usable swept load (${loads[first]} A): the knee lies below the swept range.`,
      note: null,
      method: 'none',
    };
  }
  const x0 = loads[previous];
  const x1 = loads[first];
  if (probe) {
    const load = findRoot((x) => probe(x) - target, x0, x1, efficiency[previous] - target, efficiency[first] - target);
    return { ...base, load, value: probe(load), reason: null, note: null, method: 'refined' };
  }
  const load = interpolateCrossing(x0, efficiency[previous], x1, efficiency[first], target);
  return { ...base, load, value: target, reason: null, note: null, method: 'interpolated' };
}
