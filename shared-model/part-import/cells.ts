/**
 * One spreadsheet cell read as the value of a part field.
 *   Numbers: a cell with its own prefix or unit is read by engineering entry ("8 mΩ", "8m", "4u7",
 *   "2.2 µF", "80 %", "0.4 %/K"); a bare number ("8", "1.5e-3") is in the column's unit ("mOhm" from the
 *   header or chosen in the mapping), or in the field's SI unit when the column has none. Column units
 *   are powers of ten of the SI unit (SI prefixes and the spellings of units/engineering-units.ts), so a
 *   bare number is scaled by moving its decimal exponent: the result is the double nearest the decimal
 *   value, exactly as if the SI value had been typed, and an exported library reads back bit for bit.
 *   The value must then lie in the field's range (design/numbers.ts).
 *   JSON: a list no single cell can spell (a digitised curve) as its JSON text, checked by its schema.
 *   Choices: the value or its words, any case ("Schottky", "two-point", "MOSFET"). Yes/no: yes, no,
 *   true, false, y, n, 1, 0, x (ticked). Text: as written, outer spaces trimmed.
 * A refusal says what the cell reads as and what the field allows; preview.ts adds the row and column.
 */
import type { z } from 'zod';
import { inRange, rangeText } from '../design/number-range.ts';
import { formatEngineering, parseEngineering } from '../units/engineering.ts';
import type { PartField } from './fields.ts';
import { describeSchema } from '../design/zod-problems.ts';
import { KIND_WORDS } from './field-labels.ts';

export type CellRead = { ok: true; value: unknown } | { ok: false; found: string; allowed: string };

const BARE = /^([+-]?)(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?$/;
const YES = new Set(['yes', 'y', 'true', '1', 'x']);
const NO = new Set(['no', 'n', 'false', '0']);

/** The power of ten a column unit scales the field's SI unit by (mOhm in an Ω field: -3); undefined if it does not fit. */
export function unitExponent(columnUnit: string, fieldUnit: string): number | undefined {
  if (columnUnit.trim() === '') return 0;
  const read = parseEngineering(`1 ${columnUnit}`, fieldUnit);
  if (!read.ok || read.value <= 0) return undefined;
  const exponent = Math.round(Math.log10(read.value));
  return Math.abs(read.value / 10 ** exponent - 1) < 1e-12 ? exponent : undefined;
}

/** "3" → 3; "1.5e-3" with exponent 3 → Number("1.5e0"). Undefined unless the text is a bare number. */
export function shiftBare(text: string, exponent: number): number | undefined {
  const m = BARE.exec(text);
  if (!m) return undefined;
  return Number(`${m[1] ?? ''}${m[2] ?? ''}e${Number(m[3] ?? '0') + exponent}`);
}

/** What a field allows, in words: its range ("10 µΩ ≤ RDS(on) at 25 °C ≤ 100 Ω"), choices or text length. */
export const allowedText = (field: PartField): string =>
  field.range ? rangeText(field.range, field.label, field.unit) : describeSchema(field.schema, field.path);

function readNumber(field: PartField, text: string, columnUnit: string): CellRead {
  const plain = text.replace(/\u2212/g, '-').replace(/[\u00a0\u2009\u202f ]/g, '');
  const exponent = unitExponent(columnUnit, field.unit);
  let value = shiftBare(plain, exponent ?? 0);
  if (value === undefined) {
    // A number with its own prefix and unit ("6.5 mΩ"): shift the decimal exponent, as for a bare number,
    // so the value is the double the decimal text names (6.5 × 1e-3 in binary is not 0.0065).
    const own = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([^\d\s].*)$/.exec(text.replace(/\u2212/g, '-').trim());
    const ownExponent = own ? unitExponent(own[2]!, field.unit) : undefined;
    if (own && ownExponent !== undefined && own[2]!.trim() !== '') value = shiftBare(own[1]!, ownExponent);
  }
  if (value === undefined) {
    const read = parseEngineering(text, field.unit);
    if (!read.ok) return { ok: false, found: read.message, allowed: allowedText(field) };
    value = read.value;
  } else if (exponent === undefined)
    return { ok: false, found: `"${text}" is a bare number and the column's unit "${columnUnit}" is not a unit of ${field.label}`, allowed: allowedText(field) };
  if (!Number.isFinite(value)) return { ok: false, found: `"${text}" is too large to be a number`, allowed: allowedText(field) };
  if (field.range && !inRange(value, field.range)) {
    const shown = field.unit === '' ? String(value) : formatEngineering(value, field.unit, 6);
    const unitNote = columnUnit !== '' && BARE.test(plain) ? ` ${columnUnit}` : '';
    return { ok: false, found: `"${text}"${unitNote} reads as ${shown}`, allowed: allowedText(field) };
  }
  return { ok: true, value };
}

function readChoice(field: PartField, text: string): CellRead {
  const wanted = text.trim().toLowerCase();
  const words: Record<string, string> = field.path === 'kind' ? KIND_WORDS : {};
  const hit = field.choices.find((c) => c.toLowerCase() === wanted || words[c]?.toLowerCase() === wanted);
  if (hit !== undefined) return { ok: true, value: hit };
  return { ok: false, found: `"${text}"`, allowed: `one of ${field.choices.map((c) => `"${c}"`).join(', ')}` };
}

/** Reads `text` (not blank) as a value of `field`; `columnUnit` is the unit of bare numbers in the column. */
export function readCell(field: PartField, text: string, columnUnit: string): CellRead {
  const trimmed = text.trim();
  switch (field.type) {
    case 'number':
      return readNumber(field, trimmed, columnUnit);
    case 'choice':
      return readChoice(field, trimmed);
    case 'json': {
      let value: unknown;
      try {
        value = JSON.parse(trimmed);
      } catch {
        return { ok: false, found: `"${trimmed.slice(0, 40)}" is not JSON text`, allowed: describeSchema(field.schema, field.path) };
      }
      const checked = (field.schema as z.ZodType).safeParse(value);
      return checked.success ? { ok: true, value: checked.data } : { ok: false, found: `"${trimmed.slice(0, 40)}${trimmed.length > 40 ? '…' : ''}"`, allowed: describeSchema(field.schema, field.path) };
    }
    case 'boolean': {
      const word = trimmed.toLowerCase();
      if (YES.has(word)) return { ok: true, value: true };
      if (NO.has(word)) return { ok: true, value: false };
      return { ok: false, found: `"${text}"`, allowed: 'yes or no' };
    }
    default: {
      if (!(field.schema as z.ZodType).safeParse(trimmed).success)
        return { ok: false, found: `"${trimmed.length > 40 ? `${trimmed.slice(0, 40)}…` : trimmed}" (${trimmed.length} characters)`, allowed: describeSchema(field.schema, field.path) };
      return { ok: true, value: trimmed };
    }
  }
}
