/**
 * Sweep axes: n values from `from` to `to` inclusive, evenly spaced on a linear or logarithmic scale.
 * Linear: x_i = from + i·(to − from)/(n − 1). Logarithmic: x_i = from·(to/from)^(i/(n − 1)).
 * The end points are returned exactly as given (no rounding drift at the last point).
 */
import type { OptionProblem, SweepSpacing } from './types.ts';

export const MAX_AXIS_POINTS = 10000;

export function axisValues(from: number, to: number, points: number, spacing: SweepSpacing): number[] {
  const problems = checkAxis('axis', from, to, points, spacing);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const values = new Array<number>(points);
  const last = points - 1;
  for (let i = 0; i < points; i++) {
    const t = i / last;
    values[i] = spacing === 'log' ? from * Math.pow(to / from, t) : from + t * (to - from);
  }
  values[0] = from;
  values[last] = to;
  return values;
}

/** Every problem with an axis, each naming its field path, value and allowed range. */
export function checkAxis(path: string, from: number, to: number, points: number, spacing: SweepSpacing): OptionProblem[] {
  const problems: OptionProblem[] = [];
  if (!Number.isFinite(from) || from <= 0) {
    problems.push({ path: `${path}.from`, value: from, allowed: '> 0', message: `${path}.from must be a number greater than 0 (got ${from}).` });
  }
  if (!Number.isFinite(to) || !(to > from)) {
    problems.push({ path: `${path}.to`, value: to, allowed: `> from (${from})`, message: `${path}.to must be a number greater than ${path}.from = ${from} (got ${to}).` });
  }
  if (!Number.isInteger(points) || points < 2 || points > MAX_AXIS_POINTS) {
    problems.push({ path: `${path}.points`, value: points, allowed: `whole number 2 … ${MAX_AXIS_POINTS}`, message: `${path}.points must be a whole number from 2 to ${MAX_AXIS_POINTS} (got ${points}).` });
  }
  if (spacing !== 'linear' && spacing !== 'log') {
    problems.push({ path: `${path}.spacing`, value: spacing, allowed: '"linear" or "log"', message: `${path}.spacing must be "linear" or "log" (got ${String(spacing)}).` });
  }
  return problems;
}
