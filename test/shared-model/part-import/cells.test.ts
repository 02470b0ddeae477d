/** One cell as a field's value: engineering notation, the column's unit, exact decimal scaling, the field's range. */
import { describe, expect, it } from 'vitest';
import { partField, type PartField } from '../../../shared-model/index.ts';
import { readCell, unitExponent } from '../../../shared-model/part-import/cells.ts';
import { shiftedText } from '../../../shared-model/part-import/export.ts';

const field = (path: string): PartField => {
  const f = partField(path);
  if (!f) throw new Error(path);
  return f;
};
const value = (path: string, text: string, unit = ''): unknown => {
  const read = readCell(field(path), text, unit);
  return read.ok ? read.value : read;
};

describe('readCell', () => {
  it('reads a bare number in the column unit, by moving the decimal exponent', () => {
    expect(value('rdsOn25Ohm', '8', 'mOhm')).toBe(0.008); // 1 mΩ = 1e-3 Ω (SI Brochure, 9th ed. 2019, Table 7)
    expect(value('qgC', '4.7', 'nC')).toBe(4.7e-9); // the double nearest 4.7e-9 C, as if typed in SI (Node: 4.7 * 1e-9 is 4.700000000000001e-9)
    expect(value('capacitanceF', '22', 'µF')).toBe(22e-6); // SI Brochure Table 7: µ = 1e-6
    expect(value('inductanceH', '1.5e1', 'uH')).toBe(15e-6); // "u" for µ, common practice
    expect(value('aeM2', '52', 'mm²')).toBe(52e-6); // 1 mm² = 1e-6 m²
    expect(value('rdsTemperatureLaw.alphaPerK', '0.45', '%/K')).toBe(0.0045); // 1 % = 0.01
    expect(value('qgC', '0.3', 'nC')).toBe(3e-10); // 0.3 nC = 3e-10 C (SI Brochure Table 7)
  });

  it('lets a cell with its own prefix or unit override the column unit', () => {
    expect(value('rdsOn25Ohm', '8 mΩ', 'mOhm')).toBe(0.008); // the cell's own unit wins
    expect(value('rdsOn25Ohm', '6.5 mΩ', 'Ohm')).toBe(0.0065); // exactly the double of "0.0065" (Node: 6.5 * 1e-3 is 0.006500000000000001); SI Brochure Table 7
    expect(value('capacitanceF', '4.7 µF', '')).toBe(4.7e-6); // the decimal exponent moved, not a multiplication (SI Brochure Table 7)
    expect(value('rdsOn25Ohm', '8m')).toBeCloseTo(8e-3, 18); // engineering notation (SI prefix m)
    expect(value('inductanceH', '4u7')).toBeCloseTo(4.7e-6, 20); // IEC 60062 letter as decimal point
    expect(value('rdsOn25Ohm', '8')).toBe(8); // no unit anywhere: SI
  });

  it('refuses a value outside the range with what it read and the allowed range', () => {
    expect(value('rdsOn25Ohm', '0.001', 'mOhm')).toEqual({ ok: false, found: '"0.001" mOhm reads as 1 µΩ', allowed: '10 µΩ ≤ RDS(on) at 25 °C ≤ 100 Ω' }); // design/numbers.ts conductionOhm
    expect(value('tjMaxC', '25')).toEqual({ ok: false, found: '"25" reads as 25 °C', allowed: '40 °C ≤ Tj max ≤ 300 °C' }); // design/numbers.ts partLimitC
  });

  it('refuses a unit of another quantity and text that is no number', () => {
    const wrong = readCell(field('qgC'), '4.7 µF', 'nC');
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) expect(wrong.found).toMatch(/is in F \(capacitance\), but this field takes charge \(C\)/);
    expect(readCell(field('vthV'), 'n/a', 'V').ok).toBe(false);
    expect(readCell(field('vthV'), '2', 'nC')).toEqual({ ok: false, found: '"2" is a bare number and the column\'s unit "nC" is not a unit of Threshold voltage', allowed: '100 mV ≤ Threshold voltage ≤ 30 V' });
  });

  it('reads choices by value or word and yes/no cells', () => {
    expect(value('kind', 'MOSFET')).toBe('mosfet');
    expect(value('technology', 'Schottky')).toBe('schottky');
    expect(value('rdsTemperatureLaw.law', 'Two-Point')).toBe('two-point');
    expect(value('invented', 'Yes')).toBe(true);
    expect(value('driveFromVinLinear', '0')).toBe(false);
    expect(readCell(field('dielectric'), 'paper', '')).toEqual({ ok: false, found: '"paper"', allowed: 'one of "ceramic", "electrolytic", "polymer", "film"' });
  });

  it('refuses text longer than the field allows', () => {
    const read = readCell(field('name'), 'x'.repeat(121), '');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.allowed).toBe('text of 1 to 120 characters'); // design/parts.ts name: max 120
  });
});

describe('unitExponent and shiftedText', () => {
  it('gives the power of ten of a column unit', () => {
    expect(unitExponent('mOhm', 'Ω')).toBe(-3); // SI Brochure Table 7
    expect(unitExponent('kHz', 'Hz')).toBe(3);
    expect(unitExponent('mm³', 'm³')).toBe(-9); // (1e-3 m)³
    expect(unitExponent('ppm/K', '/K')).toBe(-6); // ppm = 1e-6, common practice
    expect(unitExponent('nF', 'C')).toBeUndefined();
  });

  it('moves the decimal point of the shortest decimal form', () => {
    expect(shiftedText(0.0045, -3)).toBe('4.5');
    expect(shiftedText(4.7e-9, -9)).toBe('4.7');
    expect(shiftedText(1.5e-13, -12)).toBe('0.15');
    expect(shiftedText(-0.0018, -3)).toBe('-1.8');
    expect(shiftedText(120000, 3)).toBe('120');
    expect(shiftedText(1200, -3)).toBe('1200000');
    expect(shiftedText(0, -3)).toBe('0');
  });
});
