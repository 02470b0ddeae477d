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
 */
import type { Design } from '../design/schema.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';
import { nominalConditions } from '../operating-point/conditions.ts';
import { solveElectroThermal, type ElectroThermalOptions } from '../thermal/fixed-point.ts';
import { networkTemperatures } from '../thermal/network.ts';
import { ledgerContext, type LedgerContext } from './kernel.ts';
import { jointLoop } from './joint-loop.ts';
import { lossTerms } from './terms.ts';
import { heatsinkRecords, partTemperatures } from './temperatures.ts';
import { burnHazards } from './hazards.ts';
import { ratingChecks } from './checks.ts';
import { modelNotes, runawayWarning } from './notes.ts';
import type { Evaluation } from './types.ts';

export type EvaluateOptions = ElectroThermalOptions;

/** Electro-thermal convergence: |Ta + Θ·P(T) − T| ≤ this for every part, K (reported temperatures are Ta + Θ·P exactly). */
export const DEFAULT_TOLERANCE_K = 1e-4;

/** Relative tolerance of the power balance the record promises. */
export const POWER_BALANCE_RTOL = 1e-9;

/** Evaluates one operating point of `design` (nominal conditions with overrides). */
export function evaluate(design: Design, conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation {
  return evaluateWith(ledgerContext(design), conditions, options);
}

export interface LedgerEvaluator {
  evaluate(conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation;
}

/**
 * An evaluator for many points of one design (sweeps): the design-dependent set-up is done once.
 * The design must not change while the evaluator is in use (make a new one after an edit). Results are
 * fresh records; nothing in them is shared with the evaluator.
 */
export function ledgerEvaluator(design: Design): LedgerEvaluator {
  const ctx = ledgerContext(design);
  return { evaluate: (conditions, options) => evaluateWith(ctx, conditions, options) };
}

/** Impossible conditions are a programmer error (the caller validates user input): RangeError, as the solver. */
function checkConditions(c: Conditions): void {
  const bad = (name: string, value: number, rule: string) => {
    throw new RangeError(`conditions.${name} = ${value}: must be a finite number ${rule}`);
  };
  if (!(Number.isFinite(c.vinV) && c.vinV > 0)) bad('vinV', c.vinV, '> 0');
  if (!(Number.isFinite(c.loadA) && c.loadA >= 0)) bad('loadA', c.loadA, '≥ 0');
  if (!(Number.isFinite(c.switchingFrequencyHz) && c.switchingFrequencyHz > 0)) bad('switchingFrequencyHz', c.switchingFrequencyHz, '> 0');
  if (!(Number.isFinite(c.ambientC) && c.ambientC >= -273.15)) bad('ambientC', c.ambientC, '≥ −273.15');
}

function evaluateWith(ctx: LedgerContext, conditions?: Partial<Conditions>, options?: EvaluateOptions): Evaluation {
  const design = ctx.design;
  const cond = nominalConditions(design, conditions);
  checkConditions(cond);
  ctx.vinV = cond.vinV;
  ctx.frequencyHz = cond.switchingFrequencyHz;
  const net = ctx.net;
  const ceiling = ctx.ceilingC;

  const loop = jointLoop(ctx, cond);
  const sol = solveElectroThermal(net.network, cond.ambientC, ceiling, loop.lossAt, {
    toleranceK: options?.toleranceK ?? DEFAULT_TOLERANCE_K,
    maxIterations: options?.maxIterations,
  });
  // The solver's record at the final temperatures; the kernel is refilled on it, so the temperatures are
  // recomputed from exactly the losses the ledger shows (they differ from the loop's by rounding only).
  const op = loop.finalPoint(sol.evaluatedC);
  sol.powersW.set(ctx.nodePowerW);
  if (sol.runawayNode < 0) networkTemperatures(net.network, cond.ambientC, sol.powersW, sol.temperaturesC, sol.sinkTemperaturesC);

  // The network's warnings belong to the context (shared by its evaluations): copied into each record.
  const warnings: Warning[] = [...op.warnings];
  for (const w of net.warnings) warnings.push({ ...w });
  const losses = lossTerms(ctx);
  let totalLoss = 0;
  for (const t of losses) totalLoss += t.watts;
  const outputPower = op.outputPowerW;
  let inputPower = cond.vinV * op.waveforms.inputA;
  if (!(Math.abs(inputPower - (outputPower + totalLoss)) <= POWER_BALANCE_RTOL * Math.max(inputPower, 1e-300))) {
    inputPower = outputPower + totalLoss;
    warnings.push({
      code: 'model-limit', severity: 'caution',
      message: 'The operating point could not balance power at this duty cycle (see the regulation warnings); the input power shown is output power plus the ledger\'s losses.',
    });
  }
  const temperatures = partTemperatures(design, net, sol);
  if (sol.runawayNode >= 0) warnings.push(runawayWarning(net, sol));
  else if (!sol.converged) {
    warnings.push({
      code: 'not-converged', severity: 'caution',
      message: `The electro-thermal iteration stopped after ${sol.iterations} steps ${sol.residualK.toPrecision(2)} K from a fixed point; treat the temperatures as approximate.`,
    });
  }
  const checks = ratingChecks(design, op, temperatures, warnings);
  const hazards = burnHazards(design, net, temperatures, warnings);
  warnings.push(...modelNotes(ctx));
  return {
    conditions: cond,
    converged: sol.converged,
    iterations: sol.iterations,
    efficiency: inputPower > 0 ? outputPower / inputPower : 0,
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
    heatsinks: heatsinkRecords(net, sol),
  };
}
