/** Column headers: the unit is split off only where it reads as a unit; names compare without case or punctuation. */
import { describe, expect, it } from 'vitest';
import { headerReadings, normaliseHeader } from '../../../shared-model/part-import/header-unit.ts';

const first = (h: string) => headerReadings(h)[0];

describe('headerReadings', () => {
  it('takes the unit from brackets, after a comma, after "in" or as the last word', () => {
    expect(first('Rds(on) (mOhm)')).toEqual({ name: 'Rds(on)', unit: 'mOhm' }); // common practice: unit in parentheses
    expect(first('Qg [nC]')).toEqual({ name: 'Qg', unit: 'nC' }); // common practice: unit in square brackets (ISO 80000-1 §7.2 writes [Q] for the unit of Q)
    expect(first('Capacitance, µF')).toEqual({ name: 'Capacitance', unit: 'µF' }); // common practice
    expect(first('Inductance in uH')).toEqual({ name: 'Inductance', unit: 'uH' }); // common practice
    expect(first('Isat A')).toEqual({ name: 'Isat', unit: 'A' }); // common practice
    expect(first('Core area Ae [mm²]')).toEqual({ name: 'Core area Ae', unit: 'mm²' }); // lengths are units only where asked; a header may ask
    expect(first('Leakage doubles every [K]')).toEqual({ name: 'Leakage doubles every', unit: 'K' }); // "K" alone is kelvin or kilo; as a unit it is read
  });

  it('keeps brackets and words that are no unit in the name', () => {
    expect(first('Rds(on)')).toEqual({ name: 'Rds(on)', unit: '' }); // "(on)" is the trade's subscript, not a unit
    expect(first('Tj max')).toEqual({ name: 'Tj max', unit: '' });
    expect(first('Resistance m')).toEqual({ name: 'Resistance m', unit: '' }); // a bare prefix is not a unit
  });

  it('offers the whole header as a name last ("ESR at fs" is not "ESR at" in femtoseconds)', () => {
    const readings = headerReadings('ESR at fs');
    expect(readings[0]).toEqual({ name: 'ESR at', unit: 'fs' });
    expect(readings.at(-1)).toEqual({ name: 'ESR at fs', unit: '' });
  });
});

describe('normaliseHeader', () => {
  it('ignores case, spaces and punctuation and spells out symbols', () => {
    expect(normaliseHeader('RDS(on) at 25 °C')).toBe('rdsonat25c');
    expect(normaliseHeader('rds_on 25C')).toBe('rdson25c');
    expect(normaliseHeader('θJC')).toBe('thetajc');
    expect(normaliseHeader('Rac / Rdc')).toBe('racrdc');
    expect(normaliseHeader('µH')).toBe('uh');
  });
});
