/**
 * Part comparison: the same design with two or more alternative parts in one role. For each alternative:
 * the full ledger at a chosen load (default rated) and a load sweep on a shared load axis; then the
 * difference of each alternative from the first at every point, the winner (lowest total loss) at every
 * point, and the crossover loads where the winner changes (refined on the engine).
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation } from '../ledger/types.ts';
import { conditionsFor, evaluatorFor } from '../sweep/evaluator.ts';
import { sweepLoad } from '../sweep/load-sweep.ts';
import type { PointEvaluator, LoadSweep, LoadSweepOptions, OptionProblem } from '../sweep/types.ts';
import { findCrossovers, winnersOf } from './crossover.ts';
import { substitutePart } from './substitute-part.ts';
import { isUsablePoint } from '../ledger/regulated.ts';

export interface CompareOptions {
  role: Role;
  /** The alternatives, in the order to show them (the first is the reference for differences). */
  parts: Part[];
  /** Load of the side-by-side ledgers, A (default: rated). */
  loadA?: number;
  sweep?: Omit<LoadSweepOptions, 'evaluator'>;
  /** Refine crossovers on the engine (default true). */
  refine?: boolean;
  evaluator?: PointEvaluator;
}

export interface CompareAlternative {
  partId: string;
  partName: string;
  design: Design;
  /** The full ledger at the chosen load. */
  evaluation: Evaluation;
  sweep: LoadSweep;
  /** Total loss minus the first alternative's, W, at every sweep point. */
  lossDifferenceW: number[];
  /** Efficiency minus the first alternative's, at every sweep point. */
  efficiencyDifference: number[];
}

export interface CompareCrossover {
  load: number;
  /** The part that wins (lower total loss) below the crossover, and the one that wins above it. */
  fromPartId: string;
  toPartId: string;
  method: 'refined' | 'interpolated';
}

export interface Comparison {
  role: Role;
  loadA: number;
  loadsA: number[];
  alternatives: CompareAlternative[];
  /** Index into `alternatives` of the lowest-loss part at each sweep point among the regulated, converged ones (−1: none). */
  winners: number[];
  crossovers: CompareCrossover[];
}

export type ComparisonOutcome = { ok: true; comparison: Comparison } | { ok: false; problems: OptionProblem[] };

export function compareParts(design: Design, options: CompareOptions): ComparisonOutcome {
  const problems: OptionProblem[] = [];
  if (options.parts.length < 2) {
    problems.push({ path: 'parts', value: options.parts.length, allowed: 'two or more parts', message: `Comparison needs two or more parts (got ${options.parts.length}).` });
  }
  const loadA = options.loadA ?? design.spec.ratedLoadA;
  if (!(Number.isFinite(loadA) && loadA > 0)) {
    problems.push({ path: 'loadA', value: loadA, allowed: '> 0 A', message: `loadA must be greater than 0 A (got ${loadA}).` });
  }
  const designs: Design[] = [];
  options.parts.forEach((part, k) => {
    const s = substitutePart(design, options.role, part);
    if (s.ok) designs.push(s.design);
    else problems.push({ ...s.problem, path: `parts[${k}]` });
  });
  if (problems.length > 0) return { ok: false, problems };

  // One set-up per alternative design serves its ledger, its sweep and the crossover refinement.
  const evaluators = designs.map((d) => evaluatorFor(d, options.evaluator));
  const conditions = conditionsFor(design, { ...options.sweep?.conditions, loadA });
  const sweeps = designs.map((d, k) => sweepLoad(d, { ...options.sweep, evaluator: evaluators[k] }));
  const reference = sweeps[0].points;
  const alternatives: CompareAlternative[] = designs.map((d, k) => ({
    partId: options.parts[k].id,
    partName: options.parts[k].name,
    design: d,
    evaluation: evaluators[k](d, conditions),
    sweep: sweeps[k],
    lossDifferenceW: sweeps[k].points.map((p, i) => p.totalLoss - reference[i].totalLoss),
    efficiencyDifference: sweeps[k].points.map((p, i) => p.efficiency - reference[i].efficiency),
  }));
  const loadsA = reference.map((p) => p.loadA);
  // Only regulated, converged points compete (ledger/regulated.ts): the others never win.
  const curves = sweeps.map((s) => s.points.map((p) => (isUsablePoint(p) ? p.totalLoss : Infinity)));
  const fixed = { vinV: sweeps[0].vinV, ambientC: sweeps[0].ambientC, switchingFrequencyHz: sweeps[0].switchingFrequencyHz };
  const probe =
    options.refine === false
      ? undefined
      : (k: number, load: number) => {
          const e = evaluators[k](designs[k], { ...fixed, loadA: load });
          return isUsablePoint(e) ? e.totalLoss : Infinity;
        };
  const crossings = findCrossovers(loadsA, curves, probe);
  const winnerIndex = winnersOf(curves);
  return {
    ok: true,
    comparison: {
      role: options.role,
      loadA,
      loadsA,
      alternatives,
      winners: winnerIndex,
      crossovers: crossings.map((c) => ({
        load: c.load,
        fromPartId: options.parts[c.from].id,
        toPartId: options.parts[c.to].id,
        method: c.method,
      })),
    },
  };
}
