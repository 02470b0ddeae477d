/**
 * Expected results computed in Node by calling the engine directly (shared-model/index.ts), so the
 * numbers the page shows are checked against an independent run of the engine, never typed in.
 */
import { evaluate, nominalConditions } from '../../../shared-model/index.ts';
import type { Conditions, Design, Evaluation, OperatingPoint } from '../../../shared-model/index.ts';

/** The full electro-thermal evaluation the results area should show for `design` at `overrides`. */
export function expectedEvaluation(design: Design, overrides: Partial<Conditions> = {}): Evaluation {
  return evaluate(design, nominalConditions(design, overrides));
}

/** Its operating point (self-consistent with the losses and temperatures). */
export function expectedOperatingPoint(design: Design, overrides: Partial<Conditions> = {}): OperatingPoint {
  return expectedEvaluation(design, overrides).operatingPoint;
}
