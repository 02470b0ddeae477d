/**
 * The report's calibration section: the measurement a design carries, the fitted values it adopted
 * (with their approximate 95 % intervals), and the residuals of the design as it stands against that
 * measurement — measured − model efficiency in percentage points, the loss gap in W and each measured
 * temperature against the model's surface temperature. Whether the measurement still has the hash the
 * calibration recorded is said, so an edited measurement is not taken for the one that was fitted.
 */
import type { Design, Role } from '../design/schema.ts';
import { measuredBalance } from '../measurement/loss.ts';
import { measurementHash } from '../measurement/hash.ts';
import { CALIBRATION_CAUTION } from './caution.ts';
import { fitParameters } from './parameters.ts';
import { modelPoints } from './point-model.ts';
import type { ResidualRms } from './types.ts';

export interface CalibrationSectionPoint {
  vinV: number;
  loadA: number;
  measuredEfficiency: number;
  modelEfficiency: number;
  /** measured − model, percentage points. */
  residualPoints: number;
  measuredLossW: number;
  modelLossW: number;
  temperatures: { role: Role; measuredC: number; modelC: number }[];
}

export interface CalibrationSection {
  measurementName: string;
  pointCount: number;
  sha256: string;
  /** True when the design was calibrated against exactly this measurement. */
  calibratedAgainstThis: boolean;
  parameters: { name: string; label: string; unit: string; initial: number; fitted: number; lower95: number; upper95: number }[];
  points: CalibrationSectionPoint[];
  residualRms: ResidualRms;
  caution: string;
}

const ROLES: readonly Role[] = ['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'senseResistor', 'controller'];
const rms = (xs: number[]): number => (xs.length === 0 ? 0 : Math.sqrt(xs.reduce((s, x) => s + x * x, 0) / xs.length));

/** The section for `design`, or null when it carries no measurement. */
export function calibrationSection(design: Design): CalibrationSection | null {
  const m = design.measurements;
  if (!m) return null;
  const sha256 = measurementHash(m);
  const roles = m.points.map((p) => ROLES.filter((r) => p.temperaturesC?.[r] !== undefined));
  const model = modelPoints(design, m.points, roles);
  const labels = new Map(fitParameters(design).map((p) => [p.name as string, p]));
  const points = m.points.map((p, i): CalibrationSectionPoint => {
    const b = measuredBalance(p, design.spec.voutV);
    return {
      vinV: p.vinV,
      loadA: p.loadA,
      measuredEfficiency: b.efficiency,
      modelEfficiency: model[i].efficiency,
      residualPoints: 100 * (b.efficiency - model[i].efficiency),
      measuredLossW: b.lossW,
      modelLossW: model[i].lossW,
      temperatures: roles[i].map((role, j) => ({ role, measuredC: p.temperaturesC![role]!, modelC: model[i].temperaturesC[j] })),
    };
  });
  return {
    measurementName: m.name,
    pointCount: m.points.length,
    sha256,
    calibratedAgainstThis: design.calibration?.measurementSha256 === sha256,
    parameters: (design.calibration?.parameters ?? []).map((p) => ({
      ...p,
      label: (labels.get(p.name)?.label ?? p.name).replace(/ ×$/, ''),
      unit: labels.get(p.name)?.unit ?? '',
    })),
    points,
    residualRms: {
      lossW: rms(points.map((p) => p.measuredLossW - p.modelLossW)),
      temperatureK: rms(points.flatMap((p) => p.temperatures.map((t) => t.measuredC - t.modelC))),
    },
    caution: CALIBRATION_CAUTION,
  };
}
