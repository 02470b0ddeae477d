/**
 * The evaluators and conditions used by sweeps, comparison and tolerance analysis: the ledger's fully
 * electro-thermal `evaluate` at the design's nominal conditions with overrides.
 *
 * `evaluatorFor(design)` serves many points of one design: the design-dependent set-up (thermal network,
 * loss slots, coefficients) is done once by the ledger's `ledgerEvaluator`, and the results are exactly
 * those of `evaluate` point by point (test: test/shared-model/sweep/evaluator.test.ts). It holds that
 * set-up only for the call that made it — no cache outlives a sweep — so an edited design is never
 * evaluated with a stale set-up; the design must not change while the sweep runs.
 */
import type { Design } from '../design/schema.ts';
import { evaluate, ledgerEvaluator } from '../ledger/evaluate.ts';
import { nominalConditions } from '../operating-point/conditions.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { PointEvaluator } from './types.ts';

export const defaultEvaluator: PointEvaluator = (design, conditions) => evaluate(design, conditions);

/**
 * The evaluator for many points of `design`: the caller's own `evaluator` when given (a stand-in in
 * tests), else the ledger's per-design evaluator for `design` itself and plain `evaluate` for any other
 * design passed to it.
 */
export function evaluatorFor(design: Design, evaluator?: PointEvaluator): PointEvaluator {
  if (evaluator) return evaluator;
  const ledger = ledgerEvaluator(design);
  return (d, conditions) => (d === design ? ledger.evaluate(conditions) : evaluate(d, conditions));
}

/** The design's nominal conditions (nominal Vin, rated load, spec fs and ambient) with overrides. */
export function conditionsFor(design: Design, overrides: Partial<Conditions> = {}): Conditions {
  return nominalConditions(design, overrides);
}
