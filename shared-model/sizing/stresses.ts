/**
 * Switch and rectifier stresses over the corners, and the ratings they need with derating.
 *
 * Blocking voltage: buck switch and rectifier block Vin (largest at Vin max); boost switch and rectifier
 * block Vo (plus the rectifier drop for the switch) at every Vin. Peak and RMS switch current and the
 * rectifier's mean current grow with the inductor current (boost: Vin min; buck: Vin max for the peak,
 * whose ripple grows with Vin). Required rating = stress / derating, with the voltage derating of the
 * design (margins.voltageDerating, default 0.8 in the demos) and the current derating setting (default
 * 0.8 — common practice). Ringing and spikes are not modelled: measure them.
 * Source: common practice (derating); docs/methods.md §1 (currents), §23.
 */
import type { Design } from '../design/schema.ts';
import { topologyOf } from '../topology/registry.ts';
import { currentDeratingOf } from '../compare/role-fit.ts';
import type { SolvedCorner } from './corners.ts';
import { sized } from './sized.ts';
import type { StressSizing } from './types.ts';

const op = (c: SolvedCorner) => c.evaluation.operatingPoint;
const absPeak = (s: { peakA: number; minA: number }) => Math.max(Math.abs(s.peakA), Math.abs(s.minA));

export function sizeStresses(design: Design, corners: readonly SolvedCorner[], currentDerating = currentDeratingOf(design)): StressSizing {
  const words = topologyOf(design).sizingWords;
  const vd = design.margins.voltageDerating;
  const voltReason = words.blockingReason;
  const currentReason = words.currentReason;
  const switchV = sized(corners, (c) => op(c).stress.switchV, { unit: 'V', formula: 'solved blocking voltage', reason: voltReason });
  const rectifierV = sized(corners, (c) => op(c).stress.rectifierV, { unit: 'V', formula: 'solved blocking voltage', reason: voltReason });
  const switchPeakA = sized(corners, (c) => absPeak(op(c).stats.switch), { unit: 'A', formula: 'peak of the solved switch current', reason: currentReason });
  const switchRmsA = sized(corners, (c) => op(c).stats.switch.rmsA, {
    unit: 'A',
    formula: 'Isw,rms = √(D·(IL² + ΔI²/12)) (exact, solved)',
    reason: words.switchRmsReason,
    source: 'docs/methods.md §1',
  });
  const rectifierPeakA = sized(corners, (c) => absPeak(op(c).stats.rectifier), { unit: 'A', formula: 'peak of the solved rectifier current', reason: currentReason });
  const rectifierAverageA = sized(corners, (c) => Math.abs(op(c).stats.rectifier.averageA), {
    unit: 'A',
    formula: 'mean of the solved rectifier current',
    reason: words.rectifierMeanReason,
  });
  const rect = design.parts.rectifier;
  const rectifierCurrent = rect.kind === 'diode' ? rectifierAverageA.value : rectifierPeakA.value;
  return {
    voltageDerating: vd,
    currentDerating,
    switchV,
    switchPeakA,
    switchRmsA,
    rectifierV,
    rectifierPeakA,
    rectifierAverageA,
    required: {
      switchVdsV: switchV.value / vd,
      switchIdA: switchPeakA.value / currentDerating,
      rectifierVoltageV: rectifierV.value / vd,
      rectifierCurrentA: rectifierCurrent / currentDerating,
    },
  };
}
