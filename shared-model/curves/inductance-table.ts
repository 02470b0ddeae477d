/**
 * An inductor's L(I) roll-off curve, digitised from a datasheet, and the current swing a given
 * volt-second product drives through it.
 *   Faraday: v = dλ/dt with λ(i) = ∫₀^i L(x) dx (the incremental inductance L = dλ/di), so over an
 *   interval at a steady voltage v lasting t the current moves from i0 to i1 with
 *       λ(i1) − λ(i0) = v · t,     i.e. di/dt = v / L(i)
 *   (integrating di/dt = v/L(i) over the interval: any magnetics text, e.g. Erickson & Maksimović,
 *   Fundamentals of Power Electronics, 2nd ed., ch. 13 [memory for chapter]).
 * L is taken as straight lines between the points (the first value held below the first point, the last
 * held above the last point — callers warn), and as L(|i|) for negative currents (the core does not care
 * about the sign), so λ is odd and piecewise quadratic: exact integration, exact inversion on a segment.
 * The operating point keeps one straight segment per interval (waveform/): its end points satisfy the
 * flux balance exactly, and its slope is v over the current-average of L(i) across the swing (the chord
 * inductance (λ(b) − λ(a))/(b − a)); the curvature inside an interval is not drawn.
 * The running integrals at the points are computed once per table and kept (a WeakMap on the record).
 */
import type { InductancePoint } from '../design/parts.ts';
import { segmentOf } from './table.ts';

interface Flux {
  i: Float64Array;
  l: Float64Array;
  /** λ from 0 A to each point, V·s. */
  lambda: Float64Array;
}

const cache = new WeakMap<readonly InductancePoint[], Flux>();

function fluxOf(points: readonly InductancePoint[]): Flux {
  const hit = cache.get(points);
  if (hit) return hit;
  // A leading point at 0 A holding the first inductance (see the header).
  const n = points.length + 1;
  const i = new Float64Array(n);
  const l = new Float64Array(n);
  l[0] = points[0]!.inductanceH;
  for (let k = 1; k < n; k++) {
    i[k] = Math.max(points[k - 1]!.currentA, i[k - 1]!);
    l[k] = points[k - 1]!.inductanceH;
  }
  const lambda = new Float64Array(n);
  for (let k = 1; k < n; k++) lambda[k] = lambda[k - 1]! + 0.5 * (i[k]! - i[k - 1]!) * (l[k - 1]! + l[k]!);
  const out = { i, l, lambda };
  cache.set(points, out);
  return out;
}

/** L at current x (L(|x|); straight lines, ends held), H. */
export function inductanceOnCurve(points: readonly InductancePoint[], x: number): number {
  const { i, l } = fluxOf(points);
  const a = Math.abs(x);
  const n = i.length;
  if (a >= i[n - 1]!) return l[n - 1]!;
  const k = segmentOf(i, a);
  const h = i[k + 1]! - i[k]!;
  return h > 0 ? l[k]! + ((a - i[k]!) / h) * (l[k + 1]! - l[k]!) : l[k + 1]!;
}

/** λ(x) = ∫₀^x L(|u|) du, odd in x, V·s (A·H). */
export function fluxLinkage(points: readonly InductancePoint[], x: number): number {
  const { i, l, lambda } = fluxOf(points);
  const a = Math.abs(x);
  const n = i.length;
  let out: number;
  if (a >= i[n - 1]!) out = lambda[n - 1]! + l[n - 1]! * (a - i[n - 1]!);
  else {
    const k = segmentOf(i, a);
    out = lambda[k]! + 0.5 * (a - i[k]!) * (l[k]! + inductanceOnCurve(points, a));
  }
  return x < 0 ? -out : out;
}

/**
 * The peak-to-peak swing r, A, of a straight current centred on `centreA` that takes the flux-linkage
 * change `fluxVs` (v·t, V·s): λ(centre + r/2) − λ(centre − r/2) = fluxVs. Newton with a bisection guard
 * (the left side rises with r at the rate (L(top) + L(bottom))/2 > 0).
 */
export function swingForFlux(points: readonly InductancePoint[], centreA: number, fluxVs: number): number {
  if (!(fluxVs > 0)) return 0;
  const { l } = fluxOf(points);
  let lMin = Infinity;
  for (let k = 0; k < l.length; k++) if (l[k]! < lMin) lMin = l[k]!;
  let lo = 0;
  let hi = fluxVs / lMin; // L ≥ lMin everywhere: the swing is at most this
  let r = fluxVs / inductanceOnCurve(points, centreA);
  if (!(r > lo && r < hi)) r = 0.5 * (lo + hi);
  for (let k = 0; k < 100; k++) {
    const g = fluxLinkage(points, centreA + r / 2) - fluxLinkage(points, centreA - r / 2) - fluxVs;
    if (g > 0) hi = r;
    else lo = r;
    if (Math.abs(g) <= 1e-14 * fluxVs || hi - lo <= 1e-15 * hi) break;
    const slope = 0.5 * (inductanceOnCurve(points, centreA + r / 2) + inductanceOnCurve(points, centreA - r / 2));
    let next = r - g / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    r = next;
  }
  return r;
}

/** The current reached from 0 A by the flux-linkage `fluxVs` ≥ 0 (a DCM on interval), A. */
export function currentForFlux(points: readonly InductancePoint[], fluxVs: number): number {
  if (!(fluxVs > 0)) return 0;
  const { i, l, lambda } = fluxOf(points);
  const n = i.length;
  if (fluxVs >= lambda[n - 1]!) return i[n - 1]! + (fluxVs - lambda[n - 1]!) / l[n - 1]!;
  const k = segmentOf(lambda, fluxVs);
  // On the segment: λk + lk·u + s·u²/2 = fluxVs with u = x − ik and s = (l[k+1] − l[k])/h.
  const h = i[k + 1]! - i[k]!;
  const s = h > 0 ? (l[k + 1]! - l[k]!) / h : 0;
  const c = fluxVs - lambda[k]!;
  const lk = l[k]!;
  // Stable root of (s/2)u² + lk·u − c = 0: u = 2c / (lk + √(lk² + 2sc)).
  const u = (2 * c) / (lk + Math.sqrt(Math.max(lk * lk + 2 * s * c, 0)));
  return i[k]! + u;
}

/** The chord inductance (λ(b) − λ(a))/(b − a) across a swing, H (L(a) when a = b). */
export function chordInductance(points: readonly InductancePoint[], a: number, b: number): number {
  return b - a > 1e-15 * Math.max(Math.abs(a), Math.abs(b), 1e-30)
    ? (fluxLinkage(points, b) - fluxLinkage(points, a)) / (b - a)
    : inductanceOnCurve(points, a);
}

/** The last current of the table, A (beyond it L is held at its last value). */
export function inductanceTableTopA(points: readonly InductancePoint[]): number {
  return points[points.length - 1]!.currentA;
}
