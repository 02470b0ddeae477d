/**
 * The parts every phase shares, rescaled from the one-phase evaluations.
 *
 * A shared bank (or an input/output sense resistor) carries the phase-shifted sum of the phases' currents
 * (phase-shift.ts). Its resistive loss is I²rms·R at the same resistance the one-phase point used:
 *   R = P(one phase) / I²rms(one phase),  P(shared) = I²rms(sum) · R.
 * Its temperature, ripple-current check and touch surface follow the loss through the same linear path:
 *   T(shared) = Ta + (T(one phase) − Ta) · P(shared) / P(one phase).
 * The controller's gate drive is paid once per phase; its quiescent supply once.
 * Assumptions: the resistance is taken at the one-phase point's temperature (ESR(T) is not iterated again);
 * a shared part on a heatsink with other parts is rescaled as if it were alone on it.
 * Source: superposition at a node (Kirchhoff), I²R heating, the linear thermal network of docs/methods.md §10.
 */
import type { Role } from '../design/schema.ts';
import type { Evaluation, Hazard, LossTerm, PartTemperature, RatingCheck } from '../ledger/types.ts';
import type { Waveform } from '../operating-point/types.ts';
import { waveformStats } from '../waveform/stats.ts';
import { interleavedSum } from './phase-shift.ts';
import type { SharedCurrent } from './types.ts';

/** The node current of a shared part, from each active phase's one-phase evaluation (phase order). */
export function sharedCurrent(phaseWaves: readonly Waveform[]): SharedCurrent {
  const sum = interleavedSum(phaseWaves);
  const s = waveformStats(sum);
  const one = waveformStats(phaseWaves[0]!);
  return {
    rmsA: s.rmsA,
    onePhaseRmsA: one.rmsA,
    peakToPeakA: s.peakA - s.minA,
    onePhasePeakToPeakA: one.peakA - one.minA,
    waveform: sum,
  };
}

/** P(shared)/P(one phase) for a resistive shared part: (Irms,sum / Irms,one)²; 0 when one phase carries nothing. */
export function resistiveScale(current: SharedCurrent): number {
  return current.onePhaseRmsA > 0 ? (current.rmsA / current.onePhaseRmsA) ** 2 : 0;
}

/** The shared part's loss terms: the one-phase terms times `scale`. */
export function scaledTerms(terms: readonly LossTerm[], scale: number): LossTerm[] {
  return terms.map((t) => ({
    ...t,
    watts: t.watts * scale,
    formula: `${t.formula} (shared by every phase: the one-phase value × ${formatScale(scale)})`,
  }));
}

/** The controller: gate drive of every phase, quiescent supply once. */
export function controllerTerms(phaseRecords: readonly Evaluation[]): LossTerm[] {
  const first = phaseRecords[0]!.losses.filter((t) => t.part === 'controller');
  return first.map((t) => {
    if (t.mechanism === 'quiescent') return { ...t };
    let watts = 0;
    for (const r of phaseRecords) for (const u of r.losses) if (u.part === 'controller' && u.mechanism === t.mechanism) watts += u.watts;
    return { ...t, watts, formula: `${t.formula} (summed over the ${phaseRecords.length} phases)` };
  });
}

const formatScale = (x: number): string => (Math.abs(x) >= 0.01 ? x.toFixed(3) : x.toExponential(2));

/** Temperature record of a shared part whose dissipation is now `watts` (one-phase record `t`). */
export function rescaledTemperature(t: PartTemperature, ambientC: number, watts: number, marginK: number): PartTemperature {
  const ratio = t.dissipationW > 0 ? watts / t.dissipationW : 0;
  const celsius = ambientC + (t.celsius - ambientC) * ratio;
  const surfaceC = ambientC + (t.surfaceC - ambientC) * ratio;
  return { ...t, celsius, surfaceC, dissipationW: watts, marginK: t.limit - marginK - celsius };
}

/** A check of a shared part with its value scaled (ripple current by the RMS ratio, temperature as above). */
export function rescaledCheck(c: RatingCheck, value: number): RatingCheck {
  const lifeLike = c.check === 'capacitor-life';
  const marginFraction = c.limit > 0 ? (lifeLike ? (value - c.limit) / c.limit : (c.limit - value) / c.limit) : 0;
  return { ...c, value, marginFraction, ok: marginFraction >= 0 };
}

/** A touch hazard of a shared part with its surface now at `surfaceC`. */
export function rescaledHazard(h: Hazard, surfaceC: number): Hazard {
  const marginK = h.row.limitC - surfaceC;
  const exceeded = h.status === 'runaway' || marginK < 0;
  return { ...h, surfaceC, marginK, exceeded, status: h.status === 'runaway' ? 'runaway' : marginK < 0 ? 'too-hot' : 'within' };
}

/** The branch waveform of a shared role in a one-phase operating point. */
export function sharedWave(r: Evaluation, role: Role): Waveform {
  const w = r.operatingPoint.waveforms;
  if (role === 'inputCapacitor') return w.inputCapacitor;
  if (role === 'outputCapacitor') return w.outputCapacitor;
  return w.sense;
}
