/**
 * Reverse-recovery loss, charged to the control switch that turns on into a conducting diode (the body
 * diode of a synchronous FET after the dead time, or a PN rectifier diode in CCM).
 *
 * Formula: P ≈ Qrr · Vsw · fs. Assumptions: Qrr is the datasheet value (its dependence on current, di/dt
 * and temperature is not modelled); the recovery charge is drawn from the input at the full switch-node
 * swing and dissipated in the turning-on switch. No recovery when the diode carries no forward current at
 * the edge (DCM, negative current) — the caller passes 0 charge then.
 * Source: METHODS.md §4 (20 nC → 0.12 W check value); Mohan, Undeland & Robbins ch. 20–22 [memory].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface ReverseRecoveryInputs {
  qrrC: number;
  voltageV: number;
  frequencyHz: number;
}

export const reverseRecovery: LossModel<ReverseRecoveryInputs> = {
  mechanism: 'reverse recovery',
  formula: 'Qrr · Vsw · fs',
  watts: (x) => nonNegativeFinite(x.qrrC * x.voltageV * x.frequencyHz),
  describe: (x) => [input('Qrr', x.qrrC, 'C'), input('Vsw', x.voltageV, 'V'), input('fs', x.frequencyHz, 'Hz')],
};
