/**
 * Where marker labels go on a chart, pure: the position of a value along an axis, label rows that keep
 * neighbouring labels apart, and a sideways shift for labels at either end of the axis.
 */

/** Position of a value along an axis as a fraction of the range (log or linear). */
export function along(value: number, lo: number, hi: number, log: boolean): number {
  const t = (v: number) => (log ? Math.log(Math.max(v, Number.MIN_VALUE)) : v);
  return hi > lo ? (t(value) - t(lo)) / (t(hi) - t(lo)) : 0;
}

/**
 * Label rows for vertical markers: a label goes to the first row where no label within `gap` (a
 * fraction of the axis) sits already, so neighbouring markers (knee, peak, rated) stay readable.
 */
export function labelRows(positions: readonly number[], gap = 0.14): number[] {
  const taken: number[][] = [];
  return positions.map((x) => {
    let row = 0;
    while ((taken[row] ?? []).some((other) => Math.abs(other - x) < gap)) row++;
    (taken[row] ??= []).push(x);
    return row;
  });
}

/** Sideways shift (px) that keeps a label near either end of the axis inside the plot. */
export function edgeShift(spot: number, label: string): number {
  const half = label.length * 3 + 4;
  return spot > 0.9 ? -half : spot < 0.06 ? half : 0;
}
