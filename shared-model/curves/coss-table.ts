/**
 * Output charge and energy of a MOSFET from a digitised Coss(VDS) curve, by integration of the table:
 *   Qoss(V) = ∫₀^V Coss(v) dv,   Eoss(V) = ∫₀^V v · Coss(v) dv
 * (the definitions behind the charge- and energy-equivalent capacitances Co(tr) = Qoss/V and
 * Co(er) = 2·Eoss/V² that datasheets state — common practice; q = ∫C dv and w = ∫v·C dv for a
 * voltage-dependent capacitance — any circuit-theory text, from memory).
 * Coss is taken as straight lines between the points; below the first point it is held at the first
 * value (datasheet curves start near 0 V), above the last at the last value (callers say so: design
 * notice "above the table"). With Coss linear on a segment, ∫C dv is exact by the trapezoid rule and
 * ∫v·C dv (a quadratic) is exact by Simpson's rule, so the integrals are exact for the stated curve.
 * The running integrals at the points are computed once per table and kept (a WeakMap on the record).
 */
import type { CossPoint } from '../design/parts.ts';
import { segmentOf } from './table.ts';

interface CossIntegrals {
  v: Float64Array;
  c: Float64Array;
  /** Qoss and Eoss from 0 V to each point, C and J. */
  q: Float64Array;
  e: Float64Array;
}

const cache = new WeakMap<readonly CossPoint[], CossIntegrals>();

/** ∫ C dv and ∫ v·C dv over [a, b] with C linear from ca (at a) to cb (at b). */
function segmentIntegrals(a: number, b: number, ca: number, cb: number): [number, number] {
  const h = b - a;
  const m = 0.5 * (a + b);
  const cm = 0.5 * (ca + cb);
  return [0.5 * h * (ca + cb), (h / 6) * (a * ca + 4 * m * cm + b * cb)];
}

function integralsOf(points: readonly CossPoint[]): CossIntegrals {
  const hit = cache.get(points);
  if (hit) return hit;
  const n = points.length;
  const v = new Float64Array(n + 1);
  const c = new Float64Array(n + 1);
  // A leading point at 0 V holding the first capacitance (see the header).
  c[0] = points[0]!.cossF;
  for (let i = 0; i < n; i++) {
    v[i + 1] = points[i]!.vdsV;
    c[i + 1] = points[i]!.cossF;
  }
  const q = new Float64Array(n + 1);
  const e = new Float64Array(n + 1);
  for (let i = 1; i <= n; i++) {
    const [dq, de] = segmentIntegrals(v[i - 1]!, v[i]!, c[i - 1]!, c[i]!);
    q[i] = q[i - 1]! + dq;
    e[i] = e[i - 1]! + de;
  }
  const out = { v, c, q, e };
  cache.set(points, out);
  return out;
}

/** Qoss and Eoss from 0 V to `voltageV` (≤ 0 gives 0), C and J. */
export function cossTableAt(points: readonly CossPoint[], voltageV: number): { qossC: number; eossJ: number } {
  if (!(voltageV > 0)) return { qossC: 0, eossJ: 0 };
  const { v, c, q, e } = integralsOf(points);
  const last = v.length - 1;
  if (voltageV >= v[last]!) {
    // Above the table: the last capacitance held.
    const [dq, de] = segmentIntegrals(v[last]!, voltageV, c[last]!, c[last]!);
    return { qossC: q[last]! + dq, eossJ: e[last]! + de };
  }
  const i = segmentOf(v, voltageV);
  const t = (voltageV - v[i]!) / (v[i + 1]! - v[i]!);
  const cv = c[i]! + t * (c[i + 1]! - c[i]!);
  const [dq, de] = segmentIntegrals(v[i]!, voltageV, c[i]!, cv);
  return { qossC: q[i]! + dq, eossJ: e[i]! + de };
}
