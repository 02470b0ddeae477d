/**
 * Curves digitised from a datasheet: a table of (x, y) points read by straight-line interpolation.
 * Outside the table the end value is held (not extrapolated along the last slope: a digitised curve's
 * last segment says little about what lies beyond it); callers report when that happens.
 * Piecewise-linear interpolation of tabulated data — common practice.
 */

/** Index i of the segment [x[i], x[i+1]] holding x (0 below the table, n − 2 above it). */
export function segmentOf(xs: ArrayLike<number>, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** y at x by straight lines between the points; the end values are held outside [x0, xn]. */
export function interpolate(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const n = xs.length;
  if (x <= xs[0]!) return ys[0]!;
  if (x >= xs[n - 1]!) return ys[n - 1]!;
  const i = segmentOf(xs, x);
  const t = (x - xs[i]!) / (xs[i + 1]! - xs[i]!);
  return ys[i]! + t * (ys[i + 1]! - ys[i]!);
}

/** Where a value lies against a table's range: inside, below its first point or above its last. */
export function coverage(xs: ArrayLike<number>, x: number): 'inside' | 'below' | 'above' {
  if (x < xs[0]!) return 'below';
  if (x > xs[xs.length - 1]!) return 'above';
  return 'inside';
}

/** How a table breaks its shape rules. */
export type TableShapeFault = 'not-positive' | 'x-not-rising' | 'y-rises' | 'y-falls';

/** The first point that breaks a table's shape, or undefined: x strictly rising, y positive, and, when
 *  asked, y never rising (or never falling) with x. `index` counts from 0. */
export function tableShapeProblem(
  xs: readonly number[],
  ys: readonly number[],
  monotonic: 'non-increasing' | 'non-decreasing' | 'any',
): { index: number; kind: TableShapeFault } | undefined {
  for (let i = 0; i < xs.length; i++) {
    if (!(ys[i]! > 0)) return { index: i, kind: 'not-positive' };
    if (i === 0) continue;
    if (!(xs[i]! > xs[i - 1]!)) return { index: i, kind: 'x-not-rising' };
    if (monotonic === 'non-increasing' && ys[i]! > ys[i - 1]!) return { index: i, kind: 'y-rises' };
    if (monotonic === 'non-decreasing' && ys[i]! < ys[i - 1]!) return { index: i, kind: 'y-falls' };
  }
  return undefined;
}
