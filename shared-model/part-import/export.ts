/**
 * A library (or a selection) as CSV: one row per part, one column per field any exported part uses
 * (Kind, Identifier, Name, Invented example first; Notes last), every number column with its unit in the
 * header ("RDS(on) at 25 °C [mΩ]"). A column's unit is the SI prefix that suits its median value
 * (engineering form, 1 to 999). A cell is the value's shortest round-trip decimal (ECMA-262
 * Number::toString) with its decimal point moved, and the import moves it back (cells.ts) before one
 * correctly rounded conversion, so it reads the very decimal that names the double: the same double. So
 * `previewImport` of the export with `guessMapping` of its headers gives the same parts. Cells go through csv/write.ts: RFC 4180 and
 * formula injection neutralised (a name beginning "=" is written "'=..." and read back without the quote).
 */
import { csvLines, type CsvCell } from '../csv/write.ts';
import type { Part } from '../design/parts.ts';
import type { PartField } from './fields.ts';
import { PART_FIELDS } from './fields.ts';

/** Column units by canonical unit, [exponent, written unit], smallest first. */
const PREFIXED: readonly (readonly [number, string])[] = [[-12, 'p'], [-9, 'n'], [-6, 'µ'], [-3, 'm'], [0, ''], [3, 'k'], [6, 'M']];
const SPECIAL: Readonly<Record<string, readonly (readonly [number, string])[]>> = {
  m: [[-6, 'µm'], [-3, 'mm'], [0, 'm']],
  'm²': [[-6, 'mm²'], [0, 'm²']],
  'm³': [[-9, 'mm³'], [0, 'm³']],
};
const PREFIX_UNITS = new Set(['V', 'A', 'Ω', 'H', 'F', 'Hz', 'W', 's', 'C', 'J', 'T', 'W/m³', 'V/K']);

function valueAt(part: Part, path: string): unknown {
  let here: unknown = part;
  for (const key of path.split('.')) here = here !== null && typeof here === 'object' ? (here as Record<string, unknown>)[key] : undefined;
  return here;
}

/** `value` written with its decimal point moved `exponent` places left: (0.0045, -3) → "4.5". */
export function shiftedText(value: number, exponent: number): string {
  const m = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/.exec(String(value));
  if (!m) return String(value);
  const digits = `${m[2] ?? ''}${m[3] ?? ''}`;
  const point = (m[2] ?? '').length + Number(m[4] ?? '0') - exponent;
  const trimmed = digits.replace(/^0+(?=\d)/, '');
  const lead = digits.length - trimmed.length;
  const at = point - lead;
  let text: string;
  if (at <= 0) text = `0.${'0'.repeat(-at)}${trimmed}`;
  else if (at >= trimmed.length) text = `${trimmed}${'0'.repeat(at - trimmed.length)}`;
  else text = `${trimmed.slice(0, at)}.${trimmed.slice(at)}`;
  text = text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
  return `${m[1] ?? ''}${text.replace(/^0+(?=\d)/, '') || '0'}`;
}

function columnUnit(field: PartField, values: number[]): { exponent: number; unit: string } {
  const options = SPECIAL[field.unit] ?? (PREFIX_UNITS.has(field.unit) ? PREFIXED.map(([e, p]) => [e, `${p}${field.unit}`] as const) : [[0, field.unit] as const]);
  const sizes = values.map(Math.abs).filter((v) => v > 0).sort((a, b) => a - b);
  const median = sizes[Math.floor(sizes.length / 2)];
  const wanted = median === undefined ? 0 : Math.floor(Math.log10(median) / 3) * 3;
  const fitting = [...options].reverse().find(([e]) => e <= wanted) ?? options[0] ?? [0, field.unit];
  const [exponent, unit] = fitting;
  return { exponent, unit };
}

/** The header of an exported column: "Label [unit]", or the label alone for text and plain numbers. */
const headerOf = (field: PartField, unit: string): string => (unit === '' ? field.label : `${field.label} [${unit}]`);

function cellOf(value: unknown, exponent: number): CsvCell {
  if (value === undefined) return '';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') {
    const text = shiftedText(value, exponent);
    return String(Number(text)) === text ? Number(text) : text;
  }
  return typeof value === 'object' && value !== null ? JSON.stringify(value) : String(value);
}

/** The parts as CSV text (see the file header). */
export function partsToCsv(parts: readonly Part[]): string {
  const used = PART_FIELDS.filter((f) => ['kind', 'id', 'name'].includes(f.path) || parts.some((p) => valueAt(p, f.path) !== undefined));
  const columns = used.map((field) => {
    const numbers = parts.map((p) => valueAt(p, field.path)).filter((v): v is number => typeof v === 'number');
    const { exponent, unit } = field.type === 'number' ? columnUnit(field, numbers) : { exponent: 0, unit: '' };
    return { field, exponent, header: headerOf(field, unit) };
  });
  return csvLines([columns.map((c) => c.header), ...parts.map((p) => columns.map((c) => cellOf(valueAt(p, c.field.path), c.exponent)))]);
}
