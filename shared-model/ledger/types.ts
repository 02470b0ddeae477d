/**
 * The evaluation record: one fully electro-thermal operating point and its loss ledger.
 * Key names follow the documented command-line contract (docs in DEVELOPERS.md, "Result keys"):
 * powers in W, currents in A, voltages in V, temperatures in °C, temperature margins in K.
 */
import type { Role, TouchLimitRow } from '../design/schema.ts';
import type { Conditions, OperatingPoint } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';

export type Mechanism =
  | 'conduction'
  | 'turn-on overlap'
  | 'turn-off overlap'
  | 'output capacitance'
  | 'gate drive'
  | 'dead-time diode'
  | 'reverse recovery'
  | 'forward drop'
  | 'junction capacitance'
  | 'reverse leakage'
  | 'winding DC'
  | 'winding AC'
  | 'core'
  | 'ESR'
  | 'sense'
  | 'quiescent';

/** One input a loss model used, so a reviewer can redo the arithmetic. */
export interface LossInput {
  name: string;
  value: number;
  /** SI unit symbol ("A", "V", "Ω", "s", "C", "Hz", "°C", "T", "W/m³", "" for a ratio). */
  unit: string;
}

export interface LossTerm {
  part: Role;
  partName: string;
  mechanism: Mechanism;
  watts: number;
  /** Short formula in plain text, e.g. "Irms² · RDS(on)(Tj)". */
  formula: string;
  inputs: LossInput[];
}

export type TemperatureKind = 'junction' | 'hot-spot';

export interface PartTemperature {
  part: Role;
  partName: string;
  kind: TemperatureKind;
  /** Junction or hot-spot temperature, °C. */
  celsius: number;
  /** The part's temperature limit, °C. */
  limit: number;
  /** limit − margin − celsius, K (negative: over the derated limit). */
  marginK: number;
  /** Temperature of the surface a person could touch (case top or heatsink), °C. */
  surfaceC: number;
  dissipationW: number;
  /** "direct", "rise" or the heatsink id. */
  path: string;
}

export interface Hazard {
  part: Role;
  partName: string;
  surfaceC: number;
  row: TouchLimitRow;
  /** row.limitC − surfaceC, K (negative: too hot to touch). */
  marginK: number;
  exceeded: boolean;
  caution: string;
}

/** Rating and life checks beside the temperatures. */
export interface RatingCheck {
  part: Role;
  check:
    | 'temperature'
    | 'saturation'
    | 'voltage'
    | 'current'
    | 'ripple-current'
    | 'resistor-power'
    | 'capacitor-life';
  value: number;
  limit: number;
  unit: string;
  /** Margin as (limit − value) / limit; for 'capacitor-life' (value must reach the limit) (value − limit) / limit. Positive: within. */
  marginFraction: number;
  ok: boolean;
  note: string;
}

export interface Evaluation {
  conditions: Conditions;
  /**
   * The output reaches its specified voltage (ledger/regulated.ts). False at the duty limit or past a
   * boost's conversion-ratio limit: the numbers are then those of the lower output in operatingPoint.voutV.
   */
  regulated: boolean;
  converged: boolean;
  iterations: number;
  efficiency: number;
  inputPower: number;
  outputPower: number;
  totalLoss: number;
  dutyCycle: number;
  conductionMode: 'CCM' | 'DCM';
  losses: LossTerm[];
  temperatures: PartTemperature[];
  hazards: Hazard[];
  checks: RatingCheck[];
  warnings: Warning[];
  operatingPoint: OperatingPoint;
  /** Heatsink temperatures, °C, by heatsink id. */
  heatsinks: { id: string; name: string; celsius: number; dissipationW: number }[];
}
