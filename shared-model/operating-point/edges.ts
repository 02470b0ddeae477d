/**
 * The control switch's edge voltages and the blocking voltages for the ratings, from the topology record's
 * coefficients of Vin and Vout (copied into the circuit) plus the rectifier's drop: one definition read
 * by the solver's record (assemble.ts) and the lean point (lean-point.ts).
 * Turn-on at the valley (0 in DCM: the swing when the idle interval starts, as in CCM at zero current);
 * turn-off at the peak. Source: Erickson & Maksimović 2nd ed. ch. 4 [memory]; docs/methods.md §4.
 */
import type { Circuit } from './circuit.ts';
import type { Shape } from './shape.ts';

/** Forward drop of the rectifier at current i (diode VF0 + Rd·i, synchronous RDS·i). */
export function rectifierDrop(c: Circuit, i: number): number {
  return c.vf0V + c.rRectOhm * i;
}

/**
 * Voltage the control switch blocks just before it turns on. DCM: the swing the switch sees when the idle
 * interval starts (the rectifier has just stopped conducting), as in CCM at zero current. The idle-interval
 * ringing, which moves the node toward its resting value (buck Vo, boost Vin) and usually lowers the swing,
 * is not modelled: this is the conservative choice, and it keeps the capacitive turn-on loss continuous at
 * the CCM/DCM boundary. `vo1` is the output plus any output-sense drop.
 */
export function turnOnVoltageV(c: Circuit, s: Shape, vo1: number): number {
  const drop = rectifierDrop(c, s.dcm ? 0 : s.iv);
  return c.switchIn * s.vin1 + c.switchOut * vo1 + drop;
}

/** Voltage the control switch blocks just after it turns off (at the peak current). */
export function turnOffVoltageV(c: Circuit, s: Shape, vo1: number): number {
  const drop = rectifierDrop(c, s.ipk);
  return c.switchIn * s.vin1 + c.switchOut * vo1 + drop;
}

/** Voltage the control switch blocks, for its rating (the record's switchBlocks at Vin and Vo', plus the rectifier drop at the peak). */
export function switchStressV(c: Circuit, s: Shape, vo1: number): number {
  return c.switchIn * c.vinV + c.switchOut * vo1 + rectifierDrop(c, s.ipk);
}

/** Voltage the rectifier blocks while the switch conducts (the record's rectifierBlocks at Vin and Vo'). */
export function rectifierStressV(c: Circuit, vo1: number): number {
  return c.rectIn * c.vinV + c.rectOut * vo1;
}
