/**
 * Diode conduction loss from the datasheet's forward curves VF(IF, Tj) (rectifier diode).
 *
 * Formula: P = (1/Ts) · ∫ VF(i(t), Tj) · i(t) dt over the rectifier's conduction interval — the falling
 * segments of the inductor current (the off interval of a buck or boost) — integrated exactly over the
 * straight segments (curves/forward-table.ts). With no ripple (a flat current I over the fraction d of the
 * period) P = VF(I, Tj) · I · d.
 * Assumptions: the curves describe the junction at Tj (the datasheet's pulsed measurement); the current
 * waveform is the solver's piecewise-linear one; recovery and capacitive currents are priced elsewhere.
 * Source: the mean of the instantaneous product v·i (any power-electronics text, e.g. Mohan, Undeland &
 * Robbins, Power Electronics, ch. 2 [memory]); docs/methods.md §6 for the linear model it replaces.
 */
import type { VfPoint } from '../design/parts.ts';
import type { Segment } from '../operating-point/types.ts';
import { forwardLossSlopeWPerK, forwardLossW, forwardVoltageAt } from '../curves/forward-table.ts';
import type { DiodeForwardInputs } from './diode-forward.ts';
import { input, nonNegativeFinite, safeRatio, type LossModel } from './model.ts';

/** The straight-line model's inputs (kept for its slot), plus what the curves need. */
export interface DiodeCurveInputs extends DiodeForwardInputs {
  /** The datasheet's forward curves (undefined on the straight-line model's slot). */
  vfCurves: readonly VfPoint[] | undefined;
  /** One period of the inductor current, its length, and the rectifier's fraction of it. */
  segments: readonly Segment[];
  periodS: number;
  fraction: number;
}

/** The rectifier conducts while the inductor current falls (the off interval). */
const falling = (s: Segment): boolean => s.i1A < s.i0A;

function curveWatts(x: DiodeCurveInputs): number {
  const points = x.vfCurves;
  if (!points || !(x.iavgA > 0)) return 0;
  const p = forwardLossW(points, x.segments, x.periodS, x.temperatureC, falling);
  if (p > 0) return nonNegativeFinite(p);
  // No falling segment: a flat current over the rectifier's fraction of the period.
  const i = safeRatio(x.iavgA, x.fraction);
  return nonNegativeFinite(forwardVoltageAt(points, i, x.temperatureC) * x.iavgA);
}

export const diodeForwardCurve: LossModel<DiodeCurveInputs> = {
  mechanism: 'forward drop',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: '(1/Ts) · ∫ VF(i, Tj) · i dt (datasheet VF(IF, Tj) curves)',
  watts: curveWatts,
  // Unlike the other thermal models this returns dP/dTj itself, W/K (may be negative: VF falls when hot);
  // ledger/kernel-slopes.ts takes it with a law slope of 1.
  sensitivity: (x) => {
    const s = x.vfCurves && x.iavgA > 0 ? forwardLossSlopeWPerK(x.vfCurves, x.segments, x.periodS, x.temperatureC, falling) : 0;
    return Number.isFinite(s) ? s : 0;
  },
  describe: (x) => {
    const w = curveWatts(x);
    return [
      input('Iavg', x.iavgA, 'A'),
      input('Irms', x.irmsA, 'A'),
      input('Tj', x.temperatureC, '°C'),
      input('VF at Iavg/d (curve)', x.vfCurves ? forwardVoltageAt(x.vfCurves, safeRatio(x.iavgA, x.fraction), x.temperatureC) : 0, 'V'),
      input('Mean VF weighted by current, P/Iavg (curve)', safeRatio(w, x.iavgA), 'V'),
    ];
  },
};
