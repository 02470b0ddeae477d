import { describe, it } from 'vitest';
import { capacitorVoltageRipple, segment, waveformOf, type Waveform } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

/** Brute force: sample q(t)/C + ESR·i(t) densely (trapezoid charge) and take peak to peak. */
function sampledRipple(w: Waveform, c: number, esr: number, perSegment: number) {
  let mean = 0;
  let period = 0;
  for (const s of w.segments) {
    mean += ((s.i0A + s.i1A) / 2) * s.durationS;
    period += s.durationS;
  }
  mean /= period;
  let q = 0;
  const v: number[] = [];
  const vc: number[] = [];
  for (const s of w.segments) {
    const h = s.durationS / perSegment;
    for (let k = 0; k <= perSegment; k++) {
      const i = s.i0A + ((s.i1A - s.i0A) * k) / perSegment - mean;
      if (k > 0) {
        const prev = s.i0A + ((s.i1A - s.i0A) * (k - 1)) / perSegment - mean;
        q += ((prev + i) / 2) * h;
      }
      v.push(q / c + esr * i);
      vc.push(q / c);
    }
  }
  return { total: Math.max(...v) - Math.min(...v), capacitive: Math.max(...vc) - Math.min(...vc) };
}

describe('capacitorVoltageRipple(current, C, ESR)', () => {
  const T = 2e-6;
  const D = 5 / 12;
  const DI = ((12 - 5) * D) / (10e-6 * 500e3); // docs/methods.md §1 ΔI
  const triangle = waveformOf(segment(D * T, -DI / 2, DI / 2), segment((1 - D) * T, DI / 2, -DI / 2));

  it('a triangle ripple current gives ΔV = ΔI·T/(8C) and ESR·ΔI', () => {
    const r = capacitorVoltageRipple(triangle, 22e-6, 0.01);
    closeTo(r.capacitiveV, (DI * T) / (8 * 22e-6), 1e-12); // Erickson & Maksimović 2nd ed. ch. 2, buck output ripple ΔI/(8·fs·C) [memory for chapter]
    closeTo(r.esrV, 0.01 * DI, 1e-12); // Ohm's law on the current swing
  });

  it('the combined ripple is the exact peak to peak of the sum in time (matches dense sampling)', () => {
    for (const esr of [0, 0.002, 0.01, 0.05]) {
      const r = capacitorVoltageRipple(triangle, 22e-6, esr);
      const s = sampledRipple(triangle, 22e-6, esr, 20000);
      closeTo(r.totalV, s.total, 1e-6, 0, { esr }); // independent computation: sampled trapezoid integration
      closeTo(r.capacitiveV, s.capacitive, 1e-6, 0, { esr }); // same independent sampling
    }
    // Boost-like pulse current with jumps: −Io while the switch is on, (Ipk → Iv) − Io while the rectifier
    // conducts; D 0.6, Io 1 A, rectifier mean Io/D' = 2.5 A as 3.5 → 1.5 A (never below Io).
    const pulse = waveformOf(segment(0.6 * T, -1, -1), segment(0.4 * T, 3.5 - 1, 1.5 - 1));
    const r = capacitorVoltageRipple(pulse, 10e-6, 0.02);
    const s = sampledRipple(pulse, 10e-6, 0.02, 20000);
    closeTo(r.totalV, s.total, 1e-6); // independent computation: sampled trapezoid integration
    closeTo(r.capacitiveV, 1 * 0.6 * T / 10e-6, 1e-12); // charge drawn by a constant Io for D·T: ΔV = Io·D·T/C (charge method)
  });
});
