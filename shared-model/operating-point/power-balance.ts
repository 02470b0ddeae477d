/**
 * Duty cycle from the power balance: Vin · Iin(D) = Pout + loss(D), the seam where the loss ledger makes
 * the operating point self-consistent.
 *
 * Iin(D) is the mean current of the input path for the shape at D: buck CCM D·Io, buck DCM D·Ipk/2,
 * boost CCM Io/D', boost DCM Ipk·(D + D2)/2. The loss depends weakly on D, so a Newton step on Vin·Iin
 * from the volt-second duty followed by secant steps (kept inside a sign bracket, bisection otherwise)
 * reaches |Vin·Iin − Pout − loss| ≤ 1e-13 · Pin in a handful of loss evaluations.
 * Infeasible (the balance needs more input than D = Dmax gives) is reported, not forced.
 * Source: conservation of energy over one period; secant and bisection (Press et al., Numerical Recipes
 * 3rd ed. §9.2 [memory for section]).
 */
import type { Circuit } from './circuit.ts';
import { shapeAt, type Shape } from './shape.ts';

export interface PowerBalanceResult {
  d: number;
  feasible: boolean;
  /** Loss returned at the final duty, W. */
  lossW: number;
}

const REL_TOL = 1e-13;

export function solvePowerBalance(
  c: Circuit,
  dMax: number,
  s: Shape,
  dStart: number,
  vo: number,
  lossAt: (shape: Shape) => number,
): PowerBalanceResult {
  const pout = vo * c.loadA;
  const vin = c.vinV;
  let lastLoss = 0;
  const f = (d: number): number => {
    shapeAt(c, d, vo, s);
    const pin = vin * s.iin;
    const loss = lossAt(s);
    if (!Number.isFinite(loss)) throw new Error(`lossOf returned ${loss} at duty ${d}; it must return a finite number of watts`);
    lastLoss = loss;
    return pin - pout - loss;
  };
  const within = (fx: number) => Math.abs(fx) <= REL_TOL * Math.max(pout + Math.abs(lastLoss), vin * s.iin);

  let x0 = dStart;
  let f0 = f(x0);
  if (within(f0)) return { d: x0, feasible: true, lossW: lastLoss };
  // Bracket: f(0) < 0 (no input, positive output plus loss); f(Dmax) not yet known.
  let lo = 0;
  let hi = dMax;
  let hiKnown = false;
  if (f0 < 0) lo = x0;
  else {
    hi = x0;
    hiKnown = true;
  }
  // First step: Newton on Vin·Iin alone (the loss slope is small).
  const iin0 = shapeAt(c, x0, vo, s).iin;
  const h = 1e-7 * Math.max(x0, 1e-3);
  const slope = (vin * (shapeAt(c, Math.min(x0 + h, dMax), vo, s).iin - iin0)) / h;
  let x1 = slope > 0 ? x0 - f0 / slope : f0 < 0 ? 0.5 * (x0 + dMax) : 0.5 * x0;
  for (let iter = 0; iter < 100; iter++) {
    if (!(x1 > lo && x1 < hi) && !(x1 === dMax && !hiKnown)) x1 = x1 >= hi && !hiKnown ? dMax : 0.5 * (lo + hi);
    const f1 = f(x1);
    if (within(f1)) return { d: x1, feasible: true, lossW: lastLoss };
    if (f1 < 0) {
      if (x1 >= dMax) return { d: dMax, feasible: false, lossW: lastLoss };
      lo = x1;
    } else {
      hi = x1;
      hiKnown = true;
    }
    if (hiKnown && hi - lo <= 4 * Number.EPSILON * hi) return { d: x1, feasible: true, lossW: lastLoss };
    const x2 = f1 !== f0 ? x1 - (f1 * (x1 - x0)) / (f1 - f0) : Number.NaN;
    x0 = x1;
    f0 = f1;
    // A step that is not finite tests the duty limit first (until it is known to balance), then bisects.
    x1 = Number.isFinite(x2) ? x2 : hiKnown ? 0.5 * (lo + hi) : dMax;
  }
  return { d: x0, feasible: true, lossW: lastLoss };
}
