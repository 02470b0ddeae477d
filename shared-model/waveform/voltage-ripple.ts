/**
 * Output-voltage ripple of a capacitor bank from its piecewise-linear current (charge method).
 *
 * v(t) = q(t)/C + ESR · i(t), with q(t) = ∫ (i − mean) dt. On a segment i = a + s·τ:
 *   q(τ) = q0 + a·τ + s·τ²/2, stationary where i = 0;
 *   v(τ) stationary where a + s·τ + ESR·C·s = 0.
 * Evaluating both at the segment ends and at their stationary points inside the segment gives exact
 * peak-to-peak values for a piecewise-linear current:
 *   capacitiveV = pk-pk of q/C, esrV = ESR · (max i − min i), totalV = pk-pk of q/C + ESR·i (the two
 *   added in time, not summed as magnitudes and not combined as root-sum-square).
 * Assumptions: ideal capacitance (no bias or temperature derating of C), ESL ignored; the bank's current is
 * given (its share of the output node's ripple, which depends on the load kind: operating-point/load.ts). Source: C·dv/dt = i (definition of capacitance); Erickson & Maksimović 2nd ed.
 * ch. 2 (capacitor charge balance and the charge method for ripple) [memory for chapter].
 */
import type { Waveform } from '../operating-point/types.ts';

export interface VoltageRipple {
  capacitiveV: number;
  esrV: number;
  totalV: number;
}

/** Exact peak-to-peak ripple of a capacitor bank of total capacitance C and total ESR carrying `current`. */
export function capacitorVoltageRipple(current: Waveform, capacitanceF: number, esrOhm: number): VoltageRipple {
  let period = 0;
  let charge = 0;
  for (const s of current.segments) {
    if (!(s.durationS > 0)) continue;
    period += s.durationS;
    charge += 0.5 * (s.i0A + s.i1A) * s.durationS;
  }
  if (!(period > 0) || !(capacitanceF > 0)) return { capacitiveV: 0, esrV: 0, totalV: 0 };
  const mean = charge / period;
  const rc = esrOhm * capacitanceF;
  let q = 0;
  let qMax = 0;
  let qMin = 0;
  let iMax = -Infinity;
  let iMin = Infinity;
  let vMax = -Infinity;
  let vMin = Infinity;
  for (const s of current.segments) {
    const dt = s.durationS;
    if (!(dt > 0)) continue;
    const a = s.i0A - mean;
    const b = s.i1A - mean;
    const slope = (b - a) / dt;
    const v0 = q + rc * a;
    const q1 = q + 0.5 * (a + b) * dt;
    const v1 = q1 + rc * b;
    if (a > iMax) iMax = a;
    if (a < iMin) iMin = a;
    if (b > iMax) iMax = b;
    if (b < iMin) iMin = b;
    vMax = Math.max(vMax, v0, v1);
    vMin = Math.min(vMin, v0, v1);
    qMax = Math.max(qMax, q1);
    qMin = Math.min(qMin, q1);
    if (slope !== 0) {
      const tq = -a / slope;
      if (tq > 0 && tq < dt) {
        const qs = q + a * tq + 0.5 * slope * tq * tq;
        qMax = Math.max(qMax, qs);
        qMin = Math.min(qMin, qs);
      }
      const tv = -(a + rc * slope) / slope;
      if (tv > 0 && tv < dt) {
        const vs = q + a * tv + 0.5 * slope * tv * tv + rc * (a + slope * tv);
        vMax = Math.max(vMax, vs);
        vMin = Math.min(vMin, vs);
      }
    }
    q = q1;
  }
  return {
    capacitiveV: (qMax - qMin) / capacitanceF,
    esrV: esrOhm * (iMax - iMin),
    totalV: (vMax - vMin) / capacitanceF,
  };
}
