/**
 * Schottky junction-capacitance loss: charging the rectifier's junction capacitance at each hard turn-on of
 * the control switch. The charge comes from the input through the switch, so the heat is in the switch
 * (the ledger books it to the switch, naming the rectifier's Cj among the inputs).
 *
 * Formula: P = ½ · Cj · V² · fs for a linear Cj (datasheet value, taken as constant).
 * Assumptions: linear capacitance; PN diodes use reverse recovery instead (their capacitance is neglected).
 * Source: docs/methods.md §6 (400 pF, 12 V, 500 kHz → 14.4 mW check value).
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface JunctionCapacitanceInputs {
  cjF: number;
  voltageV: number;
  frequencyHz: number;
}

export const junctionCapacitance: LossModel<JunctionCapacitanceInputs> = {
  mechanism: 'junction capacitance',
  heats: 'switch',
  payer: 'switch-node',
  thermal: false,
  drop: false,
  formula: '½ · Cj · V² · fs',
  watts: (x) => nonNegativeFinite(0.5 * x.cjF * x.voltageV * x.voltageV * x.frequencyHz),
  describe: (x) => [input('Cj (rectifier)', x.cjF, 'F'), input('V', x.voltageV, 'V'), input('fs', x.frequencyHz, 'Hz')],
};
