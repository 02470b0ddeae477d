/**
 * Records produced by the operating-point solver. Currents are piecewise-linear over one period.
 */
import type { Amps, Fraction, Hertz, Seconds, Volts } from '../units/quantities.ts';
import type { Warning } from '../warnings.ts';

/** A straight-line piece of a current waveform: from i0A to i1A over durationS. */
export interface Segment {
  durationS: Seconds;
  i0A: Amps;
  i1A: Amps;
}

/** A periodic current made of straight-line segments whose durations add up to one period. */
export interface Waveform {
  segments: Segment[];
}

/** Mean, RMS and extremes of a waveform, computed exactly from its segments. */
export interface CurrentStats {
  averageA: Amps;
  rmsA: Amps;
  /** RMS of the waveform minus its mean. */
  acRmsA: Amps;
  peakA: Amps;
  minA: Amps;
}

export type ConductionMode = 'CCM' | 'DCM';

/** The conditions one evaluation is made at (defaults: nominal Vin, rated load, spec fs and ambient). */
export interface Conditions {
  vinV: Volts;
  loadA: Amps;
  switchingFrequencyHz: Hertz;
  ambientC: number;
}

/** A switching edge of the control switch as the loss models see it. */
export interface SwitchingEdge {
  /** Current in the switch at the edge (turn-on: valley; turn-off: peak). Negative means reverse. */
  currentA: Amps;
  /** Voltage the switch blocks after turn-off / before turn-on. */
  voltageV: Volts;
  /** True when the edge is hard-switched (overlap loss applies). */
  hard: boolean;
}

/** Resistive drops and temperatures the waveforms were built with (the electro-thermal loop sets these). */
export interface ConductionParameters {
  switchOnOhm: number;
  /** Synchronous rectifier on-resistance (ignored for a diode). */
  rectifierOnOhm: number;
  /** Diode forward model (ignored for a synchronous rectifier). */
  diodeVf0V: Volts;
  diodeRdOhm: number;
  inductorDcrOhm: number;
  senseOhm: number;
  /** Total ESR of the output capacitor bank (all parallel parts); default: the design's ESR / count. */
  outputCapacitorEsrOhm?: number;
}

/** Part temperatures the conduction parameters are evaluated at, °C (see conductionParameters). */
export interface PartTemps {
  switchC: number;
  rectifierC: number;
  inductorC: number;
  senseC: number;
}

/** Options of solveOperatingPoint: the seam where the loss ledger makes duty and power self-consistent. */
export interface SolveOptions {
  /**
   * Total loss (W) of the power stage at a trial operating point. When given, the duty cycle is solved so
   * that Vin · inputA = Pout + lossOf(op) instead of by volt-second balance.
   */
  lossOf?: (op: OperatingPoint) => number;
  /**
   * Optional: losses paid by the source outside the inductor path (charge pulses of output capacitance and
   * reverse recovery, gate drive from Vin, controller quiescent current). They add to inputA but do not
   * move the duty cycle; lossOf must then leave them out. Called once on the final point.
   */
  sourceLossOf?: (op: OperatingPoint) => number;
}

export interface OperatingPoint {
  conditions: Conditions;
  periodS: Seconds;
  /** Output voltage reached: the specified Vout when regulated, else the highest the limits allow. */
  voutV: Volts;
  /** The specified output voltage (design spec.voutV). */
  targetVoutV: Volts;
  /** False when the duty limit or the conversion-ratio limit keeps Vout from its target (see warnings). */
  regulated: boolean;
  /** How the duty cycle was found: volt-second balance with drops, or the power balance with lossOf. */
  dutyMethod: 'volt-second' | 'power-balance';
  outputPowerW: number;
  /** Control-switch duty cycle (on time / period). */
  dutyCycle: Fraction;
  /** Fraction of the period the rectifier conducts (D' in CCM, D2 in DCM). */
  rectifierFraction: Fraction;
  /** Fraction of the period with zero inductor current (DCM only; 0 in CCM). */
  idleFraction: Fraction;
  mode: ConductionMode;
  inductanceH: number;
  inductor: CurrentStats & { rippleA: Amps; valleyA: Amps };
  /** Time origin: the control switch turns on at t = 0; segments follow on, rectifier, idle (DCM). */
  waveforms: {
    inductor: Waveform;
    switch: Waveform;
    rectifier: Waveform;
    inputCapacitor: Waveform;
    outputCapacitor: Waveform;
    /** Current in the sense resistor (all zeros when there is none). */
    sense: Waveform;
    /** Average current drawn from the source (DC, after the input capacitor), incl. sourceLossOf / Vin. */
    inputA: Amps;
  };
  stats: {
    switch: CurrentStats;
    rectifier: CurrentStats;
    inputCapacitor: CurrentStats;
    outputCapacitor: CurrentStats;
    sense: CurrentStats;
  };
  edges: { turnOn: SwitchingEdge; turnOff: SwitchingEdge };
  /** Voltage stress on each semiconductor when it blocks (switch drain-source, rectifier reverse). */
  stress: { switchV: Volts; rectifierV: Volts };
  /**
   * Output-voltage ripple, peak to peak: capacitive (charge method), ESR (ESR · current swing) and the
   * exact peak to peak of their sum in time (not a sum of magnitudes, not root-sum-square). ESL ignored.
   */
  outputRipple: { capacitiveV: Volts; esrV: Volts; totalV: Volts };
  /** Boost only: right-half-plane zero and current-mode output pole. */
  smallSignal?: { rhpZeroHz: Hertz; outputPoleHz: Hertz };
  // (At a point that does not regulate, smallSignal uses the design's load line, R = target Vout / Io.)
  warnings: Warning[];
}
