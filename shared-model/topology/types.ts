/**
 * What a converter topology is, as one record: everything the engine needs to know about the circuit's
 * arrangement, so that the operating point, the loss ledger, the checks and the report read the record
 * instead of asking "which topology is this?".
 *
 * Every topology here has one inductor, one control switch and one rectifier, and two conduction
 * intervals per period (plus an idle interval in DCM):
 *   on  (control switch conducts, D·T)    and   off (rectifier conducts, D'·T or D2·T).
 * For each interval the record says which part carries the inductor current, whether that current is
 * drawn from the input node and whether it is delivered to the output node. From these the engine
 * derives, with no further case analysis (operating-point/shape.ts, branch-table.ts, lean-point.ts):
 *   - the inductor voltage of the interval (the volt-second equation with its drops):
 *       vL = [from input] · Vin' − [to output] · (Vo' − ESR·Io) − [rectifier] · VF0 − R_interval · ī
 *     where R_interval holds the conducting part, DCR, an inductor or switch sense resistor and, when the
 *     interval delivers to the output, the output bank's ESR;
 *   - the mean inductor current from charge balance: Io = IL · Σ(delivering intervals' fractions);
 *   - the mean input current: Iin = IL · Σ(drawing intervals' fractions);
 *   - the input and output capacitor currents: [from input]·iL − Iin and [to output]·iL − Io;
 *   - the DCM relations (the same two balances with the triangular current).
 * Voltages a part blocks are linear in the input and output voltages: `VoltageCoefficients`.
 * Source: Erickson & Maksimović 2nd ed. ch. 2–3 and 5 (volt-second and charge balance, DCM) [memory for
 * chapters]; docs/methods.md §1–3, §13.
 */
import type { Design } from '../design/schema.ts';

/** Which part carries the inductor current in a conduction interval. */
export type IntervalPart = 'switch' | 'rectifier';

/** One conduction interval of the period. */
export interface ConductionInterval {
  /** The part that carries the inductor current. */
  part: IntervalPart;
  /** The inductor current is drawn from the input node (through the input capacitor / source). */
  fromInput: boolean;
  /** The inductor current is delivered to the output node (output capacitor and load). */
  toOutput: boolean;
  /** The inductor slope in words (ideal circuit), for the report and a reader. */
  slope: string;
}

/** A voltage a · Vin + b · Vout (plus a rectifier drop where stated). */
export interface VoltageCoefficients {
  input: number;
  output: number;
}

/** Small-signal figures of a CCM point (Hz); absent where the topology has none of note. */
export interface SmallSignalFigures {
  rhpZeroHz: number;
  outputPoleHz: number;
}

export interface ConverterTopology {
  /** The design document's `topology.kind`. */
  kind: Design['topology']['kind'];
  /** Name for the report and messages, e.g. "buck (step-down)". */
  title: string;
  /** Direction of the ideal conversion: a buck steps down, a boost steps up. */
  steps: 'down' | 'up';
  /** Ideal (lossless CCM) conversion ratio Vout/Vin at duty d. */
  idealRatio(d: number): number;
  /** Ideal (lossless CCM) duty for vinV → voutV (may fall outside 0…1 where the topology cannot). */
  idealDuty(vinV: number, voutV: number): number;
  /** Ideal CCM inductor voltage while the switch is on, V (for the ripple ΔI = V·D·T/L). */
  idealOnVoltsV(vinV: number, voutV: number): number;
  /**
   * The two conduction intervals. Every topology of this kind (one inductor, a control switch and a
   * rectifier: buck, boost, inverting buck-boost) draws from the input while the switch conducts and
   * delivers to the output while the rectifier conducts; the other two flags tell them apart.
   */
  intervals: {
    on: ConductionInterval & { part: 'switch'; fromInput: true };
    off: ConductionInterval & { part: 'rectifier'; toOutput: true };
  };
  /** Voltage the control switch blocks when off (plus the rectifier's forward drop). */
  switchBlocks: VoltageCoefficients;
  /** Voltage the rectifier blocks while the switch conducts. */
  rectifierBlocks: VoltageCoefficients;
  /** Voltage the rectifier blocks in the DCM idle interval (the switch node rests at its idle value). */
  rectifierIdleBlocks: VoltageCoefficients;
  /** The switch node's resting voltage in the DCM idle interval, in words. */
  idleNode: string;
  /**
   * What the source pays directly: the switch-node charge pulses (Coss, rectifier junction capacitance,
   * reverse recovery) flow from the input through the switch and bypass the inductor, so they do not take
   * volt-seconds (true for a buck); false where they are drawn from the output and move the duty.
   */
  chargePulsesFromSource: boolean;
  /**
   * Small-signal figures of a CCM point at duty d, load resistance R = Vo/Io, inductance, output capacitance
   * and the load's incremental conductance g (operating-point/load.ts: 1/R resistive, 0 constant current,
   * −1/R constant power).
   */
  smallSignal(d: number, loadOhm: number, inductanceH: number, capacitanceF: number, loadConductanceS: number): SmallSignalFigures | undefined;
  /** The small-signal formulas in words and their source (report). */
  smallSignalMethod: string;
  /**
   * Current-mode output pole of the sizing with a resistive load: fp = outputPoleFactor/(2π·R·C) — 1 where
   * the power stage feeds the output like a current source (buck), 2 where it feeds about constant power
   * (boost: its own output conductance 1/R beside the load's). docs/methods.md §13.
   */
  outputPoleFactor: number;
  /** What the sizing (sizing/, design-checks/) says of this topology in words: formulas and why a corner is worst. */
  sizingWords: TopologySizingWords;
}

/** A formula in plain text and why the worst corner is where it is (`{corner}` names it). */
export interface WordedFormula {
  formula: string;
  reason: string;
}

/** The sizing's sentences that depend on the topology (sizing/*.ts fill in the solved numbers). */
export interface TopologySizingWords {
  /** The mean inductor current and where it is largest. */
  inductorCurrent: WordedFormula;
  /** Why the inductor volt-seconds are largest where they are. */
  inductorVoltSecondsReason: string;
  /** The input voltage inside the range where the ripple volt-seconds peak, if not at an end of it. */
  largestRippleVinV(voutV: number): number | undefined;
  /** Why the switch and rectifier blocking voltages are largest where they are. */
  blockingReason: string;
  /** Why the switch and rectifier peak currents are largest where they are. */
  currentReason: string;
  /** Why the switch RMS current is largest where it is. */
  switchRmsReason: string;
  /** Why the rectifier's mean current is largest where it is. */
  rectifierMeanReason: string;
  /** The output bank's charge per period above its mean current. */
  outputCharge: WordedFormula;
  /** The output bank's current swing (for the ESR limit). */
  outputCurrentSwing: WordedFormula;
  /** The inductor current's falling slope (slope compensation). */
  downSlope: WordedFormula;
  /** The current-mode output pole's formula. */
  outputPoleFormula: string;
}
