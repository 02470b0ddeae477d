/**
 * MOSFET conduction loss (control switch or synchronous rectifier).
 *
 * Formula: P = Irms² · RDS(on)(Tj), with Irms the exact RMS of the FET's piecewise-linear current and
 * RDS(on) evaluated at the junction temperature the electro-thermal loop has reached.
 * Assumptions: the channel is a linear resistor while on (no dependence on drain current or gate drive
 * beyond the datasheet value); reverse conduction through the channel uses the same RDS(on).
 * Source: Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 3–4 [memory for chapter];
 * docs/methods.md §1 (exact RMS) and §5 (RDS(on) versus temperature).
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface ConductionInputs {
  /** RMS current in the FET, A. */
  irmsA: number;
  /** RDS(on) at the junction temperature, Ω. */
  resistanceOhm: number;
  /** Junction temperature RDS(on) was taken at, °C (for the record). */
  temperatureC: number;
}

export const conduction: LossModel<ConductionInputs> = {
  mechanism: 'conduction',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: 'Irms² · RDS(on)(Tj)',
  watts: (x) => nonNegativeFinite(x.irmsA * x.irmsA * x.resistanceOhm),
  sensitivity: (x) => nonNegativeFinite(x.irmsA * x.irmsA), // ∂P/∂RDS(on)
  describe: (x) => [
    input('Irms', x.irmsA, 'A'),
    input('RDS(on)(Tj)', x.resistanceOhm, 'Ω'),
    input('Tj', x.temperatureC, '°C'),
  ],
};
