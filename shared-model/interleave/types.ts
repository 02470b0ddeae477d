/**
 * Records of an interleaved (multiphase) evaluation: N power stages switched 360°/N apart that share the
 * input and output capacitor banks, the controller and the heatsinks. Units as in ledger/types.ts.
 */
import type { Role } from '../design/schema.ts';
import type { Evaluation, Hazard, LossTerm, PartTemperature, RatingCheck } from '../ledger/types.ts';
import type { Conditions, Waveform } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';

/** Which power stage a row belongs to: 1 … N, or "shared" for a part every phase shares. */
export type PhaseIndex = number | 'shared';

/** One ledger row: a loss term of one phase, or of a shared part. */
export interface PhaseLossRow extends LossTerm {
  phase: PhaseIndex;
}

export type PhaseTemperature = PartTemperature & { phase: PhaseIndex };
export type PhaseCheck = RatingCheck & { phase: PhaseIndex };
export type PhaseHazard = Hazard & { phase: PhaseIndex };

/** The current of a node fed by every phase (a shared capacitor bank), against one phase alone. */
export interface SharedCurrent {
  /** RMS of the summed current, A. */
  rmsA: number;
  /** RMS of the same bank's current when one phase alone fed it at the per-phase point, A. */
  onePhaseRmsA: number;
  /** Peak to peak of the summed current, A. */
  peakToPeakA: number;
  /** Peak to peak of one phase's contribution, A. */
  onePhasePeakToPeakA: number;
  /** The summed current over one switching period (its ripple repeats at N·fs for identical phases). */
  waveform: Waveform;
}

export interface PhasedEvaluation {
  /** Power stages in the design. */
  phases: number;
  /** Stages switching at this point (fewer than `phases` when shed). */
  activePhases: number;
  conditions: Conditions;
  /** Load current of each active phase, A (phase 1 is the worst phase when a mismatch is set). */
  phaseLoadsA: number[];
  regulated: boolean;
  converged: boolean;
  efficiency: number;
  /** Output power + total loss, W (the shared parts' losses replace their one-phase share). */
  inputPower: number;
  outputPower: number;
  totalLoss: number;
  /** Loss of each active phase's own parts, W (index 0 = phase 1). */
  phaseLossW: number[];
  /** Loss of the shared parts (capacitor banks, controller, an input or output sense resistor), W. */
  sharedLossW: number;
  /** Phase 1's duty cycle. */
  dutyCycle: number;
  conductionMode: 'CCM' | 'DCM';
  rows: PhaseLossRow[];
  temperatures: PhaseTemperature[];
  checks: PhaseCheck[];
  hazards: PhaseHazard[];
  /** The summed currents of the shared banks and of the inductors (the output ripple of a buck). */
  shared: { inputCapacitor: SharedCurrent; outputCapacitor: SharedCurrent; inductors: SharedCurrent };
  /** Ripple frequency of the summed currents, Hz: N·fs for N active identical phases. */
  rippleFrequencyHz: number;
  warnings: Warning[];
  /** What this composition assumes (shown in the report). */
  assumptions: string[];
  /** The distinct one-phase evaluations the record was built from: phase 1, then the others (if different). */
  phaseRecords: Evaluation[];
}

/** Roles whose parts every phase has its own copy of, for a design's sense-resistor location. */
export type PerPhaseRoles = ReadonlySet<Role>;
