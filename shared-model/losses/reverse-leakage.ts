/**
 * Diode reverse-leakage loss, rising with junction temperature.
 *
 * Formula: P = IR(Tj) · (VR · dR + Vidle · dIdle), with IR(Tj) = IR(T0) · 2^((Tj − T0)/Td) (doubling
 * interval Td, ≈ 10 K for Schottky diodes), dR the fraction of the period the diode blocks VR (the control
 * switch's on-time D) and, in DCM, dIdle the idle fraction during which it blocks Vidle (buck: Vout;
 * boost: Vout − Vin).
 * Assumptions: IR does not depend on the reverse voltage; the ringing in the idle interval is ignored.
 * Source: docs/methods.md §6 (50 µA at 25 °C → 51.2 mA at 125 °C; 0.256 W check value) [common practice].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface ReverseLeakageInputs {
  /** Leakage current at the junction temperature, A. */
  leakageA: number;
  reverseV: number;
  reverseFraction: number;
  idleV: number;
  idleFraction: number;
  temperatureC: number;
}

export const reverseLeakage: LossModel<ReverseLeakageInputs> = {
  mechanism: 'reverse leakage',
  heats: 'own',
  payer: 'switch-node',
  thermal: true,
  drop: false,
  formula: 'IR(Tj) · (VR · D + Vidle · Didle)',
  watts: (x) =>
    nonNegativeFinite(
      x.leakageA * (nonNegativeFinite(x.reverseV) * x.reverseFraction + nonNegativeFinite(x.idleV) * x.idleFraction),
    ),
  // ∂P/∂IR
  sensitivity: (x) => nonNegativeFinite(nonNegativeFinite(x.reverseV) * x.reverseFraction + nonNegativeFinite(x.idleV) * x.idleFraction),
  describe: (x) => [
    input('IR(Tj)', x.leakageA, 'A'),
    input('VR', x.reverseV, 'V'),
    input('D', x.reverseFraction, ''),
    input('Vidle', x.idleV, 'V'),
    input('Didle', x.idleFraction, ''),
    input('Tj', x.temperatureC, '°C'),
  ],
};
