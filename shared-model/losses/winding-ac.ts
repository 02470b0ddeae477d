/**
 * Inductor AC winding loss: the extra loss of the ripple current in a winding whose resistance rises with
 * frequency (skin and proximity effect).
 *
 * Formula: P = Iac,rms² · DCR(T) · (F_R − 1), with Iac,rms the RMS of the ripple (inductor current minus
 * its mean) and F_R = Rac/Rdc either a user factor at fs, or Dowell's layered-winding factor weighted over
 * the ripple's harmonics (dowell.ts). The DC part of Rac is already in winding-dc.ts.
 * Assumptions: a factor below 1 is treated as 1 (no AC excess); the Dowell model assumes a 1-D field in
 * full-width layers (Dowell, Proc. IEE 113(8), 1966).
 * Source: docs/methods.md §8; Dowell 1966.
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface WindingAcInputs {
  acRmsA: number;
  dcrOhm: number;
  /** Effective Rac/Rdc for this ripple. */
  factor: number;
  temperatureC: number;
}

export const windingAc: LossModel<WindingAcInputs> = {
  mechanism: 'winding AC',
  heats: 'own',
  payer: 'source',
  thermal: true,
  drop: false,
  formula: 'Iac,rms² · DCR(T) · (F_R − 1)',
  watts: (x) => nonNegativeFinite(x.acRmsA * x.acRmsA * x.dcrOhm * (x.factor - 1)),
  sensitivity: (x) => nonNegativeFinite(x.acRmsA * x.acRmsA * (x.factor - 1)), // ∂P/∂DCR (F_R held)
  describe: (x) => [
    input('Iac,rms', x.acRmsA, 'A'),
    input('DCR(T)', x.dcrOhm, 'Ω'),
    input('F_R', x.factor, ''),
    input('T', x.temperatureC, '°C'),
  ],
};
