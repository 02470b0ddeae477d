/**
 * Scalar root finding and maximisation used by the operating-point solver (no allocation).
 *
 * brentRoot: Brent's method (bisection, secant and inverse quadratic interpolation) on a bracket where
 *   f changes sign; converges to the tolerance in a few dozen evaluations at worst.
 * goldenMax: golden-section search for the maximum of a unimodal function on an interval.
 * Source: R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4–5; Press et al.,
 * Numerical Recipes 3rd ed. §9.3 and §10.2 [memory for section numbers].
 */

/** Root of f on [a, b] given fa = f(a), fb = f(b) of opposite sign (or one of them zero). */
export function brentRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, xtol: number): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 200; iter++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xtol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}

const INV_PHI = (Math.sqrt(5) - 1) / 2;

/** Location of the maximum of a unimodal f on [a, b] to within xtol. */
export function goldenMax(f: (x: number) => number, a: number, b: number, xtol: number): number {
  let x1 = b - INV_PHI * (b - a);
  let x2 = a + INV_PHI * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let iter = 0; iter < 200 && b - a > xtol; iter++) {
    if (f1 < f2) {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + INV_PHI * (b - a);
      f2 = f(x2);
    } else {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - INV_PHI * (b - a);
      f1 = f(x1);
    }
  }
  return f1 > f2 ? x1 : x2;
}
