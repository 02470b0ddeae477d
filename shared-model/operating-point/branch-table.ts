/**
 * The one table of branch currents over a period, read by both the solver's record (assemble.ts, its
 * waveforms) and the lean point (lean-point.ts, the statistics both paths use): for each branch the three
 * intervals — on (t_on, a0 → a1), off (t_off, b0 → b1), idle (t_idle, constant c) — from the inductor
 * current's shape and the topology record's interval flags (copied into the circuit, circuit.ts).
 *   inductor: valley → peak → valley (DCM: 0 → Ipk → 0, idle 0)
 *   switch = inductor during the on interval; rectifier = inductor during the off interval
 *   input capacitor: the inductor current in the intervals that draw from the input − source DC Iin
 *   output capacitor: k·(node current − Io), the node current being the inductor current in the intervals
 *     that deliver to the output, k the bank's share of its ripple (load.ts; 1 for a constant-current load)
 *   sense resistor: switch, inductor, the load current Io + (1 − k)·(node − Io) (output, k ≠ 1), or a DC
 *     current over the whole period (input: Iin; output with k = 1: Io; none: 0 A)
 * Source: Erickson & Maksimović 2nd ed. ch. 2 and 5 [memory for chapters]; docs/methods.md §1, §2.
 */
import type { Circuit } from './circuit.ts';
import type { Shape } from './shape.ts';

/** Branch numbers, in the order both readers walk them. */
export const INDUCTOR = 0;
export const SWITCH = 1;
export const RECTIFIER = 2;
export const INPUT_CAPACITOR = 3;
export const OUTPUT_CAPACITOR = 4;
export const SENSE = 5;
export const BRANCH_COUNT = 6;

/**
 * Writes branch `b`'s intervals into v = [t_on, t_off, t_idle, a0, a1, b0, b1, c] (numbers in a typed array
 * rather than returned: a call that is not inlined would box each one on the heap).
 */
export function branchIntervals(c: Circuit, s: Shape, b: number, v: Float64Array): void {
  const T = c.periodS;
  const io = c.loadA;
  const lo = s.dcm ? 0 : s.iv;
  const hi = s.ipk;
  const iin = s.iin;
  v[0] = s.d * T;
  v[1] = s.d2 * T;
  v[2] = s.dcm ? s.idle * T : 0;
  const k = c.capacitorShare;
  const nOn0 = c.onToOutput ? lo : 0;
  const nOn1 = c.onToOutput ? hi : 0;
  switch (b) {
    case INDUCTOR:
      v[3] = lo; v[4] = hi; v[5] = hi; v[6] = lo; v[7] = 0;
      return;
    case SWITCH:
      v[3] = lo; v[4] = hi; v[5] = 0; v[6] = 0; v[7] = 0;
      return;
    case RECTIFIER:
      v[3] = 0; v[4] = 0; v[5] = hi; v[6] = lo; v[7] = 0;
      return;
    case INPUT_CAPACITOR:
      v[3] = lo - iin; v[4] = hi - iin; v[7] = -iin;
      if (c.offFromInput) { v[5] = hi - iin; v[6] = lo - iin; } else { v[5] = -iin; v[6] = -iin; }
      return;
    case OUTPUT_CAPACITOR:
      v[3] = k * (nOn0 - io); v[4] = k * (nOn1 - io); v[5] = k * (hi - io); v[6] = k * (lo - io); v[7] = k * -io;
      return;
    default:
      senseIntervals(c, s, v);
  }
}

function senseIntervals(c: Circuit, s: Shape, v: Float64Array): void {
  const io = c.loadA;
  const k = c.capacitorShare;
  if (c.senseAt === 'switch') branchIntervals(c, s, SWITCH, v);
  else if (c.senseAt === 'inductor') branchIntervals(c, s, INDUCTOR, v);
  else if (c.senseAt === 'output' && k !== 1) {
    // The load current: Io plus the load's share (1 − k) of the node ripple (load.ts).
    const lo = s.dcm ? 0 : s.iv;
    const hi = s.ipk;
    const nOn0 = c.onToOutput ? lo : 0;
    const nOn1 = c.onToOutput ? hi : 0;
    v[3] = io + (1 - k) * (nOn0 - io); v[4] = io + (1 - k) * (nOn1 - io); v[5] = io + (1 - k) * (hi - io);
    v[6] = io + (1 - k) * (lo - io); v[7] = io + (1 - k) * -io;
  } else {
    // At the input or output the sense resistor carries DC over the whole period (none: 0 A).
    const dc = c.senseAt === 'input' ? s.iin : c.senseAt === 'output' ? io : 0;
    v[0] = c.periodS; v[1] = 0; v[2] = 0;
    v[3] = dc; v[4] = dc; v[5] = 0; v[6] = 0; v[7] = 0;
  }
}
