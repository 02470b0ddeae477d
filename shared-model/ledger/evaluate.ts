/**
 * evaluate: one fully electro-thermal operating point and its loss ledger.
 *
 * 1. Node temperatures start at ambient; temperatures and duty cycle are iterated together in a lean loop
 *    (joint-loop.ts): conduction parameters (RDS(on), Vf0, DCR, ESR, sense R) at the current temperatures,
 *    the duty solved so that Vin·Iin = Pout + (losses in the inductor path) — the solver's `lossOf`
 *    seam — with the losses paid by the source outside that path added to the input as its
 *    `sourceLossOf`; the per-part losses feed the thermal network (thermal/fixed-point.ts, Newton with
 *    tangent sensitivities).
 * 2. At convergence the solver's OperatingPoint record is built once, the kernel refilled on it, and the
 *    records built: loss terms with their inputs, temperatures (Ta + Θ·P of exactly those losses),
 *    heatsinks, rating checks, burn hazards, warnings.
 * Input power is Vin · (source current of the solved point), so input = output + Σ terms holds to the
 * duty balance's tolerance (1e-12 relative; the record promises 1e-9). Where the solver could not balance power (an unregulated
 * point at the duty limit), the input power is taken as output + Σ terms and a model-limit warning says so.
 * Runaway: converged false and a danger warning naming the part; the numbers describe no steady state:
 * losses with the runaway part at its limit + 100 K and the others at the last iterate, temperatures
 * capped at each part's limit + 100 K (thermal/fixed-point.ts). All finite.
 * Never throws for physics; throws (RangeError) only for impossible conditions (programmer error).
 * The steps shared with a sweep's lean record are in solve-point.ts; this file builds the full record.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, OperatingPoint } from '../operating-point/types.ts';
import type { ElectroThermalOptions } from '../thermal/fixed-point.ts';
import { ledgerContext, type LedgerContext } from './kernel.ts';
import type { JointLoop } from './joint-loop.ts';
import { lossTerms } from './terms.ts';
import { heatsinkRecords, partTemperatures } from './temperatures.ts';
import { efficiencyOf, settlePoint, solvePoint, type Settled } from './solve-point.ts';
import { keepRecords } from './keep.ts';
import { leanEvaluateWith, type LeanEvaluation } from './lean-evaluate.ts';
import type { Evaluation, Hazard, RatingCheck } from './types.ts';
import { isRegulated } from './regulated.ts';

export { DEFAULT_TOLERANCE_K, POWER_BALANCE_RTOL } from './solve-point.ts';

export type EvaluateOptions = ElectroThermalOptions;

/** Evaluates one operating point of `design` (nominal conditions with overrides). */
export function evaluate(design: Design, conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation {
  return evaluateWith(ledgerContext(design), conditions, options);
}

export interface LedgerEvaluator {
  evaluate(conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation;
  /**
   * The same point as `evaluate` as a lean record for sweeps (lean-evaluate.ts): the same numbers and
   * warnings, without loss-term texts, rating-check and hazard records or waveforms. The record and its
   * lists are the evaluator's own, refilled by the next call; only its `warnings` array is fresh.
   */
  lean(conditions?: Partial<Conditions>, options?: EvaluateOptions): LeanEvaluation;
}

/**
 * An evaluator for many points of one design (sweeps): the design-dependent set-up is done once.
 * The design must not change while the evaluator is in use (make a new one after an edit). Results of
 * `evaluate` are fresh records; nothing in them is shared with the evaluator.
 */
export function ledgerEvaluator(design: Design): LedgerEvaluator {
  const ctx = ledgerContext(design);
  return {
    evaluate: (conditions, options) => evaluateWith(ctx, conditions, options),
    lean: (conditions, options) => leanEvaluateWith(ctx, conditions, options),
  };
}

const finalRecord = (loop: JointLoop, T: Float64Array): OperatingPoint => loop.finalPoint(T);

function evaluateWith(ctx: LedgerContext, conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation {
  const point = solvePoint(ctx, conditions, options, finalRecord);
  const { cond, sol, op } = point;
  const warnings = op.warnings.slice();
  const losses = lossTerms(ctx);
  const temperatures = partTemperatures(ctx.design, ctx.net, sol);
  const checks: RatingCheck[] = [];
  const hazards: Hazard[] = [];
  const settled: Settled = { totalLoss: 0, inputPower: 0 };
  settlePoint(ctx, point, temperatures, warnings, keepRecords(checks, hazards), settled);
  const { totalLoss, inputPower } = settled;
  const outputPower = op.outputPowerW;
  return {
    conditions: cond,
    regulated: isRegulated(op.voutV, ctx.design.spec.voutV),
    converged: sol.converged,
    iterations: sol.iterations,
    efficiency: efficiencyOf(outputPower, inputPower, totalLoss),
    inputPower,
    outputPower,
    totalLoss,
    dutyCycle: op.dutyCycle,
    conductionMode: op.mode,
    losses,
    temperatures,
    hazards,
    checks,
    warnings,
    operatingPoint: op,
    heatsinks: heatsinkRecords(ctx.net, sol),
  };
}
