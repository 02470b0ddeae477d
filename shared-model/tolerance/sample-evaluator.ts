/**
 * The samples of a tolerance analysis on the lean path with one set-up: a per-design ledger evaluator
 * for the nominal parts, and one for a copy of the design whose part values each sample writes in place
 * (variation.ts `varyPartsInto`, the same arithmetic as `varyDesign`). The evaluation context reads every
 * varied value (RDS(on), DCR, L and its roll-off, ESR) from the design at each evaluation and keeps
 * nothing derived from them (ledger/context.ts: the set-up is the topology, thermal network, loss slots,
 * gate-charge split and core coefficients), so a sample's numbers are those of `evaluate` on
 * `varyDesign(design, v)` (test: test/shared-model/tolerance/sample-evaluator.test.ts).
 * The record returned is the evaluator's lean record, refilled by the next call.
 */
import type { Design } from '../design/schema.ts';
import { ledgerEvaluator } from '../ledger/evaluate.ts';
import type { LeanEvaluation } from '../ledger/lean-evaluate.ts';
import type { Conditions } from '../operating-point/types.ts';
import { ownPartsCopy, partsNominal, varyPartsInto, type Variation } from './variation.ts';

/** Evaluates `design` with a variation's part values at `conditions` (already varied; see header). */
export type SampleEvaluator = (v: Variation, conditions: Conditions) => LeanEvaluation;

export function sampleEvaluator(design: Design): SampleEvaluator {
  const nominal = ledgerEvaluator(design);
  const own = ownPartsCopy(design);
  const varied = ledgerEvaluator(own);
  return (v, conditions) => {
    if (partsNominal(v)) return nominal.lean(conditions);
    varyPartsInto(own.parts, design.parts, v);
    return varied.lean(conditions);
  };
}
