/**
 * The boost (step-up) converter: the inductor always draws from the input; the control switch returns it
 * to ground, the rectifier delivers it to the output.
 *   on:  vL = Vin (minus drops), current from the input to ground;
 *   off: vL = Vin − Vo − VF (minus drops), current from the input to the output.
 * Ideal ratio M = 1/(1 − D); the switch and the rectifier block Vo (+ the rectifier drop at the edge); the
 * node rests at Vin in the DCM idle interval, where the rectifier blocks Vo − Vin.
 * The switch-node charge pulses are drawn from the output: they take volt-seconds and move the duty.
 * Small signal (CCM): right-half-plane zero ωz = D'²·R/L, current-mode output pole ωp = (1/R + g)/C with g
 * the load's incremental conductance — 2/(R·C) for a resistor (docs/methods.md §13), 1/(R·C) for a constant
 * current, 0 for a constant power (the power stage's constant-power output meets the load's −1/R;
 * Erickson & Maksimović 2nd ed. ch. 12, the current-programmed boost's simple model [memory]; §22).
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
  smallSignal: (d, loadOhm, inductanceH, capacitanceF, loadConductanceS) => {
    const dp = 1 - d;
    return {
      rhpZeroHz: (dp * dp * loadOhm) / inductanceH / (2 * Math.PI),
      // The current-programmed power stage feeds about constant power (output conductance 1/R) beside the
      // load's own incremental conductance g: ωp = (1/R + g)/C. (A constant-power load behind an output
      // sense resistor would put it a hair past the origin: shown as 0.)
      outputPoleHz: Math.max(1 / loadOhm + loadConductanceS, 0) / capacitanceF / (2 * Math.PI),
    };
  },
  smallSignalMethod:
    'RHP zero ωz = D′²·R/L; current-mode output pole ωp = (1/R + g)/C with g the load\'s incremental conductance: 2/(R·C) for a resistor (docs/methods.md §13), 1/(R·C) for a constant current, 0 for a constant power (docs/methods.md §22)',
  outputPoleFactor: 2,
  sizingWords: {
    inductorCurrent: {
      formula: 'IL = Iin (mean inductor current, solved)',
      reason: 'A boost draws its largest input (inductor) current at the lowest input voltage: {corner}.',
    },
    inductorVoltSecondsReason: 'The inductor volt-seconds Vin·D·Ts of a boost peak near Vin = Vout/2; the largest over the range is at {corner}.',
    // Vin·(1 − Vin/Vo) peaks at Vin = Vo/2.
    largestRippleVinV: (voutV) => voutV / 2,
    blockingReason: 'A boost switch and rectifier block the output voltage at every Vin; the largest solved value is at {corner}.',
    currentReason: 'Boost currents follow the input current, largest at {corner}.',
    switchRmsReason: 'Boost currents follow the input current, largest at {corner}.',
    rectifierMeanReason: 'A boost rectifier carries the load current on average at every Vin: {corner}.',
    outputCharge: { formula: 'Q = ∫ max(iC − īC, 0) dt = Io·D·Ts (boost)', reason: 'The bank alone feeds the load during the on time D·Ts; D is largest at {corner}.' },
    outputCurrentSwing: { formula: 'ΔiC = Ipk (rectifier current steps from 0 to the inductor peak)', reason: 'The capacitor current steps by the inductor peak, largest at {corner}.' },
    downSlope: {
      formula: 'm2 = (Vo − Vin)/L (solved waveform)',
      reason: 'The boost down-slope (Vo − Vin)/L is steepest at the lowest input voltage, which is also the largest duty: {corner}.',
    },
    outputPoleFormula: 'fp = 2/(2π·R·C) (current mode)',
  },
};
