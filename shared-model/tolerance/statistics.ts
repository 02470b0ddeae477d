/**
 * Sample statistics for Monte Carlo results.
 *
 * - mean: arithmetic mean; standard deviation: the sample (n − 1) estimator.
 * - sampleQuantile(p): linear interpolation between order statistics at h = (n − 1)·p, "type 7" of
 *   Hyndman & Fan, "Sample quantiles in statistical packages", The American Statistician 50(4), 1996
 *   (the default of R and NumPy).
 * - histogram: equal-width bins over [min, max]; the top edge belongs to the last bin.
 * Non-finite values are a programmer error upstream (the engine never returns NaN) and are rejected.
 */

export interface SampleSummary {
  count: number;
  mean: number;
  /** Sample standard deviation (n − 1); 0 for a single sample. */
  standardDeviation: number;
  min: number;
  max: number;
  /** Quantiles at 1 %, 5 %, 50 %, 95 %, 99 % (Hyndman & Fan type 7). */
  p01: number;
  p05: number;
  p50: number;
  p95: number;
  p99: number;
}

export interface SampleHistogram {
  /** Bin edges, length bins + 1. */
  edges: number[];
  counts: number[];
}

function assertSamples(values: ArrayLike<number>): void {
  if (values.length === 0) throw new RangeError('statistics need at least one sample');
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) throw new RangeError(`sample ${i} is not finite: ${values[i]}`);
  }
}

export function sampleMean(values: ArrayLike<number>): number {
  assertSamples(values);
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += values[i];
  return sum / values.length;
}

/** Sample standard deviation with the n − 1 denominator (two-pass for accuracy). */
export function sampleStandardDeviation(values: ArrayLike<number>): number {
  const m = sampleMean(values);
  if (values.length < 2) return 0;
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += (values[i] - m) ** 2;
  return Math.sqrt(sum / (values.length - 1));
}

/** Quantile of already sorted values, Hyndman & Fan type 7. */
export function sampleQuantileSorted(sorted: ArrayLike<number>, p: number): number {
  assertSamples(sorted);
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile probability must lie in [0, 1], got ${p}`);
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

export function sampleQuantile(values: ArrayLike<number>, p: number): number {
  return sampleQuantileSorted(Float64Array.from(values).sort(), p);
}

export function summarizeSamples(values: ArrayLike<number>): SampleSummary {
  const sorted = Float64Array.from(values).sort();
  return {
    count: sorted.length,
    mean: sampleMean(sorted),
    standardDeviation: sampleStandardDeviation(sorted),
    min: sorted[0],
    max: sorted[sorted.length - 1],
    p01: sampleQuantileSorted(sorted, 0.01),
    p05: sampleQuantileSorted(sorted, 0.05),
    p50: sampleQuantileSorted(sorted, 0.5),
    p95: sampleQuantileSorted(sorted, 0.95),
    p99: sampleQuantileSorted(sorted, 0.99),
  };
}

/** Equal-width histogram. When every sample is equal, one bin of zero width holds them all. */
export function sampleHistogram(values: ArrayLike<number>, bins = 30): SampleHistogram {
  assertSamples(values);
  if (!Number.isInteger(bins) || bins < 1) throw new RangeError(`bins must be a whole number ≥ 1, got ${bins}`);
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    if (values[i] < min) min = values[i];
    if (values[i] > max) max = values[i];
  }
  if (max === min) return { edges: [min, max], counts: [values.length] };
  const width = (max - min) / bins;
  const edges = Array.from({ length: bins + 1 }, (_, i) => (i === bins ? max : min + i * width));
  const counts = new Array<number>(bins).fill(0);
  for (let i = 0; i < values.length; i++) {
    const bin = Math.min(bins - 1, Math.floor((values[i] - min) / width));
    counts[bin] += 1;
  }
  return { edges, counts };
}

/** Fraction of samples for which `exceeds` is true. */
export function fractionWhere(values: ArrayLike<number>, exceeds: (value: number) => boolean): number {
  assertSamples(values);
  let count = 0;
  for (let i = 0; i < values.length; i++) if (exceeds(values[i])) count += 1;
  return count / values.length;
}
