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
 */
export interface HandInput {
  kind: 'buck' | 'boost';
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
  const boost = h.kind === 'boost';
  const fs = h.switchingFrequencyHz;
  const r = h.voutV / h.loadA;
  const d = boost ? 1 - (h.efficiency * h.vinV) / h.voutV : h.voutV / (h.efficiency * h.vinV);
  const il = boost ? h.loadA / (1 - d) : h.loadA;
  const ripple = h.rippleRatio * il;
  const onV = boost ? h.vinV : h.vinV - h.voutV;
  const l = (onV * d) / (ripple * fs);
  const peak = il + ripple / 2;
  const c = boost ? (h.loadA * d) / (fs * h.outputRippleV) : ripple / (8 * fs * h.outputRippleV);
  const maxEsr = h.outputRippleV / (boost ? peak : ripple);
  const rhp = boost ? ((1 - d) ** 2 * r) / (2 * Math.PI * l) : 0;
  const pole = (boost ? 2 : 1) / (2 * Math.PI * r * c);
  const crossover = boost ? Math.min(fs / 10, rhp / 5) : fs / 10;
  const downSlope = boost ? (h.voutV - h.vinV) / l : h.voutV / l;
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
