/**
 * The evaluators and conditions used by sweeps, comparison and tolerance analysis: the ledger's fully
 * electro-thermal `evaluate` at the design's nominal conditions with overrides.
 *
 * `evaluatorFor(design)` serves many points of one design: the design-dependent set-up (thermal network,
 * loss slots, coefficients) is done once by the ledger's `ledgerEvaluator`, and the results are exactly
 * those of `evaluate` point by point (test: test/shared-model/sweep/evaluator.test.ts). It holds that
 * set-up only for the call that made it — no cache outlives a sweep — so an edited design is never
 * evaluated with a stale set-up; the design must not change while the sweep runs.
 * It also carries the ledger's lean evaluation of its design (`lean`), which `pointRecorder` uses for
 * sweep points: the same numbers and warnings without the full record (test:
 * test/shared-model/sweep/lean-point.test.ts). A stand-in evaluator (tests) is always called as given.
 * A multiphase design (topology.phases > 1) is evaluated as the whole converter — every phase, or the best
 * active count at each point when it sheds phases (interleave/phase-evaluator.ts) — by both evaluators here,
 * so sweeps, landmarks, comparison, ranking, tolerance and the mission never treat it as one stage carrying
 * the whole load (issue 13 §1; test: test/shared-model/interleave/multiphase-callers.test.ts).
 */
import type { Design } from '../design/schema.ts';
import { phaseCount } from '../interleave/phase-design.ts';
import { designPointEvaluator } from '../interleave/phase-evaluator.ts';
import { evaluate, ledgerEvaluator } from '../ledger/evaluate.ts';
import type { LeanEvaluation } from '../ledger/lean-evaluate.ts';
import { nominalConditions } from '../operating-point/conditions.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { ColumnBook, RecordSource } from './point-record.ts';
import type { PointEvaluator, SweepPoint } from './types.ts';

/** One point of any design: `evaluate` for one phase, the whole interleaved converter for several. */
export const defaultEvaluator: PointEvaluator = (design, conditions) =>
  phaseCount(design) > 1 ? designPointEvaluator(design)!(design, conditions) : evaluate(design, conditions);

/** The per-design evaluator: a PointEvaluator that also evaluates its own design leanly. */
export interface DesignEvaluator extends PointEvaluator {
  readonly design: Design;
  /** The lean evaluation of `design` (a record refilled by the next call). */
  readonly lean: (conditions: Conditions) => LeanEvaluation;
}

/**
 * The evaluator for many points of `design`: the caller's own `evaluator` when given (a stand-in in
 * tests), else the ledger's per-design evaluator for `design` itself and plain `evaluate` for any other
 * design passed to it.
 */
export function evaluatorFor(design: Design, evaluator?: PointEvaluator): PointEvaluator {
  if (evaluator) return evaluator;
  const phased = designPointEvaluator(design);
  if (phased) return phased;
  const ledger = ledgerEvaluator(design);
  const full: PointEvaluator = (d, conditions) => (d === design ? ledger.evaluate(conditions) : defaultEvaluator(d, conditions));
  const lean = (conditions: Conditions) => ledger.lean(conditions);
  return Object.assign(full, { design, lean }) satisfies DesignEvaluator;
}

/** The lean evaluation of `design` when `evaluator` is the per-design evaluator of that very design. */
function leanOf(design: Design, evaluator: PointEvaluator): DesignEvaluator['lean'] | undefined {
  const e = evaluator as Partial<DesignEvaluator>;
  return e.design === design && typeof e.lean === 'function' ? e.lean : undefined;
}

/**
 * The numbers of one point of `design` at any conditions, for sweeps that reduce each point at once:
 * the lean evaluation through the per-design evaluator (made here when none is given), else the given
 * evaluator's full Evaluation. The result holds until the next call.
 */
export function pointSource(design: Design, evaluator?: PointEvaluator): (conditions: Conditions) => RecordSource {
  const ev = evaluatorFor(design, evaluator);
  const lean = leanOf(design, ev);
  return lean ?? ((conditions) => ev(design, conditions));
}

/** Sweep points of `design` into `book` (see pointSource). */
export function pointRecorder(design: Design, book: ColumnBook, evaluator?: PointEvaluator): (conditions: Conditions) => SweepPoint {
  const source = pointSource(design, evaluator);
  return (conditions) => book.record(source(conditions));
}

/** The design's nominal conditions (nominal Vin, rated load, spec fs and ambient) with overrides. */
export function conditionsFor(design: Design, overrides: Partial<Conditions> = {}): Conditions {
  return nominalConditions(design, overrides);
}
