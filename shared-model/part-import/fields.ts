/**
 * The part fields a spreadsheet column can fill, read from the part schemas themselves (design/parts.ts),
 * so the import can never drift from what a part record holds. A field is a dotted path inside a part
 * ("rdsOn25Ohm", "rdsTemperatureLaw.alphaPerK", "life.ratedHours"), with its label and aliases
 * (field-labels.ts), its unit (design/key-units.ts), its type and the kinds of part that have it.
 *   - A field of an alternative form (a discriminated union such as the RDS(on) temperature law) names
 *     its union and the forms that hold it; the union's tag ("rdsTemperatureLaw.law") is a choice field.
 *   - A field of an optional group (inductance roll-off, capacitor life) names its group.
 *   - A datasheet curve (a table of points, e.g. Coss(VDS)) travels as JSON text in one cell (type "json").
 */
import { z } from 'zod';
import { unitOfKey } from '../design/key-units.ts';
import { numberRangeOf, type NumberRange } from '../design/number-range.ts';
import { partSchema } from '../design/parts.ts';
import type { PartKind } from '../design/parts.ts';
import { defOf, unwrap, type Schema } from '../design/zod-problems.ts';
import { FIELD_WORDS, KIND_WORDS } from './field-labels.ts';

/** `json`: a list or record no single cell can spell (a digitised curve): the cell holds its JSON text. */
export type FieldType = 'number' | 'text' | 'choice' | 'boolean' | 'json';

export interface PartField {
  path: string;
  label: string;
  aliases: readonly string[];
  /** Canonical unit of a number field ("Ω", "°C", "" for a plain number). */
  unit: string;
  type: FieldType;
  /** The allowed values of a choice field. */
  choices: readonly string[];
  /** The allowed numbers of a number field. */
  range?: NumberRange;
  /** The zod schema of the value, for the allowed text of a problem. */
  schema: Schema;
  kinds: PartKind[];
  /** Kinds for which the field must be given (within its form or group when it has one). */
  requiredFor: PartKind[];
  /** The union ("rdsTemperatureLaw") and the forms holding this field; the tag field has forms []. */
  union?: { key: string; tag: string; forms: string[] };
  /** The optional group ("rolloff", "life") the field belongs to. */
  group?: string;
}

const isOptional = (s: Schema): boolean => defOf(s).type === 'optional';

function typeOf(s: Schema): { type: FieldType; choices: string[] } {
  const def = defOf(unwrap(s));
  if (def.type === 'number') return { type: 'number', choices: [] };
  if (def.type === 'string') return { type: 'text', choices: [] };
  if (def.type === 'boolean') return { type: 'boolean', choices: [] };
  if (def.type === 'enum') return { type: 'choice', choices: Object.values(def.entries as Record<string, string>) };
  if (def.type === 'literal') return { type: 'choice', choices: (def.values as unknown[]).map(String) };
  return { type: 'json', choices: [] };
}

function collect(): PartField[] {
  const byPath = new Map<string, PartField>();
  const add = (path: string, s: Schema, kind: PartKind, required: boolean, extra: Pick<PartField, 'union' | 'group'>): void => {
    const t = typeOf(s);
    // A field added to the part schema before it has words here is still imported and exported, under its path.
    const words = FIELD_WORDS[path] ?? { label: path, aliases: [] };
    const known = byPath.get(path);
    if (known) {
      if (!known.kinds.includes(kind)) known.kinds.push(kind);
      if (required && !known.requiredFor.includes(kind)) known.requiredFor.push(kind);
      if (t.type === 'choice') known.choices = [...new Set([...known.choices, ...t.choices])];
      for (const form of extra.union?.forms ?? []) if (!known.union?.forms.includes(form)) known.union?.forms.push(form);
      return;
    }
    const leaf = unwrap(s);
    byPath.set(path, {
      path,
      label: words.label,
      aliases: words.aliases,
      unit: t.type === 'number' ? unitOfKey(path.split('.').pop() ?? '') : '',
      type: t.type,
      choices: t.choices,
      range: numberRangeOf(leaf),
      schema: leaf,
      kinds: [kind],
      requiredFor: required ? [kind] : [],
      ...(extra.union ? { union: { ...extra.union, forms: [...extra.union.forms] } } : {}),
      ...(extra.group ? { group: extra.group } : {}),
    });
  };
  for (const option of defOf(partSchema).options as Schema[]) {
    const shape = defOf(option).shape as Record<string, Schema>;
    const kind = (defOf(shape.kind as Schema).values as PartKind[])[0] as PartKind;
    for (const [key, field] of Object.entries(shape)) {
      if (key === 'kind') continue;
      const inner = unwrap(field);
      const def = defOf(inner);
      if (def.type === 'union') {
        const tag = def.discriminator as string;
        const forms = def.options as Schema[];
        const formNames = forms.map((f) => String((defOf((defOf(f).shape as Record<string, Schema>)[tag] as Schema).values as unknown[])[0]));
        add(`${key}.${tag}`, (defOf(forms[0] as Schema).shape as Record<string, Schema>)[tag] as Schema, kind, !isOptional(field), { union: { key, tag, forms: [] } });
        const tagField = byPath.get(`${key}.${tag}`);
        if (tagField) tagField.choices = [...new Set([...tagField.choices, ...formNames])];
        forms.forEach((form, i) => {
          for (const [sub, s] of Object.entries(defOf(form).shape as Record<string, Schema>)) {
            if (sub === tag) continue;
            add(`${key}.${sub}`, s, kind, !isOptional(s), { union: { key, tag, forms: [formNames[i] as string] } });
          }
        });
      } else if (def.type === 'object') {
        for (const [sub, s] of Object.entries(def.shape as Record<string, Schema>)) add(`${key}.${sub}`, s, kind, !isOptional(s), { group: key });
      } else add(key, field, kind, !isOptional(field), {});
    }
  }
  return [...byPath.values()];
}

/** Every importable field: identity first, then the kinds' values in schema order (Notes last). */
export const PART_FIELDS: readonly PartField[] = (() => {
  const all = collect();
  const kinds = Object.keys(KIND_WORDS) as PartKind[];
  const kind: PartField = {
    path: 'kind', label: FIELD_WORDS.kind?.label ?? 'Kind', aliases: FIELD_WORDS.kind?.aliases ?? [], unit: '', type: 'choice',
    choices: kinds, schema: z.enum(kinds as [PartKind, ...PartKind[]]), kinds, requiredFor: [],
  };
  const notes = all.filter((f) => f.path === 'notes');
  return [kind, ...all.filter((f) => f.path !== 'notes'), ...notes];
})();

const BY_PATH: ReadonlyMap<string, PartField> = new Map(PART_FIELDS.map((f) => [f.path, f]));

/** The field at a path, or undefined. */
export function partField(path: string): PartField | undefined {
  return BY_PATH.get(path);
}

/** The fields a part of `kind` has, in catalogue order. */
export function fieldsOfKind(kind: PartKind): PartField[] {
  return PART_FIELDS.filter((f) => f.kinds.includes(kind));
}
