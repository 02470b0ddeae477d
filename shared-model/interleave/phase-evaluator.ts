/**
 * Point evaluators of a multiphase design for the sweeps (the `PointEvaluator` seam of sweep/types.ts):
 * - `all`: every phase switching;
 * - a number n: n phases switching (one curve of the shedding chart);
 * - `optimal`: at each load the active-phase count with the least total loss among the usable points
 *   (regulated and converged), i.e. the efficiency with ideal phase shedding.
 * Each evaluator keeps the one-phase ledger set-ups of its design (phaseLedgers) for the sweep it serves;
 * another design passed to it is evaluated afresh.
 */
import type { Design } from '../design/schema.ts';
import { evaluate } from '../ledger/evaluate.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import type { Evaluation } from '../ledger/types.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import { asEvaluation } from './as-evaluation.ts';
import { evaluatePhasesWith, phaseLedgers, type PhaseLedgers } from './evaluate-phases.ts';
import { phaseCount } from './phase-design.ts';
import type { PhasedEvaluation } from './types.ts';

export type PhaseSelection = 'all' | 'optimal' | number;

/** The phased point with the least loss among 1 … N active phases (usable points preferred). */
export function optimalPhases(design: Design, ledgers: PhaseLedgers, conditions: Partial<Conditions>): PhasedEvaluation {
  let best: PhasedEvaluation | null = null;
  let bestUsable = false;
  for (let n = phaseCount(design); n >= 1; n--) {
    const p = evaluatePhasesWith(design, ledgers, conditions, { activePhases: n });
    const usable = isUsablePoint(p);
    if (!best || (usable && !bestUsable) || (usable === bestUsable && p.totalLoss < best.totalLoss)) {
      best = p;
      bestUsable = usable;
    }
  }
  return best!;
}

/** A PointEvaluator of `design` with the given phase selection. */
export function phasedEvaluator(design: Design, selection: PhaseSelection = 'all'): PointEvaluator {
  const own = phaseLedgers(design);
  return (d: Design, conditions: Conditions) => {
    const ledgers = d === design ? own : phaseLedgers(d);
    if (selection === 'optimal') return asEvaluation(optimalPhases(d, ledgers, conditions));
    const active = selection === 'all' ? phaseCount(d) : Math.min(selection, phaseCount(d));
    return asEvaluation(evaluatePhasesWith(d, ledgers, conditions, { activePhases: active }));
  };
}

/** The selection a design asks for: optimal shedding when it sheds phases, else every phase. */
export function designSelection(design: Design): PhaseSelection {
  return phaseCount(design) > 1 && design.topology.phaseShedding ? 'optimal' : 'all';
}

/**
 * The point of any design as the ordinary record: a one-phase design through `evaluate`, a multiphase one
 * composed (with optimal shedding when the design sheds), plus the per-phase summary for multiphase ones.
 */
export function evaluateDesign(design: Design, conditions?: Partial<Conditions>): { evaluation: Evaluation; phased: PhasedEvaluation | null } {
  if (phaseCount(design) <= 1) return { evaluation: evaluate(design, conditions), phased: null };
  const ledgers = phaseLedgers(design);
  const phased = designSelection(design) === 'optimal' ? optimalPhases(design, ledgers, conditions ?? {}) : evaluatePhasesWith(design, ledgers, conditions);
  return { evaluation: asEvaluation(phased), phased };
}

/** The sweep evaluator a design needs: undefined (the ledger's own) for one phase, the phased one otherwise. */
export function designPointEvaluator(design: Design): PointEvaluator | undefined {
  return phaseCount(design) > 1 ? phasedEvaluator(design, designSelection(design)) : undefined;
}
