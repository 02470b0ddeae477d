/**
 * Capacitor ESR loss (input or output bank of identical capacitors in parallel).
 *
 * Formula: P = ESR(T) · Irms² / n for n equal capacitors sharing the bank's RMS current Irms equally
 * (each carries Irms/n and dissipates ESR·(Irms/n)²); ESR(T) = ESR25 · ratio(T), ratio(T) = 1 + c·(T − 25 °C)
 * floored at 0 or the part's ESR(T) table. ESR25 is the part's single ESR, or — with an ESR(f) table — the
 * spectrum-weighted ESR Σ Ih²·ESR(h·fs) / Irms² of the bank current (curves/esr-spectrum.ts).
 * Assumptions: without an ESR(f) table the ESR at the switching frequency applies to the whole ripple
 * spectrum; equal sharing; ESR(f, T) = ESR(f) · ratio(T).
 * Source: docs/methods.md §9, §1 (exact RMS currents) and §26 (harmonics) [common practice].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface CapacitorEsrInputs {
  /** RMS current of the whole bank, A. */
  irmsA: number;
  /** ESR of one capacitor at its temperature (spectrum-weighted with an ESR(f) table), Ω. */
  esrOhm: number;
  /** The same ESR at 25 °C, Ω (esrOhm = esr25Ohm · ratio(T)). */
  esr25Ohm: number;
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
    input('ESR(25 °C)', x.esr25Ohm, 'Ω'),
    input('ESR(T)', x.esrOhm, 'Ω'),
    input('n', x.count, ''),
    input('T', x.temperatureC, '°C'),
  ],
};
