/**
 * How far the inductor current bends away from straight lines within a switching interval.
 *
 * The engine draws every branch current as straight-line segments. In the circuit, an interval applies
 * vL = E − R·i, so the current relaxes exponentially with time constant L/R and its slope changes by a
 * fraction R·t/L of itself over an interval of length t (R: the interval's loop resistance, output-bank ESR
 * included where the inductor feeds the output node, times its ripple share k; load.ts). The sag of
 * the exponential below its chord is about (R·t/L)·Δi/8. Measured against the time-domain reference,
 * the curvature index
 *   η = (R_on·t_on + R_off·t_off)/L · ΔI / I_L,rms   (I_L,rms over the time the inductor conducts)
 * bounds the worst branch discrepancy (mean, RMS, conduction loss, input current): it stays below
 * 0.5 % for η < CURVATURE_WARN and below about 0.2·η beyond it (216 seeded buck/boost designs in CCM, DCM
 * and forced-PWM reverse current, λ up to 0.9; test/shared-model/operating-point/edges.test.ts).
 * Past CURVATURE_WARN the point carries a model-limit warning with that estimate.
 * Source: first-order RL circuit response (any circuits text, e.g. Erickson & Maksimović 2nd ed. ch. 2,
 * the small-ripple approximation and its limit) [memory]; the threshold is our own, measured.
 */
import type { Warning } from '../warnings.ts';
import { inductanceAt, type Circuit } from './circuit.ts';

/** Curvature index above which the straight-line currents may be off by more than 0.5 % (see header). */
export const CURVATURE_WARN = 0.025;
/** Measured ratio of the worst branch discrepancy to η beyond CURVATURE_WARN (see header). */
export const CURVATURE_ERROR_PER_ETA = 0.2;

/** The fields of an operating point the index reads. */
export interface CurvedPoint {
  dutyCycle: number;
  idleFraction: number;
  inductor: { averageA: number; rmsA: number; peakA: number; valleyA: number };
}

/** η of the header (0 where the inductor carries no current). */
export function curvatureIndex(c: Circuit, op: CurvedPoint): number {
  // The RMS over the time the inductor conducts: relative errors do not depend on an idle interval.
  const conducting = Math.max(1 - op.idleFraction, 1e-12);
  const rms = op.inductor.rmsA / Math.sqrt(conducting);
  const ripple = op.inductor.peakA - op.inductor.valleyA;
  if (!(rms > 0) || !(ripple > 0)) return 0;
  const esr = c.esrOhm * Math.abs(c.capacitorShare);
  const rOn = c.rOnOhm + (c.onToOutput ? esr : 0);
  const rOff = c.rOffOhm + esr;
  const tOn = op.dutyCycle * c.periodS;
  const tOff = Math.max(1 - op.dutyCycle - op.idleFraction, 0) * c.periodS;
  const l = inductanceAt(c, op.inductor.averageA);
  const eta = ((rOn * tOn + rOff * tOff) / l) * (ripple / rms);
  return Number.isFinite(eta) ? eta : 0;
}

const f2 = (x: number) => Number(x.toPrecision(2)).toString();

/** Appends the curvature warning (see header) to `out` when η ≥ CURVATURE_WARN. */
export function curvatureWarnings(c: Circuit, op: CurvedPoint, out: Warning[]): void {
  const eta = curvatureIndex(c, op);
  if (!(eta >= CURVATURE_WARN)) return;
  out.push({ code: 'model-limit', severity: 'caution', path: 'parts.inductor.inductanceH',
    message: `The inductor current bends within each switching interval (the loop resistances change its slope by a curvature index of ${f2(eta)}; the model assumes under ${CURVATURE_WARN}): the straight-line currents, conduction losses and input current may be off by about ${f2(100 * CURVATURE_ERROR_PER_ETA * eta)} %.` });
}
