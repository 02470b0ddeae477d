/**
 * The textbook hand sizing of a boost or buck from an ASSUMED efficiency — the method a lecture works by
 * hand — kept so a sizing from solved points can be compared with it (size command, tests).
 *
 * Boost: D = 1 − η·Vin/Vo; IL = Io/(1 − D); ΔI = r·IL; L = Vin·D/(ΔI·fs); Ipk = IL + ΔI/2;
 *   Cout = Io·D/(fs·ΔV); ESRmax = ΔV/Ipk; fRHPZ = (1 − D)²·R/(2π·L); fp = 2/(2π·R·C);
 *   Isw,rms = √(D·(IL² + ΔI²/12)); slope needed when D > 0.5, m_a ≥ (Vo − Vin)/(2L).
 * Buck: D = Vo/(η·Vin); IL = Io; ΔI = r·Io; L = (Vin − Vo)·D/(ΔI·fs); Ipk = IL + ΔI/2;
 *   Cout = ΔI/(8·fs·ΔV); ESRmax = ΔV/ΔI; fp = 1/(2π·R·C); m_a ≥ Vo/(2L).
 * Crossover: min(fs/10, fRHPZ/5) (common practice). Sense loss Isw,rms²·Rs.
 * Source: Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2 (ripple, capacitor
 * charge), ch. 8 (RHP zero), from memory for chapters; Ridley 1991 (slope); docs/methods.md §1, §13, §17, §23.
 * Both read the topology record (ideal duty, the intervals' flags, on-interval voltage, RHP zero, output
 * pole factor), so a new topology needs no case here.
 */
import type { Design } from '../design/schema.ts';
import { TOPOLOGIES } from '../topology/registry.ts';

export interface HandInput {
  kind: Design['topology']['kind'];
  vinV: number;
  voutV: number;
  loadA: number;
  switchingFrequencyHz: number;
  /** Assumed efficiency (0, 1]. */
  efficiency: number;
  rippleRatio: number;
  outputRippleV: number;
  /** Sense resistor in the switch path, Ω (0: none). */
  senseOhm: number;
}

export interface HandSizing {
  dutyCycle: number;
  inductorA: number;
  rippleA: number;
  inductanceH: number;
  peakA: number;
  outputCapacitanceF: number;
  maxEsrOhm: number;
  /** Boost only (0 for a buck). */
  rhpZeroHz: number;
  outputPoleHz: number;
  crossoverHz: number;
  slopeNeeded: boolean;
  minSlopeAPerS: number;
  switchRmsA: number;
  senseLossW: number;
}

export function handSizing(h: HandInput): HandSizing {
  const t = TOPOLOGIES[h.kind];
  const { on, off } = t.intervals;
  const fs = h.switchingFrequencyHz;
  const r = h.voutV / h.loadA;
  // The ideal duty with the input scaled by η (boost 1 − η·Vin/Vo, buck Vo/(η·Vin)).
  const d = t.idealDuty(h.efficiency * h.vinV, h.voutV);
  // Charge balance: the load current is the inductor current over the intervals that deliver to the output.
  const delivering = (on.toOutput ? d : 0) + (off.toOutput ? 1 - d : 0);
  const il = h.loadA / delivering;
  const ripple = h.rippleRatio * il;
  const onV = t.idealOnVoltsV(h.vinV, h.voutV);
  const l = (onV * d) / (ripple * fs);
  const peak = il + ripple / 2;
  // Output fed in both intervals: the bank takes the triangular ripple (ΔI/(8·fs·ΔV)); fed only while the
  // rectifier conducts: the bank alone carries the load for the rest of the period (Io·D/(fs·ΔV)).
  const continuous = on.toOutput && off.toOutput;
  const c = continuous ? ripple / (8 * fs * h.outputRippleV) : (h.loadA * (1 - delivering)) / (fs * h.outputRippleV);
  const maxEsr = h.outputRippleV / (continuous ? ripple : peak);
  const rhp = t.smallSignal(d, r, l, c, 1 / r)?.rhpZeroHz ?? 0;
  const pole = t.outputPoleFactor / (2 * Math.PI * r * c);
  const crossover = rhp > 0 ? Math.min(fs / 10, rhp / 5) : fs / 10;
  // Falling slope: the off interval's ideal inductor voltage (boost Vo − Vin, buck Vo) over L.
  const downSlope = Math.abs((off.fromInput ? h.vinV : 0) - h.voutV) / l;
  const swRms = Math.sqrt(d * (il * il + (ripple * ripple) / 12));
  return {
    dutyCycle: d,
    inductorA: il,
    rippleA: ripple,
    inductanceH: l,
    peakA: peak,
    outputCapacitanceF: c,
    maxEsrOhm: maxEsr,
    rhpZeroHz: rhp,
    outputPoleHz: pole,
    crossoverHz: crossover,
    slopeNeeded: d > 0.5,
    minSlopeAPerS: downSlope / 2,
    switchRmsA: swRms,
    senseLossW: swRms * swRms * h.senseOhm,
  };
}
