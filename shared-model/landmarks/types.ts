/**
 * Landmarks of a load sweep: each has a load and a value, or null for both with the reason it was not
 * found. Loads in A; `unit` names the unit of `value`.
 */
import type { Role } from '../design/schema.ts';
import type { WarningCode } from '../warnings.ts';

export interface Landmark {
  /** Load at the landmark, A, or null when it was not found. */
  load: number | null;
  /** The landmark's value (see `unit`), or null when it was not found. */
  value: number | null;
  /** Unit of `value`: "" for a ratio (efficiency, duty cycle), "°C" for a temperature. */
  unit: string;
  /** Why the landmark was not found (null when it was). */
  reason: string | null;
  /** A remark on a found landmark (for instance: it lies at the edge of the swept range). */
  note: string | null;
  /** How the load was fixed: by searching the engine between two points, or by interpolating them. */
  method: 'refined' | 'interpolated' | 'sweep-point' | 'none';
}

export interface KneeLandmark extends Landmark {
  /** The threshold, in percentage points below the peak efficiency. */
  thresholdPoints: number;
  /** Our definition of the knee in one sentence, to show wherever the knee is shown. */
  definition: string;
}

/** The first load at which one part reaches one of its limits. */
export interface PartCeiling extends Landmark {
  part: Role;
  partName: string;
  /** "temperature": the part's limit less the design margin; "touch": the surface touch limit. */
  limitKind: 'temperature' | 'touch';
  /** The threshold reached, °C. */
  thresholdC: number;
}

export interface ThermalCeilingLandmark extends Landmark {
  /** The part and limit that set the ceiling (the lowest load of all), or null. */
  part: Role | null;
  partName: string | null;
  limitKind: 'temperature' | 'touch' | null;
  /** Every part and limit, found or not. */
  perPart: PartCeiling[];
}

export interface RegulationLandmark extends Landmark {
  /** The warning that marks the limit (duty limit, cannot regulate, runaway, not converged), or null. */
  cause: WarningCode | null;
}

export interface Landmarks {
  peak: Landmark;
  knee: KneeLandmark;
  /** The CCM/DCM boundary: the load below which the inductor current falls to zero each period. */
  modeBoundary: Landmark;
  /** Pulse skipping (PFM): the load below which pulses at the minimum peak current skip (null when the design does not skip pulses). */
  pulseSkipping: Landmark;
  thermalCeiling: ThermalCeilingLandmark;
  regulationLimit: RegulationLandmark;
}
