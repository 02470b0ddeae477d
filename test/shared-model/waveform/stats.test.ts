import { describe, expect, it } from 'vitest';
import {
  constantWaveform,
  offsetWaveform,
  periodOf,
  scaleWaveform,
  segment,
  waveformOf,
  waveformStats,
  type Waveform,
} from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

// docs/methods.md §1 check circuit: buck 12 V → 5 V, 3 A, 10 µH, 500 kHz (ideal).
const T = 2e-6;
const D = 5 / 12;
const IL = 3;
const DI = ((12 - 5) * D) / (10e-6 * 500e3); // docs/methods.md §1: ΔI = (Vin − Vo)·D/(L·fs)
const inductor = waveformOf(segment(D * T, IL - DI / 2, IL + DI / 2), segment((1 - D) * T, IL + DI / 2, IL - DI / 2));
const sw = waveformOf(segment(D * T, IL - DI / 2, IL + DI / 2), segment((1 - D) * T, 0, 0));

/** Σ over harmonics 1..n of 2·|c_k|² (the AC power of a real periodic waveform), from exact Fourier integrals. */
function harmonicPower(w: Waveform, n: number): number {
  const period = periodOf(w);
  let sum = 0;
  for (let k = 1; k <= n; k++) {
    const omega = (2 * Math.PI * k) / period;
    let re = 0;
    let im = 0;
    let t0 = 0;
    for (const s of w.segments) {
      const t1 = t0 + s.durationS;
      const slope = (s.i1A - s.i0A) / s.durationS;
      // ∫ i(t)·e^{−jωt} dt on [t0, t1] with i linear, by parts: F(t) = e^{−jωt}·(j·i(t)/ω + slope/ω²)
      const term = (t: number, i: number) => {
        const c = Math.cos(omega * t);
        const sn = -Math.sin(omega * t);
        const aRe = slope / (omega * omega);
        const aIm = i / omega;
        return [c * aRe - sn * aIm, c * aIm + sn * aRe];
      };
      const [r1, i1] = term(t1, s.i1A);
      const [r0, i0] = term(t0, s.i0A);
      re += r1 - r0;
      im += i1 - i0;
      t0 = t1;
    }
    sum += (2 * (re * re + im * im)) / (period * period);
  }
  return sum;
}

describe('waveformStats(w)', () => {
  it('reproduces the exact RMS of docs/methods.md §1 for the inductor and the switch', () => {
    const l = waveformStats(inductor);
    closeTo(l.averageA, 3, 1e-12); // docs/methods.md §1: mean inductor current = Io
    closeTo(l.rmsA, 3.004722, 0, 5e-7); // docs/methods.md §1 check, printed to 6 decimals
    closeTo(l.acRmsA, DI / (2 * Math.sqrt(3)), 1e-12); // docs/methods.md §1: triangle AC RMS ΔI/(2√3)
    closeTo(l.peakA, 3.291667, 0, 5e-7); // docs/methods.md §1 check Ipk
    const s = waveformStats(sw);
    closeTo(s.rmsA, 1.93954, 0, 5e-7); // docs/methods.md §1 check Isw,rms 1.939540
    closeTo(s.averageA, 1.25, 1e-12); // docs/methods.md §1 check Isw,avg
    closeTo(s.rmsA, Math.sqrt(D * (IL * IL + (DI * DI) / 12)), 1e-12); // docs/methods.md §1: √(d(IL² + ΔI²/12))
  });

  it('the AC RMS squared equals the summed power of the harmonics (Parseval)', () => {
    const ac = waveformStats(inductor).acRmsA ** 2;
    closeTo(harmonicPower(inductor, 2000), ac, 1e-9); // docs/methods.md §8: triangle harmonics sum to ΔI²/12 (Parseval)
    closeTo(ac, (DI * DI) / 12, 1e-12); // docs/methods.md §8
    const acSw = waveformStats(sw).acRmsA ** 2;
    closeTo(harmonicPower(sw, 200000), acSw, 2e-5); // Parseval; a waveform with jumps: tail ~1/n, cut at 2e5 harmonics
  });

  it('ignores zero-length segments and gives zeros for an empty waveform', () => {
    const withEmpty = { segments: [...inductor.segments, segment(0, 100, -100)] };
    expect(waveformStats(withEmpty)).toEqual(waveformStats(inductor)); // definition: a zero-length piece carries no charge
    expect(waveformStats({ segments: [] })).toEqual({ averageA: 0, rmsA: 0, acRmsA: 0, peakA: 0, minA: 0 }); // documented: period 0 → zeros, never NaN
  });

  it('builders shift, scale and hold constants as stated', () => {
    const shifted = waveformStats(offsetWaveform(inductor, -3));
    closeTo(shifted.averageA, 0, 0, 1e-12); // mean of (i − mean) is 0 by definition
    closeTo(shifted.rmsA, waveformStats(inductor).acRmsA, 1e-12); // RMS of i − mean is the AC RMS (definition)
    closeTo(waveformStats(scaleWaveform(sw, 0.5)).rmsA, 0.5 * waveformStats(sw).rmsA, 1e-12); // RMS is homogeneous
    const dc = waveformStats(constantWaveform(T, 2));
    closeTo(dc.rmsA, 2, 1e-15); // a constant's RMS is its value
    closeTo(dc.acRmsA, 0, 0, 1e-15); // a constant has no AC part
  });
});
