/**
 * Approximate confidence intervals, correlations and identifiability of fitted parameters, from the
 * residual Jacobian J at the solution (Bates & Watts, Nonlinear Regression Analysis and Its
 * Applications, 1988, §2.3 [memory]; docs/methods.md §18):
 *   s² = Σ rᵢ² / (m − n), covariance ≈ s²·(JᵀJ)⁻¹, interval θⱼ ± t(1 − α/2, m − n)·√covⱼⱼ,
 *   correlation ρⱼₖ = covⱼₖ / √(covⱼⱼ·covₖₖ).
 * Identifiability (our own thresholds): a parameter the residuals do not respond to (a zero column of J),
 * a pair with |ρ| above 0.95, or a flat direction — the smallest eigenvalue of the correlation-scaled
 * JᵀJ below 1e-8 of the largest — means the data cannot separate those parameters. For a singular JᵀJ
 * the covariance does not exist: the intervals of the parameters involved are reported as unbounded
 * (the caller shows the parameter's allowed range instead) and correlations as 0 for them.
 */
import { inverseSpd, normalEquations, symmetricEigen } from './matrix.ts';
import { studentTQuantile } from './student-t.ts';

const CORRELATION_LIMIT = 0.95;
export const FLAT_DIRECTION_RATIO = 1e-8;

export type IdentifiabilityIssue =
  | { kind: 'no-sensitivity'; parameters: [number] }
  | { kind: 'correlated'; parameters: [number, number]; correlation: number }
  | { kind: 'flat-direction'; parameters: number[]; eigenvalueRatio: number };

export interface ParameterStatistics {
  /** Degrees of freedom m − n (0 when there are no more residuals than parameters). */
  dof: number;
  /** Residual variance s² = Σr² / dof (0 when dof is 0). */
  residualVariance: number;
  /** t(1 − α/2, dof) used for the intervals (0 when dof is 0). */
  tValue: number;
  /** Standard errors; null where the covariance does not exist. */
  standardErrors: (number | null)[];
  /** Half-widths of the intervals (t · standard error); null where unbounded. */
  halfWidths: (number | null)[];
  /** Correlation matrix (1 on the diagonal; 0 where undefined). */
  correlations: number[][];
  /** Smallest over largest eigenvalue of the correlation-scaled JᵀJ (1: orthogonal, 0: singular). */
  eigenvalueRatio: number;
  issues: IdentifiabilityIssue[];
}

/** Statistics of a least-squares solution with Jacobian `jac` (m × n, row-major) and residuals `r`. */
export function parameterStatistics(jac: Float64Array, r: Float64Array, m: number, n: number, level = 0.95): ParameterStatistics {
  const { jtj } = normalEquations(jac, r, m, n);
  const dof = m - n;
  let ss = 0;
  for (let i = 0; i < m; i++) ss += r[i] * r[i];
  const s2 = dof > 0 ? ss / dof : 0;
  const tValue = dof > 0 ? studentTQuantile(1 - (1 - level) / 2, dof) : 0;
  const issues: IdentifiabilityIssue[] = [];
  const diag = Array.from({ length: n }, (_, j) => jtj[j * n + j]);
  const maxDiag = Math.max(0, ...diag);
  const sensitive = diag.map((d) => d > 1e-24 * maxDiag && d > 0);
  sensitive.forEach((ok, j) => {
    if (!ok) issues.push({ kind: 'no-sensitivity', parameters: [j] });
  });
  const live = sensitive.flatMap((ok, j) => (ok ? [j] : []));
  const k = live.length;
  // Correlation-scaled normal matrix of the sensitive parameters.
  const scaled = new Float64Array(k * k);
  for (let a = 0; a < k; a++)
    for (let b = 0; b < k; b++) scaled[a * k + b] = jtj[live[a] * n + live[b]] / Math.sqrt(diag[live[a]] * diag[live[b]]);
  const eig = k > 0 ? symmetricEigen(scaled, k) : { values: [1], vectors: new Float64Array(1) };
  const maxEig = Math.max(...eig.values);
  const eigenvalueRatio = maxEig > 0 ? Math.max(0, eig.values[0]) / maxEig : 0;
  const standardErrors: (number | null)[] = new Array<number | null>(n).fill(null);
  const correlations: number[][] = Array.from({ length: n }, (_, a) => Array.from({ length: n }, (_, b): number => (a === b ? 1 : 0)));
  const flat = k > 0 && eigenvalueRatio < FLAT_DIRECTION_RATIO;
  const inverse = flat ? null : inverseSpd(scaled, k);
  if (flat || !inverse) {
    const v = eig.vectors;
    const involved = live.filter((_, a) => Math.abs(v[a * k]) > 0.1);
    issues.push({ kind: 'flat-direction', parameters: involved, eigenvalueRatio });
    // Parameters outside the flat direction keep no interval either: the covariance does not exist.
  } else {
    for (let a = 0; a < k; a++) {
      const ja = live[a];
      standardErrors[ja] = Math.sqrt((s2 * inverse[a * k + a]) / diag[ja]);
      for (let b = 0; b < k; b++) {
        if (a === b) continue;
        correlations[ja][live[b]] = inverse[a * k + b] / Math.sqrt(inverse[a * k + a] * inverse[b * k + b]);
      }
    }
    for (let a = 0; a < k; a++)
      for (let b = a + 1; b < k; b++) {
        const rho = correlations[live[a]][live[b]];
        if (Math.abs(rho) > CORRELATION_LIMIT) issues.push({ kind: 'correlated', parameters: [live[a], live[b]], correlation: rho });
      }
  }
  const halfWidths = standardErrors.map((se) => (se === null || dof === 0 ? null : tValue * se));
  return { dof, residualVariance: s2, tValue, standardErrors, halfWidths, correlations, eigenvalueRatio, issues };
}
