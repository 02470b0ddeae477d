/**
 * Records of the design-checks room: the chosen parts and the specification's targets held against the
 * sizing (sizing/) and against the solved operating points at the corners of the input range (rated
 * load), regulated and converged corners only. SI units (V, A, F, H, Hz, W, A/s); temperatures °C.
 */
import type { Role } from '../design/schema.ts';
import type { CornerId, Sizing, SizingCorner } from '../sizing/types.ts';

/** What a check concerns (one per row; ratings and temperatures per part). */
export type DesignCheckId =
  | 'inductor-ripple-ratio'
  | 'output-ripple'
  | 'efficiency-at-rated'
  | 'efficiency-at-light-load'
  | 'switch-voltage'
  | 'switch-current'
  | 'rectifier-voltage'
  | 'rectifier-current'
  | 'inductor-saturation'
  | 'inductor-rms'
  | 'input-capacitor-voltage'
  | 'output-capacitor-voltage'
  | 'input-capacitor-ripple-current'
  | 'output-capacitor-ripple-current'
  | 'temperature-switch'
  | 'temperature-rectifier'
  | 'temperature-inductor'
  | 'temperature-inputCapacitor'
  | 'temperature-outputCapacitor'
  | 'temperature-senseResistor'
  | 'temperature-controller'
  | 'steady-state'
  | 'maximum-duty'
  | 'slope-compensation'
  | 'crossover';

/**
 * pass: within the limit. warn: past the limit but short of what breaks (a derated rating exceeded while
 * the full rating holds; a ramp that the controller must provide; little room for the loop). fail: past
 * what breaks (the full rating, the temperature limit, the target, the duty limit).
 */
export type CheckStatus = 'pass' | 'warn' | 'fail';

export interface DesignCheck {
  id: DesignCheckId;
  /** Short label for tables and screens. */
  label: string;
  /** The part concerned, when the check is about one part. */
  part?: Role;
  value: number;
  /** The limit the value is held against (derated where a derating applies). */
  limit: number;
  unit: string;
  /** 'max': the value must not exceed the limit; 'min': it must reach it. */
  bound: 'max' | 'min';
  status: CheckStatus;
  /** status === 'pass'. */
  passed: boolean;
  /** Margin as a fraction of the limit: (limit − value)/limit for 'max', (value − limit)/limit for 'min'. */
  marginFraction: number;
  /** The corner that drives the check (absent for checks that are not read at a corner). */
  corner?: CornerId;
  /** That corner's label ("Vin max 16 V, rated load 3 A"). */
  where?: string;
  /** One sentence: what was compared and, when it does not pass, what the sizing says is needed. */
  message: string;
  /** docs/methods.md section or published source. */
  source: string;
}

export interface DesignReview {
  sizing: Sizing;
  checks: DesignCheck[];
  /** The corners the checks read (regulated and converged). */
  usableCorners: SizingCorner[];
  /** Counts by status. */
  counts: Record<CheckStatus, number>;
  /** Plain sentences: checks left out (no target set), corners not used and why. */
  notes: string[];
}
