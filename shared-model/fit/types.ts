/**
 * The calibration record: what was fitted to which measurement, with intervals, correlations,
 * identifiability warnings, residuals before and after, and the loss ledger at rated load before and
 * after. SI units; temperatures °C, their residuals K; efficiency residuals in percentage points.
 */
import type { Design, Role } from '../design/schema.ts';
import type { Severity } from '../warnings.ts';
import type { FitParameterName } from './parameters.ts';

export interface FittedParameter {
  name: FitParameterName;
  label: string;
  /** '×' for a multiplier of the datasheet value, else the value's unit. */
  unit: string;
  initial: number;
  fitted: number;
  /** Approximate 95 % interval from the Jacobian; the allowed range when the interval is unknown. */
  lower95: number;
  upper95: number;
  /** False when the data cannot fix this parameter (then lower95/upper95 are its allowed range). */
  intervalKnown: boolean;
  standardError: number | null;
  /** The allowed range the fit kept to. */
  lower: number;
  upper: number;
  /** Which bound the fitted value rests on, if any. */
  atBound: 'lower' | 'upper' | null;
}

export interface TemperatureComparison {
  role: Role;
  measuredC: number;
  beforeC: number;
  afterC: number;
}

export interface PointComparison {
  /** 0-based index of the point in the measurement. */
  index: number;
  vinV: number;
  loadA: number;
  measuredEfficiency: number;
  efficiencyBefore: number;
  efficiencyAfter: number;
  measuredLossW: number;
  lossBeforeW: number;
  lossAfterW: number;
  /** measured − model, percentage points of efficiency. */
  residualBeforePoints: number;
  residualAfterPoints: number;
  temperatures: TemperatureComparison[];
}

export type CalibrationWarningCode = 'not-identifiable' | 'correlated' | 'no-sensitivity' | 'at-bound' | 'not-converged' | 'model-not-converged';

export interface CalibrationWarning {
  code: CalibrationWarningCode;
  severity: Severity;
  message: string;
  parameters: FitParameterName[];
}

export type LossGroup = 'conduction' | 'switching' | 'core' | 'winding AC' | 'controller' | 'leakage';

export interface GroupChange {
  group: LossGroup;
  beforeW: number;
  afterW: number;
}

export interface ResidualRms {
  /** RMS of measured − model loss over the points, W. */
  lossW: number;
  /** RMS of measured − model temperature over the measured temperatures, K (0 when none). */
  temperatureK: number;
}

export interface Calibration {
  /** SHA-256 of the measurement's canonical text (measurement/hash.ts). */
  measurementSha256: string;
  parameters: FittedParameter[];
  /** Correlation matrix of the fitted parameters, in the order of `parameters`. */
  correlations: number[][];
  points: PointComparison[];
  residualRms: { before: ResidualRms; after: ResidualRms };
  /** Loss ledger at rated load (nominal Vin, rated load, the design's ambient and fs). */
  atRated: { beforeW: number; afterW: number; groups: GroupChange[] };
  /** One or two sentences: where the gap is and which parameter moved most. */
  summary: string;
  warnings: CalibrationWarning[];
  /** Weights: a loss residual counts in units of lossSigmaW, a temperature residual in temperatureSigmaK. */
  weights: { lossSigmaW: number; temperatureSigmaK: number };
  solver: { iterations: number; evaluations: number; converged: boolean; degreesOfFreedom: number; tValue: number };
  /** The design with the fitted values adopted, the measurement and this calibration recorded in it. */
  calibratedDesign: Design;
  caution: string;
}
