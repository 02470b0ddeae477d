/**
 * The default evaluator and conditions used by sweeps, comparison and tolerance analysis: the ledger's
 * fully electro-thermal `evaluate` at the design's nominal conditions with overrides.
 */
import type { Design } from '../design/schema.ts';
import { evaluate } from '../ledger/evaluate.ts';
import { nominalConditions } from '../operating-point/conditions.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { PointEvaluator } from './types.ts';

export const defaultEvaluator: PointEvaluator = (design, conditions) => evaluate(design, conditions);

/** The design's nominal conditions (nominal Vin, rated load, spec fs and ambient) with overrides. */
export function conditionsFor(design: Design, overrides: Partial<Conditions> = {}): Conditions {
  return nominalConditions(design, overrides);
}
