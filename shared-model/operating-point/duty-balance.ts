/**
 * The one duty solver of the power balance: f(D) = Vin·Iin(D) − Pout − P_path(D) = 0, used by
 * solveOperatingPoint (power-balance.ts, the solver's record) and by the electro-thermal loop
 * (ledger/joint-loop.ts, every point of an evaluation or a sweep), so both find the same duty the same way.
 *
 * Steps from the caller's duty: a Newton step on Vin·Iin alone (its slope from the problem; the loss
 * depends weakly on D), then secant steps, each kept inside the sign bracket [lo, hi] (bisection when a
 * step leaves it; the duty limit is tried once while the balance is not yet bracketed), until
 * |f| ≤ BALANCE_RTOL · (the larger power flow). The slope is kept in the record, so a caller that solves
 * again at nearby conditions (the next electro-thermal step) starts from it.
 * Infeasible: the balance needs more input than D = Dmax gives (reported, not forced).
 * The problem writes its numbers into the record rather than returning them: a number passed to or
 * returned from a call the engine does not inline is boxed on the heap (waveform/interval-stats.ts).
 * Source: conservation of energy over one period; secant and bisection (Press et al., Numerical Recipes
 * 3rd ed. §9.2 [memory for section]).
 */

/** Relative tolerance of the balance: |f| against the larger of Vin·Iin and Pout + P_path. */
export const BALANCE_RTOL = 1e-12;

export const BALANCING = 0;
export const BALANCED = 1;
export const INFEASIBLE = 2;
export const OUT_OF_STEPS = 3;

/** The solver's state: the duty, its residual and scale, the slope carried between calls, the outcome. */
export interface DutyBalance {
  d: number;
  /** Vin·Iin − Pout − P_path at d, W. */
  f: number;
  /** The larger power flow at d, W (the tolerance's scale). */
  scale: number;
  /** d(Vin·Iin)/dD or the last positive secant slope, W; NaN: not known (the problem supplies it). */
  slope: number;
  status: number;
}

export interface BalanceProblem {
  /** Evaluates the problem at duty b.d: writes b.f and b.scale. */
  residualAt(b: DutyBalance): void;
  /** Writes b.slope = d(Vin·Iin)/dD at b.d (the problem was last evaluated at b.d). */
  inputSlopeAt(b: DutyBalance): void;
}

export function newDutyBalance(): DutyBalance {
  return { d: 0, f: 0, scale: 0, slope: NaN, status: BALANCING };
}

function within(b: DutyBalance): boolean {
  return Math.abs(b.f) <= BALANCE_RTOL * Math.max(b.scale, Number.MIN_VALUE);
}

/** Solves from b.d with at most `maxSteps` steps after the first evaluation; b.status says how it ended. */
export function balanceDuty(p: BalanceProblem, b: DutyBalance, dMax: number, maxSteps: number): void {
  p.residualAt(b);
  if (within(b)) {
    b.status = BALANCED;
    return;
  }
  let lo = 0;
  let hi = dMax;
  let hiKnown = false;
  if (b.f < 0) lo = b.d;
  else {
    hi = b.d;
    hiKnown = true;
  }
  for (let k = 0; k < maxSteps; k++) {
    if (!(b.slope > 0)) p.inputSlopeAt(b);
    const d = b.d;
    const f = b.f;
    let next = b.slope > 0 ? d - f / b.slope : NaN;
    if (!(next > lo && next < hi)) {
      if (!hiKnown && f < 0) {
        // Not bracketed yet and the input is short: try the duty limit once, then it is infeasible.
        if (d >= dMax) {
          b.status = INFEASIBLE;
          return;
        }
        next = dMax;
      } else next = 0.5 * (lo + hi);
    }
    b.d = next;
    p.residualAt(b);
    if (next !== d) {
      const secant = (b.f - f) / (next - d);
      if (secant > 0) b.slope = secant;
    }
    if (within(b)) {
      b.status = BALANCED;
      return;
    }
    if (b.f < 0) {
      if (next >= dMax) {
        b.status = INFEASIBLE;
        return;
      }
      lo = next;
    } else {
      hi = next;
      hiKnown = true;
    }
    if (hiKnown && hi - lo <= 4 * Number.EPSILON * hi) {
      b.status = BALANCED;
      return;
    }
  }
  b.status = OUT_OF_STEPS;
}
