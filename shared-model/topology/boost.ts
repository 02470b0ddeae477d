/**
 * The boost (step-up) converter: the inductor always draws from the input; the control switch returns it
 * to ground, the rectifier delivers it to the output.
 *   on:  vL = Vin (minus drops), current from the input to ground;
 *   off: vL = Vin − Vo − VF (minus drops), current from the input to the output.
 * Ideal ratio M = 1/(1 − D); the switch and the rectifier block Vo (+ the rectifier drop at the edge); the
 * node rests at Vin in the DCM idle interval, where the rectifier blocks Vo − Vin.
 * The switch-node charge pulses are drawn from the output: they take volt-seconds and move the duty.
 * Small signal (CCM): right-half-plane zero ωz = D'²·R/L, current-mode output pole ωp = 2/(R·C)
 * (docs/methods.md §13).
 * Source: Erickson & Maksimović 2nd ed. ch. 2 and 8 [memory for chapters]; docs/methods.md §1, §13.
 */
import type { ConverterTopology } from './types.ts';

export const boost: ConverterTopology = {
  kind: 'boost',
  title: 'boost (step-up)',
  steps: 'up',
  idealRatio: (d) => 1 / (1 - d),
  idealDuty: (vinV, voutV) => 1 - vinV / voutV,
  idealOnVoltsV: (vinV) => vinV,
  intervals: {
    on: { part: 'switch', fromInput: true, toOutput: false, slope: 'Vin/L' },
    off: { part: 'rectifier', fromInput: true, toOutput: true, slope: '(Vin − Vout − VF)/L' },
  },
  switchBlocks: { input: 0, output: 1 },
  rectifierBlocks: { input: 0, output: 1 },
  rectifierIdleBlocks: { input: -1, output: 1 },
  idleNode: 'Vin',
  chargePulsesFromSource: false,
  smallSignal: (d, loadOhm, inductanceH, capacitanceF) => {
    const dp = 1 - d;
    return {
      rhpZeroHz: (dp * dp * loadOhm) / inductanceH / (2 * Math.PI),
      outputPoleHz: 2 / (loadOhm * capacitanceF) / (2 * Math.PI),
    };
  },
  smallSignalMethod: 'RHP zero ωz = D′²·R/L; current-mode output pole ωp = 2/(R·C) (docs/methods.md §13)',
};
