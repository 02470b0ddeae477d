import { describe, expect, it } from 'vitest';
import type { ConditionOverrides } from '../../../shared-model/index.ts';
import { checkConditionOverrides, CONDITION_RANGES } from '../../../shared-model/index.ts';
import { RANGES as DESIGN_RANGES } from '../../../shared-model/design/numbers.ts';
import { demoDesign } from '../../helpers/demo.ts';

const buck = demoDesign('synchronous-buck');

describe('condition overrides take the range of the design field they stand for', () => {
  it('the ranges are those of spec.vinNomV, spec.ratedLoadA (from no load), spec.switchingFrequencyHz and spec.ambientC', () => {
    expect([CONDITION_RANGES.vinV.min, CONDITION_RANGES.vinV.max]).toEqual([DESIGN_RANGES.railV.min, DESIGN_RANGES.railV.max]);
    expect([CONDITION_RANGES.loadA.min, CONDITION_RANGES.loadA.max]).toEqual([0, DESIGN_RANGES.loadA.max]); // no load is a fair question
    expect([CONDITION_RANGES.switchingFrequencyHz.min, CONDITION_RANGES.switchingFrequencyHz.max]).toEqual([DESIGN_RANGES.switchingHz.min, DESIGN_RANGES.switchingHz.max]);
    expect([CONDITION_RANGES.ambientC.min, CONDITION_RANGES.ambientC.max]).toEqual([DESIGN_RANGES.ambientC.min, DESIGN_RANGES.ambientC.max]);
  });

  it.each([
    [{ vinV: 1e308 }, 'conditions.vinV', 'Input voltage (conditions.vinV) is 1e+308 V; allowed: 200 mV ≤ conditions.vinV ≤ 2 kV (the range of Input voltage, nominal (spec.vinNomV) in a design).'], // issue 10 §6 audit case
    [{ loadA: 1e300 }, 'conditions.loadA', 'Load current (conditions.loadA) is 1e+300 A; allowed: 0 A ≤ conditions.loadA ≤ 1 kA (the range of Rated load current (spec.ratedLoadA) in a design).'], // issue 10 §6 audit case
    [{ loadA: -1e-3 }, 'conditions.loadA', 'Load current (conditions.loadA) is -0.001 A (-1 mA); allowed: 0 A ≤ conditions.loadA ≤ 1 kA (the range of Rated load current (spec.ratedLoadA) in a design).'],
    [{ switchingFrequencyHz: 999 }, 'conditions.switchingFrequencyHz', 'Switching frequency (conditions.switchingFrequencyHz) is 999 Hz; allowed: 1 kHz ≤ conditions.switchingFrequencyHz ≤ 20 MHz (the range of Switching frequency (spec.switchingFrequencyHz) in a design).'],
    [{ ambientC: Number.NaN }, 'conditions.ambientC', 'Ambient temperature (conditions.ambientC) is NaN (not a number); allowed: -100 °C ≤ conditions.ambientC ≤ 200 °C (the range of Ambient temperature (spec.ambientC) in a design).'],
  ] as [ConditionOverrides, string, string][])('refuses %j naming the override by its on-screen label and path, the value and the range', (o, path, message) => {
    const [p, ...rest] = checkConditionOverrides(buck, o);
    expect(rest).toEqual([]);
    expect(p?.path).toBe(path);
    expect(p?.message).toBe(message);
  });

  it('accepts the edges of every range on a design they fit (no load, 2 kV into the 3.3 V buck, −100 °C)', () => {
    expect(checkConditionOverrides(buck, { loadA: 0, vinV: 2000, ambientC: -100 })).toEqual([]);
    expect(checkConditionOverrides(buck, { loadA: 1000, ambientC: 200 })).toEqual([]);
  });
});

describe('condition overrides pass the validity rules of the design they are applied to', () => {
  it('refuses a frequency whose dead times no longer fit the off time, with the highest valid frequency', () => {
    // At Vin,min 10.8 V: D = 3.3/10.8 = 0.305556; (1 − D)/fs = 40 ns of dead time at fs = 17.3611 MHz (docs/methods.md §1, worked here)
    const [p] = checkConditionOverrides(buck, { switchingFrequencyHz: 20e6 });
    expect(p?.path).toBe('conditions.switchingFrequencyHz');
    expect(p?.allowed).toBe('conditions.switchingFrequencyHz ≤ 17.3611 MHz for this design');
    expect(p?.message).toContain('must fit in the shortest off time');
    expect(checkConditionOverrides(buck, { switchingFrequencyHz: 17.3e6 })).toEqual([]);
  });

  it('refuses a frequency far too low for the inductor and the output bank; the stated edge is where they start to fit', () => {
    const [p] = checkConditionOverrides(buck, { switchingFrequencyHz: 1000 });
    expect(p?.message).toContain('Inductor — Inductance (parts.inductor.inductanceH) (4.7 µH) is far too small for Switching frequency (spec.switchingFrequencyHz) (1 kHz)');
    expect(p?.message).toContain('The output bank Output capacitors (parts.outputCapacitor) (2 × 150 µF) is far too small');
    const edge = Number(/≥ ([\d.]+) kHz/.exec(p?.allowed ?? '')?.[1]) * 1e3;
    expect(edge).toBeGreaterThan(1000);
    expect(checkConditionOverrides(buck, { switchingFrequencyHz: edge * 1.001 })).toEqual([]); // the edge is valid…
    expect(checkConditionOverrides(buck, { switchingFrequencyHz: edge * 0.99 })).toHaveLength(1); // …and just below it is not
  });

  it('checks an input voltage at its own value: a 2 kV input into the diode boost (Vin > Vout) is a fair what-if, a sense drop is not', () => {
    expect(checkConditionOverrides(demoDesign('diode-boost'), { vinV: 2000 })).toEqual([]); // the results say it cannot regulate
    // boost, switch position: at 0.2 V the inductor carries 1 A·12/0.2 = 60 A; 10 mΩ drops 0.6 V > half of 0.2 V
    const [p] = checkConditionOverrides(demoDesign('diode-boost'), { vinV: 0.2 });
    expect(p?.path).toBe('conditions.vinV');
    expect(p?.message).toContain('Current-sense resistor — Resistance (parts.senseResistor.resistanceOhm) (10 mΩ) would drop');
  });
});
