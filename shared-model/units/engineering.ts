/**
 * Engineering entry: read SI-prefixed numbers the way engineers type them, and format numbers back.
 *
 * Accepted: "4.7u", "4.7 µH", "4.7uH", "4u7" (letter as decimal point, IEC 60062 style), "4R7" (Ω only),
 * "10m", "10 mΩ", "10mOhm", "2.2meg", "120 kHz", "120k", "1e-6", "−5" (U+2212 minus), "25 °C"/"25C" in a
 * temperature field, "80 %" (= 0.8) in a ratio field, "0.4 %/K" (= 0.004 /K), "52 mm²" in an area field.
 * Prefixes: the SI Brochure (BIPM, 9th ed. 2019, Table 7) — f p n u/µ/μ m k M G — plus "meg"/"MEG"/"Meg"
 * (mega, circuit-simulator spelling) and "K" as a shorthand for kilo where K cannot mean kelvin.
 *
 * The "M" rule. In a value, lower-case "m" is always milli and upper-case "M", "meg", "MEG" are mega
 * (SI). Circuit simulators read a lone "M" as milli, so "1M" from a simulator user may mean 1e-3. An
 * upper-case "M" is therefore accepted only where mega values are normal and the unit makes the intent
 * clear — frequency ("1 MHz", "1M" in a Hz field), resistance ("2.2M", "2.2 MΩ"), loss density and plain
 * numbers. In any other field ("1M" or "1 MF" for a capacitance, inductance, charge, voltage...) it is
 * refused with a message asking for "m" (milli) or "meg" (mega). "meg" always means mega.
 *
 * Refused with a message that quotes the input: empty text, two numbers ("4.7 4.7"), a comma decimal
 * ("4,7"), unknown or doubled units ("1mm" outside a length field, "1 uuH"), a unit of another quantity
 * ("10 µF" into an inductance field), prefixes on units that take none ("25 m°C", "2k h"), a lone "K"
 * when it could mean kelvin or kilo, numbers too large for a double.
 * Lengths, areas and volumes ("mm", "cm²", "mm³") are recognised only in fields that ask for them.
 */
import { FORMAT_PREFIXES, ONLY_WHEN_ASKED, PREFIXES, UNITS } from './engineering-units.ts';

export type EngineeringParse = { ok: true; value: number; unit: string } | { ok: false; message: string };

interface Reading {
  prefix: string;
  prefixFactor: number;
  /** Canonical unit typed, or null when only a number (and maybe a prefix) was typed. */
  unit: string | null;
  factor: number;
}

const NUMBER = /^([+-]?)(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?/;
const INFIX = /^([+-]?)(\d+)(meg|MEG|Meg|[fpnuµμmkKMGRr])(\d+)/;
const KELVIN_FAMILY: ReadonlySet<string> = new Set(['K', 'K/W', '/K', '°C']);

function normalise(text: string): string {
  return text
    .replace(/[\u00a0\u2007\u2009\u202f]/g, ' ')
    .replace(/\u2212/g, '-')
    .replace(/°\s+C/g, '°C')
    .replace(/deg\s+C/g, 'degC')
    .trim();
}

function prefixFactor(p: string): number | undefined {
  return PREFIXES.find(([q]) => q === p)?.[1];
}

/** Every way `rest` reads as [prefix][unit]; prefixes are not allowed when `allowPrefix` is false. */
function readings(rest: string, expected: string | undefined, allowPrefix: boolean): Reading[] {
  const out: Reading[] = [];
  if (rest === '') out.push({ prefix: '', prefixFactor: 1, unit: null, factor: 1 });
  const bare = allowPrefix ? prefixFactor(rest) : undefined;
  if (bare !== undefined) out.push({ prefix: rest, prefixFactor: bare, unit: null, factor: 1 });
  for (const [unit, info] of Object.entries(UNITS)) {
    if (ONLY_WHEN_ASKED.has(unit) && unit !== expected) continue;
    for (const [spelling, factor] of info.spellings) {
      if (rest === spelling) out.push({ prefix: '', prefixFactor: 1, unit, factor });
      else if (allowPrefix && info.prefixes && spelling !== '%' && rest.endsWith(spelling)) {
        const p = rest.slice(0, rest.length - spelling.length);
        const f = prefixFactor(p);
        if (f !== undefined) out.push({ prefix: p, prefixFactor: f, unit, factor });
      }
    }
  }
  return out;
}

const describeUnit = (unit: string): string =>
  unit === '' ? 'a plain number or ratio' : `${UNITS[unit]?.quantity ?? 'a quantity'} (${unit})`;

function choose(input: string, rest: string, all: Reading[], expected: string | undefined): Reading | string {
  if (expected === undefined) {
    if (all.some((r) => r.unit === null && r.prefix === 'K') && all.some((r) => r.unit === 'K'))
      return `"${input}": "K" could mean kelvin or kilo; write "k" for kilo.`;
    return all[0] ?? `"${input}": "${rest}" is not a unit or prefix WattLedger knows.`;
  }
  const match = all.find((r) => r.unit === expected);
  if (match) return match;
  const bare = all.find((r) => r.unit === null);
  if (bare) {
    if (bare.prefix === 'K' && KELVIN_FAMILY.has(expected))
      return `"${input}": "K" reads as kelvin here, not kilo; this field takes ${describeUnit(expected)}.`;
    if (bare.prefix !== '' && UNITS[expected]?.prefixes === false)
      return `"${input}": ${describeUnit(expected)} takes no prefix such as "${bare.prefix}"; enter the plain number.`;
    return bare;
  }
  const other = all.find((r) => r.unit !== null);
  if (other?.unit != null)
    return `"${input}" is in ${other.unit || '%'} (${UNITS[other.unit]?.quantity ?? 'ratio'}), but this field takes ${describeUnit(expected)}.`;
  const info = UNITS[expected];
  if (info && !info.prefixes && info.spellings.some(([sp]) => rest.endsWith(sp) && prefixFactor(rest.slice(0, -sp.length))))
    return `"${input}": ${describeUnit(expected)} takes no prefix; enter the plain number.`;
  return `"${input}": "${rest}" is not a unit or prefix WattLedger knows for ${describeUnit(expected)} (a prefix typed twice?).`;
}

function megaRefusal(input: string, prefix: string, expected: string | undefined): string | null {
  if (prefix !== 'M' || expected === undefined || (UNITS[expected]?.megaIsNormal ?? true)) return null;
  return (
    `"${input}": WattLedger reads "M" as mega, which is not a sensible ${describeUnit(expected)}; ` +
    `circuit simulators read it as milli. Write "m" for milli, or "meg" if you really mean mega.`
  );
}

/**
 * Reads `text` as a number with an optional SI prefix and unit. With `expectedUnit` (a canonical unit
 * from design/key-units.ts), a typed unit must measure the same quantity; the value is returned in that
 * unit without prefix. Never throws.
 */
export function parseEngineering(text: string, expectedUnit?: string): EngineeringParse {
  if (typeof text !== 'string') return { ok: false, message: 'Enter a number as text.' };
  const input = normalise(text);
  if (input === '') return { ok: false, message: 'The value is empty; enter a number.' };
  let sign: string;
  let mantissa: number;
  let rest: string;
  let infixPrefix: string | null = null;
  const infix = INFIX.exec(input);
  if (infix) {
    const letter = infix[3] ?? '';
    if ((letter === 'R' || letter === 'r') && expectedUnit !== undefined && expectedUnit !== 'Ω')
      return { ok: false, message: `"${input}": "R" as a decimal point is for resistances only.` };
    sign = infix[1] ?? '';
    mantissa = Number(`${infix[2]}.${infix[4]}`);
    infixPrefix = letter === 'R' || letter === 'r' ? '' : letter;
    rest = input.slice(infix[0].length).trim();
  } else {
    const m = NUMBER.exec(input);
    if (!m) return { ok: false, message: `"${input}" does not start with a number.` };
    sign = m[1] ?? '';
    mantissa = Number(`${m[2]}e${m[3] ?? '0'}`);
    rest = input.slice(m[0].length).trim();
  }
  if (/^,\d/.test(rest)) return { ok: false, message: `"${input}": use a point (.) as the decimal separator.` };
  if (/^[-+]?\.?\d/.test(rest)) return { ok: false, message: `"${input}" holds more than one number; enter one value.` };
  const all = readings(rest, expectedUnit, infixPrefix === null);
  const chosen = choose(input, rest, all, expectedUnit);
  if (typeof chosen === 'string') return { ok: false, message: chosen };
  const prefix = infixPrefix ?? chosen.prefix;
  const refusal = megaRefusal(input, prefix, expectedUnit);
  if (refusal) return { ok: false, message: refusal };
  if (infixPrefix && UNITS[expectedUnit ?? '']?.prefixes === false)
    return { ok: false, message: `"${input}": ${describeUnit(expectedUnit ?? '')} takes no prefix; enter the plain number.` };
  const factor = (infixPrefix ? (prefixFactor(infixPrefix) ?? 1) : chosen.prefixFactor) * chosen.factor;
  const value = (sign === '-' ? -1 : 1) * mantissa * factor;
  if (!Number.isFinite(value)) return { ok: false, message: `"${input}" is too large to be a number.` };
  return { ok: true, value, unit: chosen.unit ?? expectedUnit ?? '' };
}

/**
 * How a formatted number is written. `entry` (the default): the shortest text, trailing zeros dropped and
 * an ASCII minus, as a person types it back into a field ("4.7 µH", "-1.5 V"). `table`: the digits asked
 * for with trailing zeros kept and the minus sign U+2212, so a column of numbers lines up ("4.70 µH",
 * "−1.50 V") — the results on screen and the report print values this way. Both read back with
 * `parseEngineering`.
 */
export type NumberStyle = 'entry' | 'table';

const MINUS = '\u2212';

/** `x` ≥ 0 to `digits` significant digits: trimmed ("4.7") or with its trailing zeros ("4.70"). */
function digitsOf(x: number, digits: number, style: NumberStyle): string {
  const rounded = Number(x.toPrecision(digits));
  if (style === 'entry' || rounded === 0) return String(rounded);
  const intDigits = Math.floor(Math.log10(rounded) + 1e-12) + 1;
  return rounded.toFixed(Math.min(20, Math.max(0, digits - intDigits)));
}

function lengthLike(a: number, unit: string, digits: number): [number, string] {
  if (unit === 'm') return a >= 1 || a === 0 ? [a, 'm'] : a >= 1e-3 ? [a * 1e3, 'mm'] : [a * 1e6, 'µm'];
  if (unit === 'm²') return a >= 1e-2 || a === 0 ? [a, 'm²'] : [a * 1e6, 'mm²'];
  return a >= 1e-3 || a === 0 ? [a, 'm³'] : [Number((a * 1e9).toPrecision(digits)), 'mm³'];
}

/**
 * The engineering prefix for a magnitude already rounded to its printed digits: the power of 1000 that
 * leaves 1 ≤ mantissa < 1000 (SI Brochure, 9th ed. 2019, Table 7), or undefined outside f … G.
 */
function prefixFor(rounded: number): { symbol: string; exponent: number } | undefined {
  let exp = Math.floor(Math.log10(rounded) / 3) * 3;
  if (rounded / 10 ** exp >= 1000) exp += 3;
  if (rounded / 10 ** exp < 1) exp -= 3;
  const prefix = FORMAT_PREFIXES.find(([, e]) => e === exp);
  return prefix ? { symbol: prefix[0], exponent: exp } : undefined;
}

/**
 * The one number formatter of screen, report and command line: `value` (in the canonical `unit`) with an
 * SI prefix and `significantDigits` significant digits, in the given style (above):
 * formatEngineering(4.7e-6, 'H') is "4.7 µH", formatEngineering(4.7e-6, 'H', 3, 'table') "4.70 µH".
 * Units that take no prefix are written plainly ("125 °C", "0.0045 /K"); lengths, areas and volumes use
 * mm, mm², mm³; unit "%" writes a fraction as a percentage. Zero has no prefix ("0 W"). A value that is
 * not finite is written "—".
 */
export function formatEngineering(value: number, unit: string, significantDigits = 3, style: NumberStyle = 'entry'): string {
  if (!Number.isFinite(value)) return '—';
  const digits = Math.min(15, Math.max(1, Math.round(Number.isFinite(significantDigits) ? significantDigits : 3)));
  const a = Math.abs(value);
  const sign = value < 0 ? (style === 'table' ? MINUS : '-') : '';
  const withUnit = (n: string, u: string): string => (u === '' ? `${sign}${n}` : `${sign}${n} ${u}`);
  const plain = (x: number, u: string): string => withUnit(digitsOf(x, digits, style), u);
  if (unit === '%') return plain(a * 100, '%');
  if (unit === 'm' || unit === 'm²' || unit === 'm³') {
    const [scaled, shown] = lengthLike(a, unit, digits);
    return plain(scaled, shown);
  }
  if (unit === '' || UNITS[unit]?.prefixes === false || a === 0) return a === 0 ? withUnit('0', unit) : plain(a, unit);
  const rounded = Number(a.toPrecision(digits));
  const prefix = prefixFor(rounded);
  if (!prefix) return plain(a, unit);
  return plain(rounded / 10 ** prefix.exponent, `${prefix.symbol}${unit}`);
}
