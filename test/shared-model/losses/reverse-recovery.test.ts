import { describe, expect, it } from 'vitest';
import { chargeAtEdge, reverseRecovery, type ReverseRecoveryInputs } from '../../../shared-model/losses/reverse-recovery.ts';
import { closeTo } from '../../helpers/close-to.ts';

// docs/methods.md §4 check case: Qrr 20 nC, Vsw = Vin 12 V, fs 500 kHz → 0.12 W. The datasheet charge is stated
// at a test current; the check holds where the diode carries exactly that current at the edge.
const CHECK = { qrrC: 20e-9, voltageV: 12, frequencyHz: 500e3, watts: 0.12 };
const TEST_A = 10; // an invented test current; the check must not depend on its value
const at = (forwardA: number, testA = TEST_A): ReverseRecoveryInputs => ({
  qrrC: CHECK.qrrC, testA, forwardA, voltageV: CHECK.voltageV, frequencyHz: CHECK.frequencyHz,
});

describe('reverse recovery: Qrr · (IF / Itest) · Vsw · fs', () => {
  it('gives 0.12 W for 20 nC at 12 V and 500 kHz when the forward current equals the Qrr test current', () => {
    closeTo(reverseRecovery.watts(at(TEST_A)), CHECK.watts, 1e-9); // docs/methods.md §4: Qrr 20 nC → 0.12 W
    closeTo(reverseRecovery.watts(at(3, 3)), CHECK.watts, 1e-9); // docs/methods.md §4 again at another test current (IF = Itest = 3 A)
  });

  it('scales the stored charge, and so the loss, linearly with the forward current at the edge', () => {
    for (const fraction of [0.25, 0.5, 2]) {
      // Charge-control model Q ≈ τ·IF (Mohan, Undeland & Robbins, Power Electronics, diodes chapter [from memory]): Q ∝ IF
      closeTo(reverseRecovery.watts(at(fraction * TEST_A)), fraction * CHECK.watts, 1e-9);
      closeTo(chargeAtEdge(at(fraction * TEST_A)), fraction * CHECK.qrrC, 1e-9); // same model: Qrr(IF) = Qrr · IF/Itest
    }
  });

  it('is zero at zero forward current and stays zero for current against the diode', () => {
    expect(reverseRecovery.watts(at(0))).toBe(0); // charge-control model Q ≈ τ·IF [from memory]: no forward current, no stored charge
    expect(reverseRecovery.watts(at(-2))).toBe(0); // a diode carrying no forward current stores no charge (same model)
    closeTo(reverseRecovery.watts(at(1e-6)), CHECK.watts * 1e-7, 1e-9); // and approaches 0 continuously: IF/Itest = 1e-7 (same model)
  });

  it('never returns NaN, a negative or an infinite loss for a non-positive test current', () => {
    for (const testA of [0, -1, Number.NaN]) {
      const w = reverseRecovery.watts(at(5, testA));
      expect(Number.isFinite(w) && w >= 0, `testA ${testA}: ${w}`).toBe(true); // losses/model.ts contract: finite, ≥ 0
    }
  });

  it('lists the datasheet Qrr, its test current, the forward current and the charge at the edge among its inputs', () => {
    const inputs = reverseRecovery.describe(at(5));
    const value = (prefix: string) => inputs.find((i) => i.name.startsWith(prefix))?.value;
    expect(value('Qrr (datasheet)')).toBe(CHECK.qrrC); // the input record, unchanged
    expect(value('Itest')).toBe(TEST_A);
    expect(value('IF')).toBe(5);
    closeTo(value('Qrr at the edge')!, CHECK.qrrC * 5 / TEST_A, 1e-12); // charge-control model Q ∝ IF [from memory]
    expect(reverseRecovery.formula).toMatch(/IF \/ Itest/); // the ledger shows the scaling it used
    expect(reverseRecovery.formula).toMatch(/rated load current/); // and the default it assumes (issue 3: terms name their inputs)
  });
});
