/**
 * Small dense matrices for the time-domain reference (test-only code).
 *
 * expm: e^M by scaling and squaring with a Taylor series (‖M/2^s‖∞ ≤ 1/2, terms until they fall below
 * 1e-18 of the sum). Source: Moler & Van Loan, "Nineteen dubious ways to compute the exponential of a
 * matrix, twenty-five years later", SIAM Review 45(1), 2003 (method 3, scaling and squaring) [memory].
 * Matrices are row-major Float64Array of size n·n.
 */

export type Matrix = Float64Array;

export function identity(n: number): Matrix {
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) m[i * n + i] = 1;
  return m;
}

export function multiply(a: Matrix, b: Matrix, n: number): Matrix {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) out[i * n + j] += aik * b[k * n + j];
    }
  }
  return out;
}

export function applyTo(m: Matrix, v: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += m[i * n + j] * v[j];
    out[i] = s;
  }
  return out;
}

function normInf(m: Matrix, n: number): number {
  let best = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += Math.abs(m[i * n + j]);
    best = Math.max(best, s);
  }
  return best;
}

/** e^(M·t) for an n×n matrix M. */
export function expm(m: Matrix, n: number, t = 1): Matrix {
  const norm = normInf(m, n) * Math.abs(t);
  const squarings = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const scale = t / 2 ** squarings;
  const a = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) a[i] = m[i] * scale;
  let sum = identity(n);
  let term = identity(n);
  for (let k = 1; k < 40; k++) {
    term = multiply(term, a, n);
    for (let i = 0; i < n * n; i++) term[i] /= k;
    let tn = 0;
    for (let i = 0; i < n * n; i++) {
      sum[i] += term[i];
      tn = Math.max(tn, Math.abs(term[i]));
    }
    if (tn < 1e-18) break;
  }
  for (let s = 0; s < squarings; s++) sum = multiply(sum, sum, n);
  return sum;
}

/** Solves the 2×2 system [[a, b], [c, d]]·x = [e, f]. */
export function solve2(a: number, b: number, c: number, d: number, e: number, f: number): [number, number] {
  const det = a * d - b * c;
  return [(e * d - b * f) / det, (a * f - e * c) / det];
}
