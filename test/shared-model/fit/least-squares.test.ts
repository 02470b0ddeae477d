/**
 * The bounded Levenberg–Marquardt solver and its intervals against certified reference results:
 * NIST StRD nonlinear regression problem Misra1a (https://www.itl.nist.gov/div898/strd/nls/data/misra1a.shtml),
 * y = b1·(1 − exp(−b2·x)), 14 observations, certified to 11 significant digits.
 */
import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../../shared-model/fit/least-squares.ts';
import { parameterStatistics } from '../../../shared-model/fit/intervals.ts';
import { studentTQuantile } from '../../../shared-model/fit/student-t.ts';
import { closeTo } from '../../helpers/close-to.ts';

// NIST StRD Misra1a data (y, x), from the data file on the page above.
const Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.4, 75.47, 81.78];
const X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];
const residuals = (b: readonly number[]) => Float64Array.from(X.map((x, i) => Y[i] - b[0] * (1 - Math.exp(-b[1] * x))));
const misra = (start: number[], lower = [0, 0], upper = [1e4, 1]) =>
  leastSquares({ residuals, start, lower, upper, scale: [100, 1e-4] });

describe('leastSquares on NIST StRD Misra1a', () => {
  for (const [label, start] of [['start 1 (500, 1e-4)', [500, 1e-4]], ['start 2 (250, 5e-4)', [250, 5e-4]]] as const) {
    it(`reaches the certified estimates from NIST's ${label}`, () => {
      const fit = misra([...start]);
      expect(fit.converged).toBe(true);
      closeTo(fit.x[0], 2.3894212918e2, 1e-6, 0, fit); // NIST StRD Misra1a certified b1
      closeTo(fit.x[1], 5.5015643181e-4, 1e-6, 0, fit); // NIST StRD Misra1a certified b2
      closeTo(fit.sumSquares, 1.2455138894e-1, 1e-7, 0, fit); // NIST StRD Misra1a certified residual sum of squares
    });
  }

  it('gives the certified standard errors and residual standard deviation from the Jacobian at the solution', () => {
    const fit = misra([500, 1e-4]);
    const stats = parameterStatistics(fit.jacobian, fit.residuals, fit.m, fit.n);
    expect(stats.dof).toBe(12); // NIST StRD Misra1a: 12 degrees of freedom
    closeTo(stats.standardErrors[0]!, 2.7070075241, 1e-4, 0, stats); // NIST StRD Misra1a certified std. dev. of b1
    closeTo(stats.standardErrors[1]!, 7.2668688436e-6, 1e-4, 0, stats); // NIST StRD Misra1a certified std. dev. of b2
    closeTo(Math.sqrt(stats.residualVariance), 1.0187876330e-1, 1e-6, 0, stats); // NIST StRD Misra1a certified residual standard deviation
    // Misra1a is rated "lower difficulty" by NIST: no flat direction, every parameter moves the residuals
    // (its b1 and b2 are strongly correlated, which the correlation warning may report).
    expect(stats.issues.filter((i) => i.kind !== 'correlated')).toEqual([]);
  });

  it('stops on a bound and says so when the optimum lies outside the box', () => {
    const fit = misra([200, 5e-4], [0, 0], [230, 1]);
    closeTo(fit.x[0], 230, 0, 1e-12, fit); // the certified b1 238.94 lies above the bound, so the best bounded b1 is the bound itself
    expect(fit.atUpper).toEqual([true, false]);
  });
});

describe('parameterStatistics identifiability', () => {
  it('reports a flat direction when two parameters enter only as their product', () => {
    // y = a·b·x cannot separate a and b: JᵀJ is singular (exact algebra, no outside source needed beyond that).
    const xs = [1, 2, 3, 4, 5];
    const r = (p: readonly number[]) => Float64Array.from(xs.map((x) => 2 * x + 0.01 * Math.sin(x) - p[0] * p[1] * x));
    const fit = leastSquares({ residuals: r, start: [1, 1], lower: [0.1, 0.1], upper: [10, 10] });
    const stats = parameterStatistics(fit.jacobian, fit.residuals, fit.m, fit.n);
    expect(stats.issues.map((i) => i.kind)).toContain('flat-direction');
    expect(stats.standardErrors).toEqual([null, null]);
  });

  it('reports a parameter the residuals do not respond to', () => {
    const r = (p: readonly number[]) => Float64Array.from([1, 2, 3].map((x) => x - p[0] * x + 0 * p[1]));
    const fit = leastSquares({ residuals: r, start: [0.5, 1], lower: [0, 0], upper: [2, 2] });
    const stats = parameterStatistics(fit.jacobian, fit.residuals, fit.m, fit.n);
    expect(stats.issues).toContainEqual({ kind: 'no-sensitivity', parameters: [1] });
  });
});

describe('studentTQuantile', () => {
  // Two-sided 95 % points of Student's t (Abramowitz & Stegun, Handbook of Mathematical Functions, Table 26.10 [memory]).
  for (const [dof, t] of [[1, 12.706], [2, 4.303], [5, 2.571], [10, 2.228], [12, 2.179], [30, 2.042], [120, 1.980]] as const) {
    it(`t(0.975, ${dof}) = ${t}`, () => closeTo(studentTQuantile(0.975, dof), t, 0, 5e-4)); // A&S Table 26.10, 3 decimals
  }
  it('t(0.995, 4) = 4.604', () => closeTo(studentTQuantile(0.995, 4), 4.604, 0, 5e-4)); // A&S Table 26.10
});
