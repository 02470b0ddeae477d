/**
 * One-dimensional searches used to place landmarks between two sweep points.
 *
 * - Root of a continuous function with a sign change: the Illinois variant of regula falsi
 *   (Dowell & Jarratt, BIT 11(2), 1971 [memory]), which keeps the bracket and converges superlinearly.
 * - Edge of a true/false property: bisection.
 * - Maximum of a unimodal function on an interval: golden-section search (Kiefer, Proc. AMS 4(3), 1953 [memory]).
 * - Between two points without the engine: straight-line interpolation, and for a maximum the vertex of
 *   the parabola through three points.
 */

/** Relative width at which a bracket is considered closed. */
export const RELATIVE_TOLERANCE = 1e-8;
const MAX_ITERATIONS = 40;

/** x where the straight line through (x0, y0) and (x1, y1) takes the value `level`. */
export function interpolateCrossing(x0: number, y0: number, x1: number, y1: number, level: number): number {
  if (y1 === y0) return (x0 + x1) / 2;
  const t = (level - y0) / (y1 - y0);
  return x0 + Math.min(1, Math.max(0, t)) * (x1 - x0);
}

/** The value at x of the straight line through (x0, y0) and (x1, y1). */
export function interpolateAt(x0: number, y0: number, x1: number, y1: number, x: number): number {
  if (x1 === x0) return (y0 + y1) / 2;
  return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

/** Root of f in [a, b], given f(a) and f(b) of opposite signs (or one of them zero). */
export function findRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Math.sign(fa) === Math.sign(fb)) return interpolateCrossing(a, fa, b, fb, 0);
  let side = 0;
  for (let k = 0; k < MAX_ITERATIONS; k++) {
    const x = (a * fb - b * fa) / (fb - fa);
    if (Math.abs(b - a) <= RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b))) return x;
    const fx = f(x);
    if (fx === 0 || !Number.isFinite(fx)) return x;
    if (Math.sign(fx) === Math.sign(fb)) {
      b = x;
      fb = fx;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return (a * fb - b * fa) / (fb - fa);
}

/** The x in [a, b] where `test` turns from false (at a) to true (at b), to `iterations` halvings. */
export function findEdge(test: (x: number) => boolean, a: number, b: number, iterations = 20): number {
  for (let k = 0; k < iterations; k++) {
    const mid = (a + b) / 2;
    if (test(mid)) b = mid;
    else a = mid;
  }
  return (a + b) / 2;
}

/** Maximum of a unimodal f on [a, b] by golden-section search. */
export function findMaximum(f: (x: number) => number, a: number, b: number): { x: number; fx: number } {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a);
  let d = a + r * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let k = 0; k < MAX_ITERATIONS; k++) {
    if (Math.abs(b - a) <= 1e-7 * Math.max(Math.abs(a), Math.abs(b))) break;
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - r * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + r * (b - a);
      fd = f(d);
    }
  }
  return fc >= fd ? { x: c, fx: fc } : { x: d, fx: fd };
}

/** Vertex of the parabola through three points (x0 < x1 < x2, y1 the largest): its x and y. */
export function parabolaVertex(
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  x2: number,
  y2: number,
): { x: number; y: number } {
  // Newton form with divided differences: y(x) = y0 + d01·(x − x0) + c·(x − x0)·(x − x1).
  const d01 = (y1 - y0) / (x1 - x0);
  const d12 = (y2 - y1) / (x2 - x1);
  const c = (d12 - d01) / (x2 - x0);
  if (!(c < 0)) return { x: x1, y: y1 };
  // dy/dx = d01 + c·(2x − x0 − x1) = 0 at:
  const x = (x0 + x1) / 2 - d01 / (2 * c);
  const xc = Math.min(x2, Math.max(x0, x));
  return { x: xc, y: y0 + d01 * (xc - x0) + c * (xc - x0) * (xc - x1) };
}
