/**
 * Writing CSV (RFC 4180): comma separated, CRLF line ends, a field holding a comma, quote or line break
 * is quoted with inner quotes doubled.
 *
 * Text cells are made safe against spreadsheet formula injection: a text cell that begins with `=`, `+`,
 * `-`, `@`, a tab or a carriage return would be evaluated as a formula by common spreadsheets, so it is
 * prefixed with a single quote and quoted (the OWASP "CSV Injection" recommendation, docs/methods.md §19).
 * Numbers are written by `csvNumber` as plain numbers (JavaScript's shortest round-trip form) and are never
 * prefixed, so a negative number stays a number in the spreadsheet. Every CSV the tool writes goes through
 * `csvText`/`csvNumber` and `csvLines`.
 */

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** A text cell, neutralised against formula injection and quoted where RFC 4180 requires. */
export function csvText(value: string): string {
  if (FORMULA_START.test(value)) return `"'${value.replace(/"/g, '""')}"`;
  return NEEDS_QUOTES.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** A number cell: the shortest round-trip form; empty for a value that is not finite. */
export function csvNumber(value: number): string {
  return Number.isFinite(value) ? String(value) : '';
}

/** A cell already formatted: numbers stay numbers, anything else is text (see csvText). */
export type CsvCell = string | number;

function cell(value: CsvCell): string {
  return typeof value === 'number' ? csvNumber(value) : csvText(value);
}

/** Rows to CSV text, every line ending in CRLF. */
export function csvLines(rows: readonly (readonly CsvCell[])[]): string {
  return rows.map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
