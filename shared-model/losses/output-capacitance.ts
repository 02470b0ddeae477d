/**
 * Output-capacitance (Coss) loss, dissipated in the control switch's channel at its hard turn-on.
 *
 * Formula, per cycle at switch-node swing V:
 *   with a synchronous FET (hard-switched half-bridge): E = Eoss,ctrl(V) + V·Qoss,sync(V) − Eoss,sync(V)
 *     (the control FET's own stored energy, plus the loss of charging the rectifier FET's Coss from the
 *     source: the source delivers V·Qoss, the rectifier FET stores Eoss);
 *   without one: E = Eoss,ctrl(V).
 *   P = E · fs. For a linear capacitance this is ½(C1 + C2)·V² (plain Eoss·fs underestimates it).
 * Scaling from the datasheet voltage V0 (stated `atV`): a small-signal Coss is taken as linear,
 * Qoss = Coss·V and Eoss = ½·Coss·V²; a charge/energy pair is scaled with constant charge- and
 * energy-equivalent capacitances, Qoss(V) = Qoss(V0)·V/V0 and Eoss(V) = Eoss(V0)·(V/V0)². Exact at V0;
 * below V0 a strongly non-linear Coss holds more charge than this scaling says (model limit).
 * A Coss(VDS) table (datasheet curve) is integrated instead: Qoss = ∫C dv, Eoss = ∫v·C dv
 * (curves/coss-table.ts), which keeps the extra charge a non-linear Coss holds at low voltage.
 * A soft (zero-voltage) turn-on has no Coss loss: the caller passes V = 0.
 * Source: docs/methods.md §4 (half-bridge form, check values); Erickson & Maksimović 2nd ed. ch. 4 [memory].
 */
import type { OutputCapacitance } from '../design/parts.ts';
import { cossTableAt } from '../curves/coss-table.ts';
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface OutputCapacitanceInputs {
  /** Switch-node swing at the control switch's turn-on, V (0 for a soft edge). */
  voltageV: number;
  frequencyHz: number;
  /** Control FET energy stored at voltageV, J. */
  ctrlEossJ: number;
  /** Synchronous FET charge and energy at voltageV (0 when the rectifier is a diode). */
  syncQossC: number;
  syncEossJ: number;
}

/** Qoss of a FET at voltage V, C, scaled as stated in the header (a table: integrated). */
export function qossAt(spec: OutputCapacitance, voltageV: number): number {
  const v = voltageV > 0 ? voltageV : 0;
  if (spec.kind === 'table') return cossTableAt(spec.points, v).qossC;
  return spec.kind === 'capacitance' ? spec.cossF * v : (spec.qossC * v) / spec.atV;
}

/** Eoss of a FET at voltage V, J, scaled as stated in the header (a table: integrated). */
export function eossAt(spec: OutputCapacitance, voltageV: number): number {
  const v = voltageV > 0 ? voltageV : 0;
  if (spec.kind === 'table') return cossTableAt(spec.points, v).eossJ;
  if (spec.kind === 'capacitance') return 0.5 * spec.cossF * v * v;
  const r = v / spec.atV;
  return spec.eossJ * r * r;
}

/** Qoss and Eoss of a FET at voltage V, scaled as stated in the header. */
export function cossAt(spec: OutputCapacitance, voltageV: number): { qossC: number; eossJ: number } {
  return { qossC: qossAt(spec, voltageV), eossJ: eossAt(spec, voltageV) };
}

export const outputCapacitance: LossModel<OutputCapacitanceInputs> = {
  mechanism: 'output capacitance',
  heats: 'switch',
  payer: 'switch-node',
  thermal: false,
  drop: false,
  formula: '(Eoss,ctrl(V) + V · Qoss,sync(V) − Eoss,sync(V)) · fs; sync terms are 0 without a synchronous FET; Qoss ∝ V and Eoss ∝ V² from the stated voltage, or ∫C dv and ∫v·C dv of a Coss(VDS) table',
  watts: (x) =>
    nonNegativeFinite((x.ctrlEossJ + x.voltageV * x.syncQossC - x.syncEossJ) * x.frequencyHz),
  describe: (x) => [
    input('V', x.voltageV, 'V'),
    input('fs', x.frequencyHz, 'Hz'),
    input('Eoss,ctrl(V)', x.ctrlEossJ, 'J'),
    input('Qoss,sync(V)', x.syncQossC, 'C'),
    input('Eoss,sync(V)', x.syncEossJ, 'J'),
  ],
};
