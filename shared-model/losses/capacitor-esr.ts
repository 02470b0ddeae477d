/**
 * Capacitor ESR loss (input or output bank of identical capacitors in parallel).
 *
 * Formula: P = ESR(T) · Irms² / n for n equal capacitors sharing the bank's RMS current Irms equally
 * (each carries Irms/n and dissipates ESR·(Irms/n)²); ESR(T) = ESR · (1 + c·(T − 25 °C)), floored at 0.
 * Assumptions: ESR at the switching frequency applies to the whole ripple spectrum; equal sharing.
 * Source: docs/methods.md §9 and §1 (exact RMS currents) [common practice].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface CapacitorEsrInputs {
  /** RMS current of the whole bank, A. */
  irmsA: number;
  /** ESR of one capacitor at its temperature, Ω. */
  esrOhm: number;
  count: number;
  temperatureC: number;
}

export const capacitorEsr: LossModel<CapacitorEsrInputs> = {
  mechanism: 'ESR',
  heats: 'own',
  payer: 'path',
  thermal: true,
  drop: true,
  formula: 'ESR(T) · Irms² / n',
  watts: (x) => nonNegativeFinite((x.esrOhm * x.irmsA * x.irmsA) / x.count),
  sensitivity: (x) => nonNegativeFinite((x.irmsA * x.irmsA) / x.count), // ∂P/∂ESR
  describe: (x) => [
    input('Irms (bank)', x.irmsA, 'A'),
    input('ESR(T)', x.esrOhm, 'Ω'),
    input('n', x.count, ''),
    input('T', x.temperatureC, '°C'),
  ],
};
