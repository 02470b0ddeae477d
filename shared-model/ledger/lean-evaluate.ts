/**
 * The lean evaluation of one point for sweeps: the same solve and the same numbers and warnings as
 * evaluate (solve-point.ts), kept in records that belong to the context and are refilled point after
 * point — the loss of each term (no formula text or input list), the part temperatures, the touch
 * margins, the heatsink temperatures and the final operating point's summary (no waveforms, rating-check
 * or hazard records). Only the warnings array is new for each point: a sweep keeps it.
 * A sweep reduces each LeanEvaluation to its compact point at once (sweep/point-record.ts); the record
 * holds until the context's next evaluation. Equality with the point reduced from the full Evaluation
 * is tested point by point (test/shared-model/sweep/lean-point.test.ts).
 */
import type { Role, TouchLimitRow } from '../design/schema.ts';
import type { Conditions, ConductionMode } from '../operating-point/types.ts';
import type { ElectroThermalOptions } from '../thermal/fixed-point.ts';
import type { Warning } from '../warnings.ts';
import type { LedgerContext } from './kernel.ts';
import type { JointLoop } from './joint-loop.ts';
import { newLeanPoint, type PointSummary } from '../operating-point/lean-point.ts';
import { partTemperaturesInto } from './temperatures.ts';
import { efficiencyOf, picksOf, settlePoint, solvePoint, type Settled } from './solve-point.ts';
import { keepMargins, type Keeper } from './keep.ts';
import type { Mechanism, PartTemperature, RatingCheck } from './types.ts';
import { isRegulated } from './regulated.ts';

/** One loss term's number (the Evaluation's LossTerm without formula and inputs). */
export interface LeanTerm {
  part: Role;
  partName: string;
  mechanism: Mechanism;
  watts: number;
}

/** One touchable part's margin to its touch limit (the Evaluation's Hazard without its texts). */
export interface LeanHazard {
  part: Role;
  partName: string;
  row: TouchLimitRow;
  marginK: number;
}

export interface LeanEvaluation {
  conditions: Conditions;
  /** As Evaluation.regulated. */
  regulated: boolean;
  converged: boolean;
  iterations: number;
  efficiency: number;
  inputPower: number;
  outputPower: number;
  totalLoss: number;
  dutyCycle: number;
  conductionMode: ConductionMode;
  /** Every term of the ledger, in the Evaluation's order. */
  losses: LeanTerm[];
  temperatures: PartTemperature[];
  hazards: LeanHazard[];
  heatsinks: { id: string; name: string; celsius: number }[];
  warnings: Warning[];
  operatingPoint: PointSummary;
}

/** The sweep's reused records of one context (context.ts Workspace.leanRecords). */
export interface LeanRecords {
  evaluation: LeanEvaluation;
  /** settlePoint's sums. */
  settle: Settled;
  /** Warnings only: the touch margins into evaluation.hazards, checks in one scratch record. */
  keeper: Keeper;
}

const newCheck = (): RatingCheck => ({ part: 'switch', check: 'temperature', value: 0, limit: 0, unit: '', marginFraction: 0, ok: true, note: '' });

/** The context's lean records (made on first use). */
function recordsOf(ctx: LedgerContext): LeanRecords {
  const made = ctx.leanRecords;
  if (made) return made;
  const nodes = ctx.net.nodes;
  const index = ctx.net.index;
  const evaluation: LeanEvaluation = {
    conditions: { vinV: 0, loadA: 0, switchingFrequencyHz: 0, ambientC: 0 },
    regulated: false,
    converged: false,
    iterations: 0,
    efficiency: 0,
    inputPower: 0,
    outputPower: 0,
    totalLoss: 0,
    dutyCycle: 0,
    conductionMode: 'CCM',
    losses: ctx.slots.all.map((slot) => ({
      part: slot.role, partName: nodes[index[slot.role]]!.partName, mechanism: slot.model.mechanism, watts: 0,
    })),
    temperatures: [],
    hazards: picksOf(ctx).map((p) => ({ part: p.part, partName: nodes[p.node]!.partName, row: p.row, marginK: 0 })),
    heatsinks: ctx.net.sinks.map((sink) => ({ id: sink.id, name: sink.name, celsius: 0 })),
    warnings: [],
    operatingPoint: (ctx.work.summary ??= newLeanPoint()),
  };
  const settle: Settled = { totalLoss: 0, inputPower: 0 };
  const records = { evaluation, settle, keeper: keepMargins(evaluation.hazards, newCheck()) };
  ctx.leanRecords = records;
  return records;
}

const finalSummary = (loop: JointLoop, T: Float64Array): PointSummary => loop.finalSummary(T);

/** Evaluates one point into the context's lean record (see header); returns that record. */
export function leanEvaluateWith(ctx: LedgerContext, conditions?: Partial<Conditions>, options?: ElectroThermalOptions): LeanEvaluation {
  const { evaluation: r, settle, keeper } = recordsOf(ctx);
  const point = solvePoint(ctx, conditions, options, finalSummary);
  const { cond, sol, op } = point;
  // A fresh array: the summary's own on the fast path, the slow path's private record otherwise.
  const warnings = op.warnings;
  const slots = ctx.slots.all;
  for (let i = 0; i < slots.length; i++) r.losses[i]!.watts = slots[i]!.watts;
  partTemperaturesInto(ctx.design, ctx.net, sol, r.temperatures);
  settlePoint(ctx, point, r.temperatures, warnings, keeper, settle);
  for (let s = 0; s < r.heatsinks.length; s++) r.heatsinks[s]!.celsius = sol.sinkTemperaturesC[s]!;
  r.conditions = cond;
  r.regulated = isRegulated(op.voutV, ctx.design.spec.voutV);
  r.converged = sol.converged;
  r.iterations = sol.iterations;
  r.totalLoss = settle.totalLoss;
  r.inputPower = settle.inputPower;
  r.outputPower = op.outputPowerW;
  r.efficiency = efficiencyOf(r.outputPower, r.inputPower, r.totalLoss);
  r.dutyCycle = op.dutyCycle;
  r.conductionMode = op.mode;
  r.warnings = warnings;
  r.operatingPoint = op;
  return r;
}
