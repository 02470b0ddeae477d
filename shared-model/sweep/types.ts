/**
 * Records of load, frequency and two-axis sweeps.
 *
 * A sweep keeps one compact record per point instead of a full Evaluation: the numbers the charts, tables
 * and report need (efficiency, every loss term, every temperature and margin, touch-surface margins, mode,
 * warnings), with the names of the loss terms and parts stored once per sweep in `columns`. A full
 * Evaluation at any single load is one `evaluate` call away.
 * Units: currents A, powers W, temperatures °C, temperature margins K, frequencies Hz.
 */
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation, Mechanism, TemperatureKind } from '../ledger/types.ts';
import type { Conditions, ConductionMode } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';

/** Computes one fully electro-thermal operating point (the ledger's `evaluate`, or a stand-in in tests). */
export type PointEvaluator = (design: Design, conditions: Conditions) => Evaluation;

export type SweepSpacing = 'linear' | 'log';

/** One invalid option, named by its path, with the value and the allowed range. */
export interface OptionProblem {
  path: string;
  value: unknown;
  allowed: string;
  message: string;
}

export interface LossColumn {
  part: Role;
  partName: string;
  mechanism: Mechanism;
}

export interface TemperatureColumn {
  part: Role;
  partName: string;
  kind: TemperatureKind;
  /** The part's own temperature limit, °C. */
  limitC: number;
  /** The limit less the design's temperature margin, °C (what the margins are measured against). */
  deratedLimitC: number;
}

export interface HazardColumn {
  part: Role;
  partName: string;
  /** The touch limit of the applied row, °C. */
  limitC: number;
  rowId: string;
  standard: string;
}

export interface SweepColumns {
  losses: LossColumn[];
  temperatures: TemperatureColumn[];
  hazards: HazardColumn[];
  heatsinks: { id: string; name: string }[];
}

/** One point of a sweep. Arrays are aligned with the sweep's `columns`. */
export interface SweepPoint {
  loadA: number;
  vinV: number;
  ambientC: number;
  switchingFrequencyHz: number;
  /**
   * The rate the converter actually switches at, Hz: the pulse rate while pulse skipping (PFM) is active
   * (light-load/pulse-skipping.ts), else the switching frequency.
   */
  equivalentSwitchingHz: number;
  efficiency: number;
  totalLoss: number;
  inputPower: number;
  outputPower: number;
  dutyCycle: number;
  mode: ConductionMode;
  /** The output reaches its specified voltage (ledger/regulated.ts); false: the numbers are those of voutV. */
  regulated: boolean;
  /** Output voltage reached, V (the specified Vout when regulated). */
  voutV: number;
  converged: boolean;
  /** Inductor current peak and ripple (peak to peak), A. */
  inductorPeakA: number;
  inductorRippleA: number;
  /** W, aligned with columns.losses (0 where a mechanism is absent at this point). */
  losses: number[];
  /** °C, aligned with columns.temperatures. */
  temperaturesC: number[];
  /** K below the derated limit (negative: over it), aligned with columns.temperatures. */
  marginsK: number[];
  /** Touchable-surface temperature of each part, °C, aligned with columns.temperatures. */
  surfacesC: number[];
  /** K below the touch limit (negative: too hot to touch), aligned with columns.hazards. */
  hazardMarginsK: number[];
  /** °C, aligned with columns.heatsinks. */
  heatsinksC: number[];
  warnings: Warning[];
}

export interface LoadSweepOptions {
  /** Lightest load, A (default 1 % of rated). */
  fromA?: number;
  /** Heaviest load, A (default 120 % of rated). */
  toA?: number;
  /** Number of points (default 200). */
  points?: number;
  /** Point spacing (default logarithmic: fine detail at light load, where efficiency changes fastest). */
  spacing?: SweepSpacing;
  /** Input voltage, ambient and switching frequency (defaults: the design's nominal conditions). */
  conditions?: Partial<Omit<Conditions, 'loadA'>>;
  evaluator?: PointEvaluator;
}

export interface LoadSweep {
  designName: string;
  ratedLoadA: number;
  spacing: SweepSpacing;
  /** The conditions held fixed while the load moves. */
  vinV: number;
  ambientC: number;
  switchingFrequencyHz: number;
  columns: SweepColumns;
  points: SweepPoint[];
}
