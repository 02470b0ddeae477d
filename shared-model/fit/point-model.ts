/**
 * The model side of a measured point: the design evaluated at the point's conditions (its Vin and load,
 * its fs and ambient or the design's), giving the loss, efficiency and each measured part's surface
 * temperature. The fit tightens the electro-thermal tolerance so that difference Jacobians see the
 * parameters, not the iteration's rounding.
 */
import type { Design, Role } from '../design/schema.ts';
import { ledgerEvaluator } from '../ledger/evaluate.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { MeasuredPoint } from '../measurement/schema.ts';

export const FIT_TOLERANCE_K = 1e-10;

export interface ModelPoint {
  lossW: number;
  efficiency: number;
  converged: boolean;
  /** Surface temperature of each role asked for, °C, in the order asked. */
  temperaturesC: number[];
}

export function pointConditions(design: Design, p: MeasuredPoint): Partial<Conditions> {
  return {
    vinV: p.vinV,
    loadA: p.loadA,
    switchingFrequencyHz: p.fsHz ?? design.spec.switchingFrequencyHz,
    ambientC: p.ambientC ?? design.spec.ambientC,
  };
}

/** The model at every point; `roles[i]` lists the roles whose temperature point i measured. */
export function modelPoints(design: Design, points: readonly MeasuredPoint[], roles: readonly (readonly Role[])[]): ModelPoint[] {
  const evaluator = ledgerEvaluator(design);
  return points.map((p, i) => {
    const e = evaluator.lean(pointConditions(design, p), { toleranceK: FIT_TOLERANCE_K });
    const temperaturesC = roles[i].map((role) => e.temperatures.find((t) => t.part === role)?.surfaceC ?? e.conditions.ambientC);
    return { lossW: e.totalLoss, efficiency: e.efficiency, converged: e.converged, temperaturesC };
  });
}
