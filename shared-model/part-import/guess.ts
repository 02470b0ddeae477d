/**
 * First guesses of the mapping, for the user to confirm: each header is matched to a field by name,
 * ignoring case, spaces, punctuation and the unit (header-unit.ts), against the field's label, its
 * aliases and its key ("Rds(on) (mOhm)" → RDS(on) at 25 °C, bare numbers in mΩ). A reading whose unit
 * is not a unit of the field is passed over. With a kind, only that kind's fields are candidates; a field
 * already taken by an earlier column is not given twice. `reuseMapping` applies a saved mapping to new
 * headers: the same header (exactly, then by normalised name) keeps its saved field and unit, any other
 * header is guessed.
 */
import type { PartKind } from '../design/parts.ts';
import { unitExponent } from './cells.ts';
import type { PartField } from './fields.ts';
import { fieldsOfKind, PART_FIELDS } from './fields.ts';
import { headerReadings, normaliseHeader } from './header-unit.ts';
import type { ColumnMapping, PartMapping } from './mapping.ts';
import { mappingDocument } from './mapping.ts';

const namesOf = (field: PartField): string[] => [field.label, field.path, field.path.split('.').pop() ?? '', ...field.aliases].map(normaliseHeader);

/** The column mapping guessed for one header. */
export function guessColumn(header: string, candidates: readonly PartField[], taken: ReadonlySet<string> = new Set()): ColumnMapping {
  for (const reading of headerReadings(header)) {
    const name = normaliseHeader(reading.name);
    if (name === '') continue;
    const fits = (f: PartField): boolean => !taken.has(f.path) && (reading.unit === '' || (f.type === 'number' && unitExponent(reading.unit, f.unit) !== undefined));
    // A label names one field; an alias may be shared ("Qrr"), so labels are tried first.
    const field = candidates.find((f) => fits(f) && normaliseHeader(f.label) === name) ?? candidates.find((f) => fits(f) && namesOf(f).includes(name));
    if (field) return { header, field: field.path, unit: reading.unit };
  }
  return { header, field: null, unit: '' };
}

/** A whole mapping guessed from the header row; `kind` when every row is one kind of part. */
export function guessMapping(headers: readonly string[], kind?: PartKind): PartMapping {
  const candidates = kind === undefined ? PART_FIELDS : PART_FIELDS.filter((f) => f.path === 'kind' || fieldsOfKind(kind).includes(f));
  const taken = new Set<string>();
  const columns = headers.map((header) => {
    const guess = guessColumn(header, candidates, taken);
    if (guess.field !== null) taken.add(guess.field);
    return guess;
  });
  return mappingDocument({ ...(kind === undefined ? {} : { kind }), columns, fixed: [] });
}

/** A saved mapping applied to a new header row (see the file header). */
export function reuseMapping(headers: readonly string[], saved: PartMapping): PartMapping {
  const guessed = guessMapping(headers, saved.kind);
  const taken = new Set<string>();
  const columns = headers.map((header, i) => {
    const same = saved.columns.find((c) => c.header === header) ?? saved.columns.find((c) => normaliseHeader(c.header) === normaliseHeader(header));
    const chosen = same ? { header, field: same.field, unit: same.unit } : (guessed.columns[i] as ColumnMapping);
    if (chosen.field !== null && taken.has(chosen.field)) return { header, field: null, unit: '' };
    if (chosen.field !== null) taken.add(chosen.field);
    return chosen;
  });
  return { ...saved, columns };
}
