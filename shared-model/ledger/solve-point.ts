/**
 * The steps every evaluation shares, whether it builds the full Evaluation record (evaluate.ts) or a
 * sweep's lean record (lean-evaluate.ts):
 *   solvePoint: conditions checked, pulse skipping decided (below its mode-change load the point is solved
 *     at the pulse rate, light-load/pulse-skipping.ts), the electro-thermal fixed point solved by the joint loop, the final
 *     point filled (the solver's record, or its lean summary), node temperatures recomputed from exactly
 *     the losses the ledger shows (they differ from the loop's by rounding only);
 *   settlePoint: Σ terms, input power (Vin · source current incl. source-paid terms) checked against
 *     output + Σ terms (a model-limit warning where it does not close), and every warning in its order — operating point,
 *     network, power balance, runaway or not converged, ratings, burn hazards, model notes.
 * The two records differ only in what they keep, never in a number or a warning (test:
 * test/shared-model/sweep/lean-point.test.ts).
 */
import type { Conditions } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';
import { conductionParameters, nominalConditions, uniformTemps } from '../operating-point/conditions.ts';
import { pulseSkippingAt, solveConditions } from '../light-load/pulse-skipping.ts';
import { solveElectroThermal, type ElectroThermalOptions, type ElectroThermalSolution } from '../thermal/fixed-point.ts';
import { networkTemperatures } from '../thermal/network.ts';
import type { LedgerContext } from './kernel.ts';
import { jointLoop, type JointLoop } from './joint-loop.ts';
import { burnHazards, touchPicks, type TouchPick } from './hazards.ts';
import { ratingChecks } from './checks.ts';
import { modelNotes, runawayWarning } from './notes.ts';
import { curveNotes } from '../curves/notes.ts';
import { pulseSkippingNotes } from '../light-load/notes.ts';
import type { PointSummary } from '../operating-point/lean-point.ts';
import type { PartTemperature } from './types.ts';
import type { Keeper } from './keep.ts';

/** Electro-thermal convergence: |Ta + Θ·P(T) − T| ≤ this for every part, K (reported temperatures are Ta + Θ·P exactly). */
export const DEFAULT_TOLERANCE_K = 1e-4;

/**
 * Relative tolerance of the power-balance check: |Vin·Iin + source terms − (Pout + Σ losses)| against the
 * larger of the two sides. Where the duty is power-balanced the two agree to the solver's 1e-12; in forced
 * PWM (volt-second duty) they agree as far as the volt-second drops and the loss formulas describe the same
 * circuit (the interval-mean drops against Irms²·R's mean part) — measured ≤ 2e-16 on the synchronous-buck demo
 * from 0 A to 4 A; a larger gap means the models disagree and the record says so.
 */
export const POWER_BALANCE_RTOL = 1e-9;

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

export interface SolvedPoint<P extends PointSummary> {
  cond: Conditions;
  /** The context's thermal workspace: valid until the context's next evaluation. */
  sol: ElectroThermalSolution;
  op: P;
}

/**
 * Solves the point at `conditions` (nominal with overrides) and fills its final point with `final`
 * (the loop's finalPoint for the record, finalSummary for a sweep); see the header.
 */
export function solvePoint<P extends PointSummary>(
  ctx: LedgerContext,
  conditions: Partial<Conditions> | undefined,
  options: ElectroThermalOptions | undefined,
  final: (loop: JointLoop, T: Float64Array) => P,
): SolvedPoint<P> {
  const cond = nominalConditions(ctx.design, conditions);
  checkConditions(cond);
  ctx.vinV = cond.vinV;
  // Pulse skipping: below its mode-change load the point is solved at the pulse rate (light-load/).
  const pfm = ctx.design.topology.lightLoad === 'pulse-skipping'
    ? pulseSkippingAt(ctx.design, cond, conductionParameters(ctx.design, uniformTemps(cond.ambientC)))
    : null;
  ctx.pulseSkipping = pfm;
  const solveCond = solveConditions(cond, pfm);
  ctx.frequencyHz = solveCond.switchingFrequencyHz;
  const net = ctx.net;
  const loop = jointLoop(ctx, solveCond);
  const tolerance = { toleranceK: options?.toleranceK ?? DEFAULT_TOLERANCE_K, maxIterations: options?.maxIterations };
  const sol = solveElectroThermal(net.network, cond.ambientC, ctx.ceilingC, loop.lossAt, tolerance, ctx.work.thermal);
  // The final point at the final temperatures; the kernel is refilled on it, so the temperatures are
  // recomputed from exactly the losses the ledger shows (they differ from the loop's by rounding only).
  const op = final(loop, sol.evaluatedC);
  sol.powersW.set(ctx.nodePowerW);
  if (sol.runawayNode < 0) networkTemperatures(net.network, cond.ambientC, sol.powersW, sol.temperaturesC, sol.sinkTemperaturesC);
  return { cond, sol, op };
}

/**
 * Efficiency of a settled point: output over the larger of the input power and output + Σ losses (equal
 * within POWER_BALANCE_RTOL where the balance closes; the conservative side where it does not); 0 at no output.
 */
export function efficiencyOf(outputPower: number, inputPower: number, totalLoss: number): number {
  const base = Math.max(inputPower, outputPower + totalLoss);
  return base > 0 ? outputPower / base : 0;
}

/** The warning of a power balance that does not close (see POWER_BALANCE_RTOL). */
function powerBalanceWarning(inputPower: number, demand: number): Warning {
  const gap = (100 * (inputPower - demand)) / Math.max(inputPower, demand);
  return {
    code: 'model-limit', severity: 'caution',
    message: `The power balance does not close: the input (Vin × source current + source-paid losses) is ${inputPower.toPrecision(6)} W, output plus losses ${demand.toPrecision(6)} W (${gap.toPrecision(3)} %, tolerance ${POWER_BALANCE_RTOL * 100} %). The efficiency shown uses the larger of the two; treat it and the duty cycle as approximate (see the regulation warnings).`,
  };
}

/** The touch-limit rows of the context's design (made once per context). */
export function picksOf(ctx: LedgerContext): TouchPick[] {
  ctx.touchPicks ??= touchPicks(ctx.design, ctx.net);
  return ctx.touchPicks;
}

/** The sums settlePoint writes (a record the caller owns). */
export interface Settled {
  totalLoss: number;
  inputPower: number;
}

/**
 * Σ terms, input power and the warnings after the operating point's own (see header), appended to
 * `warnings`; temps: the point's PartTemperature records (node order).
 */
export function settlePoint(
  ctx: LedgerContext,
  point: SolvedPoint<PointSummary>,
  temps: readonly PartTemperature[],
  warnings: Warning[],
  keeper: Keeper,
  into: Settled,
): void {
  const { cond, sol, op } = point;
  const net = ctx.net;
  // The network's warnings belong to the context (shared by its evaluations): copied into each record.
  for (let i = 0; i < net.warnings.length; i++) warnings.push({ ...net.warnings[i]! });
  const slots = ctx.slots.all;
  let totalLoss = 0;
  for (let i = 0; i < slots.length; i++) totalLoss += slots[i]!.watts;
  const outputPower = op.outputPowerW;
  // The power balance is a check, never an assignment: the input power is Vin × the source current of the
  // waveforms plus the source-paid terms (op.waveforms.inputA holds both), compared with Pout + Σ losses.
  const inputPower = cond.vinV * op.waveforms.inputA;
  const demand = outputPower + totalLoss;
  if (!(Math.abs(inputPower - demand) <= POWER_BALANCE_RTOL * Math.max(inputPower, demand, 1e-300))) {
    warnings.push(powerBalanceWarning(inputPower, demand));
  }
  if (sol.runawayNode >= 0) warnings.push(runawayWarning(net, sol));
  else if (!sol.converged) {
    warnings.push({
      code: 'not-converged', severity: 'caution',
      message: `The electro-thermal iteration stopped after ${sol.iterations} steps ${sol.residualK.toPrecision(2)} K from a fixed point; treat the temperatures as approximate.`,
    });
  }
  pulseSkippingNotes(ctx.pulseSkipping, warnings);
  ratingChecks(ctx.design, op, temps, warnings, keeper);
  burnHazards(picksOf(ctx), temps, warnings, keeper, sol.runawayNode >= 0);
  modelNotes(ctx, warnings);
  curveNotes(ctx.design, op, temps, warnings);
  into.totalLoss = totalLoss;
  into.inputPower = inputPower;
}
