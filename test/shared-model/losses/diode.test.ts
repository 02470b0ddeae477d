import { describe, expect, it } from 'vitest';
import { diodeForward } from '../../../shared-model/losses/diode-forward.ts';
import { reverseLeakage } from '../../../shared-model/losses/reverse-leakage.ts';
import { junctionCapacitance } from '../../../shared-model/losses/junction-capacitance.ts';
import { leakageAt } from '../../../shared-model/physics/temperature-laws.ts';
import { inventedDiode } from '../../helpers/designs.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('diode forward drop', () => {
  it('gives Vf0·Iavg + Rd·Irms² = 0.717831 W for the docs/methods.md §6 case', () => {
    const w = diodeForward.watts({ vf0V: 0.35, rdOhm: 0.02, iavgA: 1.75, irmsA: 2.294895, temperatureC: 25 });
    closeTo(w, 0.717831, 1e-6); // docs/methods.md §6: Iavg 1.75 A, Irms 2.294895 A, Vf0 0.35 V, Rd 20 mΩ → 0.717831 W
  });
  it('falls as Vf0 falls with temperature (negative drift)', () => {
    const hot = diodeForward.watts({ vf0V: 0.35 - 0.0015 * 100, rdOhm: 0.02, iavgA: 1.75, irmsA: 2.294895, temperatureC: 125 });
    closeTo(hot, 0.717831 - 0.15 * 1.75, 1e-6); // docs/methods.md §6: Vf0 drifts about −1 to −2 mV/K (−1.5 mV/K × 100 K here)
  });
});

describe('diode reverse leakage', () => {
  it('rises to 51.2 mA at 125 °C and gives 0.256 W over D = 0.416667 at 12 V', () => {
    const diode = { ...inventedDiode(0.35, 0.02), leakageA: 50e-6, leakageAtC: 25, leakageDoublingK: 10 };
    const ir = leakageAt(diode, 125);
    closeTo(ir, 51.2e-3, 1e-9); // docs/methods.md §6: IR 50 µA at 25 °C → 51.2 mA at 125 °C (doubling every 10 K)
    const w = reverseLeakage.watts({ leakageA: ir, reverseV: 12, reverseFraction: 5 / 12, idleV: 0, idleFraction: 0, temperatureC: 125 });
    closeTo(w, 0.256, 1e-6); // docs/methods.md §6: reverse-biased at 12 V for D = 0.416667 → 0.256 W
  });
  it('adds the DCM idle interval at its own blocking voltage', () => {
    const base = { leakageA: 1e-3, reverseV: 12, reverseFraction: 0.3, idleV: 5, idleFraction: 0.2, temperatureC: 100 };
    closeTo(reverseLeakage.watts(base), 1e-3 * (12 * 0.3 + 5 * 0.2), 1e-12); // reverse-leakage.ts header: IR·(VR·D + Vidle·Didle)
  });
});

describe('Schottky junction capacitance', () => {
  it('gives ½·Cj·V²·fs = 14.4 mW for 400 pF at 12 V and 500 kHz', () => {
    closeTo(junctionCapacitance.watts({ cjF: 400e-12, voltageV: 12, frequencyHz: 500e3 }), 0.0144, 1e-9); // docs/methods.md §6: 14.4 mW
  });
  it('is zero for a soft edge (no swing)', () => {
    expect(junctionCapacitance.watts({ cjF: 400e-12, voltageV: 0, frequencyHz: 500e3 })).toBe(0); // ½·Cj·0²·fs
  });
});
