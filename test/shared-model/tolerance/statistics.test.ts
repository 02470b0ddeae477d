import { describe, expect, it } from 'vitest';
import { fractionWhere, sampleHistogram as histogram, sampleMean as mean, sampleQuantile as quantile, sampleStandardDeviation as standardDeviation, summarizeSamples as summarize } from '../../../shared-model/tolerance/statistics.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('sample statistics', () => {
  it('mean and sample standard deviation of 2, 4, 4, 4, 5, 5, 7, 9', () => {
    const x = [2, 4, 4, 4, 5, 5, 7, 9];
    expect(mean(x)).toBe(5); // arithmetic: 40/8
    // Sum of squared deviations 32; population σ = 2 (a classic textbook example, e.g. Wikipedia "Standard deviation" [memory]); sample s = √(32/7).
    closeTo(standardDeviation(x), Math.sqrt(32 / 7), 1e-12); // n − 1 estimator by definition, 32 computed by hand
  });

  it('quantiles follow Hyndman & Fan type 7 (the default of R and NumPy)', () => {
    expect(quantile([1, 2, 3, 4], 0.25)).toBe(1.75); // h = 3·0.25 = 0.75 → 1 + 0.75·(2 − 1); Hyndman & Fan 1996, type 7
    expect(quantile([10, 7, 4, 3, 2, 1], 0.5)).toBe(3.5); // NumPy docs example np.percentile(a, 50) = 3.5 [memory]; type 7 midpoint of 3 and 4
    expect(quantile([5, 1, 3], 0)).toBe(1); // p = 0 gives the minimum (type 7 definition)
    expect(quantile([5, 1, 3], 1)).toBe(5); // p = 1 gives the maximum (type 7 definition)
  });

  it('summarize reports count, extremes and the 50 % quantile', () => {
    const s = summarize([3, 1, 2]);
    expect([s.count, s.min, s.max, s.p50, s.mean]).toEqual([3, 1, 3, 2, 2]); // by hand: sorted 1, 2, 3
  });

  it('histogram counts every sample once, with the top edge in the last bin', () => {
    const h = histogram([0, 0.5, 1, 1.5, 2], 2);
    expect(h.edges).toEqual([0, 1, 2]); // equal-width bins over [min, max] by construction
    expect(h.counts).toEqual([2, 3]); // by hand: [0, 1) holds 0 and 0.5; [1, 2] holds 1, 1.5, 2
    expect(histogram([4, 4, 4]).counts).toEqual([3]); // all equal: one bin holds all (by construction)
  });

  it('fractionWhere counts the share of samples over a limit', () => {
    expect(fractionWhere([1, 2, 3, 4], (v) => v > 2.5)).toBe(0.5); // by hand: 3 and 4 of four samples
  });

  it('refuses an empty sample and non-finite values', () => {
    expect(() => mean([])).toThrow(/at least one/); // programmer error: a statistic of nothing is undefined
    expect(() => mean([1, Number.NaN])).toThrow(/not finite/); // programmer error: the engine never returns NaN
  });
});
