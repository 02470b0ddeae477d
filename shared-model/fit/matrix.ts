/**
 * Small dense symmetric matrices for the least-squares fit (a handful of parameters): the normal
 * matrix JᵀJ, a Cholesky solve, the inverse and the eigenvalues (cyclic Jacobi rotations).
 * Storage: row-major Float64Array of n·n. Sources: Golub & Van Loan, Matrix Computations, 4th ed.,
 * §4.2 (Cholesky) and §8.5 (Jacobi) [memory for section numbers].
 */

/** JᵀJ and Jᵀr of a Jacobian stored row by row (m rows of n columns). */
export function normalEquations(jac: Float64Array, r: Float64Array, m: number, n: number): { jtj: Float64Array; jtr: Float64Array } {
  const jtj = new Float64Array(n * n);
  const jtr = new Float64Array(n);
  for (let i = 0; i < m; i++) {
    const row = i * n;
    const ri = r[i];
    for (let a = 0; a < n; a++) {
      const ja = jac[row + a];
      if (ja === 0) continue;
      jtr[a] += ja * ri;
      for (let b = a; b < n; b++) jtj[a * n + b] += ja * jac[row + b];
    }
  }
  for (let a = 0; a < n; a++) for (let b = 0; b < a; b++) jtj[a * n + b] = jtj[b * n + a];
  return { jtj, jtr };
}

/** Cholesky factor L (lower, row-major) of a symmetric matrix, or null when it is not positive definite. */
export function cholesky(a: Float64Array, n: number): Float64Array | null {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j];
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      if (i === j) {
        if (!(s > 0) || !Number.isFinite(s)) return null;
        l[i * n + i] = Math.sqrt(s);
      } else l[i * n + j] = s / l[j * n + j];
    }
  }
  return l;
}

/** Solves L·Lᵀ·x = b for x. */
export function choleskySolve(l: Float64Array, n: number, b: Float64Array): Float64Array {
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[i * n + k] * y[k];
    y[i] = s / l[i * n + i];
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k < n; k++) s -= l[k * n + i] * x[k];
    x[i] = s / l[i * n + i];
  }
  return x;
}

/** Inverse of a symmetric positive-definite matrix, or null when it is singular. */
export function inverseSpd(a: Float64Array, n: number): Float64Array | null {
  const l = cholesky(a, n);
  if (!l) return null;
  const inv = new Float64Array(n * n);
  const e = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    e.fill(0);
    e[j] = 1;
    const col = choleskySolve(l, n, e);
    for (let i = 0; i < n; i++) inv[i * n + j] = col[i];
  }
  return inv;
}

/** Eigenvalues (ascending) and eigenvectors (columns, row-major) of a symmetric matrix by cyclic Jacobi rotations. */
export function symmetricEigen(a: Float64Array, n: number): { values: number[]; vectors: Float64Array } {
  const m = Float64Array.from(a);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += m[p * n + q] ** 2;
    if (off < 1e-30) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q];
        if (apq === 0) continue;
        const theta = (m[q * n + q] - m[p * n + p]) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const mkp = m[k * n + p];
          const mkq = m[k * n + q];
          m[k * n + p] = c * mkp - s * mkq;
          m[k * n + q] = s * mkp + c * mkq;
        }
        for (let k = 0; k < n; k++) {
          const mpk = m[p * n + k];
          const mqk = m[q * n + k];
          m[p * n + k] = c * mpk - s * mqk;
          m[q * n + k] = s * mpk + c * mqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k * n + p];
          const vkq = v[k * n + q];
          v[k * n + p] = c * vkp - s * vkq;
          v[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => m[i * n + i] - m[j * n + j]);
  const vectors = new Float64Array(n * n);
  order.forEach((src, dst) => {
    for (let k = 0; k < n; k++) vectors[k * n + dst] = v[k * n + src];
  });
  return { values: order.map((i) => m[i * n + i]), vectors };
}
