/**
 * Diode conduction loss (rectifier diode).
 *
 * Formula: P = Vf0(Tj) · Iavg + Rd · Irms², with the piecewise-linear forward model v = Vf0 + Rd·i and
 * Vf0(Tj) = Vf0 + (dVf0/dT)·(Tj − 25 °C) (falls about 1–2 mV/K).
 * Assumptions: the forward model holds over the current range; Rd does not change with temperature.
 * Source: docs/methods.md §6 (0.717831 W check value); Erickson & Maksimović 2nd ed. ch. 3 [memory].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface DiodeForwardInputs {
  /** Threshold voltage at the junction temperature, V. */
  vf0V: number;
  rdOhm: number;
  iavgA: number;
  irmsA: number;
  temperatureC: number;
}

export const diodeForward: LossModel<DiodeForwardInputs> = {
  mechanism: 'forward drop',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: 'Vf0(Tj) · Iavg + Rd · Irms²',
  watts: (x) => nonNegativeFinite(x.vf0V * x.iavgA + x.rdOhm * x.irmsA * x.irmsA),
  sensitivity: (x) => nonNegativeFinite(x.iavgA), // ∂P/∂Vf0
  describe: (x) => [
    input('Vf0(Tj)', x.vf0V, 'V'),
    input('Rd', x.rdOhm, 'Ω'),
    input('Iavg', x.iavgA, 'A'),
    input('Irms', x.irmsA, 'A'),
    input('Tj', x.temperatureC, '°C'),
  ],
};
