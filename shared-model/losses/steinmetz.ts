/**
 * Steinmetz and iGSE coefficients of a core material.
 *
 * Steinmetz (sine, peak flux B̂): Pv = k · f^α · B̂^β (W/m³, f in Hz, B in T).
 * iGSE coefficient: ki = k / ((2π)^(α−1) · 2^(β−α) · ∫₀^{2π}|cos θ|^α dθ), with
 * ∫₀^{2π}|cos θ|^α dθ = 2√π · Γ((α+1)/2) / Γ(α/2 + 1).
 * A datasheet point (Pv at f0 and B̂0, sine) gives k = Pv / (f0^α · B̂0^β).
 * Source: Venkatachalam, Sullivan, Abdallah & Tacca, COMPEL 2002, DOI 10.1109/CIPE.2002.1196712;
 * docs/methods.md §7 (check values ki 0.420616, ∫|cos|^α 3.529752, k 8.455149).
 */
import type { CoreLossSpec } from '../design/parts.ts';
import { gamma } from './gamma.ts';

/** ∫₀^{2π} |cos θ|^α dθ. */
export function cosPowerIntegral(alpha: number): number {
  return (2 * Math.sqrt(Math.PI) * gamma((alpha + 1) / 2)) / gamma(alpha / 2 + 1);
}

/** iGSE ki from Steinmetz k, α, β. */
export function igseKi(k: number, alpha: number, beta: number): number {
  return k / (Math.pow(2 * Math.PI, alpha - 1) * Math.pow(2, beta - alpha) * cosPowerIntegral(alpha));
}

/** Steinmetz k from one sine datasheet point. */
export function steinmetzKFromPoint(lossWPerM3: number, atHz: number, atPeakT: number, alpha: number, beta: number): number {
  return lossWPerM3 / (Math.pow(atHz, alpha) * Math.pow(atPeakT, beta));
}

/** k, α, β and ki of a design's core-loss record. */
export function coreCoefficients(spec: CoreLossSpec): { k: number; alpha: number; beta: number; ki: number } {
  const k =
    spec.kind === 'steinmetz'
      ? spec.k
      : steinmetzKFromPoint(spec.lossWPerM3, spec.atHz, spec.atPeakT, spec.alpha, spec.beta);
  const ki = igseKi(k, spec.alpha, spec.beta);
  return { k, alpha: spec.alpha, beta: spec.beta, ki: Number.isFinite(ki) && ki > 0 ? ki : 0 };
}
