/**
 * The inductor-current shape for a given duty cycle D (and output voltage), CCM or DCM.
 *
 * The topology enters only through the record's interval flags (topology/types.ts, copied into the
 * circuit): whether the on interval delivers to the output (buck) and whether the off interval draws from
 * the input (boost).
 * CCM: mean IL from charge balance (buck IL = Io, boost IL = Io/D'); the off interval, whose voltage
 *   is known, sets the ripple: ΔI = (Eoff + Roff·IL) · D'·T / L; valley/peak = IL ∓ ΔI/2.
 * DCM (when the rectifier blocks reverse current and the CCM valley would be < 0): for a given D the
 *   off slope and the output charge balance fix Ipk and D2:
 *     Ipk·L = (Eoff + Roff·Ipk/2) · D2·T   and   buck: Io = Ipk·(D + D2)/2,  boost: Io = Ipk·D2/2,
 *   a quadratic in Ipk with one positive root. At the boundary (D + D2 = 1) both shapes coincide.
 * residualV = D·vL,on + D2·vL,off (volt-second balance; zero at the solution without lossOf), with the
 *   drops taken at each interval's mean current (exact mean of a straight line).
 * With an L(I) curve (curves/inductance-table.ts) the ripple is the swing centred on IL whose flux-linkage
 *   change λ(Ipk) − λ(Iv) equals the interval's volt-seconds, and in DCM L is the chord λ(Ipk)/Ipk.
 * Terms E/R: see circuit.ts. Source: Erickson & Maksimović 2nd ed. ch. 2 and 5 (CCM ripple, DCM charge
 * balance) [memory for chapters]; docs/methods.md §1–2.
 */
import { inductanceAt, type Circuit } from './circuit.ts';
import { chordInductance, inductanceOnCurve, swingForFlux } from '../curves/inductance-table.ts';

export interface Shape {
  dcm: boolean;
  d: number;
  d2: number;
  idle: number;
  /** Mean inductor current, A. */
  il: number;
  ipk: number;
  /** Valley current (0 in DCM). */
  iv: number;
  /** Peak-to-peak inductor ripple (Ipk in DCM). */
  ripple: number;
  inductanceH: number;
  /** Mean current the power stage draws through its input path (before sourceLossOf), A. */
  iin: number;
  /** Vin after an input sense resistor's drop. */
  vin1: number;
  vo: number;
  residualV: number;
}

export function newShape(): Shape {
  return { dcm: false, d: 0, d2: 0, idle: 0, il: 0, ipk: 0, iv: 0, ripple: 0, inductanceH: 0, iin: 0, vin1: 0, vo: 0, residualV: 0 };
}

/** Fills `s` with the shape at duty d and output voltage vo; returns s. */
export function shapeAt(c: Circuit, d: number, vo: number, s: Shape): Shape {
  s.d = d;
  s.vo = vo;
  return shapeOfOwn(c, s);
}

/**
 * Fills `s` with the shape at its own duty `s.d` and output voltage `s.vo`; returns s. (The hot loop sets
 * them and calls this: numbers passed as arguments to a call that is not inlined are boxed on the heap.)
 */
export function shapeOfOwn(c: Circuit, s: Shape): Shape {
  const d = s.d;
  const vo = s.vo;
  const T = c.periodS;
  const io = c.loadA;
  // The ESR seen at the node: the bank's share k of the ripple current flows through it (load.ts).
  const esr = c.esrOhm * c.capacitorShare;
  const rIn = c.rInputSenseOhm;
  const vo1 = vo + c.rOutputSenseOhm * io;
  const dp = Math.max(1 - d, 1e-12);
  const roff = c.rOffOhm + esr;
  // The interval flags of the topology record (circuit.ts): buck onToOutput, boost offFromInput.
  const onOut = c.onToOutput;
  const offIn = c.offFromInput;
  const ron = onOut ? c.rOnOhm + esr : c.rOnOhm;

  // CCM attempt. Charge balance: the output receives IL over the delivering intervals, the input supplies
  // it over the drawing intervals.
  let il = onOut ? io : io / dp;
  let iin = offIn ? il : d * il;
  let vin1 = c.vinV - rIn * iin;
  let eon = onOut ? vin1 - vo1 + esr * io : vin1;
  let eoff = offIn ? vo1 + c.vf0V - vin1 - esr * io : vo1 + c.vf0V - esr * io;
  const vOff = eoff + roff * il;
  const curve = c.inductanceCurve;
  let L: number;
  let ripple: number;
  if (curve) {
    // L(I) curve: the swing centred on IL whose flux-linkage change is the off interval's volt-seconds.
    const flux = vOff * dp * T;
    ripple = Math.sign(flux) * swingForFlux(curve, il, Math.abs(flux));
    L = ripple !== 0 ? flux / ripple : inductanceOnCurve(curve, il);
  } else {
    L = inductanceAt(c, il);
    ripple = (vOff * dp * T) / L;
  }
  const iv = il - ripple / 2;
  if (!(c.blocksReverse && iv < 0)) {
    s.dcm = false;
    s.d2 = 1 - d;
    s.idle = 0;
    s.il = il;
    s.ripple = ripple;
    s.iv = iv;
    s.ipk = il + ripple / 2;
    s.inductanceH = L;
    s.iin = iin;
    s.vin1 = vin1;
    s.residualV = d * (eon - ron * il) - dp * vOff;
    return s;
  }

  // DCM. The off interval and the output charge balance fix Ipk and D2 for the given D:
  //   Ipk·L = (a + b·Ipk)·D2·T,   Io = Ipk·([onToOutput]·D + D2)/2,
  // with a + b·Ipk = Eoff + Roff·Ipk/2 (Eoff holds −Vin' = −Vin + Rin·Iin when the off interval draws from
  // the input, Iin = Ipk·D/2 + Io there): a quadratic qa·Ipk² + qb·Ipk − qc = 0 with one positive root.
  // The inductance is taken at the mean current, iterated (the mean follows from Ipk when the inductor
  // does not carry the load over the whole period).
  const a = offIn ? vo1 + c.vf0V - esr * io - c.vinV + rIn * io : vo1 + c.vf0V - esr * io;
  const b = offIn ? roff / 2 + (rIn * d) / 2 : roff / 2;
  let ipk = 0;
  let d2 = 0;
  for (let k = 0; k < 50; k++) {
    const qa = onOut ? L + b * d * T : L;
    const qb = onOut ? T * (a * d - 2 * b * io) : -(2 * b * io * T);
    const qc = 2 * a * io * T;
    const root = Math.sqrt(Math.max(qb * qb + 4 * qa * qc, 0));
    ipk = qb > 0 ? (2 * qc) / (qb + root) : (root - qb) / (2 * qa);
    d2 = ipk > 0 ? Math.min(Math.max((2 * io) / ipk - (onOut ? d : 0), 0), dp) : 0;
    il = onOut ? io : (ipk * (d + d2)) / 2;
    // With an L(I) curve, the chord inductance from 0 A to the peak (the flux linkage it takes).
    const next = curve ? chordInductance(curve, 0, ipk) : inductanceAt(c, il);
    if (Math.abs(next - L) <= 1e-13 * L) break;
    L = next;
  }
  iin = offIn ? (ipk * (d + d2)) / 2 : (d * ipk) / 2;
  vin1 = c.vinV - rIn * iin;
  eon = onOut ? vin1 - vo1 + esr * io : vin1;
  eoff = offIn ? vo1 + c.vf0V - vin1 - esr * io : vo1 + c.vf0V - esr * io;
  s.dcm = true;
  s.d2 = d2;
  s.idle = Math.max(1 - d - d2, 0);
  s.il = il;
  s.ipk = ipk;
  s.iv = 0;
  s.ripple = ipk;
  s.inductanceH = L;
  s.iin = iin;
  s.vin1 = vin1;
  s.residualV = d * (eon - (ron * ipk) / 2) - d2 * (eoff + (roff * ipk) / 2);
  return s;
}
