/**
 * What the load is, and how it shares the switching-frequency ripple of the output node with the
 * output capacitor bank.
 *
 * The converter feeds a current i_node into the output node (buck: the inductor current; boost: the
 * rectifier current). The bank (ESR in series with C) and the load share its ripple. Seen from the node,
 * the load is linearised about its operating point (Vo, Io) as an incremental conductance g:
 *   constant-current sink  g = 0
 *   resistor R = Vo/Io     g = 1/(R + Rs)          (Rs: an output sense resistor in series with the load)
 *   constant power P = Vo·Io at the load's terminals, i = P/v, so dv/di = −R there:  g = 1/(Rs − R)
 * With the bank's capacitance an AC short over a period (R·C ≫ T), the node ripple divides between ESR
 * and 1/g:   i_C = k·(i_node − Io),   i_load = Io + (1 − k)·(i_node − Io),   k = 1/(1 + g·ESR).
 * A resistor takes a share (k < 1); a constant-power load's negative incremental resistance pushes more
 * ripple into the bank (k > 1), without bound as ESR approaches R − Rs. The node then sees ESR·k where a
 * current sink sees ESR (the volt-second drops of circuit.ts).
 * Assumptions (validity limits, warned by checks.ts): the capacitor's own voltage ripple drives no load
 * current, so R·C must be many periods (measured against the time-domain reference on a boost, the
 * worst case: the capacitive ripple is 0.3 % off at R·C = 10 T, 0.7 % at 5 T, 1.3 % at 3 T; with the
 * bank's ESR at 1 % of R the total ripple is 1.07 % off at 10 T, 0.75 % at 20 T, 0.59 % at 30 T and
 * 0.49 % at 40 T, and the switch's conduction loss 0.78 % at 10 T — test/shared-model/operating-point/
 * edges.test.ts); the
 * linearisation of a constant-power load holds while the ripple is small beside Vo and the bank's share
 * stays moderate (|k − 1| ≤ 0.5).
 * The mean load current is the evaluated load Io in every kind (R = Vo/Io at each point of a sweep).
 * Source: Kirchhoff's current law at the output node and the current divider; linearisation of i = P/v
 * (a constant-power load's negative incremental resistance, −V/I) — common practice.
 */
import type { Specification } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';

export type LoadKind = NonNullable<Specification['loadKind']>;

/** The load kind of a specification (absent: a constant-current sink, the behaviour before the field existed). */
export function loadKindOf(spec: Specification): LoadKind {
  return spec.loadKind ?? 'constant-current';
}

/** The load's incremental conductance seen from the output node, S (see header); 0 at no load. */
export function loadConductanceS(kind: LoadKind, voutV: number, loadA: number, senseOhm: number): number {
  if (kind === 'constant-current' || !(loadA > 0) || !(voutV > 0)) return 0;
  const r = voutV / loadA;
  return kind === 'resistive' ? 1 / (r + senseOhm) : 1 / (senseOhm - r);
}

/** Smallest |1 + g·ESR| used: keeps k finite where a constant-power load meets an ESR equal to R − Rs. */
const SHARE_FLOOR = 1e-6;

/** Fraction k of the node's ripple current that the output capacitor bank carries: 1/(1 + g·ESR). */
export function capacitorShare(conductanceS: number, esrOhm: number): number {
  if (conductanceS === 0) return 1;
  const den = 1 + conductanceS * esrOhm;
  return 1 / (Math.abs(den) < SHARE_FLOOR ? Math.sign(den || 1) * SHARE_FLOOR : den);
}

/** Largest |k − 1| for which the model is stated valid without a warning (ESR-to-load ratio, checks.ts). */
export const SHARE_DEVIATION_WARN = 0.5;

/**
 * Smallest R·C, in switching periods, for which the output ripple and the bank RMS stay within 0.5 % of
 * the time-domain reference (see header) — below it checks.ts warns.
 */
export const LOAD_RC_MIN_PERIODS = 40;

const f3 = (x: number) => Number(x.toPrecision(3)).toString();

/** The fields of a circuit (circuit.ts) the load-model warnings read. */
export interface LoadedCircuit {
  loadConductanceS: number;
  capacitorShare: number;
  esrOhm: number;
  outputCapacitanceF: number;
  periodS: number;
}

/** Appends the load model's validity warnings (see header) to `out`. */
export function loadModelWarnings(c: LoadedCircuit, out: Warning[]): void {
  const g = c.loadConductanceS;
  if (g === 0) return;
  const rcPeriods = c.outputCapacitanceF / (Math.abs(g) * c.periodS);
  if (rcPeriods < LOAD_RC_MIN_PERIODS) {
    out.push({ code: 'model-limit', severity: 'caution', path: 'spec.loadKind',
      message: `The load's time constant with the output bank is only ${f3(rcPeriods)} switching periods (the model assumes at least ${LOAD_RC_MIN_PERIODS}): the load also takes part of the capacitor's ripple, which is not modelled: the output-capacitor RMS and the output ripple are approximate.` });
  }
  if (g < 0 && Math.abs(c.capacitorShare - 1) > SHARE_DEVIATION_WARN) {
    out.push({ code: 'model-limit', severity: 'caution', path: 'spec.loadKind',
      message: `The output bank's ESR (${f3(c.esrOhm)} Ω) is comparable to the load's incremental resistance (${f3(1 / g)} Ω): a constant-power load pushes ${f3(c.capacitorShare)} × the node's ripple current into the bank, near the edge where the linearised load stops holding (at ESR = R − Rs the share is unbounded).` });
  }
}
