/**
 * Records of a mission profile evaluated (mission/evaluate-mission.ts). SI units: V, A, W; °C for
 * temperatures, K for margins; energy per day in Wh (1 Wh = 3600 J); the battery share as a fraction.
 */
import type { Role } from '../design/schema.ts';

export interface MissionRowResult {
  label: string;
  vinV: number;
  loadA: number;
  ambientC: number;
  fraction: number;
  efficiency: number;
  inputW: number;
  outputW: number;
  lossW: number;
  /** The row's hottest part and its margin to its derated limit (negative: over it). */
  hottestPart: Role | null;
  hottestC: number;
  hottestMarginK: number;
  /** Regulated and converged (ledger/regulated.ts). */
  usable: boolean;
  /** Why the row is not usable (empty when it is). */
  reason: string;
}

export interface MissionPartTemperature {
  part: Role;
  partName: string;
  /** Time-weighted mean over the rows, °C. */
  averageC: number;
  /** Hottest over the rows, °C, the row (index) where it occurs and the margin there, K. */
  worstC: number;
  worstRow: number;
  worstMarginK: number;
}

export interface MissionResult {
  /** "profile": the design's mission profile; "rated-point": the design has none, its rated point stands in. */
  basis: 'profile' | 'rated-point';
  name: string;
  rows: MissionRowResult[];
  /** Σ fᵢ·ηᵢ: the form of the published weighting sets (mission/weightings.ts). */
  weightedEfficiency: number;
  /** Energy out over energy in, Σ fᵢ·Pout,ᵢ / Σ fᵢ·Pin,ᵢ (0 when no energy flows). */
  energyEfficiency: number;
  /** Σ fᵢ·Ploss,ᵢ, W. */
  averageLossW: number;
  /** Σ fᵢ·Pout,ᵢ, W. */
  averageOutputW: number;
  hoursPerDay: number;
  /** averageLossW × hoursPerDay, Wh. */
  energyLostPerDayWh: number;
  /** With a battery capacity: the share of it the converter wastes per day (energyLostPerDayWh / capacity). */
  battery: { capacityWh: number; shareLostPerDay: number } | null;
  temperatures: MissionPartTemperature[];
  /** The smallest touch margin over rows and touchable parts (null: nothing touchable): the part, its margin, K, the limit applied, °C, and the row. */
  worstTouch: { part: Role; marginK: number; limitC: number; row: number } | null;
  /** Every row regulated and converged: only then do the weighted figures describe the design. */
  usable: boolean;
}
