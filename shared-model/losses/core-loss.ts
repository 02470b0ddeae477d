/**
 * Inductor core loss by the improved generalised Steinmetz equation (iGSE) on the actual flux waveform.
 *
 * Formula: Pv = (1/T) · Σ_segments ki · |ΔB_s/t_s|^α · ΔB^(β−α) · t_s, P = Pv · Ve, for a piecewise-linear
 * flux B(t) = (L/(N·Ae)) · iL(t) whose straight segments last t_s and change by ΔB_s; ΔB is the
 * peak-to-peak flux of the period (one major loop). Flat segments (the DCM idle interval) add nothing.
 * For a CCM triangle rising for D·T this reduces to Pv = ki · ΔB^β · f^α · (D^(1−α) + D'^(1−α)).
 * With a core-loss-vs-temperature curve: P = P(iGSE) · factor(T), T the inductor temperature (the factor
 * scales the Steinmetz k; ferrite loss has a minimum near 80–100 °C, common practice).
 * Assumptions: Steinmetz exponents at one temperature, k scaled by the curve's factor; no relaxation loss
 * after the DCM idle interval (i²GSE not modelled); no DC-bias dependence; L at the operating current.
 * Source: Venkatachalam et al., COMPEL 2002 (DOI 10.1109/CIPE.2002.1196712); docs/methods.md §7.
 */
import type { Segment } from '../operating-point/types.ts';
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface CoreLossInputs {
  kiWPerM3: number;
  alpha: number;
  beta: number;
  veM3: number;
  /** Flux density per ampere of inductor current, L/(N·Ae), T/A. */
  fluxPerAmpT: number;
  /** One period of the inductor current. */
  segments: readonly Segment[];
  /** Core loss at the inductor temperature over the Steinmetz loss (1 without a curve). */
  temperatureFactor: number;
  temperatureC: number;
}

/** Peak-to-peak flux density of the waveform, T. */
export function fluxSwingT(fluxPerAmpT: number, segments: readonly Segment[]): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of segments) {
    if (s.i0A < lo) lo = s.i0A;
    if (s.i1A < lo) lo = s.i1A;
    if (s.i0A > hi) hi = s.i0A;
    if (s.i1A > hi) hi = s.i1A;
  }
  return hi > lo ? Math.abs(fluxPerAmpT) * (hi - lo) : 0;
}

/** iGSE loss density, W/m³, of a piecewise-linear flux waveform. */
export function igseLossDensity(ki: number, alpha: number, beta: number, fluxPerAmpT: number, segments: readonly Segment[]): number {
  const swing = fluxSwingT(fluxPerAmpT, segments);
  if (!(swing > 0)) return 0;
  let period = 0;
  let sum = 0;
  const scale = Math.abs(fluxPerAmpT);
  for (const s of segments) {
    const t = s.durationS;
    if (!(t > 0)) continue;
    period += t;
    const db = scale * Math.abs(s.i1A - s.i0A);
    if (db > 0) sum += t * Math.pow(db / t, alpha);
  }
  if (!(period > 0)) return 0;
  return nonNegativeFinite((ki * Math.pow(swing, beta - alpha) * sum) / period);
}

/** Fraction of the period the flux rises (for the record). */
function risingFraction(segments: readonly Segment[]): number {
  let up = 0;
  let total = 0;
  for (const s of segments) {
    if (!(s.durationS > 0)) continue;
    total += s.durationS;
    if (s.i1A > s.i0A) up += s.durationS;
  }
  return total > 0 ? up / total : 0;
}

function periodOf(segments: readonly Segment[]): number {
  let t = 0;
  for (const s of segments) if (s.durationS > 0) t += s.durationS;
  return t;
}

export const coreLoss: LossModel<CoreLossInputs> = {
  mechanism: 'core',
  heats: 'own',
  payer: 'source',
  thermal: true,
  drop: false,
  formula: 'factor(T) · Ve · (1/T) · Σ ki · |ΔBs/ts|^α · ΔB^(β−α) · ts  (iGSE)',
  watts: (x) => nonNegativeFinite(x.temperatureFactor * x.veM3 * igseLossDensity(x.kiWPerM3, x.alpha, x.beta, x.fluxPerAmpT, x.segments)),
  // ∂P/∂factor: the loss at the Steinmetz coefficients (ledger/kernel-slopes.ts multiplies by dfactor/dT).
  sensitivity: (x) => nonNegativeFinite(x.veM3 * igseLossDensity(x.kiWPerM3, x.alpha, x.beta, x.fluxPerAmpT, x.segments)),
  describe: (x) => {
    const period = periodOf(x.segments);
    return [
      input('ΔB (peak to peak)', fluxSwingT(x.fluxPerAmpT, x.segments), 'T'),
      input('f', period > 0 ? 1 / period : 0, 'Hz'),
      input('rising fraction', risingFraction(x.segments), ''),
      input('ki', x.kiWPerM3, 'W·s^α/(m³·T^β)'),
      input('α', x.alpha, ''),
      input('β', x.beta, ''),
      input('Pv', igseLossDensity(x.kiWPerM3, x.alpha, x.beta, x.fluxPerAmpT, x.segments), 'W/m³'),
      input('Ve', x.veM3, 'm³'),
      input('factor(T)', x.temperatureFactor, ''),
      input('T', x.temperatureC, '°C'),
    ];
  },
};
