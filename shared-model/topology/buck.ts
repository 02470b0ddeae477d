/**
 * The buck (step-down) converter: the control switch connects the inductor to the input, the rectifier
 * returns it to ground; the inductor always feeds the output.
 *   on:  vL = Vin − Vo (minus drops), current from the input to the output;
 *   off: vL = −Vo − VF (minus drops), current from ground to the output.
 * Ideal ratio M = D; the switch and the rectifier block Vin (+ the rectifier drop at the edge); the node
 * rests at Vo in the DCM idle interval, where the rectifier blocks Vo.
 * The switch-node charge pulses flow from Vin through the switch: paid by the source at unchanged duty.
 * No right-half-plane zero (the small-signal figures are left out).
 * Source: Erickson & Maksimović 2nd ed. ch. 2 [memory for chapter]; docs/methods.md §1.
 */
import type { ConverterTopology } from './types.ts';

export const buck: ConverterTopology = {
  kind: 'buck',
  title: 'buck (step-down)',
  steps: 'down',
  idealRatio: (d) => d,
  idealDuty: (vinV, voutV) => voutV / vinV,
  idealOnVoltsV: (vinV, voutV) => vinV - voutV,
  intervals: {
    on: { part: 'switch', fromInput: true, toOutput: true, slope: '(Vin − Vout)/L' },
    off: { part: 'rectifier', fromInput: false, toOutput: true, slope: '−(Vout + VF)/L' },
  },
  switchBlocks: { input: 1, output: 0 },
  rectifierBlocks: { input: 1, output: 0 },
  rectifierIdleBlocks: { input: 0, output: 1 },
  idleNode: 'Vout',
  chargePulsesFromSource: true,
  smallSignal: () => undefined,
  smallSignalMethod: 'none (no right-half-plane zero)',
  outputPoleFactor: 1,
  sizingWords: {
    inductorCurrent: {
      formula: 'IL = Io (mean inductor current, solved)',
      reason: 'A buck carries the load current in its inductor at every input voltage; {corner} is taken.',
    },
    inductorVoltSecondsReason: 'The inductor volt-seconds (Vin − Vout)·D·Ts of a buck grow with Vin: {corner}.',
    // (Vin − Vo)·Vo/Vin rises with Vin: the largest ripple is at the top of the range, a corner already.
    largestRippleVinV: () => undefined,
    blockingReason: 'A buck switch and rectifier block the input voltage: {corner}.',
    currentReason: 'Buck currents follow the load plus half the ripple; the ripple grows with Vin: {corner}.',
    switchRmsReason: 'The switch RMS current of a buck grows with D, largest at {corner}.',
    rectifierMeanReason: 'A buck rectifier conducts (1 − D), longest at {corner}.',
    outputCharge: { formula: 'Q = ∫ max(iC − īC, 0) dt = ΔI·Ts/8 (buck)', reason: 'The bank absorbs the inductor ripple, largest at {corner}.' },
    outputCurrentSwing: { formula: 'ΔiC = ΔI', reason: 'The capacitor current swings by the inductor ripple, largest at {corner}.' },
    downSlope: { formula: 'm2 = Vo/L (solved waveform)', reason: 'The buck down-slope Vo/L is the same at every Vin; the duty is largest at {corner}.' },
    outputPoleFormula: 'fp = 1/(2π·R·C) (current mode)',
  },
};
