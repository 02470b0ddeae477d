/**
 * Rows of the bench residual table from engine records: the comparison of the design as it stands
 * (calibrationSection of the design with the measurement) or, after a fit, the calibration's points
 * (before and after). No physics here.
 */
import type { Calibration, CalibrationSectionPoint } from '../../shared-model/index.ts';

export interface ResidualRow {
  vinV: number;
  loadA: number;
  measuredEfficiency: number;
  modelEfficiency: number;
  fittedEfficiency: number | null;
  /** measured − model loss, W. */
  lossGapW: number;
  fittedLossGapW: number | null;
  temperatures: { role: string; measuredC: number; modelC: number; fittedC: number | null }[];
}

export function comparisonRows(points: readonly CalibrationSectionPoint[]): ResidualRow[] {
  return points.map((p) => ({
    vinV: p.vinV,
    loadA: p.loadA,
    measuredEfficiency: p.measuredEfficiency,
    modelEfficiency: p.modelEfficiency,
    fittedEfficiency: null,
    lossGapW: p.measuredLossW - p.modelLossW,
    fittedLossGapW: null,
    temperatures: p.temperatures.map((t) => ({ role: t.role, measuredC: t.measuredC, modelC: t.modelC, fittedC: null })),
  }));
}

export function calibrationRows(c: Calibration): ResidualRow[] {
  return c.points.map((p) => ({
    vinV: p.vinV,
    loadA: p.loadA,
    measuredEfficiency: p.measuredEfficiency,
    modelEfficiency: p.efficiencyBefore,
    fittedEfficiency: p.efficiencyAfter,
    lossGapW: p.measuredLossW - p.lossBeforeW,
    fittedLossGapW: p.measuredLossW - p.lossAfterW,
    temperatures: p.temperatures.map((t) => ({ role: t.role, measuredC: t.measuredC, modelC: t.beforeC, fittedC: t.afterC })),
  }));
}
