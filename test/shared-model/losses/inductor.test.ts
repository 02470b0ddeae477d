import { describe, expect, it } from 'vitest';
import { windingDc } from '../../../shared-model/losses/winding-dc.ts';
import { windingAc } from '../../../shared-model/losses/winding-ac.ts';
import {
  copperResistivityOhmM,
  dowellFactor,
  dowellRippleFactor,
  DOWELL_SCRATCH,
  harmonicPowers,
  skinDepthM,
} from '../../../shared-model/losses/dowell.ts';
import { copperResistanceAt } from '../../../shared-model/physics/temperature-laws.ts';
import type { Segment } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

/** A CCM triangle: rises by ripple over D·T, falls back over (1 − D)·T. */
function triangle(meanA: number, rippleA: number, d: number, periodS: number): Segment[] {
  return [
    { durationS: d * periodS, i0A: meanA - rippleA / 2, i1A: meanA + rippleA / 2 },
    { durationS: (1 - d) * periodS, i0A: meanA + rippleA / 2, i1A: meanA - rippleA / 2 },
  ];
}

describe('winding DC loss', () => {
  it('uses DCR(T) with copper α20 0.00393/K: 10 mΩ at 20 °C → 13.144 mΩ at 100 °C', () => {
    const r = copperResistanceAt(0.01, 100);
    closeTo(r, 0.013144, 1e-9); // docs/methods.md §8: IEC 60028 copper, 10 mΩ at 20 °C → 13.144 mΩ at 100 °C
    closeTo(windingDc.watts({ irmsA: 3.004722, dcrOhm: r, temperatureC: 100 }), 3.004722 ** 2 * 0.013144, 1e-9); // docs/methods.md §1: IL,rms 3.004722 A
  });
});

describe('winding AC loss', () => {
  it('charges only the excess F_R − 1 to the ripple', () => {
    closeTo(windingAc.watts({ acRmsA: 0.5, dcrOhm: 0.02, factor: 4, temperatureC: 25 }), 0.25 * 0.02 * 3, 1e-12); // winding-ac.ts header: Iac²·DCR·(F_R − 1)
    expect(windingAc.watts({ acRmsA: 0.5, dcrOhm: 0.02, factor: 0.5, temperatureC: 25 })).toBe(0); // a factor below 1 adds nothing (header)
  });
});

describe('skin depth and Dowell', () => {
  it('gives δ = 0.208981 mm in copper at 100 kHz and 20 °C', () => {
    closeTo(skinDepthM(copperResistivityOhmM(20), 100e3), 0.208981e-3, 1e-5); // docs/methods.md §8: δ 0.208981 mm at 100 kHz, 20 °C
  });
  it('gives F_R(Δ = 1, m = 1) = 1.085636', () => {
    closeTo(dowellFactor(1, 1), 1.085636, 1e-6); // docs/methods.md §8: Dowell, Proc. IEE 113(8), 1966
  });
  it('tends to Δ for one layer at high frequency (current in one skin depth)', () => {
    closeTo(dowellFactor(30, 1), 30, 1e-9); // Dowell 1966: (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) → 1 as Δ → ∞
    closeTo(dowellFactor(19.99, 1), dowellFactor(20.01, 1), 1e-3); // continuous across the large-Δ branch (same limit)
  });
  it('agrees with its low-frequency expansion 1 + (5m² − 1)·Δ⁴/45', () => {
    const d = 0.05;
    const m = 3;
    closeTo(dowellFactor(d, m), 1 + ((5 * m * m - 1) * d ** 4) / 45, 1e-9); // series of Dowell's formula for small Δ (Kazimierczuk, High-Frequency Magnetic Components, ch. 4 [memory])
  });
});

describe('harmonics of the ripple', () => {
  it('sum to the AC RMS² = ΔI²/12 of a triangle (Parseval)', () => {
    const ripple = 0.583333;
    const n = 2000;
    const out = new Float64Array(2 * n);
    harmonicPowers(triangle(3, ripple, 0.3, 2e-6), n, out);
    let sum = 0;
    for (let k = 0; k < n; k++) sum += out[k]!;
    closeTo(sum, (ripple * ripple) / 12, 1e-8); // docs/methods.md §8: sum of squares of the harmonics equals ΔI²/12 (Parseval)
  });
  it('give the fundamental of a symmetric triangle: amplitude 8·(ΔI/2)/π²', () => {
    const out = new Float64Array(2);
    harmonicPowers(triangle(0, 2, 0.5, 1e-5), 1, out);
    const amplitude = (8 * 1) / Math.PI ** 2; // Fourier series of a triangle wave of peak 1 (standard table)
    closeTo(out[0]!, (amplitude * amplitude) / 2, 1e-12); // harmonic RMS² = amplitude²/2
  });
  it('weight Dowell over the spectrum: F_eff lies between F_R at fs and at the last harmonic', () => {
    const segs = triangle(2, 1, 0.3, 1e-5);
    const scratch = new Float64Array(DOWELL_SCRATCH);
    const f = dowellRippleFactor(segs, 1 / Math.sqrt(12), 3, 0.3e-3, 0.8, 20, scratch);
    const delta1 = (0.3e-3 * Math.sqrt(0.8)) / skinDepthM(copperResistivityOhmM(20), 1e5);
    expect(f).toBeGreaterThan(dowellFactor(delta1, 3)); // harmonics see a higher factor (F_R rises with frequency)
    expect(f).toBeLessThan(dowellFactor(delta1 * Math.sqrt(12), 3));
    // The cached per-harmonic factors give the same answer on a second call at the same temperature.
    expect(dowellRippleFactor(segs, 1 / Math.sqrt(12), 3, 0.3e-3, 0.8, 20, scratch)).toBe(f);
  });
});
