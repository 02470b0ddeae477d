/**
 * Test generator: every number field of a generated JSON Schema (draft 2020-12 keywords, read here
 * independently of zod), its bounds, and a document that holds the field with a chosen value.
 * A new field in the zod schema appears in the JSON Schema and so in these lists without a hand edit.
 */
import type { Json } from './fixtures.ts';

export type JsonSchema = Record<string, unknown>;
export type Key = string | number;

/** The option of a oneOf chosen on the way to a field: where, and the option's schema. */
export interface Choice {
  keys: Key[];
  option: JsonSchema;
}

export interface NumberField {
  keys: Key[];
  /** "parts.inputCapacitor.part.capacitanceF", "thermal.heatsinks[0].thetaSaKPerW". */
  path: string;
  choices: Choice[];
  schema: JsonSchema;
}

export const dotted = (keys: readonly Key[]): string =>
  keys.reduce<string>((out, k) => (typeof k === 'number' ? `${out}[${k}]` : out === '' ? k : `${out}.${k}`), '');

const isSchema = (v: unknown): v is JsonSchema => typeof v === 'object' && v !== null && !Array.isArray(v);
const props = (s: JsonSchema): Record<string, JsonSchema> => (isSchema(s.properties) ? (s.properties as Record<string, JsonSchema>) : {});

/** Every number or integer field (constants such as "version" excepted), each union option walked. */
export function numberFields(schema: JsonSchema, keys: Key[] = [], choices: Choice[] = []): NumberField[] {
  if ((schema.type === 'number' || schema.type === 'integer') && !('const' in schema))
    return [{ keys, path: dotted(keys), choices, schema }];
  if (Array.isArray(schema.oneOf))
    return (schema.oneOf as JsonSchema[]).flatMap((option) => numberFields(option, keys, [...choices, { keys, option }]));
  const out: NumberField[] = [];
  for (const [k, v] of Object.entries(props(schema))) out.push(...numberFields(v, [...keys, k], choices));
  if (isSchema(schema.items)) out.push(...numberFields(schema.items, [...keys, 0], choices));
  const names = isSchema(schema.propertyNames) && Array.isArray(schema.propertyNames.enum) ? (schema.propertyNames.enum as string[]) : [];
  if (isSchema(schema.additionalProperties) && names[0] !== undefined)
    out.push(...numberFields(schema.additionalProperties, [...keys, names[0]], choices));
  return out;
}

/** Fields that lack a lower or an upper bound, as sentences (empty: every number is bounded). */
export function unboundedFields(fields: readonly NumberField[]): string[] {
  const out: string[] = [];
  for (const f of fields) {
    if (typeof f.schema.minimum !== 'number' && typeof f.schema.exclusiveMinimum !== 'number') out.push(`${f.path}: no lower bound`);
    if (typeof f.schema.maximum !== 'number' && typeof f.schema.exclusiveMaximum !== 'number') out.push(`${f.path}: no upper bound`);
  }
  return out;
}

const step = (x: number): number => (x === 0 ? 1e-9 : Math.abs(x) * 1e-6);

/** Values just inside and just outside each bound of a field. */
export function edgeValues(s: JsonSchema): { inside: number[]; outside: number[] } {
  const whole = s.type === 'integer';
  const below = (x: number): number => (whole ? x - 1 : x - step(x));
  const above = (x: number): number => (whole ? x + 1 : x + step(x));
  const inside: number[] = [];
  const outside: number[] = [];
  const add = (inValue: number, outValue: number): void => {
    inside.push(inValue);
    outside.push(outValue);
  };
  if (typeof s.minimum === 'number') add(s.minimum, below(s.minimum));
  if (typeof s.exclusiveMinimum === 'number') add(above(s.exclusiveMinimum), s.exclusiveMinimum);
  if (typeof s.maximum === 'number') add(s.maximum, above(s.maximum));
  if (typeof s.exclusiveMaximum === 'number') add(below(s.exclusiveMaximum), s.exclusiveMaximum);
  return { inside, outside };
}

/** A value the schema accepts, made from its keywords alone (numbers in the middle of their range). */
export function sampleOf(s: JsonSchema): unknown {
  if ('const' in s) return s.const;
  if (Array.isArray(s.enum)) return s.enum[0];
  if (Array.isArray(s.oneOf)) return sampleOf(s.oneOf[0] as JsonSchema);
  switch (s.type) {
    case 'number':
    case 'integer': {
      const lo = (s.minimum ?? s.exclusiveMinimum ?? 0) as number;
      const hi = (s.maximum ?? s.exclusiveMaximum ?? lo + 2) as number;
      const mid = lo > 0 ? Math.sqrt(lo * hi) : (lo + hi) / 2;
      return s.type === 'integer' ? Math.round(mid) : mid;
    }
    case 'string':
      return 'x'.repeat(Math.max(1, (s.minLength as number | undefined) ?? 1));
    case 'boolean':
      return false;
    case 'array':
      return [];
    case 'object': {
      const out: Json = {};
      for (const k of (s.required ?? []) as string[]) out[k] = sampleOf(props(s)[k] ?? {});
      return out;
    }
    default:
      return null;
  }
}

/** The constants an option fixes (its discriminator), e.g. { kind: "diode" }. */
function constantsOf(option: JsonSchema): [string, unknown][] {
  return Object.entries(props(option)).filter(([, v]) => 'const' in v).map(([k, v]) => [k, v.const]);
}

const sameKeys = (a: readonly Key[], b: readonly Key[]): boolean => a.length === b.length && a.every((k, i) => k === b[i]);

/**
 * A copy of `base` in which the field holds `value`. Containers on the way that are missing, or that are
 * another option of a oneOf than the field's, are replaced by samples of the schema (so only the field
 * itself can be out of range).
 */
export function documentWith(root: JsonSchema, base: unknown, field: NumberField, value: number): Json {
  const doc = structuredClone(base) as Json;
  let node: Record<Key, unknown> = doc;
  let schema = root;
  for (let i = 0; i < field.keys.length; i += 1) {
    const key = field.keys[i] as Key;
    const here = field.keys.slice(0, i + 1);
    const chosen = field.choices.find((c) => sameKeys(c.keys, field.keys.slice(0, i)));
    if (chosen) schema = chosen.option;
    const child = typeof key === 'number' ? (schema.items as JsonSchema) : (props(schema)[key] ?? (schema.additionalProperties as JsonSchema));
    if (i === field.keys.length - 1) {
      node[key] = value;
      break;
    }
    const option = field.choices.find((c) => sameKeys(c.keys, here))?.option;
    const current = node[key];
    const fits = isSchema(current) || Array.isArray(current)
      ? option === undefined || constantsOf(option).every(([k, v]) => (current as Json)[k] === v)
      : false;
    if (!fits) node[key] = sampleOf(option ?? child);
    node = node[key] as Record<Key, unknown>;
    schema = child;
  }
  return doc;
}
