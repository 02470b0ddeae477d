/**
 * Gate-charge helpers shared by the overlap models: the gate current during each switching interval and
 * the post-threshold gate-source charge Qgs2.
 *
 * Gate current at the plateau: turn-on Ig = (Vdrv − Vpl)/(Rpull-up + Rg); turn-off Ig = Vpl/(Rpull-down + Rg).
 * Qgs2 estimate when the datasheet gives only Qgs (charge from 0 V to the plateau): Qgs2 ≈ Qgs·(Vpl − Vth)/Vpl,
 * i.e. the gate-source capacitance is taken as constant between 0 V and the plateau. When neither Qgs2
 * nor Qgs is given: Qgs ≈ (Qg − Qgd)·Vpl/Vdrv (the non-Miller charge spread evenly over the gate swing),
 * then the same split. Both are estimates; the ledger says so.
 * Source: Erickson & Maksimović 2nd ed. ch. 4; Mohan, Undeland & Robbins, Power Electronics, ch. 22
 * [memory for chapters]; docs/methods.md §4.
 */
import type { Mosfet } from '../design/parts.ts';

/** Gate current on the plateau at turn-on, A; 0 when the drive cannot pass the plateau. */
export function turnOnGateCurrentA(driveV: number, plateauV: number, pullUpOhm: number, gateOhm: number): number {
  const headroom = driveV - plateauV;
  if (!(headroom > 0)) return 0;
  const r = pullUpOhm + gateOhm;
  return r > 0 ? headroom / r : Infinity;
}

/** Gate current on the plateau at turn-off, A. */
export function turnOffGateCurrentA(plateauV: number, pullDownOhm: number, gateOhm: number): number {
  if (!(plateauV > 0)) return 0;
  const r = pullDownOhm + gateOhm;
  return r > 0 ? plateauV / r : Infinity;
}

export type Qgs2Source = 'datasheet' | 'from Qgs' | 'from Qg and Qgd';

/** Qgs2 in coulombs, with where it came from. */
export function qgs2Of(fet: Mosfet, driveV: number): { qgs2C: number; source: Qgs2Source } {
  if (fet.qgs2C !== undefined) return { qgs2C: fet.qgs2C, source: 'datasheet' };
  const split = fet.plateauV > fet.vthV ? (fet.plateauV - fet.vthV) / fet.plateauV : 0;
  if (fet.qgsC !== undefined) return { qgs2C: fet.qgsC * split, source: 'from Qgs' };
  const swing = driveV > fet.plateauV ? fet.plateauV / driveV : 1;
  const qgs = Math.max(0, fet.qgC - fet.qgdC) * swing;
  return { qgs2C: qgs * split, source: 'from Qg and Qgd' };
}
