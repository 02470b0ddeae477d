/**
 * A diode's forward curves VF(IF) at several junction temperatures, digitised from a datasheet, and the
 * conduction loss they give over a piecewise-linear current:
 *   VF(i, T):  straight lines in IF on each curve; straight lines in Tj between the two curves around T
 *              (the nearest curve held outside their temperatures). Below a curve's first point the first
 *              VF is held; above its last point VF follows the last segment (the ohmic region of a
 *              forward-biased junction, where v ≈ V0 + Rd·i: Sze & Ng, Physics of Semiconductor Devices,
 *              3rd ed., §2.3 [memory]).
 *   P = (1/Ts)·∫ VF(i(t), T)·i(t) dt. On a straight segment from i0 to i1 lasting t:
 *       ∫ VF·i dt = t/(i1 − i0) · ∫_{i0}^{i1} VF(i)·i di,
 *   and with VF linear between the curve's points VF·i is a quadratic there, so Simpson's rule over each
 *   piece between breakpoints is exact. Interpolation in T is linear in VF, so the loss at T is the same
 *   mix of the two curves' exact losses. (The average of VF·i, not VF at the mean current: a diode's
 *   loss is the mean of the instantaneous product — any power-electronics text, e.g. Mohan, Undeland &
 *   Robbins, Power Electronics, ch. 2 [memory].) Reverse current does not flow in a diode: the negative
 *   part of a segment adds nothing.
 * The linear equivalent for the volt-second equation (operating-point/conditions.ts) is the curve's
 * tangent at a stated current: VF(I) = V0 + Rd·I with Rd the local slope.
 * Grouped curves are built once per table and kept (a WeakMap on the record).
 */
import type { VfPoint } from '../design/parts.ts';
import type { Segment } from '../operating-point/types.ts';
import { segmentOf } from './table.ts';

interface Curve {
  tjC: number;
  i: Float64Array;
  v: Float64Array;
}

const cache = new WeakMap<readonly VfPoint[], Curve[]>();

/** The table's rows grouped into curves by Tj, in the order given (the validator checks the order). */
export function forwardCurvesOf(points: readonly VfPoint[]): Curve[] {
  const hit = cache.get(points);
  if (hit) return hit;
  const groups: VfPoint[][] = [];
  for (const p of points) {
    const last = groups[groups.length - 1];
    if (last && last[0]!.tjC === p.tjC) last.push(p);
    else groups.push([p]);
  }
  const curves = groups.map((g) => ({ tjC: g[0]!.tjC, i: Float64Array.from(g, (p) => p.ifA), v: Float64Array.from(g, (p) => p.vfV) }));
  cache.set(points, curves);
  return curves;
}

/** VF on one curve at current x ≥ 0 (first value held below, last segment continued above). */
function vfOn(c: Curve, x: number): number {
  const n = c.i.length;
  if (x <= c.i[0]!) return c.v[0]!;
  const k = x >= c.i[n - 1]! ? n - 2 : segmentOf(c.i, x);
  const slope = (c.v[k + 1]! - c.v[k]!) / (c.i[k + 1]! - c.i[k]!);
  return Math.max(c.v[k]! + slope * (x - c.i[k]!), 0);
}

/** ∫_{a}^{b} VF(i)·i di on one curve, 0 ≤ a ≤ b, exact (Simpson on every linear piece). */
function energyOn(c: Curve, a: number, b: number): number {
  let sum = 0;
  let lo = a;
  const n = c.i.length;
  for (let k = 0; k <= n; k++) {
    const edge = k < n ? c.i[k]! : Infinity;
    if (edge <= lo) continue;
    const hi = Math.min(edge, b);
    const m = 0.5 * (lo + hi);
    sum += ((hi - lo) / 6) * (vfOn(c, lo) * lo + 4 * vfOn(c, m) * m + vfOn(c, hi) * hi);
    lo = hi;
    if (lo >= b) break;
  }
  return sum;
}

/** The two curves around tC and the weight of the upper one (0 when tC is at or outside an end). */
function bracket(curves: readonly Curve[], tC: number): { lower: Curve; upper: Curve; w: number } {
  const n = curves.length;
  if (tC <= curves[0]!.tjC) return { lower: curves[0]!, upper: curves[0]!, w: 0 };
  if (tC >= curves[n - 1]!.tjC) return { lower: curves[n - 1]!, upper: curves[n - 1]!, w: 0 };
  let k = 0;
  while (curves[k + 1]!.tjC < tC) k++;
  const lower = curves[k]!;
  const upper = curves[k + 1]!;
  return { lower, upper, w: (tC - lower.tjC) / (upper.tjC - lower.tjC) };
}

/** VF at current iA and junction temperature tC, V. */
export function forwardVoltageAt(points: readonly VfPoint[], iA: number, tC: number): number {
  const { lower, upper, w } = bracket(forwardCurvesOf(points), tC);
  const x = Math.max(iA, 0);
  return (1 - w) * vfOn(lower, x) + w * vfOn(upper, x);
}

/** The tangent V0 + Rd·I of the curve at iA and tC (both ≥ 0), for the volt-second equation. */
export function forwardTangentAt(points: readonly VfPoint[], iA: number, tC: number): { vf0V: number; rdOhm: number } {
  const { lower, upper, w } = bracket(forwardCurvesOf(points), tC);
  const x = Math.max(iA, 0);
  const slopeOf = (c: Curve) => {
    const n = c.i.length;
    if (x < c.i[0]!) return 0;
    const k = x >= c.i[n - 1]! ? n - 2 : segmentOf(c.i, x);
    return (c.v[k + 1]! - c.v[k]!) / (c.i[k + 1]! - c.i[k]!);
  };
  const rd = Math.max((1 - w) * slopeOf(lower) + w * slopeOf(upper), 0);
  const vf = (1 - w) * vfOn(lower, x) + w * vfOn(upper, x);
  return { vf0V: Math.max(vf - rd * x, 0), rdOhm: rd };
}

/** ∫ VF(i(t))·i(t) dt over one straight segment on one curve (the positive part of the current), J. */
function segmentEnergy(c: Curve, s: Segment): number {
  const { durationS: t, i0A: i0, i1A: i1 } = s;
  if (!(t > 0)) return 0;
  const a = Math.min(i0, i1);
  const b = Math.max(i0, i1);
  if (b <= 0) return 0;
  if (b - a <= 1e-12 * b) return t * vfOn(c, b) * b;
  // Time spent at positive current: the fraction (b − max(a, 0))/(b − a) of the segment.
  return (t / (b - a)) * energyOn(c, Math.max(a, 0), b);
}

/**
 * The forward-drop loss, W, of the current `segments` (one period `periodS`) through a diode at tC,
 * counting only the segments where `conducts(segment)` is true.
 */
export function forwardLossW(points: readonly VfPoint[], segments: readonly Segment[], periodS: number, tC: number, conducts: (s: Segment) => boolean): number {
  if (!(periodS > 0)) return 0;
  const { lower, upper, w } = bracket(forwardCurvesOf(points), tC);
  let lowerJ = 0;
  let upperJ = 0;
  for (const s of segments) {
    if (!conducts(s)) continue;
    lowerJ += segmentEnergy(lower, s);
    if (w > 0) upperJ += segmentEnergy(upper, s);
  }
  return ((1 - w) * lowerJ + w * upperJ) / periodS;
}

/**
 * dP/dT of forwardLossW at tC, W/K: the two bracketing curves' losses differ by (upper − lower) over their
 * temperature gap (P is linear in T between them); 0 outside the curves' temperatures (the end curve held).
 */
export function forwardLossSlopeWPerK(points: readonly VfPoint[], segments: readonly Segment[], periodS: number, tC: number, conducts: (s: Segment) => boolean): number {
  if (!(periodS > 0)) return 0;
  const { lower, upper, w } = bracket(forwardCurvesOf(points), tC);
  if (!(w > 0) || lower === upper) return 0;
  let diff = 0;
  for (const s of segments) if (conducts(s)) diff += segmentEnergy(upper, s) - segmentEnergy(lower, s);
  return diff / periodS / (upper.tjC - lower.tjC);
}

/** The temperatures the table covers, °C. */
export function forwardTableSpanC(points: readonly VfPoint[]): { lowC: number; highC: number } {
  const curves = forwardCurvesOf(points);
  return { lowC: curves[0]!.tjC, highC: curves[curves.length - 1]!.tjC };
}

/** The highest current every curve of the table reaches, A (beyond it VF is extrapolated). */
export function forwardTableTopA(points: readonly VfPoint[]): number {
  let top = Infinity;
  for (const c of forwardCurvesOf(points)) top = Math.min(top, c.i[c.i.length - 1]!);
  return top;
}
