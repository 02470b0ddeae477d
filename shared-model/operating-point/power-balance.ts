/**
 * Duty cycle from the power balance: Vin · Iin(D) = Pout + loss(D), the seam where the loss ledger makes
 * the operating point self-consistent (solveOperatingPoint with lossOf).
 *
 * Iin(D) is the mean current of the input path for the shape at D (the topology record's intervals: buck
 * CCM D·Io, buck DCM D·Ipk/2, boost CCM Io/D', boost DCM Ipk·(D + D2)/2). The steps are the one duty
 * solver's (duty-balance.ts), the same the electro-thermal loop uses.
 * Infeasible (the balance needs more input than D = Dmax gives) is reported, not forced.
 * Source: conservation of energy over one period; duty-balance.ts.
 */
import type { Circuit } from './circuit.ts';
import { shapeAt, type Shape } from './shape.ts';
import { balanceDuty, INFEASIBLE, newDutyBalance, type BalanceProblem, type DutyBalance } from './duty-balance.ts';

export interface PowerBalanceResult {
  d: number;
  feasible: boolean;
  /** Loss returned at the final duty, W. */
  lossW: number;
}

const MAX_STEPS = 100;

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
  const problem: BalanceProblem = {
    residualAt(b: DutyBalance): void {
      shapeAt(c, b.d, vo, s);
      const loss = lossAt(s);
      if (!Number.isFinite(loss)) throw new Error(`lossOf returned ${loss} at duty ${b.d}; it must return a finite number of watts`);
      lastLoss = loss;
      b.f = vin * s.iin - pout - loss;
      b.scale = Math.max(pout + Math.abs(loss), vin * s.iin);
    },
    inputSlopeAt(b: DutyBalance): void {
      const iin0 = shapeAt(c, b.d, vo, s).iin;
      const h = 1e-7 * Math.max(b.d, 1e-3);
      b.slope = (vin * (shapeAt(c, Math.min(b.d + h, dMax), vo, s).iin - iin0)) / h;
    },
  };
  const b = newDutyBalance();
  b.d = dStart;
  balanceDuty(problem, b, dMax, MAX_STEPS);
  return { d: b.status === INFEASIBLE ? dMax : b.d, feasible: b.status !== INFEASIBLE, lossW: lastLoss };
}
