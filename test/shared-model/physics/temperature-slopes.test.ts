/**
 * The exact slopes of the temperature laws (shared-model/physics/temperature-slopes.ts), checked against the
 * published values of the laws themselves: by the fundamental theorem of calculus the slope integrated from
 * T1 to T2 must equal the published R(T2) − R(T1), and for a law of degree two (the power law with k = 2
 * in kelvin) the secant between two published points equals the slope at their midpoint exactly.
 */
import { describe, expect, it } from 'vitest';
import type { Capacitor, Mosfet, RdsTemperatureLaw } from '../../../shared-model/index.ts';
import {
  copperResistanceSlopeAt,
  diodeVf0SlopeAt,
  esrSlopeAt,
  leakageSlopeAt,
  rdsOnSlopeAt,
  resistorSlopeAt,
} from '../../../shared-model/physics/temperature-slopes.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { inventedDiode, inventedMosfet } from '../../helpers/designs.ts';

const withLaw = (law: RdsTemperatureLaw): Mosfet => ({ ...inventedMosfet(0.01), rdsTemperatureLaw: law });

/** ∫ f from a to b by composite Simpson's rule with n (even) intervals (any numerical-analysis text). */
function simpson(f: (t: number) => number, a: number, b: number, n = 200): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

describe('rdsOnSlopeAt(mosfet, tC)', () => {
  it('linear law 0.5 %/K on 10 mΩ: the slope integrated from 100 to 125 °C is 15.00 − 13.75 mΩ', () => {
    const fet = withLaw({ law: 'linear', alphaPerK: 0.005 });
    closeTo(simpson((t) => rdsOnSlopeAt(fet, t), 100, 125), 0.015 - 0.01375, 1e-9); // docs/methods.md §5 check values (common practice)
    expect(rdsOnSlopeAt(fet, -200)).toBe(0); // where the law is clamped at 0 it does not move (temperature-laws.ts header)
  });

  it('power law k = 2: the secant 15.664 → 17.833 mΩ over 100–125 °C is the slope at 112.5 °C', () => {
    const fet = withLaw({ law: 'power', exponent: 2 });
    // docs/methods.md §5 check values, printed to 1 µΩ: the secant is known to ±1e-6/25 Ω/K
    closeTo(rdsOnSlopeAt(fet, 112.5), (0.017833 - 0.015664) / 25, 0, 1e-6 / 25);
    closeTo(simpson((t) => rdsOnSlopeAt(fet, t), 100, 125), 0.017833 - 0.015664, 0, 1e-6); // docs/methods.md §5
  });

  it('two-point fits have the slope of the law they reproduce', () => {
    const linear = withLaw({ law: 'two-point', shape: 'linear', hotC: 125, hotRatio: 1.5 }); // α = 0.5 %/K
    closeTo(simpson((t) => rdsOnSlopeAt(linear, t), 100, 125), 0.015 - 0.01375, 1e-9); // docs/methods.md §5
    const ratio = ((125 + 273.15) / (25 + 273.15)) ** 2; // docs/methods.md §5 power law, k = 2, at 125 °C
    const power = withLaw({ law: 'two-point', shape: 'power', hotC: 125, hotRatio: ratio });
    closeTo(rdsOnSlopeAt(power, 112.5), (0.017833 - 0.015664) / 25, 0, 1e-6 / 25); // docs/methods.md §5
  });

  it('a normalised table: the segment slope, the one above at a corner, 0 outside', () => {
    // Invented curve: ratio 1.0 at 25 °C, 1.5 at 125 °C, 1.7 at 150 °C (straight lines between points).
    const fet = withLaw({ law: 'table', points: [{ tjC: 25, ratio: 1 }, { tjC: 125, ratio: 1.5 }, { tjC: 150, ratio: 1.7 }] });
    closeTo(rdsOnSlopeAt(fet, 60), (0.01 * 0.5) / 100, 1e-12); // straight line between the points (the law's definition)
    closeTo(rdsOnSlopeAt(fet, 125), (0.01 * 0.2) / 25, 1e-12); // at the corner: the segment a rising temperature enters
    expect(rdsOnSlopeAt(fet, 10)).toBe(0); // end ratios held outside the table
    expect(rdsOnSlopeAt(fet, 150)).toBe(0);
    closeTo(simpson((t) => rdsOnSlopeAt(fet, t), 30, 120, 400), 0.01 * 0.5 * 0.9, 1e-9); // R(120) − R(30) read off the straight line
  });
});

describe('copper, diode, resistor and ESR slopes', () => {
  it('copper: the slope integrated from 20 to 100 °C is 13.144 − 10 mΩ', () => {
    closeTo(simpson((t) => copperResistanceSlopeAt(0.01, t), 20, 100), 0.013144 - 0.01, 1e-9); // docs/methods.md §8, IEC 60028 [memory for α]
  });

  it('leakage doubling every 10 K: the slope integrated from 25 to 125 °C is 51.2 mA − 50 µA', () => {
    const d = { ...inventedDiode(0.35, 0.02), leakageA: 50e-6, leakageAtC: 25, leakageDoublingK: 10 };
    closeTo(simpson((t) => leakageSlopeAt(d, t), 25, 125, 2000), 0.0512 - 50e-6, 1e-9); // docs/methods.md §6 check (common practice)
  });

  it('VF0 drifts at its coefficient and stops where it is clamped at 0', () => {
    const d = { ...inventedDiode(0.35, 0.02), vfTempCoVPerK: -0.0015 };
    closeTo(diodeVf0SlopeAt(d, 125), -0.0015, 1e-12); // docs/methods.md §6: VF0 drift about −1 to −2 mV/K (common practice)
    expect(diodeVf0SlopeAt(d, 1000)).toBe(0); // 0.35 − 0.0015·975 < 0: clamped, flat
  });

  it('resistor and ESR: R25·tc inside the law, 0 where it is clamped', () => {
    const cap: Capacitor = {
      kind: 'capacitor', id: 'c', name: 'Invented electrolytic', invented: true, dielectric: 'electrolytic',
      capacitanceF: 100e-6, esrOhm: 0.1, esrTempCoPerK: -0.01, rippleRatingA: 1, voltageRatingV: 25, tMaxC: 105,
    };
    closeTo(simpson((t) => esrSlopeAt(cap, t), 25, 65), 0.1 * (1 - 0.01 * 40) - 0.1, 1e-9); // schema definition: tc per K from 25 °C
    expect(esrSlopeAt(cap, 150)).toBe(0); // 1 − 0.01·125 < 0: clamped
    const r = { kind: 'resistor' as const, id: 'r', name: 'Invented shunt', invented: true, resistanceOhm: 0.01,
      tempCoPerK: 0.0002, powerRatingW: 1, deratingStartC: 70, zeroPowerC: 155 };
    closeTo(simpson((t) => resistorSlopeAt(r, t), 25, 125), 0.01 * 0.0002 * 100, 1e-9); // schema definition: tc per K from 25 °C
  });
});
