/**
 * Reverse-recovery loss, charged to the control switch that turns on into a conducting diode (the body
 * diode of a synchronous FET after the dead time, or a PN rectifier diode in CCM).
 *
 * Formula: P ≈ Qrr · (IF / Itest) · Vsw · fs, where Qrr is the datasheet charge stated at the test
 * current Itest and IF ≥ 0 is the forward current in the diode at the moment the opposing switch turns
 * on. Charge-control model: the charge stored in the diode is proportional to its forward current,
 * Q ≈ τ·IF (Mohan, Undeland & Robbins, Power Electronics, chapter on power diodes [from memory]), so the
 * datasheet charge is scaled linearly from its test current; the loss goes to 0 as IF goes to 0, which
 * keeps it continuous where the inductor valley current reaches zero (the CCM/DCM boundary).
 * Assumptions: linear in IF (a simplification: real Qrr grows less than linearly at high current and
 * also depends on di/dt and temperature, neither modelled); Itest defaults to the design's rated load
 * current when the part does not state it (the caller passes it; the ledger notes the assumption); the
 * recovery charge is drawn from the input at the full switch-node swing and dissipated in the turning-on
 * switch. No recovery when the diode carries no forward current at the edge (DCM, negative current, no
 * dead time) — the caller passes IF = 0 then.
 * Source: docs/methods.md §4 (Qrr 20 nC → 0.12 W at IF = Itest); Mohan, Undeland & Robbins ch. 20–22 [memory].
 */
import { input, nonNegativeFinite, safeRatio, type LossModel } from './model.ts';

export interface ReverseRecoveryInputs {
  /** Datasheet reverse-recovery charge, C, stated at testA. */
  qrrC: number;
  /** The forward current of the datasheet Qrr, A (> 0). */
  testA: number;
  /** Forward current in the diode when the opposing switch turns on, A (≥ 0; 0 when it does not conduct). */
  forwardA: number;
  voltageV: number;
  frequencyHz: number;
}

/** Recovery charge at the edge: Qrr · IF / Itest (0 for IF ≤ 0 or a non-positive test current). */
export function chargeAtEdge(x: ReverseRecoveryInputs): number {
  return nonNegativeFinite(x.qrrC * safeRatio(Math.max(x.forwardA, 0), x.testA));
}

export const reverseRecovery: LossModel<ReverseRecoveryInputs> = {
  mechanism: 'reverse recovery',
  heats: 'switch',
  payer: 'switch-node',
  thermal: false,
  drop: false,
  formula: 'Qrr · (IF / Itest) · Vsw · fs; Qrr scaled linearly from its test current Itest (rated load current when not stated)',
  watts: (x) => nonNegativeFinite(chargeAtEdge(x) * x.voltageV * x.frequencyHz),
  describe: (x) => [
    input('Qrr (datasheet)', x.qrrC, 'C'),
    input('Itest (Qrr test current, or rated load current if not stated)', x.testA, 'A'),
    input('IF at the edge', Math.max(x.forwardA, 0), 'A'),
    input('Qrr at the edge', chargeAtEdge(x), 'C'),
    input('Vsw', x.voltageV, 'V'),
    input('fs', x.frequencyHz, 'Hz'),
  ],
};
