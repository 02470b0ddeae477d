/**
 * The lean electro-thermal loop: temperatures and duty cycle iterated together, no records built.
 *
 * Each call of `lossAt(T)` (from thermal/fixed-point.ts):
 *   1. conduction parameters at T; the circuit reduced to drops (operating-point/circuit.ts);
 *   2. duty: the one duty solver (operating-point/duty-balance.ts, also solveOperatingPoint's) on
 *      f(D) = Vin·Iin(D) − Pout − P_path(D, T), warm-started from the previous call's duty and slope,
 *      until |f| ≤ 1e-12·Pin (usually one or two steps once the temperatures settle;
 *      a single step while the temperatures are still more than 1 K from their fixed point);
 *   3. per-part losses from the kernel on a reused LeanPoint — at the duties the solver only tries, the
 *      losses that move the duty alone (fillPathLosses), the source's (core loss, gate drive, bias, charge
 *      pulses from the source…) once at the duty kept (completeLosses); the tangents ∂P_i/∂T_i exact, from the
 *      filled slots and the laws' slopes with the electrical point held (kernel-slopes.ts), no further pass.
 * `finalSummary(T)` fills the final point once at the converged duty, as the context's reused summary
 * (operating-point/lean-point.ts) with its warnings and the kernel filled on it; `finalPoint(T)` is that
 * same point with the solver's record built on its numbers (operating-point/assemble.ts), exactly as
 * solveOperatingPoint(design, conditions, conduction(T), { lossOf, sourceLossOf }) would build it (test:
 * test/shared-model/ledger/joint-loop.test.ts).
 * Forced PWM (operating-point/circuit.ts dutyByVoltSeconds): step 2 is the volt-second duty of the circuit
 * at T instead; the losses it does not carry are paid by the source (slots.ts).
 * Slow path: a point the volt-second solution cannot regulate, or whose power balance needs more than
 * the duty limit, is handed to solveOperatingPoint at every step (its fallbacks and warnings apply).
 * One loop object per context, reset for each evaluation; its work records are the context's (no
 * allocation per step on the fast path).
 */
import type { Conditions, OperatingPoint } from '../operating-point/types.ts';
import { circuitInto, dutyByVoltSeconds, type Circuit } from '../operating-point/circuit.ts';
import { shapeAt, shapeOfOwn } from '../operating-point/shape.ts';
import { dutyLimitOf, solveVoltSecond } from '../operating-point/duty.ts';
import { solveOperatingPoint } from '../operating-point/solve.ts';
import { BALANCED, balanceDuty, INFEASIBLE, newDutyBalance, type BalanceProblem, type DutyBalance } from '../operating-point/duty-balance.ts';
import { buildOperatingPoint } from '../operating-point/assemble.ts';
import { addWarnings } from '../operating-point/checks.ts';
import type { ConductionParameters } from '../operating-point/types.ts';
import type { LossAt } from '../thermal/fixed-point.ts';
import { completeLosses, conductionInto, fillLosses, fillPathLosses, type LedgerContext } from './kernel.ts';
import { nodeSlopesInto } from './kernel-slopes.ts';
import { leanPointAt, newLeanPoint, type LeanPoint, type PointSummary } from '../operating-point/lean-point.ts';
import { rippleSquaresOf, rippleSquaresOfLean } from './ripple-squares.ts';

const LOOSE_ABOVE_K = 1;

export interface JointLoop {
  lossAt: LossAt;
  /** The solver's record at temperatures T; leaves the kernel filled at that point. */
  finalPoint(T: Float64Array): OperatingPoint;
  /**
   * The same point as finalPoint, as a summary: on the fast path the context's reused LeanPoint (valid
   * until the next evaluation; its `warnings` array is fresh), else the solver's record.
   */
  finalSummary(T: Float64Array): PointSummary;
  /** True while the fast path is in use. */
  isFast(): boolean;
}

/** The context's loop, reset for an evaluation at `cond` (see header). */
export function jointLoop(ctx: LedgerContext, cond: Conditions): JointLoop {
  let loop = ctx.loop;
  if (!loop) {
    loop = new Loop(ctx);
    ctx.loop = loop;
  }
  loop.reset(cond);
  return loop;
}

/** The loop object a context keeps (context.ts Workspace.loop). */
export class Loop implements JointLoop, BalanceProblem {
  readonly lossAt: LossAt;
  private cond!: Conditions;
  private fast = true;
  private vin = 0;
  private vo = 0;
  private pout = 0;
  private d = 0;
  /** The duty solver's state; its slope is carried from one electro-thermal step to the next. */
  private readonly bal: DutyBalance = newDutyBalance();
  /** Temperatures and conduction parameters of the step in progress (read by residualAt). */
  private T: Float64Array = new Float64Array(0);
  private cp!: ConductionParameters;
  /** Power-balance residual of the last balance, W. */
  private f = 0;
  /** Forced PWM: the duty is the volt-second duty at each step's temperatures (circuit.ts dutyByVoltSeconds). */
  private readonly byVoltSeconds: boolean;

  constructor(private readonly ctx: LedgerContext) {
    this.lossAt = lossAtOf(this);
    this.byVoltSeconds = dutyByVoltSeconds(ctx.design);
  }

  reset(cond: Conditions): void {
    const ctx = this.ctx;
    const w = ctx.work;
    this.cond = cond;
    this.vin = cond.vinV;
    w.ambient.fill(cond.ambientC);
    const c = circuitInto(ctx.design, cond, conductionInto(ctx, w.ambient, w.cp), w.circuit);
    const vs0 = solveVoltSecond(c, ctx.design.spec.maxDuty, w.shape);
    this.fast = vs0.limit === 'none';
    this.vo = vs0.vo;
    this.pout = vs0.vo * cond.loadA;
    this.d = vs0.d;
    this.bal.slope = NaN;
  }

  isFast(): boolean {
    return this.fast;
  }

  /** What the source pays at the last fill beside Vin·Iin of the waveforms (see slowPoint). */
  private sourcePaidW(): number {
    const ctx = this.ctx;
    return this.byVoltSeconds ? ctx.sourceLossW + ctx.offDropLossW : ctx.sourceLossW;
  }

  private slowPoint(T: Float64Array, cp: ConductionParameters): OperatingPoint {
    const ctx = this.ctx;
    const byVoltSeconds = this.byVoltSeconds;
    const op = solveOperatingPoint(ctx.design, this.cond, cp, {
      lossOf: byVoltSeconds ? undefined : (p) => {
        fillLosses(ctx, p, rippleSquaresOf(p, ctx.ripple), T, cp);
        return ctx.pathLossW;
      },
      // Where the duty is not power-balanced (forced PWM, an unregulated point) the losses the volt-second
      // drops do not carry are paid by the source at that duty.
      sourceLossOf: (p) => {
        fillLosses(ctx, p, rippleSquaresOf(p, ctx.ripple), T, cp);
        return ctx.sourceLossW + (byVoltSeconds || !p.regulated ? ctx.offDropLossW : 0);
      },
    });
    ctx.op = op;
    return op;
  }

  /**
   * Fills the kernel's path losses at the current duty and sets `f`, the power-balance residual
   * Vin·Iin − Pout − P_path (a field, not a return value: a number returned across a call is boxed on the
   * heap). The source's losses wait for completeLosses at the duty the step keeps (kernel.ts).
   */
  private balance(T: Float64Array, cp: ConductionParameters): void {
    const ctx = this.ctx;
    const { circuit: c, shape: s, lean } = ctx.work;
    s.d = this.d;
    s.vo = this.vo;
    shapeOfOwn(c, s);
    leanPointAt(c, s, lean);
    fillPathLosses(ctx, lean, rippleSquaresOfLean(lean, ctx.ripple), T, cp);
    this.f = this.vin * s.iin - this.pout - ctx.pathLossW;
  }

  /** The one duty solver's problem (operating-point/duty-balance.ts): the kernel filled at duty b.d. */
  residualAt(b: DutyBalance): void {
    this.d = b.d;
    this.balance(this.T, this.cp);
    b.f = this.f;
    b.scale = Math.max(this.vin * this.ctx.work.shape.iin, this.pout + this.ctx.pathLossW);
  }

  /** d(Vin·Iin)/dD at b.d by a forward difference on the reused probe shape. */
  inputSlopeAt(b: DutyBalance): void {
    const w = this.ctx.work;
    const d = b.d;
    const h = 1e-7 * Math.max(d, 1e-3);
    b.slope = (this.vin * (shapeAt(w.circuit, Math.min(d + h, this.ctx.design.spec.maxDuty), this.vo, w.probe).iin - w.shape.iin)) / h;
  }

  /** One electro-thermal step (see header): the solver's LossAt. */
  step(T: Float64Array, P: Float64Array, G: Float64Array, residualK: number): boolean {
    const ctx = this.ctx;
    const w = ctx.work;
    const cp = conductionInto(ctx, T, w.cp);
    if (!this.fast) {
      this.slowPoint(T, cp);
      P.set(ctx.nodePowerW);
      nodeSlopesInto(ctx, T, G);
      return true;
    }
    const dMax = ctx.design.spec.maxDuty;
    const c = circuitInto(ctx.design, this.cond, cp, w.circuit);
    if (this.byVoltSeconds) {
      // Forced PWM: the volt-second duty of the circuit at T; the losses it does not carry are the source's.
      const vs = solveVoltSecond(c, dMax, w.probe);
      if (vs.limit !== 'none') {
        this.fast = false;
        return this.step(T, P, G, residualK);
      }
      this.d = vs.d;
      this.balance(T, cp);
      completeLosses(ctx);
      P.set(ctx.nodePowerW);
      nodeSlopesInto(ctx, T, G);
      return true;
    }
    // Far from the thermal fixed point (residual above LOOSE_ABOVE_K) one duty step is enough: the
    // temperatures, and with them the losses, will still move. Near it the duty is balanced fully.
    const b = this.bal;
    this.T = T;
    this.cp = cp;
    b.d = this.d;
    balanceDuty(this, b, dMax, residualK > LOOSE_ABOVE_K ? 1 : 12);
    if (b.status === INFEASIBLE) {
      // The balance needs more than the duty limit: hand the point to the solver's fallback.
      this.fast = false;
      return this.step(T, P, G, residualK);
    }
    const ok = b.status === BALANCED;
    // The last residual was at the duty kept (duty-balance.ts): its source losses complete the fill.
    completeLosses(ctx);
    P.set(ctx.nodePowerW);
    nodeSlopesInto(ctx, T, G);
    return ok;
  }

  /**
   * The final point's conduction parameters at T (into the context's work record) and, on the fast path,
   * its circuit with the inductor-current shape at the loop's duty; null when the point takes the slow
   * path (the loop already did, or the duty limit binds at T).
   */
  private finalCircuit(T: Float64Array): Circuit | null {
    const ctx = this.ctx;
    const w = ctx.work;
    const cp = conductionInto(ctx, T, w.cp);
    if (!this.fast) return null;
    const c = circuitInto(ctx.design, this.cond, cp, w.circuit);
    if (dutyLimitOf(c, ctx.design.spec.maxDuty, w.probe) !== 'none') {
      this.fast = false;
      return null;
    }
    if (this.byVoltSeconds) this.d = solveVoltSecond(c, ctx.design.spec.maxDuty, w.probe).d;
    shapeAt(c, this.d, this.vo, w.shape);
    return c;
  }

  finalPoint(T: Float64Array): OperatingPoint {
    const c = this.finalCircuit(T);
    if (!c) return this.slowPoint(T, this.ctx.work.cp);
    // The record on the summary's numbers (assemble.ts): the final point is computed once.
    const p = this.summaryAt(c, T);
    const dutyMethod = this.byVoltSeconds ? 'volt-second' : 'power-balance';
    const op = buildOperatingPoint(c, this.ctx.work.shape, this.cond, { regulated: true, dutyMethod, extraInputA: 0, warnings: p.warnings }, p);
    op.waveforms.inputA = p.waveforms.inputA;
    this.ctx.op = op;
    return op;
  }

  finalSummary(T: Float64Array): PointSummary {
    const c = this.finalCircuit(T);
    if (!c) return this.slowPoint(T, this.ctx.work.cp);
    const p = this.summaryAt(c, T);
    this.ctx.op = p;
    return p;
  }

  /**
   * The final point as the context's reused summary (a fresh warnings array), the kernel filled on it and
   * the source-paid losses added to its source current; `c` and the work shape at the loop's duty.
   */
  private summaryAt(c: Circuit, T: Float64Array): LeanPoint {
    const ctx = this.ctx;
    const w = ctx.work;
    w.summary ??= newLeanPoint();
    const p = leanPointAt(c, w.shape, w.summary, true, this.cond);
    p.warnings = [];
    addWarnings({ design: ctx.design, circuit: c, limit: 'none', powerBalanceFallback: false }, p);
    fillLosses(ctx, p, rippleSquaresOfLean(p, ctx.ripple), T, w.cp);
    p.waveforms.inputA += Math.max(this.sourcePaidW(), 0) / this.vin;
    return p;
  }
}

/**
 * The solver's callback for `loop`. Made here rather than as an arrow function in the constructor: there,
 * capturing `this` led V8 to keep every context alive through its young-generation collections and then
 * to allocate contexts directly in the old generation (measured: a single `evaluate` 5× slower).
 */
function lossAtOf(loop: Loop): LossAt {
  return (T, P, G, residualK) => loop.step(T, P, G, residualK);
}
