/**
 * The on-screen name of a design field, from the same field descriptions the editor draws:
 * "parts.inductor.inductanceH" → "Inductor — Inductance", "spec.vinMinV" → "Input voltage, lowest".
 * The validator's dotted paths stay in the command line and the JSON; the screen names the field by
 * the label the user sees, with its section where the label alone is ambiguous (parts, thermal paths,
 * heatsinks). Returns the unit the field is entered in, so a value can be written the same way.
 */
import { partInRole, ROLE_LABELS, ROLES, type Design, type Role } from '../../shared-model/index.ts';
import { partPath } from '../state/design-actions.ts';
import {
  CONTACT_CHOICE,
  DEAD_TIME_FIELDS,
  IDENTITY_FIELDS,
  KIND_CHOICE,
  LIGHT_LOAD_CHOICE,
  MARGIN_FIELDS,
  RECTIFIER_CHOICE,
  SENSE_CHOICE,
  SPEC_FIELDS,
  TARGET_FIELDS,
} from './design-fields.ts';
import type { FieldSpec } from './field-spec.ts';
import { PART_FIELDS } from './part-fields.ts';
import { HEATSINK_FIELDS, thermalPathSpec } from './thermal-fields.ts';

export interface FieldName {
  label: string;
  /** The SI unit the field is entered in ('' for a plain number, null for text and choices). */
  unit: string | null;
}

/** "thermal.heatsinks[1].id" → ["thermal", "heatsinks", 1, "id"]. */
export function pathSegments(path: string): (string | number)[] {
  const out: (string | number)[] = [];
  for (const match of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) out.push(match[2] !== undefined ? Number(match[2]) : match[1]!);
  return out;
}

/** Finds a field by its key path inside a list of field descriptions (through unions and groups). */
export function findSpec(fields: readonly FieldSpec[], keys: readonly (string | number)[]): FieldName | null {
  const [head, ...rest] = keys;
  for (const field of fields) {
    if (field.key !== head) continue;
    if (rest.length === 0) return { label: field.label, unit: field.type === 'number' ? field.unit : null };
    if (field.type === 'group') return findSpec(field.fields, rest);
    if (field.type === 'table' && typeof rest[0] === 'number') {
      // One point of a curve table ("points[2].esrOhm"): the table, the point as numbered on screen, the column.
      const column = rest.length === 2 ? field.columns.find((c) => c.key === rest[1]) : undefined;
      if (rest.length === 1) return { label: `${field.label}, point ${rest[0] + 1}`, unit: null };
      if (column) return { label: `${field.label}, point ${rest[0] + 1}, ${column.label}`, unit: column.unit };
    }
    if (field.type === 'union') {
      for (const variant of field.variants) {
        const inner = findSpec(variant.fields, rest);
        if (inner) return inner;
      }
      if (rest.length === 1 && rest[0] === field.tag) return { label: field.label, unit: null };
    }
  }
  return null;
}

const isRole = (key: unknown): key is Role => typeof key === 'string' && (ROLES as readonly string[]).includes(key);

function within(section: string, found: FieldName | null): FieldName | null {
  return found ? { ...found, label: `${section} — ${found.label}` } : null;
}

/** The on-screen name of a design field, or null when the editor shows no field for that path. */
export function fieldName(path: string, design: Design): FieldName | null {
  const [root, ...rest] = pathSegments(path);
  switch (root) {
    case 'spec':
      return rest[0] === 'targets' ? within('Target', findSpec(TARGET_FIELDS, rest.slice(1))) : findSpec(SPEC_FIELDS, rest);
    case 'topology':
      return findSpec([KIND_CHOICE, RECTIFIER_CHOICE, LIGHT_LOAD_CHOICE, SENSE_CHOICE, ...DEAD_TIME_FIELDS], rest);
    case 'parts': {
      const role = rest[0];
      if (!isRole(role)) return null;
      if (rest[1] === 'count') return { label: `${ROLE_LABELS[role]} — Number in parallel`, unit: '' };
      const part = partInRole(design, role);
      const keys = rest.slice(partPath(role).length - 1);
      if (keys.length === 0 || !part) return { label: ROLE_LABELS[role], unit: null };
      const fields = PART_FIELDS[part.kind];
      return within(ROLE_LABELS[role], findSpec([...fields.identity, ...fields.values], keys));
    }
    case 'thermal': {
      const [group, which, ...keys] = rest;
      if (group === 'paths' && isRole(which)) {
        if (keys.length === 0) return { label: `Thermal path — ${ROLE_LABELS[which]}`, unit: null };
        return within(`Thermal path of the ${ROLE_LABELS[which].toLowerCase()}`, findSpec(thermalPathSpec(design.thermal.heatsinks).variants.flatMap((v) => v.fields), keys));
      }
      if (group === 'heatsinks' && typeof which === 'number') {
        const sink = design.thermal.heatsinks[which];
        return within(`Heatsink “${sink?.name ?? which + 1}”`, findSpec(HEATSINK_FIELDS, keys));
      }
      if (group === 'touch' && isRole(which)) return { label: `Touch — ${ROLE_LABELS[which]}`, unit: null };
      if (group === 'contact') return { label: CONTACT_CHOICE.label, unit: null };
      return null;
    }
    case 'margins':
      return findSpec(MARGIN_FIELDS, rest);
    default:
      return findSpec(IDENTITY_FIELDS, [root!, ...rest]);
  }
}
