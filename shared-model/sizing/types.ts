/**
 * Records of the sizing room: what the specification asks of each part, computed from solved operating
 * points at the corners of the input-voltage range (rated load), each result naming the corner that
 * drives it and why. SI units throughout (V, A, Ω, H, F, Hz, s, W, C); temperatures °C.
 */
import type { Design } from '../design/schema.ts';
import type { ConductionMode } from '../operating-point/types.ts';

/** Where a sizing result was found: a corner of Vin at rated load. */
export type CornerId = 'vin-min' | 'vin-nom' | 'vin-max' | 'vin-ripple';

/** One solved corner: the full electro-thermal evaluation of the design at (vinV, rated load). */
export interface SizingCorner {
  id: CornerId;
  /** Plain description, e.g. "Vin min 3 V, rated load 1 A". */
  label: string;
  vinV: number;
  loadA: number;
  /** Solved duty (power balance with the design's losses, not an assumed efficiency). */
  dutyCycle: number;
  efficiency: number;
  regulated: boolean;
  converged: boolean;
  mode: ConductionMode;
}

/** One sized quantity: its value, unit, the corner that drives it, why that corner, and its source. */
export interface SizedValue {
  value: number;
  unit: string;
  corner: CornerId;
  /** Why this corner drives the result (plain sentence). */
  reason: string;
  /** The formula in plain text. */
  formula: string;
  /** Published source or docs/methods.md section. */
  source: string;
}

export interface InductorSizing {
  /** Ripple target as a fraction of the rated inductor current (spec.targets.inductorRippleRatio, default 0.3). */
  targetRippleRatio: number;
  /** Largest mean inductor current over the corners at rated load. */
  ratedCurrentA: SizedValue;
  /** Target ripple, peak to peak: ratio × rated current. */
  targetRippleA: number;
  /** Smallest inductance that keeps the ripple within the target at every corner. */
  requiredInductanceH: SizedValue;
  /** The design's inductance (at its operating current when it rolls off). */
  chosenInductanceH: number;
  /** Ripple ratio the design's inductor gives at its worst corner. */
  chosenRippleRatio: SizedValue;
  /** Peak current with the required inductance; the saturation current the inductor needs (hot). */
  requiredIsatA: SizedValue;
  /** RMS current with the required inductance; the RMS rating the inductor needs. */
  requiredRmsA: SizedValue;
  /** Peak current with the design's inductor. */
  chosenPeakA: SizedValue;
}

export interface OutputCapacitorSizing {
  /** spec.targets.outputRippleV; absent when the specification gives none. */
  targetRippleV?: number;
  /** Largest charge the bank gives up per period (area of the capacitor current above its mean). */
  chargeC: SizedValue;
  /** Largest peak-to-peak swing of the capacitor current (what the ESR turns into ripple). */
  currentSwingA: SizedValue;
  /** Capacitance for the whole target with zero ESR (the capacitive part alone). */
  minCapacitanceF?: SizedValue;
  /** Largest ESR for the whole target with unlimited capacitance (the ESR part alone). */
  maxEsrOhm?: SizedValue;
  /** The design's bank: total capacitance and total ESR (parallel parts). */
  bank: { capacitanceF: number; esrOhm: number };
  /** Capacitance needed with the bank's ESR (capacitive and ESR parts added as magnitudes). */
  capacitanceWithBankEsrF?: SizedValue;
  /** Largest ESR that still meets the target with the bank's capacitance. */
  maxEsrWithBankCapacitanceOhm?: SizedValue;
  /** ESL is not in the part data; its part of the ripple is not sized (a sentence saying so). */
  eslNote: string;
  /** RMS current of the bank. */
  rmsA: SizedValue;
}

export interface StressSizing {
  /** Voltage derating used (design margins.voltageDerating) and current derating (setting). */
  voltageDerating: number;
  currentDerating: number;
  switchV: SizedValue;
  switchPeakA: SizedValue;
  switchRmsA: SizedValue;
  rectifierV: SizedValue;
  rectifierPeakA: SizedValue;
  rectifierAverageA: SizedValue;
  /** Ratings the parts need: stress / derating. */
  required: { switchVdsV: number; switchIdA: number; rectifierVoltageV: number; rectifierCurrentA: number };
}

export interface DutySizing {
  min: SizedValue;
  max: SizedValue;
  /** The controller's limit (spec.maxDuty). */
  limit: number;
  /** True when some corner needs more than the limit (the corner does not regulate). */
  limitReached: boolean;
}

export interface SlopeSizing {
  /** Duty above 0.5 at the worst corner: a peak-current-mode loop needs a compensating ramp. */
  needed: boolean;
  /** Inductor current down-slope m2 at the worst corner, A/s. */
  downSlopeAPerS: SizedValue;
  /** Minimum compensating slope m_a = m2 / 2, A/s of inductor current. */
  minSlopeAPerS: number;
  /** Sense resistance the current is measured with (switch or inductor location), Ω; absent if none. */
  senseOhm?: number;
  /** Minimum slope referred to the sense signal, V/s (m2/2 · Ri). */
  minSlopeVPerS?: number;
  /** Sense-signal amplitude at the end of the on time with the minimum ramp: Ri·Ipk + (m2/2)·Ri·D·Ts. */
  senseSignalPeakV?: SizedValue;
  /** Dissipation of the sense resistor (from the ledger) at its worst corner. */
  senseLossW?: SizedValue;
}

export interface CrossoverLimit {
  id: 'switching' | 'rhp-zero';
  hz: number;
  reason: string;
  source: string;
}

export interface LoopSizing {
  /** Boost: right-half-plane zero at its lowest corner. */
  rhpZeroHz?: SizedValue;
  /** Current-mode output pole (boost 2/(2πRC), buck 1/(2πRC)) at rated load. */
  outputPoleHz: SizedValue;
  /** ESR zero of the bank, 1/(2π·ESR·C). */
  esrZeroHz: number;
  /** Buck: LC double pole 1/(2π√(LC)). */
  lcDoublePoleHz?: number;
  /** Every upper limit on the crossover, the binding one first. */
  limits: CrossoverLimit[];
  /** Recommended crossover: the lowest limit. */
  crossoverHz: number;
  /** Why, in one sentence (names the binding limit and the ESR zero's position). */
  crossoverReason: string;
}

export interface Sizing {
  topology: Design['topology']['kind'];
  corners: SizingCorner[];
  duty: DutySizing;
  inductor: InductorSizing;
  outputCapacitor: OutputCapacitorSizing;
  inputCapacitorRmsA: SizedValue;
  stresses: StressSizing;
  slope: SlopeSizing;
  loop: LoopSizing;
  /** Plain sentences: DCM corners, unconverged corners, what is not modelled. */
  notes: string[];
}
