import { describe, expect, it } from 'vitest';
import { delayWaveform, interleavedSum, sumWaveforms, type Waveform } from '../../../shared-model/index.ts';
import { periodOf, waveformStats } from '../../../shared-model/waveform/stats.ts';
import { closeTo } from '../../helpers/close-to.ts';

const T = 2e-6;

/** An ideal CCM buck inductor current: mean I, ripple ΔI, rising for D·T (textbook triangle, docs/methods.md §1). */
const inductor = (D: number, meanA: number, rippleA: number): Waveform => ({
  segments: [
    { durationS: D * T, i0A: meanA - rippleA / 2, i1A: meanA + rippleA / 2 },
    { durationS: (1 - D) * T, i0A: meanA + rippleA / 2, i1A: meanA - rippleA / 2 },
  ],
});

/** An ideal buck switch current with a flat top (no ripple): I during D·T, 0 after. */
const flatSwitch = (D: number, currentA: number): Waveform => ({
  segments: [
    { durationS: D * T, i0A: currentA, i1A: currentA },
    { durationS: (1 - D) * T, i0A: 0, i1A: 0 },
  ],
});

/** K(N, D) = N·(D − m/N)·((m + 1)/N − D)/(D·(1 − D)), m = floor(N·D) — docs/methods.md §15 (multiphase-VRM literature, from memory). */
const cancellation = (N: number, D: number): number => {
  const m = Math.floor(N * D);
  return (N * (D - m / N) * ((m + 1) / N - D)) / (D * (1 - D));
};

/** The value of a waveform at t (right limit), for sampling the sum independently of its segment list. */
function valueAt(w: Waveform, t: number): number {
  let t0 = 0;
  for (const s of w.segments) {
    if (t < t0 + s.durationS) return s.i0A + ((s.i1A - s.i0A) * (t - t0)) / s.durationS;
    t0 += s.durationS;
  }
  const last = w.segments[w.segments.length - 1]!;
  return last.i1A;
}

const peakToPeak = (w: Waveform): number => {
  const s = waveformStats(w);
  return s.peakA - s.minA;
};

describe('interleavedSum (phase-shifted sum of piecewise-linear currents)', () => {
  it('reproduces the worked check N = 3, D = 0.4 → K = 0.22222', () => {
    const sum = interleavedSum([0, 1, 2].map(() => inductor(0.4, 10, 2)));
    closeTo(peakToPeak(sum) / 2, 0.22222, 1e-4, 0, { N: 3, D: 0.4 }); // docs/methods.md §15 worked check
  });

  it('gives the summed inductor ripple K(N, D) of the multiphase literature for N = 1 … 8 over the duty range', () => {
    for (let N = 1; N <= 8; N++)
      for (const D of [0.05, 0.1, 0.17, 0.25, 0.31, 0.45, 0.6, 0.73, 0.9, 0.95]) {
        if (Math.abs(N * D - Math.round(N * D)) < 1e-9) continue; // the nulls are checked below
        const sum = interleavedSum(Array.from({ length: N }, () => inductor(D, 5, 1.5)));
        closeTo(peakToPeak(sum) / 1.5, cancellation(N, D), 1e-9, 0, { N, D }); // docs/methods.md §15 (VRM literature, from memory)
      }
  });

  it('cancels the ripple completely at the nulls D = k/N', () => {
    for (let N = 2; N <= 8; N++)
      for (let k = 1; k < N; k++) {
        const D = k / N;
        const sum = interleavedSum(Array.from({ length: N }, () => inductor(D, 5, 1.5)));
        expect(peakToPeak(sum), `N ${N}, D ${D}`).toBeLessThan(1e-9); // docs/methods.md §15: K = 0 at D = k/N
        closeTo(waveformStats(sum).averageA, 5 * N, 1e-12, 0, { N, D }); // Kirchhoff: the DC parts add
      }
  });

  it('gives the input-capacitor RMS Io·√((D − m/N)((m + 1)/N − D)) of flat-topped phase currents', () => {
    for (let N = 1; N <= 6; N++)
      for (const D of [0.1, 0.25, 0.4, 0.5, 0.66, 0.85]) {
        const Io = 30;
        const sum = interleavedSum(Array.from({ length: N }, () => flatSwitch(D, Io / N)));
        const m = Math.floor(N * D);
        // Counting conducting phases: m or m + 1 of them carry Io/N each, m + 1 for a fraction N·D − m of
        // the period; the variance of that two-level current (derived here; the normalised curves of the
        // multiphase-buck literature, e.g. Zhou et al., IEEE TPEL 15(6) 2000 — from memory).
        const expected = Io * Math.sqrt(Math.max(0, (D - m / N) * ((m + 1) / N - D)));
        closeTo(waveformStats(sum).acRmsA, expected, 1e-9, 1e-12, { N, D });
      }
  });

  it('a single-phase buck input capacitor reaches Io·√(D(1 − D)) (docs/methods.md §1)', () => {
    const sum = interleavedSum([flatSwitch(0.3, 12)]);
    closeTo(waveformStats(sum).acRmsA, 12 * Math.sqrt(0.3 * 0.7), 1e-12); // docs/methods.md §1 (flat-top approximation)
  });

  it('ripples at N·fs: the sum delayed by T/N is the same current', () => {
    const N = 3;
    const sum = interleavedSum(Array.from({ length: N }, () => inductor(0.37, 4, 1)));
    const shifted = delayWaveform(sum, T / N);
    for (let j = 0; j < 97; j++) {
      const t = ((j + 0.5) * T) / 97;
      closeTo(valueAt(shifted, t), valueAt(sum, t), 1e-9, 1e-12, { t }); // superposition of identical shifted phases (Kirchhoff)
    }
  });

  it('keeps jumps: a delayed switch current has the same mean and RMS and its edge at the delay', () => {
    const w = flatSwitch(0.3, 7);
    const d = delayWaveform(w, 0.5 * T);
    closeTo(periodOf(d), T, 1e-12);
    closeTo(waveformStats(d).rmsA, 7 * Math.sqrt(0.3), 1e-12); // RMS of a pulse train (elementary)
    expect(valueAt(d, 0.49 * T)).toBe(0);
    expect(valueAt(d, 0.51 * T)).toBe(7);
  });

  it('sums unequal phases sample by sample', () => {
    const a = inductor(0.3, 6, 2);
    const b = inductor(0.3, 4, 1);
    const sum = sumWaveforms([a, delayWaveform(b, 0.4 * T)]);
    for (let j = 0; j < 50; j++) {
      const t = ((j + 0.25) * T) / 50;
      const expected = valueAt(a, t) + valueAt(b, (t - 0.4 * T + T) % T); // superposition (Kirchhoff)
      closeTo(valueAt(sum, t), expected, 1e-12, 1e-12, { t });
    }
  });
});
