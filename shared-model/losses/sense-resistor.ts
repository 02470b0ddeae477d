/**
 * Current-sense resistor loss, wherever the resistor sits (input, switch, inductor or output path).
 *
 * Formula: P = Irms² · R(T), R(T) = R · (1 + TCR · (T − 25 °C)), with Irms the exact RMS of the current in
 * the resistor's branch. Source: common practice (Joule heating with the datasheet TCR).
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface SenseResistorInputs {
  irmsA: number;
  resistanceOhm: number;
  temperatureC: number;
}

export const senseResistor: LossModel<SenseResistorInputs> = {
  mechanism: 'sense',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: 'Irms² · R(T)',
  watts: (x) => nonNegativeFinite(x.irmsA * x.irmsA * x.resistanceOhm),
  sensitivity: (x) => nonNegativeFinite(x.irmsA * x.irmsA), // ∂P/∂R
  describe: (x) => [input('Irms', x.irmsA, 'A'), input('R(T)', x.resistanceOhm, 'Ω'), input('T', x.temperatureC, '°C')],
};
