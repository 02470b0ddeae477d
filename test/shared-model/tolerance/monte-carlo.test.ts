import { describe, expect, it } from 'vitest';
import { monteCarlo } from '../../../shared-model/index.ts';
import { createRandom } from '../../../shared-model/tolerance/prng.ts';
import { drawVariation } from '../../../shared-model/tolerance/monte-carlo.ts';
import { resolveTolerances } from '../../../shared-model/tolerance/variation.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { CEILING, handCeilingDesign } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

const design = demoDesign('synchronous-buck.json');
const zero = { rdsOnFraction: 0, dcrFraction: 0, esrFraction: 0, inductanceFraction: 0, frequencyFraction: 0 };
const scaled = (f: number) => ({ rdsOnFraction: f, dcrFraction: f, esrFraction: f, inductanceFraction: f, frequencyFraction: f / 2 });

describe('Monte Carlo', () => {
  it('reproduces exactly for the same seed, and differs for another seed', () => {
    const a = monteCarlo(design, { seed: 12345, samples: 150, keepSamples: true });
    const b = monteCarlo(design, { seed: 12345, samples: 150, keepSamples: true });
    const c = monteCarlo(design, { seed: 12346, samples: 150, keepSamples: true });
    expect(b).toEqual(a); // issue 4: reproduces exactly for the same seed (MT19937 is deterministic, prng.ts)
    expect(c.values?.efficiency).not.toEqual(a.values?.efficiency); // another seed, other samples
    expect(a.seed).toBe(12345); // the seed is visible in the result (issue 4)
  });

  it('equals the nominal point in every sample when every tolerance is zero', () => {
    const r = monteCarlo(design, { seed: 7, samples: 50, tolerances: zero });
    expect(r.efficiency.summary.min).toBe(r.nominal.efficiency); // zero spread: each sample is the nominal design
    expect(r.efficiency.summary.max).toBe(r.nominal.efficiency); // zero spread: each sample is the nominal design
    expect(r.efficiency.summary.standardDeviation).toBeLessThan(1e-12); // zero up to the rounding of a 50-term mean (IEEE 754 double)
    r.temperatures.forEach((t, j) => expect(t.summary.mean).toBeCloseTo(r.nominal.temperatures[j].celsius, 12)); // mean of 50 equal values
  });

  it('converges to the nominal point as tolerances shrink: spread ∝ tolerance', () => {
    // First-order (Taylor) response: δη ≈ Σ ∂η/∂x·δx, so with the same draws the standard deviation scales with the tolerance
    // and the mean's offset from nominal with its square (error propagation, e.g. Taylor, An Introduction to Error Analysis, ch. 3 [memory]).
    const wide = monteCarlo(design, { seed: 99, samples: 200, tolerances: scaled(0.02) });
    const narrow = monteCarlo(design, { seed: 99, samples: 200, tolerances: scaled(0.002) });
    closeTo(wide.efficiency.summary.standardDeviation / narrow.efficiency.summary.standardDeviation, 10, 0.05); // σ ∝ tolerance: ratio 0.02/0.002 = 10
    expect(Math.abs(narrow.efficiency.summary.mean - narrow.nominal.efficiency)).toBeLessThan(Math.abs(wide.efficiency.summary.mean - wide.nominal.efficiency)); // the mean closes in on nominal
    expect(narrow.efficiency.summary.max - narrow.efficiency.summary.min).toBeLessThan(1e-3); // ±0.2 % parts move η by well under 0.1 point
  });

  it('counts the fraction over a limit: half the samples when nominal sits exactly at it', () => {
    // Hand design at its closed-form ceiling (docs/methods.md §8/§10): the inductor is at its derated limit at nominal DCR.
    // Its temperature rises monotonically with DCR, so P(over) = P(DCR scale > 1) = 1/2 for a symmetric spread.
    const d = handCeilingDesign();
    const tLim = CEILING.tMaxC - CEILING.marginK;
    const load = Math.sqrt((tLim - CEILING.ambientC) / (CEILING.thetaKPerW * CEILING.dcr20Ohm * (1 + 0.00393 * (tLim - 20))));
    const n = 400;
    const r = monteCarlo(d, { seed: 2024, samples: n, loadA: load, tolerances: { ...zero, dcrFraction: 0.1 } });
    const inductor = r.temperatures.find((t) => t.part === 'inductor');
    expect(Math.abs((inductor?.fractionOverDerated ?? NaN) - 0.5)).toBeLessThan(3 * Math.sqrt(0.25 / n)); // binomial: σ = √(p(1−p)/n), 3σ band
    expect(inductor?.fractionOverLimit).toBe(0); // +10 % DCR cannot add the 15 K margin: ΔT ≈ 0.1·70 K = 7 K (docs/methods.md §10)
  });

  it('draws scales uniformly over 1 ± tolerance', () => {
    const rng = createRandom(5);
    const t = resolveTolerances(design, { rdsOnFraction: 0.2 });
    const base = { vinV: 14.4, loadA: 5, switchingFrequencyHz: 5e5, ambientC: 40 };
    const s = Array.from({ length: 20000 }, () => drawVariation(rng, t, 'uniform', base, false).switchRdsOnScale);
    expect(Math.min(...s)).toBeGreaterThanOrEqual(0.8); // support of U(0.8, 1.2)
    expect(Math.max(...s)).toBeLessThanOrEqual(1.2); // support of U(0.8, 1.2)
    const mean = s.reduce((a, b) => a + b, 0) / s.length;
    expect(Math.abs(mean - 1)).toBeLessThan(5 * (0.4 / Math.sqrt(12)) / Math.sqrt(s.length)); // U(a,b): σ = (b − a)/√12; CLT 5σ band
  });

  it('keeps a normal draw within ±tolerance (3σ, common practice)', () => {
    const rng = createRandom(6);
    const t = resolveTolerances(design, { dcrFraction: 0.1 });
    const base = { vinV: 14.4, loadA: 5, switchingFrequencyHz: 5e5, ambientC: 40 };
    const s = Array.from({ length: 20000 }, () => drawVariation(rng, t, 'normal', base, false).dcrScale);
    expect(Math.max(...s.map((x) => Math.abs(x - 1)))).toBeLessThanOrEqual(0.1); // truncated at 3σ = tolerance (common practice)
    const sd = Math.sqrt(s.reduce((a, x) => a + (x - 1) ** 2, 0) / s.length);
    closeTo(sd, (0.1 / 3) * 0.9865, 0.03); // 3σ-truncated normal: σ_t = σ·√(1 − 2·3·φ(3)/(2Φ(3) − 1)) ≈ 0.9865σ (truncated-normal variance formula)
  });
});
