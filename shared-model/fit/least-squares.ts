/**
 * Bounded nonlinear least squares: minimise Σ rᵢ(x)² subject to lower ≤ x ≤ upper, by Levenberg–Marquardt
 * steps projected onto the bounds.
 *
 * Method (Levenberg 1944, Marquardt 1963; docs/methods.md §18 [memory]): in parameters scaled by their
 * typical size u = x / scale, solve (JᵀJ + λ·diag(JᵀJ))·δ = −Jᵀr, clip u + δ to the bounds, accept the
 * step when the sum of squares falls (λ shrinks) and reject it otherwise (λ grows). A parameter resting
 * on a bound with the gradient pushing outward is held there for the step (an active set). J is the
 * residual Jacobian, from the caller or by forward differences (backward at an upper bound).
 * Stops when the relative step, the relative fall of the sum of squares or the projected gradient is
 * below its tolerance, or after maxIterations.
 * Why our own solver: we need the Jacobian at the solution for confidence intervals and correlations,
 * an active set that tells which parameter rests on a bound, and nothing that touches the engine's purity
 * rules; the whole method is ~150 lines (see the commit that added it).
 */
import { cholesky, choleskySolve, normalEquations } from './matrix.ts';

export interface LeastSquaresProblem {
  /** Residuals at x (a new or reused array of length m; every entry finite). */
  residuals(x: readonly number[]): Float64Array;
  start: readonly number[];
  lower: readonly number[];
  upper: readonly number[];
  /** Typical size of each parameter (scaling and difference steps); default max(|start|, 1). */
  scale?: readonly number[];
  /** Analytic Jacobian ∂rᵢ/∂xⱼ, row-major m × n; forward differences when absent. */
  jacobian?(x: readonly number[]): Float64Array;
}

export interface LeastSquaresOptions {
  maxIterations?: number;
  /** Relative step below which the fit has converged (default 1e-10). */
  stepTolerance?: number;
  /** Relative fall of the sum of squares below which the fit has converged (default 1e-14). */
  reductionTolerance?: number;
  /** Relative difference step (default 1e-7; use larger for a model that iterates internally). */
  differenceStep?: number;
}

export type StopReason = 'small-step' | 'small-reduction' | 'small-gradient' | 'max-iterations';

export interface LeastSquaresResult {
  x: number[];
  residuals: Float64Array;
  /** Jacobian at x, row-major m × n. */
  jacobian: Float64Array;
  m: number;
  n: number;
  sumSquares: number;
  iterations: number;
  /** Residual evaluations, including those for difference Jacobians. */
  evaluations: number;
  converged: boolean;
  stop: StopReason;
  /** Which parameters rest on a bound at the solution. */
  atLower: boolean[];
  atUpper: boolean[];
}

const sumOfSquares = (r: Float64Array): number => {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i] * r[i];
  return s;
};

/** Fits `problem` (see the header). Throws only for a malformed problem (programmer error). */
export function leastSquares(problem: LeastSquaresProblem, options: LeastSquaresOptions = {}): LeastSquaresResult {
  const n = problem.start.length;
  const { lower, upper } = problem;
  if (lower.length !== n || upper.length !== n) throw new RangeError('leastSquares: start, lower and upper must have one entry per parameter');
  for (let j = 0; j < n; j++) if (!(lower[j] <= upper[j])) throw new RangeError(`leastSquares: bounds of parameter ${j} are reversed`);
  const maxIterations = options.maxIterations ?? 100;
  const stepTol = options.stepTolerance ?? 1e-10;
  const reductionTol = options.reductionTolerance ?? 1e-14;
  const h = options.differenceStep ?? 1e-7;
  const scale = problem.scale ?? problem.start.map((v) => Math.max(Math.abs(v), 1));
  const clamp = (v: number, j: number) => Math.min(upper[j], Math.max(lower[j], v));
  let evaluations = 0;
  const evalR = (x: readonly number[]) => {
    evaluations++;
    return Float64Array.from(problem.residuals(x));
  };
  const jacobianAt = (x: number[], r: Float64Array): Float64Array => {
    if (problem.jacobian) return problem.jacobian(x);
    const m = r.length;
    const jac = new Float64Array(m * n);
    for (let j = 0; j < n; j++) {
      const step = h * Math.max(Math.abs(x[j]), scale[j]);
      const forward = x[j] + step <= upper[j];
      const xj = forward ? x[j] + step : x[j] - step;
      const moved = x.slice();
      moved[j] = xj;
      const rj = evalR(moved);
      const d = xj - x[j];
      for (let i = 0; i < m; i++) jac[i * n + j] = (rj[i] - r[i]) / d;
    }
    return jac;
  };

  let x = problem.start.map(clamp);
  let r = evalR(x);
  const m = r.length;
  let ss = sumOfSquares(r);
  let jac = jacobianAt(x, r);
  let lambda = -1;
  let iterations = 0;
  let stop: StopReason = 'max-iterations';
  outer: while (iterations < maxIterations) {
    iterations++;
    // Normal equations in scaled parameters: J_u = J · diag(scale).
    const ju = new Float64Array(m * n);
    for (let i = 0; i < m; i++) for (let j = 0; j < n; j++) ju[i * n + j] = jac[i * n + j] * scale[j];
    const { jtj, jtr } = normalEquations(ju, r, m, n);
    let maxDiag = 0;
    for (let j = 0; j < n; j++) maxDiag = Math.max(maxDiag, jtj[j * n + j]);
    if (lambda < 0) lambda = 1e-3;
    // Active set: parameters on a bound with the descent direction (−Jᵀr) pointing out of the box.
    const held = x.map((v, j) => (v <= lower[j] && jtr[j] > 0) || (v >= upper[j] && jtr[j] < 0));
    let gradient = 0;
    for (let j = 0; j < n; j++) if (!held[j]) gradient = Math.max(gradient, Math.abs(jtr[j]));
    if (gradient <= 1e-15 * Math.max(ss, 1e-300) || maxDiag === 0) {
      stop = 'small-gradient';
      break;
    }
    for (;;) {
      const a = new Float64Array(n * n);
      const g = new Float64Array(n);
      for (let p = 0; p < n; p++) {
        for (let q = 0; q < n; q++) a[p * n + q] = held[p] || held[q] ? (p === q ? 1 : 0) : jtj[p * n + q];
        g[p] = held[p] ? 0 : -jtr[p];
        if (!held[p]) a[p * n + p] += lambda * Math.max(jtj[p * n + p], 1e-12 * maxDiag);
      }
      const l = cholesky(a, n);
      if (!l) {
        lambda *= 10;
        if (lambda > 1e16) break outer;
        continue;
      }
      const delta = choleskySolve(l, n, g);
      const trial = x.map((v, j) => clamp(v + delta[j] * scale[j], j));
      let stepNorm = 0;
      let xNorm = 0;
      for (let j = 0; j < n; j++) {
        stepNorm += ((trial[j] - x[j]) / scale[j]) ** 2;
        xNorm += (x[j] / scale[j]) ** 2;
      }
      if (Math.sqrt(stepNorm) <= stepTol * (Math.sqrt(xNorm) + stepTol)) {
        stop = 'small-step';
        break outer;
      }
      const rt = evalR(trial);
      const sst = sumOfSquares(rt);
      if (Number.isFinite(sst) && sst < ss) {
        const fall = (ss - sst) / Math.max(ss, 1e-300);
        x = trial;
        r = rt;
        ss = sst;
        lambda = Math.max(lambda / 3, 1e-12);
        jac = jacobianAt(x, r);
        if (fall <= reductionTol) {
          stop = 'small-reduction';
          break outer;
        }
        break;
      }
      lambda *= 4;
      if (lambda > 1e16) {
        stop = 'small-reduction';
        break outer;
      }
    }
  }
  return {
    x,
    residuals: r,
    jacobian: jac,
    m,
    n,
    sumSquares: ss,
    iterations,
    evaluations,
    converged: stop !== 'max-iterations',
    stop,
    atLower: x.map((v, j) => v <= lower[j] && lower[j] < upper[j]),
    atUpper: x.map((v, j) => v >= upper[j] && lower[j] < upper[j]),
  };
}
