/**
 * Controller quiescent loss: the bias current drawn from the input.
 *
 * Formula: P = Vin · Iq. Assumption: Iq is constant (datasheet value at this Vin); all of it is dissipated
 * in the controller. Source: common practice (datasheet quiescent current times supply voltage).
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface QuiescentInputs {
  vinV: number;
  quiescentA: number;
}

export const quiescent: LossModel<QuiescentInputs> = {
  mechanism: 'quiescent',
  heats: 'controller',
  payer: 'source',
  thermal: false,
  drop: false,
  formula: 'Vin · Iq',
  watts: (x) => nonNegativeFinite(x.vinV * x.quiescentA),
  describe: (x) => [input('Vin', x.vinV, 'V'), input('Iq', x.quiescentA, 'A')],
};
