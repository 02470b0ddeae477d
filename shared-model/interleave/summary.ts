/**
 * The per-phase part of a multiphase point as plain data for the command line's JSON, the results and the
 * report: everything of the PhasedEvaluation except the waveforms and the one-phase records it came from.
 */
import type { PhasedEvaluation, PhaseIndex } from './types.ts';

export interface SharedCurrentSummary {
  rmsA: number;
  onePhaseRmsA: number;
  peakToPeakA: number;
  onePhasePeakToPeakA: number;
}

export interface PhaseSummary {
  phases: number;
  activePhases: number;
  phaseLoadsA: number[];
  phaseLossW: number[];
  sharedLossW: number;
  rippleFrequencyHz: number;
  rows: { phase: PhaseIndex; part: string; partName: string; mechanism: string; watts: number }[];
  temperatures: { phase: PhaseIndex; part: string; partName: string; celsius: number; limit: number; marginK: number }[];
  sharedCurrents: { inputCapacitor: SharedCurrentSummary; outputCapacitor: SharedCurrentSummary; inductors: SharedCurrentSummary };
  assumptions: string[];
}

const current = (c: PhasedEvaluation['shared']['inputCapacitor']): SharedCurrentSummary => ({
  rmsA: c.rmsA,
  onePhaseRmsA: c.onePhaseRmsA,
  peakToPeakA: c.peakToPeakA,
  onePhasePeakToPeakA: c.onePhasePeakToPeakA,
});

export function phaseSummary(p: PhasedEvaluation): PhaseSummary {
  return {
    phases: p.phases,
    activePhases: p.activePhases,
    phaseLoadsA: p.phaseLoadsA.slice(),
    phaseLossW: p.phaseLossW.slice(),
    sharedLossW: p.sharedLossW,
    rippleFrequencyHz: p.rippleFrequencyHz,
    rows: p.rows.map((r) => ({ phase: r.phase, part: r.part, partName: r.partName, mechanism: r.mechanism, watts: r.watts })),
    temperatures: p.temperatures.map((t) => ({ phase: t.phase, part: t.part, partName: t.partName, celsius: t.celsius, limit: t.limit, marginK: t.marginK })),
    sharedCurrents: { inputCapacitor: current(p.shared.inputCapacitor), outputCapacitor: current(p.shared.outputCapacitor), inductors: current(p.shared.inductors) },
    assumptions: p.assumptions.slice(),
  };
}
