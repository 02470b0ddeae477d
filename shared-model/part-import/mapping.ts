/**
 * The mapping from spreadsheet columns to part fields, as the user confirms it and as it is saved for
 * reuse: one entry per column (its header, the field it fills or null to leave it out, the unit of bare
 * numbers in it), the kind of part when no column gives it, and fixed values for fields no column gives
 * (the same text for every row, read like a cell). Saved as
 *   { "format": "wattledger.part-mapping", "version": 1, "kind"?: ..., "columns": [...], "fixed": [...] }
 * `checkMapping` finds every problem of a mapping before any row is read: an unknown field, a field
 * given twice, a unit that is not a unit of the field, a fixed value the field refuses, a required field
 * that nothing gives.
 */
import { z } from 'zod';
import type { PartKind } from '../design/parts.ts';
import { readCell } from './cells.ts';
import { KIND_WORDS } from './field-labels.ts';
import { fieldsOfKind, partField } from './fields.ts';
import { unitExponent } from './cells.ts';

const PART_MAPPING_FORMAT = 'wattledger.part-mapping';
const PART_MAPPING_VERSION = 1;

const kinds = Object.keys(KIND_WORDS) as [PartKind, ...PartKind[]];

export const partMappingSchema = z.object({
  format: z.literal(PART_MAPPING_FORMAT),
  version: z.literal(PART_MAPPING_VERSION),
  kind: z.enum(kinds).optional(),
  columns: z.array(z.object({ header: z.string().max(200), field: z.string().max(80).nullable(), unit: z.string().max(20) })).max(500),
  fixed: z.array(z.object({ field: z.string().max(80), text: z.string().max(2000) })).max(200),
});

export type PartMapping = z.infer<typeof partMappingSchema>;
export type ColumnMapping = PartMapping['columns'][number];

export interface MappingProblem {
  /** The column concerned (0-based), or undefined for the kind or a fixed value. */
  column?: number;
  field?: string;
  message: string;
}

const quoted = (header: string): string => `column "${header}"`;

/** The fields given by a column or a fixed value. */
export function givenFields(mapping: PartMapping): Set<string> {
  return new Set([...mapping.columns.flatMap((c) => (c.field === null ? [] : [c.field])), ...mapping.fixed.map((f) => f.field)]);
}

/** Every problem of the mapping itself (see the file header); [] when rows can be read with it. */
export function checkMapping(mapping: PartMapping): MappingProblem[] {
  const out: MappingProblem[] = [];
  const seen = new Map<string, string>();
  mapping.columns.forEach((c, column) => {
    if (c.field === null) return;
    const field = partField(c.field);
    if (!field) {
      out.push({ column, message: `${quoted(c.header)} is mapped to "${c.field}", which is not a part field.` });
      return;
    }
    const before = seen.get(c.field);
    if (before !== undefined)
      out.push({ column, field: c.field, message: `${quoted(c.header)} and ${before} both give ${field.label}; leave one of them out.` });
    seen.set(c.field, quoted(c.header));
    if (field.type === 'number' && c.unit.trim() !== '' && unitExponent(c.unit, field.unit) === undefined)
      out.push({ column, field: c.field, message: `${quoted(c.header)}: "${c.unit}" is not a unit of ${field.label} (${field.unit || 'a plain number'}); allowed: ${field.unit || 'no unit, or %'} with an SI prefix where it takes one.` });
    if (field.type !== 'number' && c.unit.trim() !== '')
      out.push({ column, field: c.field, message: `${quoted(c.header)}: ${field.label} takes no unit, but "${c.unit}" is set.` });
  });
  for (const fixed of mapping.fixed) {
    const field = partField(fixed.field);
    if (!field) out.push({ field: fixed.field, message: `The fixed value for "${fixed.field}" names no part field.` });
    else if (seen.has(fixed.field)) out.push({ field: fixed.field, message: `${field.label} is given by ${seen.get(fixed.field)} and by a fixed value; keep one.` });
    else {
      const read = readCell(field, fixed.text, '');
      if (!read.ok) out.push({ field: fixed.field, message: `The fixed value of ${field.label}: ${read.found}; allowed: ${read.allowed}.` });
    }
  }
  const given = givenFields(mapping);
  if (mapping.kind === undefined && !given.has('kind'))
    out.push({ field: 'kind', message: 'Choose the kind of part, or map a column to Kind.' });
  if (mapping.kind !== undefined) {
    for (const field of fieldsOfKind(mapping.kind)) {
      if (field.requiredFor.includes(mapping.kind) && field.union === undefined && field.group === undefined && field.path !== 'id' && !given.has(field.path))
        out.push({ field: field.path, message: `No column gives ${field.label}, which every ${KIND_WORDS[mapping.kind]} needs; map a column or give a fixed value.` });
    }
  }
  return out;
}

/** A mapping as the saved document (format and version set). */
export function mappingDocument(mapping: Omit<PartMapping, 'format' | 'version'>): PartMapping {
  return { format: PART_MAPPING_FORMAT, version: PART_MAPPING_VERSION, ...mapping };
}
