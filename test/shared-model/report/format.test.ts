/**
 * The report's number formats. References: ECMA-262 Number.prototype.toFixed / toPrecision (rounding
 * of the printed digits) and the SI prefixes of the SI Brochure (BIPM, 9th ed. 2019, Table 7).
 */
import { describe, expect, it } from 'vitest';
import { balanceDecimals, formatCelsius, formatHours, formatKelvin, formatPercent, formatQuantity, formatEngineering } from '../../../shared-model/index.ts';
import { formatFixed } from '../../../shared-model/report/format.ts';

// Independent reader of a formatted SI value: number, optional prefix, unit (SI Brochure Table 7).
const PREFIX: Record<string, number> = { p: 1e-12, n: 1e-9, µ: 1e-6, m: 1e-3, '': 1, k: 1e3, M: 1e6, G: 1e9 };
function readSi(text: string, unit: string): number {
  const m = new RegExp(`^(\u2212?)(\\d+(?:\\.\\d+)?) ([pnµmkMG]?)${unit}$`).exec(text);
  if (!m) throw new Error(`unreadable: ${text}`);
  return (m[1] ? -1 : 1) * Number(m[2]) * PREFIX[m[3] ?? '']!;
}

const formatSi = (value: number, unit: string): string => formatEngineering(value, unit, 3, 'table');

describe('formatEngineering, table style (the report and the results on screen)', () => {
  it('keeps three significant digits with trailing zeros and the SI prefix', () => {
    expect(formatSi(1.104, 'W')).toBe('1.10 W'); // toPrecision(3) of 1.104 is "1.10" (ECMA-262)
    expect(formatSi(0.0042, 'W')).toBe('4.20 mW'); // 4.2e-3 W = 4.20 mW (SI Brochure Table 7)
    expect(formatSi(4.7e-6, 'H')).toBe('4.70 µH'); // 4.7e-6 H = 4.70 µH (SI Brochure Table 7)
    expect(formatSi(450e3, 'Hz')).toBe('450 kHz'); // 450e3 Hz = 450 kHz (SI Brochure Table 7)
    expect(formatSi(0, 'W')).toBe('0 W'); // definition: zero carries no prefix
    expect(formatSi(-0.0042, 'W')).toBe('\u22124.20 mW'); // minus sign U+2212 (ISO 80000-1 §7.1.4, from memory)
  });

  it('prints the same value as the entry style, differing only in the kept zeros and the minus sign', () => {
    for (const [value, unit] of [[4.7e-6, 'H'], [-1.5, 'V'], [0.0042, 'W'], [450e3, 'Hz'], [1e-15, 'F']] as const) {
      const entry = formatEngineering(value, unit, 3);
      const table = formatSi(value, unit);
      expect(Number.parseFloat(table.replace('\u2212', '-')), `${entry} / ${table}`).toBe(Number.parseFloat(entry)); // one prefix algorithm: same mantissa, same prefix (SI Brochure Table 7)
      expect(table.replace(/^[^ ]+/, ''), `${entry} / ${table}`).toBe(entry.replace(/^[^ ]+/, '')); // same prefix and unit
    }
  });

  it('moves to the next prefix when rounding reaches 1000', () => {
    expect(formatSi(999.6, 'W')).toBe('1.00 kW'); // 999.6 rounds to 1.00e3 at 3 significant digits (ECMA-262 toPrecision)
    expect(formatSi(0.0009996, 'A')).toBe('1.00 mA'); // 9.996e-4 rounds to 1.00e-3 (ECMA-262 toPrecision)
  });

  it('reads back within half a unit of the last printed digit over twelve decades', () => {
    for (let k = 0; k < 400; k++) {
      const value = (k % 2 ? -1 : 1) * 10 ** (-11 + (k * 19.7) / 400) * (1 + ((k * 7919) % 1000) / 1000);
      const text = formatSi(value, 'W');
      const back = readSi(text, 'W');
      const digits = text.replace(/[^\d]/g, '').replace(/^0+/, '').length;
      expect(digits, text).toBe(3); // three significant digits, trailing zeros kept (definition)
      expect(Math.abs(back - value), `${value} → ${text}`).toBeLessThanOrEqual(0.005 * Math.abs(value)); // half a unit in the 3rd digit ≤ 0.5 % (ECMA-262 rounding)
    }
  });
});

describe('fixed formats', () => {
  it('round like toFixed and write negatives with the minus sign U+2212', () => {
    for (const x of [-12.345, -0.04, 0, 0.05, 47.2854, 135, 1e-9]) {
      const expected = Math.abs(x).toFixed(1); // ECMA-262 Number.prototype.toFixed
      const negative = x < 0 && Number(expected) !== 0;
      expect(formatCelsius(x)).toBe(`${negative ? '\u2212' : ''}${expected} °C`);
      expect(formatKelvin(x)).toBe(`${negative ? '\u2212' : ''}${expected} K`);
    }
    expect(formatFixed(-0.04, 1)).toBe('0.0'); // −0.04 rounds to zero at one decimal: no sign (definition)
  });

  it('write fractions as percentages with fixed decimals', () => {
    expect(formatPercent(0.93728)).toBe('93.73 %'); // 93.728 → toFixed(2) "93.73" (ECMA-262)
    expect(formatPercent(0.5, 0)).toBe('50 %'); // toFixed(0) (ECMA-262)
    expect(formatPercent(Number.NaN)).toBe('—'); // definition: not finite is a dash, never "NaN"
  });

  it('group hours by thousands', () => {
    expect(formatHours(32000)).toBe('32\u2009000 h'); // SI Brochure §5.4.4: digits grouped in threes with a thin space
  });

  it('print plain quantities without prefixes', () => {
    expect(formatEngineering(0.95, '', 3, 'table')).toBe('0.950'); // toPrecision(3) (ECMA-262)
    expect(formatQuantity(0.478, '')).toBe('0.478'); // a ratio has no unit and no prefix (definition)
    expect(formatQuantity(46.83, '°C')).toBe('46.8 °C'); // temperatures with one decimal (definition)
    expect(formatQuantity(1.2e-9, 'C')).toBe('1.20 nC'); // SI Brochure Table 7
  });
});

describe('balanceDecimals', () => {
  it('gives the total loss at least four significant digits', () => {
    for (const loss of [0.0123, 0.456, 1.062, 9.99, 12.3, 250]) {
      const d = balanceDecimals(loss);
      const shown = loss.toFixed(d).replace('.', '').replace(/^0+/, ''); // ECMA-262 toFixed
      expect(shown.length, `${loss} with ${d} decimals`).toBeGreaterThanOrEqual(4);
    }
  });
});
