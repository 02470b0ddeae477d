/**
 * The import preview: every data row of the table read with the mapping into a part record, or into the
 * list of its problems. A row is good only when every cell it uses reads and the assembled part passes
 * the part schema (the same check as a part in the library editor). Each problem names the row (the
 * spreadsheet row: the line where the row starts), the column by its header and the field by its label,
 * the value found and the allowed values or range.
 *   - kind: the row's Kind cell, else the mapping's kind;
 *   - a cell of a field that the row's kind (or chosen form) does not have must be blank;
 *   - an alternative form (RDS(on) law, Coss form, core-loss data, AC winding) comes from its own column
 *     or fixed value, else from the form whose fields the row fills (a row with an "RDS(on) coefficient α"
 *     has the linear law);
 *   - an optional group (roll-off, rated life) is present when any of its cells is filled;
 *   - an id, when no column gives one, is made from the name (apply.ts keeps ids unique).
 */
import type { CsvReadProblem, CsvTable } from '../csv/read.ts';
import { idFromName } from '../design/ids.ts';
import type { Part, PartKind } from '../design/parts.ts';
import { partSchema } from '../design/parts.ts';
import { problemsFromZod } from '../design/zod-problems.ts';
import { allowedText, readCell } from './cells.ts';
import { KIND_WORDS } from './field-labels.ts';
import type { PartField } from './fields.ts';
import { fieldsOfKind, PART_FIELDS, partField } from './fields.ts';
import type { MappingProblem, PartMapping } from './mapping.ts';
import { checkMapping } from './mapping.ts';

export interface RowProblem {
  /** Spreadsheet row (1-based line where the row starts; the header is usually row 1). */
  row: number;
  /** 0-based column index and its header, when one column is at fault. */
  column?: number;
  header?: string;
  /** Field path inside the part. */
  field?: string;
  /** The cell's text ("" when blank or when no cell gives the field). */
  value: string;
  message: string;
}

export interface PreviewRow {
  row: number;
  part?: Part;
  problems: RowProblem[];
}

export interface ImportPreview {
  headers: string[];
  mappingProblems: MappingProblem[];
  readProblems: CsvReadProblem[];
  rows: PreviewRow[];
  /** The parts of the good rows, in row order. */
  good: Part[];
  /** Rows with at least one problem. */
  bad: PreviewRow[];
}

interface Given {
  field: PartField;
  text: string;
  column?: number;
  header?: string;
  unit: string;
}

const where = (row: number, g: Pick<Given, 'header' | 'field'>): string =>
  g.header !== undefined ? `Row ${row}, column "${g.header}" (${g.field.label})` : `Row ${row}, fixed value of ${g.field.label}`;

function set(target: Record<string, unknown>, path: string, value: unknown): void {
  const [head, tail] = path.split('.') as [string, string | undefined];
  if (tail === undefined) target[head] = value;
  else target[head] = { ...((target[head] as Record<string, unknown> | undefined) ?? {}), [tail]: value };
}

function chooseForm(union: string, tagPath: string, present: Given[], values: Map<string, unknown>): string | undefined {
  const tagValue = values.get(tagPath);
  if (typeof tagValue === 'string') return tagValue;
  const forms = partField(tagPath)?.choices ?? [];
  const fits = forms.filter((form) => present.every((g) => g.field.union?.forms.includes(form)));
  const required = (form: string): string[] =>
    PART_FIELDS.filter((f) => f.union?.key === union && f.path !== tagPath && f.union.forms.includes(form) && f.requiredFor.length > 0).map((f) => f.path);
  const complete = fits.find((form) => present.length > 0 && required(form).every((p) => values.has(p)));
  return complete ?? (present.length > 0 ? fits[0] : undefined);
}

function readRow(row: number, cells: readonly string[], headers: readonly string[], mapping: PartMapping): PreviewRow {
  const problems: RowProblem[] = [];
  const given: Given[] = [];
  mapping.columns.forEach((c, column) => {
    const field = c.field === null ? undefined : partField(c.field);
    const text = (cells[column] ?? '').trim();
    if (field && text !== '') given.push({ field, text, column, header: headers[column] ?? c.header, unit: c.unit });
  });
  for (const f of mapping.fixed) {
    const field = partField(f.field);
    if (field && !given.some((g) => g.field === field)) given.push({ field, text: f.text, unit: '' });
  }
  cells.slice(headers.length).forEach((text, i) => {
    if (text.trim() !== '')
      problems.push({ row, column: headers.length + i, value: text, message: `Row ${row}, column ${headers.length + i + 1}: "${text}" lies beyond the last header; allowed: a blank cell, or add a header for it.` });
  });
  const fail = (g: Given, found: string, allowed: string): void => {
    problems.push({ row, column: g.column, header: g.header, field: g.field.path, value: g.text, message: `${where(row, g)}: ${found}; allowed: ${allowed}.` });
  };
  const values = new Map<string, unknown>();
  for (const g of given) {
    const read = readCell(g.field, g.text, g.unit);
    if (read.ok) values.set(g.field.path, read.value);
    else fail(g, read.found, read.allowed);
  }
  const kind = (values.get('kind') as PartKind | undefined) ?? mapping.kind;
  if (kind === undefined) {
    if (!given.some((g) => g.field.path === 'kind')) problems.push({ row, field: 'kind', value: '', message: `Row ${row}: the Kind cell is empty; allowed: one of ${Object.keys(KIND_WORDS).map((k) => `"${k}"`).join(', ')}.` });
    return { row, problems };
  }
  const own = new Set(fieldsOfKind(kind).map((f) => f.path));
  for (const g of given)
    if (!own.has(g.field.path) && g.field.path !== 'kind') fail(g, `"${g.text}" is given, but a ${KIND_WORDS[kind]} has no ${g.field.label}`, 'a blank cell');
  const part: Record<string, unknown> = { kind };
  const unions = new Set(fieldsOfKind(kind).flatMap((f) => (f.union ? [f.union.key] : [])));
  const forms = new Map<string, string | undefined>();
  for (const union of unions) {
    const tag = fieldsOfKind(kind).find((f) => f.union?.key === union && f.path === `${union}.${f.union.tag}`) as PartField;
    const present = given.filter((g) => g.field.union?.key === union && g.field !== tag && values.has(g.field.path));
    const form = chooseForm(union, tag.path, present, values);
    forms.set(union, form);
    if (form === undefined) {
      const cell = given.find((g) => g.field === tag);
      if (!cell) problems.push({ row, field: tag.path, value: '', message: `Row ${row}: nothing gives ${tag.label}; allowed: a column or fixed value with one of ${tag.choices.map((c) => `"${c}"`).join(', ')}, or the cells of one form.` });
      continue;
    }
    set(part, tag.path, form);
    for (const g of present)
      if (!g.field.union?.forms.includes(form)) fail(g, `"${g.text}" is given, but ${tag.label} "${form}" has no ${g.field.label}`, 'a blank cell, or another form');
  }
  for (const field of fieldsOfKind(kind)) {
    if (field.path === 'kind' || (field.union !== undefined && field.union.tag === field.path.split('.')[1])) continue;
    const form = field.union ? forms.get(field.union.key) : undefined;
    if (field.union && (form === undefined || !field.union.forms.includes(form))) continue;
    const group = field.group;
    if (group !== undefined && !given.some((g) => g.field.group === group)) continue;
    if (values.has(field.path)) set(part, field.path, values.get(field.path));
    else if (field.requiredFor.includes(kind) && !given.some((g) => g.field === field)) {
      if (field.path === 'id' && typeof values.get('name') === 'string') set(part, 'id', idFromName(values.get('name') as string));
      else {
        const column = mapping.columns.findIndex((c) => c.field === field.path);
        const header = column >= 0 ? (headers[column] ?? '') : undefined;
        problems.push({
          row, field: field.path, value: '', ...(column >= 0 ? { column, header } : {}),
          message: column >= 0
            ? `Row ${row}, column "${header}" (${field.label}): the cell is empty; allowed: ${allowedText(field)} (every ${KIND_WORDS[kind]} needs it).`
            : `Row ${row}: no column gives ${field.label}, which every ${KIND_WORDS[kind]} needs.`,
        });
      }
    }
  }
  if (problems.length > 0) return { row, problems };
  const checked = partSchema.safeParse(part);
  if (checked.success) return { row, part: checked.data, problems };
  for (const p of problemsFromZod(checked.error.issues, partSchema, part)) {
    const g = given.find((x) => x.field.path === p.path);
    problems.push({ row, field: p.path, value: g?.text ?? '', ...(g?.column !== undefined ? { column: g.column, header: g.header } : {}), message: `${g ? where(row, g) : `Row ${row}`}: ${p.message}` });
  }
  return { row, problems };
}

/** Reads every data row of `table` (the first row holds the headers) with `mapping`. */
export function previewImport(table: CsvTable, mapping: PartMapping): ImportPreview {
  const [head, ...data] = table.rows;
  const headers = head?.cells.map((h) => h.trim()) ?? [];
  const mappingProblems = checkMapping(mapping);
  const rows = mappingProblems.length > 0 ? [] : data.map((r) => readRow(r.line, r.cells, headers, mapping));
  return {
    headers,
    mappingProblems,
    readProblems: table.problems,
    rows,
    good: rows.flatMap((r) => (r.part ? [r.part] : [])),
    bad: rows.filter((r) => r.problems.length > 0),
  };
}
