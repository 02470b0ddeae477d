/**
 * Typed warnings: physics outside a model's validity, limits reached, ratings exceeded.
 * They travel in results as data; the engine never throws for them.
 */
export type WarningCode =
  | 'dcm'
  | 'duty-limit'
  | 'cannot-regulate'
  | 'saturation'
  | 'over-voltage-rating'
  | 'over-current-rating'
  | 'over-temperature'
  | 'thermal-runaway'
  | 'not-converged'
  | 'ripple-current-rating'
  | 'resistor-power'
  | 'capacitor-life'
  | 'burn-hazard'
  | 'negative-current'
  | 'pulse-skipping'
  | 'target-missed'
  | 'model-limit';

export type Severity = 'info' | 'caution' | 'danger';

export interface Warning {
  code: WarningCode;
  severity: Severity;
  message: string;
  /** Design-document path of the field concerned, e.g. "parts.inductor.isatA". */
  path?: string;
  /** Role of the part concerned, when there is one. */
  part?: string;
}
