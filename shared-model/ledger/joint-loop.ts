/**
 * The lean electro-thermal loop: temperatures and duty cycle iterated together, no records built.
 *
 * Each call of `lossAt(T)` (from thermal/fixed-point.ts):
 *   1. conduction parameters at T; the circuit reduced to drops (operating-point/circuit.ts);
 *   2. duty: secant steps on f(D) = Vin·Iin(D) − Pout − P_path(D, T), warm-started from the previous
 *      call's duty and slope, until |f| ≤ 1e-12·Pin (usually one or two steps once the temperatures settle;
 *      a single step while the temperatures are still more than 1 K from their fixed point);
 *   3. per-part losses from the kernel on a reused LeanPoint; the tangents ∂P_i/∂T_i by one more kernel
 *      pass with every temperature raised by SLOPE_STEP_K and the electrical point held.
 * `finalPoint(T)` then builds the solver's OperatingPoint record once at the converged duty, exactly as
 * solveOperatingPoint(design, conditions, conduction(T), { lossOf, sourceLossOf }) would (test:
 * test/shared-model/ledger/joint-loop.test.ts).
 * Slow path: a point the volt-second solution cannot regulate, or whose power balance needs more than
 * the duty limit, is handed to solveOperatingPoint at every step (its fallbacks and warnings apply).
 */
import type { Conditions, OperatingPoint } from '../operating-point/types.ts';
import { circuitOf, type Circuit } from '../operating-point/circuit.ts';
import { shapeAt } from '../operating-point/shape.ts';
import { solveVoltSecond } from '../operating-point/duty.ts';
import { solveOperatingPoint } from '../operating-point/solve.ts';
import { buildOperatingPoint } from '../operating-point/assemble.ts';
import { addWarnings } from '../operating-point/checks.ts';
import type { ConductionParameters } from '../operating-point/types.ts';
import type { LossAt } from '../thermal/fixed-point.ts';
import { conductionAt, fillLosses, type LedgerContext } from './kernel.ts';
import { leanPointAt, rippleSquaresOf, rippleSquaresOfLean, type PointView, type RippleSquares } from './point-view.ts';

export const SLOPE_STEP_K = 0.01;
const BALANCE_RTOL = 1e-12;
const LOOSE_ABOVE_K = 1;

export interface JointLoop {
  lossAt: LossAt;
  /** The solver's record at temperatures T; leaves the kernel filled at that point. */
  finalPoint(T: Float64Array): OperatingPoint;
  /** True while the fast path is in use. */
  isFast(): boolean;
}

export function jointLoop(ctx: LedgerContext, cond: Conditions): JointLoop {
  const design = ctx.design;
  const n = ctx.net.nodes.length;
  const dMax = design.spec.maxDuty;
  const vin = cond.vinV;
  const { shape: s, probe, lean, raised: Tp, base } = ctx.work;
  const ambient = new Float64Array(n).fill(cond.ambientC);
  const vs0 = solveVoltSecond(circuitOf(design, cond, conductionAt(ctx, ambient)), dMax, s);
  let fast = vs0.limit === 'none';
  const vo = vs0.vo;
  const pout = vo * cond.loadA;
  let d = vs0.d;
  let slope = NaN;

  const slowPoint = (T: Float64Array, cp: ConductionParameters): OperatingPoint => {
    const op = solveOperatingPoint(design, cond, cp, {
      lossOf: (p) => {
        fillLosses(ctx, p, rippleSquaresOf(p, ctx.ripple), T, cp);
        return ctx.pathLossW;
      },
      sourceLossOf: (p) => {
        fillLosses(ctx, p, rippleSquaresOf(p, ctx.ripple), T, cp);
        return ctx.sourceLossW;
      },
    });
    ctx.op = op;
    return op;
  };

  const balance = (c: Circuit, T: Float64Array, cp: ConductionParameters): number => {
    shapeAt(c, d, vo, s);
    leanPointAt(c, s, lean);
    fillLosses(ctx, lean, rippleSquaresOfLean(lean, ctx.ripple), T, cp);
    return vin * s.iin - pout - ctx.pathLossW;
  };

  const balanced = (f: number): boolean =>
    Math.abs(f) <= BALANCE_RTOL * Math.max(vin * s.iin, pout + ctx.pathLossW, Number.MIN_VALUE);

  const slopesAt = (view: PointView, ripple: RippleSquares, T: Float64Array, P: Float64Array, G: Float64Array): void => {
    base.set(P);
    for (let i = 0; i < n; i++) Tp[i] = T[i]! + SLOPE_STEP_K;
    fillLosses(ctx, view, ripple, Tp, conductionAt(ctx, Tp), true);
    const q = ctx.nodePowerW;
    for (let i = 0; i < n; i++) G[i] = (q[i]! - base[i]!) / SLOPE_STEP_K;
  };

  const lossAt: LossAt = (T, P, G, residualK) => {
    const cp = conductionAt(ctx, T);
    if (!fast) {
      const op = slowPoint(T, cp);
      P.set(ctx.nodePowerW);
      slopesAt(op, ctx.ripple, T, P, G);
      return true;
    }
    const c = circuitOf(design, cond, cp);
    let f = balance(c, T, cp);
    let ok = balanced(f);
    // Far from the thermal fixed point (residual above LOOSE_ABOVE_K) one duty step is enough: the
    // temperatures, and with them the losses, will still move. Near it the duty is balanced fully.
    const steps = residualK > LOOSE_ABOVE_K ? 1 : 12;
    for (let k = 0; k < steps && !ok; k++) {
      if (!(slope > 0)) {
        const h = 1e-7 * Math.max(d, 1e-3);
        slope = (vin * (shapeAt(c, Math.min(d + h, dMax), vo, probe).iin - s.iin)) / h;
      }
      let next = slope > 0 ? d - f / slope : f < 0 ? 0.5 * (d + dMax) : 0.5 * d;
      if (!(next > 0)) next = 0.5 * d;
      if (next > dMax) {
        if (d >= dMax) {
          // The balance needs more than the duty limit: hand the point to the solver's fallback.
          fast = false;
          return lossAt(T, P, G, residualK);
        }
        next = dMax;
      }
      const fPrev = f;
      const dPrev = d;
      d = next;
      f = balance(c, T, cp);
      if (d !== dPrev) {
        const secant = (f - fPrev) / (d - dPrev);
        if (secant > 0) slope = secant;
      }
      ok = balanced(f);
    }
    P.set(ctx.nodePowerW);
    slopesAt(lean, ctx.ripple, T, P, G);
    return ok;
  };

  const finalPoint = (T: Float64Array): OperatingPoint => {
    const cp = conductionAt(ctx, T);
    if (!fast) return slowPoint(T, cp);
    const c = circuitOf(design, cond, cp);
    const vs = solveVoltSecond(c, dMax, probe);
    if (vs.limit !== 'none') {
      fast = false;
      return slowPoint(T, cp);
    }
    shapeAt(c, d, vo, s);
    const op = buildOperatingPoint(c, s, cond, { regulated: true, dutyMethod: 'power-balance', extraInputA: 0, warnings: [] });
    addWarnings({ design, circuit: c, limit: 'none', powerBalanceFallback: false }, op);
    fillLosses(ctx, op, rippleSquaresOf(op, ctx.ripple), T, cp);
    op.waveforms.inputA += Math.max(ctx.sourceLossW, 0) / vin;
    ctx.op = op;
    return op;
  };

  return {
    lossAt,
    finalPoint,
    isFast: () => fast,
  };
}
