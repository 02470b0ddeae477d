/**
 * The canonical text of a design document: the one byte sequence every route that writes a design
 * produces (the app's Save, the shipped demo files, the report's hash), so the same design always hashes
 * the same.
 *
 * Canonical text of a design D (UTF-8, no byte-order mark):
 *   - the JSON text of D as ECMA-262 JSON.stringify writes it with a two-space indent: numbers in
 *     ECMAScript's shortest round-trip form (Number::toString: 2e-8, 450000, 0.0047), strings escaped
 *     only where JSON requires (non-ASCII characters are written as themselves), LF line ends;
 *   - every object's keys in the order the schema declares them (design/schema.ts, design/parts.ts; a
 *     discriminated union uses the shape of the option its discriminator names), array items in their
 *     given order; keys the schema does not know (an invalid draft only) follow, sorted by UTF-16 code
 *     units as in RFC 8785;
 *   - one final LF.
 * A valid design is first passed through validateDesign, so defaults and migrations are applied and
 * unknown keys are gone: two files that read as the same design have the same canonical text.
 */
import type { Schema } from './zod-problems.ts';
import { defOf, pickOption, unwrap } from './zod-problems.ts';

function ordered(value: unknown, schema: Schema | undefined): unknown {
  if (Array.isArray(value)) {
    const element = schema ? unwrap(schema) : undefined;
    const itemSchema = element && defOf(element).type === 'array' ? (defOf(element).element as Schema) : undefined;
    return value.map((item) => ordered(item, itemSchema));
  }
  if (value === null || typeof value !== 'object') return value;
  let s = schema ? unwrap(schema) : undefined;
  if (s && defOf(s).type === 'union') s = pickOption(s, value);
  const shape = s && defOf(s).type === 'object' ? (defOf(s).shape as Record<string, Schema>) : {};
  const record = value as Record<string, unknown>;
  const known = Object.keys(shape).filter((key) => Object.hasOwn(record, key));
  const unknown = Object.keys(record)
    .filter((key) => !Object.hasOwn(shape, key))
    .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const out: Record<string, unknown> = {};
  // defineProperty, not assignment: a key named "__proto__" stays an ordinary key.
  for (const key of [...known, ...unknown])
    Object.defineProperty(out, key, { value: ordered(record[key], Object.hasOwn(shape, key) ? shape[key] : undefined), enumerable: true, writable: true, configurable: true });
  return out;
}

/** The value with every object's keys in canonical order (see the header). */
export function canonicalOrder(value: unknown, schema: Schema): unknown {
  return ordered(value, schema);
}
