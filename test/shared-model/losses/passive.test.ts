import { describe, expect, it } from 'vitest';
import { capacitorEsr } from '../../../shared-model/losses/capacitor-esr.ts';
import { senseResistor } from '../../../shared-model/losses/sense-resistor.ts';
import { quiescent } from '../../../shared-model/losses/quiescent.ts';
import { lossTerm, nonNegativeFinite, safeRatio } from '../../../shared-model/losses/model.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('capacitor ESR', () => {
  it('is ESR·Irms²/n for n equal capacitors sharing the bank current', () => {
    closeTo(capacitorEsr.watts({ irmsA: 1.483009, esrOhm: 0.01, esr25Ohm: 0.01, count: 1, temperatureC: 25 }), 1.483009 ** 2 * 0.01, 1e-12); // docs/methods.md §9 with ICin,rms 1.483009 A (§1)
    closeTo(capacitorEsr.watts({ irmsA: 1.483009, esrOhm: 0.01, esr25Ohm: 0.01, count: 2, temperatureC: 25 }), 2 * 0.01 * (1.483009 / 2) ** 2, 1e-12); // two parts, each (I/2)²·ESR
  });
});

describe('sense resistor and controller', () => {
  it('sense: Irms²·R(T); quiescent: Vin·Iq', () => {
    closeTo(senseResistor.watts({ irmsA: 3.004722, resistanceOhm: 0.01, temperatureC: 25 }), 3.004722 ** 2 * 0.01, 1e-12); // Joule heating (common practice)
    closeTo(quiescent.watts({ vinV: 12, quiescentA: 1.5e-3 }), 0.018, 1e-12); // P = Vin·Iq (common practice)
  });
});

describe('the loss-model shape', () => {
  it('builds a ledger term with part, mechanism, watts, formula and inputs', () => {
    const t = lossTerm(quiescent, 'controller', 'Invented controller', { vinV: 12, quiescentA: 1e-3 });
    expect(t).toEqual({
      part: 'controller',
      partName: 'Invented controller',
      mechanism: 'quiescent',
      watts: 0.012,
      formula: 'Vin · Iq',
      inputs: [
        { name: 'Vin', value: 12, unit: 'V' },
        { name: 'Iq', value: 1e-3, unit: 'A' },
      ],
    });
  });
  it('never returns NaN, Infinity or a negative number', () => {
    expect(nonNegativeFinite(Number.NaN)).toBe(0);
    expect(nonNegativeFinite(Number.POSITIVE_INFINITY)).toBe(0);
    expect(nonNegativeFinite(-1)).toBe(0);
    expect(safeRatio(1, 0)).toBe(0);
    expect(capacitorEsr.watts({ irmsA: 1, esrOhm: 0.01, esr25Ohm: 0.01, count: 0, temperatureC: 25 })).toBe(0);
  });
});
