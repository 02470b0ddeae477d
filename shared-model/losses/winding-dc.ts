/**
 * Inductor winding loss at DC resistance (the whole RMS current through DCR at the winding temperature).
 *
 * Formula: P = IL,rms² · DCR(T), DCR(T) = DCR20 · (1 + 0.00393/K · (T − 20 °C)) (annealed copper).
 * The AC excess of the ripple is a separate term (winding-ac.ts), so nothing is counted twice.
 * Assumptions: uniform winding temperature equal to the hot spot (slightly conservative).
 * Source: IEC 60028 (ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393/K [memory for α]); docs/methods.md §8.
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface WindingDcInputs {
  irmsA: number;
  /** DCR at the winding temperature, Ω. */
  dcrOhm: number;
  temperatureC: number;
}

export const windingDc: LossModel<WindingDcInputs> = {
  mechanism: 'winding DC',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: 'IL,rms² · DCR(T)',
  watts: (x) => nonNegativeFinite(x.irmsA * x.irmsA * x.dcrOhm),
  sensitivity: (x) => nonNegativeFinite(x.irmsA * x.irmsA), // ∂P/∂DCR
  describe: (x) => [input('IL,rms', x.irmsA, 'A'), input('DCR(T)', x.dcrOhm, 'Ω'), input('T', x.temperatureC, '°C')],
};
