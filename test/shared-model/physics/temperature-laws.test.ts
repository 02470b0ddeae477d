import { describe, expect, it } from 'vitest';
import {
  copperResistanceAt,
  diodeVf0At,
  esrAt,
  leakageAt,
  rdsOnAt,
  resistorAt,
  type Capacitor,
  type Mosfet,
  type RdsTemperatureLaw,
} from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { inventedDiode, inventedMosfet } from '../../helpers/designs.ts';

const withLaw = (law: RdsTemperatureLaw): Mosfet => ({ ...inventedMosfet(0.01), rdsTemperatureLaw: law });
const HALF_MICRO_OHM = 0.5e-6; // docs/methods.md prints mΩ to 3 decimals: half a unit of the last digit

describe('rdsOnAt(mosfet, tC)', () => {
  it('linear law 0.5 %/K on 10 mΩ gives 13.75 mΩ at 100 °C and 15.00 mΩ at 125 °C', () => {
    const fet = withLaw({ law: 'linear', alphaPerK: 0.005 });
    closeTo(rdsOnAt(fet, 100), 0.01375, 1e-12); // docs/methods.md §5 check (common practice)
    closeTo(rdsOnAt(fet, 125), 0.015, 1e-12); // docs/methods.md §5 check (common practice)
    closeTo(rdsOnAt(fet, 25), 0.01, 1e-15); // definition: R25 at 25 °C
  });

  it('power law k = 2 (kelvin ratio) gives 15.664 mΩ at 100 °C and 17.833 mΩ at 125 °C', () => {
    const fet = withLaw({ law: 'power', exponent: 2 });
    closeTo(rdsOnAt(fet, 100), 0.015664, 0, HALF_MICRO_OHM); // docs/methods.md §5 check
    closeTo(rdsOnAt(fet, 125), 0.017833, 0, HALF_MICRO_OHM); // docs/methods.md §5 check
  });

  it('two-point fits reproduce the law that produced the hot point', () => {
    const linear = withLaw({ law: 'two-point', shape: 'linear', hotC: 125, hotRatio: 1.5 }); // 1 + 0.005·100
    closeTo(rdsOnAt(linear, 100), 0.01375, 1e-12); // docs/methods.md §5: same α = 0.5 %/K as the linear check
    const ratio = ((125 + 273.15) / (25 + 273.15)) ** 2; // docs/methods.md §5 power law, k = 2, at 125 °C
    const power = withLaw({ law: 'two-point', shape: 'power', hotC: 125, hotRatio: ratio });
    closeTo(rdsOnAt(power, 100), 0.015664, 0, HALF_MICRO_OHM); // docs/methods.md §5 check, k recovered from two points
  });

  it('never returns a negative resistance far below the linear law range', () => {
    const fet = withLaw({ law: 'linear', alphaPerK: 0.008 });
    expect(rdsOnAt(fet, -200)).toBe(0); // 1 + 0.008·(−225) < 0: clamped at 0 (documented in the law header)
  });
});

describe('copperResistanceAt(r20, tC)', () => {
  it('10 mΩ at 20 °C is 13.144 mΩ at 100 °C (α20 = 0.00393/K)', () => {
    closeTo(copperResistanceAt(0.01, 100), 0.013144, 1e-12); // docs/methods.md §8, IEC 60028 [memory for α]
    closeTo(copperResistanceAt(0.01, 20), 0.01, 1e-15); // definition: R20 at 20 °C
  });
});

describe('diode laws', () => {
  it('leakage doubling every 10 K: 50 µA at 25 °C is 51.2 mA at 125 °C', () => {
    const d = { ...inventedDiode(0.35, 0.02), leakageA: 50e-6, leakageAtC: 25, leakageDoublingK: 10 };
    closeTo(leakageAt(d, 125), 0.0512, 1e-12); // docs/methods.md §6 check (common practice)
  });

  it('VF0 drifts linearly with its coefficient from 25 °C', () => {
    const d = { ...inventedDiode(0.35, 0.02), vfTempCoVPerK: -0.0015 };
    closeTo(diodeVf0At(d, 125), 0.35 - 0.0015 * 100, 1e-12); // docs/methods.md §6: VF0 drift about −1 to −2 mV/K (common practice)
    expect(diodeVf0At(d, 1000)).toBe(0); // clamped: a forward drop never turns negative
  });
});

describe('resistorAt and esrAt', () => {
  it('follow R25·(1 + tc·(T − 25)) and stay ≥ 0', () => {
    const cap: Capacitor = {
      kind: 'capacitor', id: 'c', name: 'Invented electrolytic', invented: true, dielectric: 'electrolytic',
      capacitanceF: 100e-6, esrOhm: 0.1, esrTempCoPerK: -0.01, rippleRatingA: 1, voltageRatingV: 25, tMaxC: 105,
    };
    closeTo(esrAt(cap, 65), 0.1 * (1 - 0.01 * 40), 1e-12); // schema definition: fractional change per K from 25 °C
    expect(esrAt(cap, 150)).toBe(0); // 1 − 0.01·125 < 0: clamped
    const r = { kind: 'resistor' as const, id: 'r', name: 'Invented shunt', invented: true, resistanceOhm: 0.01,
      tempCoPerK: 0.0002, powerRatingW: 1, deratingStartC: 70, zeroPowerC: 155 };
    closeTo(resistorAt(r, 125), 0.01 * (1 + 0.0002 * 100), 1e-12); // schema definition: tc per K from 25 °C
  });
});
