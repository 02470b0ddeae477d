/**
 * The textbook hand sizing from an assumed efficiency, on the lecture's boost case (5 V → 12 V, 2 A,
 * 120 kHz, 120 mV output ripple, 80 % assumed efficiency, 30 % inductor ripple, 10 mΩ switch shunt).
 * Every expected value was worked here from the published formula named on its line
 * (docs/methods.md §23 lists the working).
 */
import { describe, expect, test } from 'vitest';
import { handSizing } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

const seed = {
  kind: 'boost' as const,
  vinV: 5,
  voutV: 12,
  loadA: 2,
  switchingFrequencyHz: 120e3,
  efficiency: 0.8,
  rippleRatio: 0.3,
  outputRippleV: 0.12,
  senseOhm: 0.01,
};

describe('handSizing reproduces the hand results of the boost case', () => {
  const h = handSizing(seed);
  test('duty from the assumed efficiency D = 1 − η·Vin/Vo', () => {
    closeTo(h.dutyCycle, 0.666667, 1e-6); // Erickson & Maksimović 2nd ed. ch. 3 (boost with losses), worked here
  });
  test('inductor current, ripple, inductance and peak', () => {
    closeTo(h.inductorA, 6, 1e-6); // IL = Io/(1 − D), charge balance, Erickson & Maksimović ch. 2, worked here
    closeTo(h.rippleA, 1.8, 1e-6); // ΔI = r·IL with r = 0.3 (common practice 20–40 %)
    closeTo(h.inductanceH, 15.432099e-6, 1e-6); // L = Vin·D/(ΔI·fs), Erickson & Maksimović ch. 2, worked here
    closeTo(h.peakA, 6.9, 1e-6); // Ipk = IL + ΔI/2, Erickson & Maksimović ch. 2
  });
  test('output capacitance and the largest ESR from the ripple target', () => {
    closeTo(h.outputCapacitanceF, 92.592593e-6, 1e-6); // C = Io·D/(fs·ΔV), charge method, Erickson & Maksimović ch. 2, worked here
    closeTo(h.maxEsrOhm, 17.391304e-3, 1e-6); // ESR = ΔV/Ipk (common practice), worked here
  });
  test('RHP zero, output pole and crossover', () => {
    closeTo(h.rhpZeroHz, 6875.4935, 1e-6); // fz = D′²R/(2πL), Erickson & Maksimović ch. 8 (from memory), worked here
    closeTo(h.outputPoleHz, 572.95780, 1e-6); // fp = 2/(2πRC) current mode, docs/methods.md §13, worked here
    closeTo(h.crossoverHz, 1375.0987, 1e-6); // min(fs/10, fz/5), common practice, worked here
  });
  test('slope compensation and sense-resistor loss', () => {
    expect(h.slopeNeeded).toBe(true); // D > 0.5 needs a ramp, Ridley 1991 (from memory)
    closeTo(h.minSlopeAPerS, 226800, 1e-6); // m_a ≥ (Vo − Vin)/(2L), docs/methods.md §17, worked here
    closeTo(h.switchRmsA, 4.9173163, 1e-6); // √(D(IL² + ΔI²/12)), docs/methods.md §1, worked here
    closeTo(h.senseLossW, 0.2418, 1e-6); // Isw,rms²·Rs, worked here
  });
});

describe('handSizing of a buck', () => {
  test('matches the CCM check values of docs/methods.md §1 at unit efficiency', () => {
    // Buck Vin 12 V, Vo 5 V, Io 3 A, L 10 µH, fs 500 kHz gives ΔI 0.583333 A (docs/methods.md §1):
    // sizing for that ripple (r = 0.583333/3) must return L = 10 µH.
    const h = handSizing({ kind: 'buck', vinV: 12, voutV: 5, loadA: 3, switchingFrequencyHz: 500e3, efficiency: 1, rippleRatio: 0.583333333 / 3, outputRippleV: 0.01, senseOhm: 0 });
    closeTo(h.dutyCycle, 0.416667, 1e-5); // docs/methods.md §1
    closeTo(h.inductanceH, 10e-6, 1e-6); // docs/methods.md §1
    closeTo(h.peakA, 3.291667, 1e-6); // docs/methods.md §1
    closeTo(h.outputCapacitanceF, 0.583333 / (8 * 500e3 * 0.01), 1e-5); // C = ΔI/(8·fs·ΔV), Erickson & Maksimović ch. 2
    expect(h.slopeNeeded).toBe(false); // D < 0.5, Ridley 1991 (from memory)
  });
});
