import { describe, expect, it } from 'vitest';
import { formatEngineering, parseEngineering } from '../../../shared-model/index.ts';

/** Value of a successful parse, or the failure message thrown as a test failure. */
function value(text: string, unit?: string): number {
  const r = parseEngineering(text, unit);
  if (!r.ok) throw new Error(`expected "${text}" to parse, got: ${r.message}`);
  return r.value;
}

function refusal(text: string, unit?: string): string {
  const r = parseEngineering(text, unit);
  if (r.ok) throw new Error(`expected "${text}" to be refused, got ${r.value}`);
  return r.message;
}

describe('parseEngineering reads SI-prefixed numbers', () => {
  it('reads the prefixes of the SI Brochure', () => {
    expect(value('4.7u')).toBeCloseTo(4.7e-6, 20); // BIPM SI Brochure 9th ed. (2019) Table 7: micro = 1e-6 ("u" is the ASCII stand-in, common practice)
    expect(value('4.7 µH', 'H')).toBeCloseTo(4.7e-6, 20); // SI Brochure Table 7: µ = 1e-6; U+00B5 micro sign
    expect(value('4.7 μH', 'H')).toBeCloseTo(4.7e-6, 20); // SI Brochure Table 7; U+03BC Greek small mu
    expect(value('4.7uH', 'H')).toBeCloseTo(4.7e-6, 20); // SI Brochure Table 7
    expect(value('10m')).toBeCloseTo(10e-3, 15); // SI Brochure Table 7: milli = 1e-3
    expect(value('10 mΩ', 'Ω')).toBeCloseTo(10e-3, 15); // SI Brochure Table 7; ohm sign U+03A9
    expect(value('10 m\u2126', 'Ω')).toBeCloseTo(10e-3, 15); // Unicode U+2126 OHM SIGN is canonically equivalent to U+03A9
    expect(value('10mOhm', 'Ω')).toBeCloseTo(10e-3, 15); // SI Brochure Table 7; "Ohm" spelled out (common practice)
    expect(value('120 kHz', 'Hz')).toBe(120e3); // SI Brochure Table 7: kilo = 1e3
    expect(value('120k', 'Hz')).toBe(120e3); // SI Brochure Table 7
    expect(value('22 nC', 'C')).toBeCloseTo(22e-9, 20); // SI Brochure Table 7: nano = 1e-9
    expect(value('180 pF', 'F')).toBeCloseTo(180e-12, 24); // SI Brochure Table 7: pico = 1e-12
    expect(value('1.5 GHz', 'Hz')).toBe(1.5e9); // SI Brochure Table 7: giga = 1e9
  });

  it('reads the letter-for-decimal-point code', () => {
    expect(value('4u7', 'H')).toBeCloseTo(4.7e-6, 20); // IEC 60062 letter code: the multiplier letter stands for the decimal point [from memory]
    expect(value('2k2', 'Ω')).toBe(2200); // IEC 60062 letter code [from memory]
    expect(value('4R7', 'Ω')).toBeCloseTo(4.7, 12); // IEC 60062: "R" marks the decimal point of a resistance in ohms [from memory]
    expect(refusal('4R7', 'H')).toMatch(/4R7.*resistances only/); // IEC 60062 uses R for resistance values only [from memory]
  });

  it('reads plain and scientific notation and the Unicode minus', () => {
    expect(value('1e-6')).toBe(1e-6); // ECMA-262 numeric literal grammar (StrDecimalLiteral with ExponentPart)
    expect(value('-5')).toBe(-5); // ECMA-262 numeric literal
    expect(value('\u22125', 'V')).toBe(-5); // Unicode U+2212 MINUS SIGN is the typographic minus (Unicode Standard, Mathematical Operators block)
    expect(value('+3.3 V', 'V')).toBe(3.3); // ECMA-262 allows a leading plus sign
    expect(value('.5')).toBe(0.5); // ECMA-262 StrUnsignedDecimalLiteral ". DecimalDigits"
    expect(value('3.3\u00a0V', 'V')).toBe(3.3); // SI Brochure §5.4.3: a space separates number and unit (no-break space accepted)
  });

  it('reads temperatures, percentages and temperature coefficients', () => {
    expect(value('25 °C', '°C')).toBe(25); // SI Brochure §2.3.1: degree Celsius symbol °C
    expect(value('25C', '°C')).toBe(25); // "C" alone in a temperature field (common practice for typed input)
    expect(value('25 ℃', '°C')).toBe(25); // Unicode U+2103 DEGREE CELSIUS
    expect(value('80 %', '')).toBeCloseTo(0.8, 15); // SI Brochure §5.4.7: % = 0.01 [from memory for section]
    expect(value('0.4 %/K', '/K')).toBeCloseTo(0.004, 15); // % = 0.01 (SI Brochure §5.4.7 [from memory]); docs/methods.md §5 quotes α in %/K
    expect(value('3930 ppm/K', '/K')).toBeCloseTo(0.00393, 15); // ppm = 1e-6 (common practice); IEC 60028 copper α20 = 0.00393/K [from memory]
    expect(value('-1.5 mV/K', 'V/K')).toBeCloseTo(-1.5e-3, 15); // docs/methods.md §6: Vf0 drifts about −1 to −2 mV/K
    expect(value('10 K', 'K')).toBe(10); // SI Brochure §2.3.1: a temperature difference in kelvin
    expect(value('40 °C/W', 'K/W')).toBe(40); // SI Brochure §2.3.1: a difference of 1 °C equals 1 K
  });

  it('reads lengths, areas, volumes and loss densities only in fields that ask for them', () => {
    expect(value('0.3 mm', 'm')).toBeCloseTo(0.3e-3, 15); // SI Brochure Table 7: 1 mm = 1e-3 m
    expect(value('52 mm²', 'm²')).toBeCloseTo(52e-6, 15); // (1e-3 m)² = 1e-6 m² (SI Brochure §5.4.4: a prefix is raised with its unit)
    expect(value('500 mm3', 'm³')).toBeCloseTo(500e-9, 18); // (1e-3 m)³ = 1e-9 m³ (SI Brochure §5.4.4)
    expect(value('1.2 cm²', 'm²')).toBeCloseTo(1.2e-4, 15); // (1e-2 m)² = 1e-4 m²
    expect(value('300 kW/m³', 'W/m³')).toBe(300e3); // SI Brochure Table 7; docs/methods.md §7 quotes core loss in kW/m³
    expect(value('300 mW/cm³', 'W/m³')).toBeCloseTo(300e3, 6); // 1 mW/cm³ = 1e-3 W / 1e-6 m³ = 1 kW/m³ (SI arithmetic)
    expect(value('100 mT', 'T')).toBeCloseTo(0.1, 15); // SI Brochure Table 7
    expect(refusal('1mm', 'V')).toMatch(/"1mm".*"mm".*voltage/); // "mm" is no prefix+volt: refused (team brief, engineering entry)
    expect(refusal('1mm')).toMatch(/"1mm".*"mm"/); // without a length field, "mm" is a doubled prefix
  });
});

describe('parseEngineering decides the "M" question by a stated rule', () => {
  // Our rule (engineering.ts header): "m" milli, "M"/"meg" mega (SI Brochure Table 7); SPICE reads "M" as
  // milli and "MEG" as mega (Nagel, SPICE2, UC Berkeley ERL-M520, 1975 [from memory]), so a lone "M" is
  // refused where mega is never a sensible value.
  it('reads lower-case m as milli everywhere', () => {
    expect(value('1m', 'F')).toBeCloseTo(1e-3, 15); // SI Brochure Table 7: m = milli
    expect(value('1m', 'Hz')).toBeCloseTo(1e-3, 15); // SI Brochure Table 7: m = milli, even when unusual
  });
  it('reads meg and MEG as mega everywhere', () => {
    expect(value('2.2meg')).toBe(2.2e6); // SPICE scale factor MEG = 1e6 [from memory]
    expect(value('2.2MEG', 'Ω')).toBe(2.2e6); // SPICE scale factor MEG = 1e6 [from memory]
  });
  it('reads M as mega where the unit makes it clear', () => {
    expect(value('1 MHz', 'Hz')).toBe(1e6); // SI Brochure Table 7: M = mega
    expect(value('1M', 'Hz')).toBe(1e6); // SI mega; a frequency field makes mega the only sensible reading
    expect(value('2.2M', 'Ω')).toBe(2.2e6); // SI mega; megohm values are ordinary
    expect(value('2.2M')).toBe(2.2e6); // SI mega when no field unit is given
  });
  it('refuses M where mega is never sensible and says what to type', () => {
    const m = refusal('1M', 'F'); // SPICE users mean 1 mF; SI reads 1 MF: refuse (our rule)
    expect(m).toMatch(/"1M"/);
    expect(m).toMatch(/mega/);
    expect(m).toMatch(/"m" for milli/);
    expect(refusal('10 MH', 'H')).toMatch(/"10 MH".*"meg"/); // same rule with the unit typed
  });
});

describe('parseEngineering refuses ambiguous or mismatched input with a message naming the input', () => {
  it.each([
    ['', undefined, /empty/], // nothing typed
    ['   ', undefined, /empty/], // only spaces
    ['abc', undefined, /"abc" does not start with a number/], // no number
    ['NaN', undefined, /"NaN" does not start/], // NaN is not a number a person enters
    ['Infinity', undefined, /"Infinity" does not start/], // nor is Infinity
    ['4.7 4.7', undefined, /"4.7 4.7" holds more than one number/], // two numbers
    ['1.2.3', undefined, /more than one number/], // two decimal points
    ['4,7', undefined, /"4,7".*decimal separator/], // comma decimal (ISO 80000-1 allows it; we do not, to avoid 1,000 confusion)
    ['10 µF', 'H', /"10 µF" is in F \(capacitance\).*inductance \(H\)/], // unit of another quantity
    ['10 V', 'A', /"10 V" is in V \(voltage\).*current \(A\)/], // unit of another quantity
    ['1 uuH', 'H', /"1 uuH".*prefix typed twice/], // doubled prefix
    ['25 m°C', '°C', /"25 m°C".*takes no prefix/], // SI Brochure §5.4.4: no prefixes with °C [from memory]
    ['25 K', '°C', /"25 K".*kelvin/], // a kelvin value in a Celsius field is refused, not converted
    ['10K', 'K/W', /"10K".*kelvin here, not kilo/], // K is kelvin in thermal fields
    ['10K', undefined, /"10K".*kelvin or kilo/], // without a field unit "K" is ambiguous
    ['1e999', undefined, /"1e999" is too large/], // IEEE 754 binary64 overflows above ~1.8e308
    ['--5', undefined, /does not start with a number/], // two signs
  ])('refuses %j (field unit %s)', (text, unit, pattern) => {
    expect(refusal(text, unit)).toMatch(pattern);
  });

  it('reads an upper-case K as kilo where it cannot be kelvin (common shorthand, e.g. "10K" resistor)', () => {
    expect(value('10K', 'Ω')).toBe(10e3); // common practice shorthand for kΩ
  });
});

describe('formatEngineering writes numbers with SI prefixes and units', () => {
  it.each([
    [4.7e-6, 'H', 3, '4.7 µH'], // SI Brochure Table 7 and §5.4.3 (space between number and unit)
    [0.0123, 'Ω', 3, '12.3 mΩ'], // SI Brochure Table 7
    [500e3, 'Hz', 3, '500 kHz'], // SI Brochure Table 7
    [999.96, 'V', 3, '1 kV'], // rounding to 3 significant digits gives 1000 V = 1 kV
    [22e-9, 'C', 3, '22 nC'], // SI Brochure Table 7
    [-3.3, 'V', 3, '-3.3 V'], // sign kept
    [0, 'W', 3, '0 W'], // zero takes no prefix
    [125.46, '°C', 3, '125 °C'], // SI Brochure §5.4.4: no prefix on °C [from memory]
    [1234.5, '°C', 3, '1230 °C'], // 3 significant digits, still no prefix
    [0.853, '%', 3, '85.3 %'], // SI Brochure §5.4.7: % = 0.01 [from memory]
    [52e-6, 'm²', 3, '52 mm²'], // (1e-3 m)² = 1e-6 m²
    [5e-7, 'm³', 3, '500 mm³'], // (1e-3 m)³ = 1e-9 m³
    [0.5, '', 3, '0.5'], // a plain ratio
    [1e-20, 'F', 3, '1e-20 F'], // beyond the femto prefix: plain exponent
  ])('formatEngineering(%s, %j, %s) is %j', (v, unit, digits, text) => {
    expect(formatEngineering(v, unit, digits)).toBe(text);
  });

  it('never writes NaN: a non-finite value is a dash', () => {
    expect(formatEngineering(Number.NaN, 'V')).toBe('—'); // team brief rule 6: never show NaN
    expect(formatEngineering(Number.POSITIVE_INFINITY, 'W')).toBe('—'); // team brief rule 6
  });
});
