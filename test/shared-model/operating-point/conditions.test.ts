import { describe, expect, it } from 'vitest';
import {
  conductionParameters,
  copperResistanceAt,
  diodeVf0At,
  nominalConditions,
  rdsOnAt,
  resistorAt,
  uniformTemps,
} from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { METHODS_BUCK } from '../../helpers/operating-point.ts';

describe('nominalConditions(design, overrides?)', () => {
  const design = makeDesign({ ...METHODS_BUCK, vinMinV: 9, vinMaxV: 15, ambientC: 40 });
  it('takes nominal Vin, rated load, spec fs and ambient', () => {
    const expected = { vinV: 12, loadA: 3, switchingFrequencyHz: 500e3, ambientC: 40 };
    expect(nominalConditions(design)).toEqual(expected); // agreed contract (brief): nominal Vin, rated load, spec fs and ambient
  });
  it('applies only the overrides that are given', () => {
    const expected = { vinV: 9, loadA: 3, switchingFrequencyHz: 500e3, ambientC: 40 };
    expect(nominalConditions(design, { vinV: 9, loadA: undefined })).toEqual(expected); // agreed contract: only given keys override
  });
});

describe('conductionParameters(design, temps)', () => {
  it('evaluates every part at its own temperature with the temperature laws', () => {
    const design = makeDesign({ ...METHODS_BUCK, senseLocation: 'inductor', senseOhm: 0.01, switchOhm: 0.012, rectifierOhm: 0.008 });
    const temps = { switchC: 110, rectifierC: 90, inductorC: 80, senseC: 60 };
    const cp = conductionParameters(design, temps);
    const rect = design.parts.rectifier;
    expect(rect.kind).toBe('mosfet'); // test design: synchronous rectifier
    closeTo(cp.switchOnOhm, rdsOnAt(design.parts.switch, 110), 1e-15); // each part at its own temperature (agreed contract)
    closeTo(cp.switchOnOhm, 0.012 * (1 + 0.005 * 85), 1e-12); // docs/methods.md §5 linear law, test part α 0.5 %/K
    if (rect.kind === 'mosfet') closeTo(cp.rectifierOnOhm, rdsOnAt(rect, 90), 1e-15); // docs/methods.md §5 law at the rectifier temperature
    closeTo(cp.inductorDcrOhm, copperResistanceAt(0.02, 80), 1e-15); // docs/methods.md §8 copper law
    closeTo(cp.senseOhm, resistorAt(design.parts.senseResistor!, 60), 1e-15); // resistor law at the sense temperature
    expect(cp.diodeRdOhm).toBe(0); // a MOSFET body diode has no Rd in the document
    expect(cp.diodeVf0V).toBe(0.8); // body diode VSD of the synchronous rectifier (dead-time models)
  });

  it('uses the diode model for a diode rectifier and no sense resistance without one', () => {
    const design = makeDesign({ ...METHODS_BUCK, rectifier: 'diode', vf0V: 0.35, rdOhm: 0.02 });
    const cp = conductionParameters(design, uniformTemps(125));
    const rect = design.parts.rectifier;
    if (rect.kind === 'diode') closeTo(cp.diodeVf0V, diodeVf0At(rect, 125), 1e-15); // docs/methods.md §6 VF0 drift
    closeTo(cp.diodeVf0V, 0.35 - 0.0015 * 100, 1e-12); // docs/methods.md §6 drift, test part −1.5 mV/K
    expect(cp.diodeRdOhm).toBe(0.02); // Rd taken from the part (no temperature law in the document)
    expect(cp.rectifierOnOhm).toBe(0); // ConductionParameters contract: unused for a diode
    expect(cp.senseOhm).toBe(0); // no sense resistor in the design
  });
});
