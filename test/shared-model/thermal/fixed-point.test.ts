import { describe, expect, it } from 'vitest';
import { RUNAWAY_BAND_K, solveElectroThermal } from '../../../shared-model/thermal/fixed-point.ts';
import { thermalNetwork } from '../../../shared-model/thermal/network.ts';
import { closeTo } from '../../helpers/close-to.ts';

// docs/methods.md §10 linear case: P = P0·(1 + a·(T − T0)), P0 2 W at T0 25 °C, a 0.005/K, Ta 25 °C.
const P0 = 2; // docs/methods.md §10
const A = 0.005; // docs/methods.md §10
const T0 = 25; // docs/methods.md §10
const linearLoss = (temps: Float64Array, powers: Float64Array) => {
  powers[0] = P0 * (1 + A * (temps[0]! - T0));
};
const withTangent = (temps: Float64Array, powers: Float64Array, slopes: Float64Array) => {
  linearLoss(temps, powers);
  slopes[0] = P0 * A;
};
const ceiling = (...limits: number[]) => Float64Array.from(limits.map((l) => l + RUNAWAY_BAND_K));

describe('solveElectroThermal on a single part with a loss linear in temperature', () => {
  it('finds 158.3333 °C with loop gain 0.4 at Rth 40 K/W (secant slopes)', () => {
    const sol = solveElectroThermal(thermalNetwork([40], [-1], []), 25, ceiling(200), linearLoss);
    expect(sol.converged).toBe(true);
    closeTo(sol.temperaturesC[0]!, 158.3333333333, 1e-9); // docs/methods.md §10: (Ta + Rth·P0·(1 − a·T0))/(1 − Rth·P0·a)
    closeTo(sol.loopGain[0]!, 0.4, 1e-9); // docs/methods.md §10: gain Rth·P0·a = 0.4
    expect(sol.runawayNode).toBe(-1);
    expect(sol.iterations).toBeLessThanOrEqual(4);
  });

  it('lands on it in one Newton step with tangent slopes', () => {
    const sol = solveElectroThermal(thermalNetwork([40], [-1], []), 25, ceiling(200), withTangent);
    closeTo(sol.temperaturesC[0]!, 158.3333333333, 1e-9); // docs/methods.md §10
    expect(sol.iterations).toBe(2); // one step from ambient, one evaluation to confirm
  });

  it('reports runaway (gain 1, no fixed point) at Rth 100 K/W with finite, capped numbers', () => {
    for (const [lossAt, reasons] of [
      [linearLoss, ['loop-gain', 'ceiling']], // secant slopes need two sightings; the ceiling may come first
      [withTangent, ['loop-gain']],
    ] as const) {
      const sol = solveElectroThermal(thermalNetwork([100], [-1], []), 25, ceiling(175), lossAt);
      expect(sol.converged).toBe(false); // docs/methods.md §10: Rth 100 K/W → runaway
      expect(sol.runawayNode).toBe(0);
      expect(reasons).toContain(sol.runawayReason);
      expect(sol.temperaturesC[0]).toBe(175 + RUNAWAY_BAND_K); // capped at the ceiling (fixed-point.ts header)
      expect(Number.isFinite(sol.powersW[0]!)).toBe(true);
    }
  });

  it('reports runaway by the ceiling when the gain is just below 1 (fixed point far above the limit)', () => {
    // gain 0.995: the fixed point (Ta + θ·P0·(1 − a·T0))/(1 − gain) lies thousands of kelvin up.
    const sol = solveElectroThermal(thermalNetwork([99.5], [-1], []), 25, ceiling(150), withTangent);
    expect(sol.converged).toBe(false);
    expect(sol.runawayReason).toBe('ceiling');
    expect(sol.temperaturesC[0]).toBe(150 + RUNAWAY_BAND_K);
  });
});

describe('solveElectroThermal on coupled and non-linear cases', () => {
  it('solves two parts on a shared sink against the linear system solved by hand', () => {
    // P1 = 3·(1 + 0.004·(T1 − 25)), P2 = 1·(1 + 0.006·(T2 − 25)); own θ 2 and 5 K/W, θSA 4 K/W, Ta 25 °C.
    const lossAt = (t: Float64Array, p: Float64Array) => {
      p[0] = 3 * (1 + 0.004 * (t[0]! - 25));
      p[1] = 1 * (1 + 0.006 * (t[1]! - 25));
    };
    const sol = solveElectroThermal(thermalNetwork([2, 5], [0, 0], [4]), 25, ceiling(150, 150), lossAt);
    // x_i = T_i − 25: x1 = 6·(3 + 0.012·x1) + 4·(3 + 0.012·x1 + 1 + 0.006·x2)... written as
    // x1 = (2 + 4)·p1 + 4·p2, x2 = 4·p1 + (5 + 4)·p2 with p1 = 3 + 0.012·x1, p2 = 1 + 0.006·x2 (Cramer's rule):
    const a11 = 1 - 6 * 0.012, a12 = -4 * 0.006, a21 = -4 * 0.012, a22 = 1 - 9 * 0.006;
    const b1 = 6 * 3 + 4 * 1, b2 = 4 * 3 + 9 * 1;
    const det = a11 * a22 - a12 * a21;
    closeTo(sol.temperaturesC[0]!, 25 + (b1 * a22 - a12 * b2) / det, 1e-9); // Cramer's rule on the linear network equations
    closeTo(sol.temperaturesC[1]!, 25 + (a11 * b2 - a21 * b1) / det, 1e-9);
    expect(sol.converged).toBe(true);
  });

  it('finds the lower, stable fixed point of an exponential leakage loss', () => {
    // P = 0.05·2^((T − 25)/10) W, θ 50 K/W: two fixed points; the iteration from ambient must take the lower.
    const lossAt = (t: Float64Array, p: Float64Array) => {
      p[0] = 0.05 * 2 ** ((t[0]! - 25) / 10);
    };
    const sol = solveElectroThermal(thermalNetwork([50], [-1], []), 25, ceiling(150), lossAt);
    expect(sol.converged).toBe(true);
    // Independent check: bisection on g(T) = 25 + 50·P(T) − T between ambient and the point of tangency.
    let lo = 25, hi = 25 + 10 / Math.LN2 * Math.log((10 / Math.LN2) / (50 * 0.05)) + 10; // loose upper bracket below the unstable root
    const g = (t: number) => 25 + 50 * 0.05 * 2 ** ((t - 25) / 10) - t;
    expect(g(lo)).toBeGreaterThan(0);
    while (g(hi) > 0) hi -= 1;
    for (let k = 0; k < 200; k++) {
      const mid = 0.5 * (lo + hi);
      if (g(mid) > 0) lo = mid;
      else hi = mid;
    }
    closeTo(sol.temperaturesC[0]!, lo, 1e-6, 1e-6); // bisection (independent of the solver)
    expect(sol.loopGain[0]!).toBeLessThan(1);
  });

  it('converges for a loss that falls with temperature (diode Vf0 drift)', () => {
    const lossAt = (t: Float64Array, p: Float64Array) => {
      p[0] = Math.max(0, 1 - 0.004 * (t[0]! - 25));
    };
    const sol = solveElectroThermal(thermalNetwork([60], [-1], []), 25, ceiling(150), lossAt);
    closeTo(sol.temperaturesC[0]!, 25 + 60 / (1 + 60 * 0.004), 1e-9); // x = 60·(1 − 0.004·x) solved by hand
  });

  it('never returns NaN when the loss callback misbehaves', () => {
    const sol = solveElectroThermal(thermalNetwork([10], [-1], []), 25, ceiling(150), (_t, p) => {
      p[0] = Number.NaN;
    });
    expect(Number.isFinite(sol.temperaturesC[0]!)).toBe(true);
  });
});
