import { readFileSync } from 'node:fs';
import nodePath from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, DEMO_PARTS_LIBRARY, designJsonSchema } from '../../../shared-model/index.ts';
import { SCHEMA_DIR, schemaFiles } from '../../../src-main/dev/write-schema.ts';
import { demoWith } from './fixtures.ts';

type Schema = Record<string, unknown>;

/**
 * A small checker for the JSON Schema 2020-12 keywords the generated files use (JSON Schema Validation
 * draft 2020-12 §6.1–§6.5 and Core §10.2–§10.3), written here independently of zod.
 */
function errors(schema: Schema, value: unknown, path = '$'): string[] {
  const out: string[] = [];
  const t = schema.type;
  const typeOk =
    t === undefined ||
    (t === 'object' && typeof value === 'object' && value !== null && !Array.isArray(value)) ||
    (t === 'array' && Array.isArray(value)) ||
    (t === 'string' && typeof value === 'string') ||
    (t === 'boolean' && typeof value === 'boolean') ||
    (t === 'number' && typeof value === 'number' && Number.isFinite(value)) ||
    (t === 'integer' && Number.isInteger(value));
  if (!typeOk) return [`${path}: not ${String(t)}`];
  if ('const' in schema && value !== schema.const) out.push(`${path}: not const`);
  if (Array.isArray(schema.enum) && !schema.enum.includes(value)) out.push(`${path}: not in enum`);
  if (typeof value === 'number') {
    if (typeof schema.minimum === 'number' && value < schema.minimum) out.push(`${path}: < minimum`);
    if (typeof schema.maximum === 'number' && value > schema.maximum) out.push(`${path}: > maximum`);
    if (typeof schema.exclusiveMinimum === 'number' && value <= schema.exclusiveMinimum) out.push(`${path}: ≤ exclusiveMinimum`);
    if (typeof schema.exclusiveMaximum === 'number' && value >= schema.exclusiveMaximum) out.push(`${path}: ≥ exclusiveMaximum`);
  }
  if (typeof value === 'string') {
    if (typeof schema.minLength === 'number' && [...value].length < schema.minLength) out.push(`${path}: too short`);
    if (typeof schema.maxLength === 'number' && [...value].length > schema.maxLength) out.push(`${path}: too long`);
  }
  if (Array.isArray(value)) {
    if (typeof schema.maxItems === 'number' && value.length > schema.maxItems) out.push(`${path}: too many items`);
    if (schema.items) value.forEach((v, i) => out.push(...errors(schema.items as Schema, v, `${path}[${i}]`)));
  }
  if (typeof value === 'object' && value !== null && !Array.isArray(value)) {
    const obj = value as Record<string, unknown>;
    const props = (schema.properties ?? {}) as Record<string, Schema>;
    for (const key of (schema.required ?? []) as string[]) if (!(key in obj)) out.push(`${path}.${key}: required`);
    for (const [key, v] of Object.entries(obj)) {
      if (props[key]) out.push(...errors(props[key], v, `${path}.${key}`));
      else if (schema.additionalProperties === false) out.push(`${path}.${key}: not allowed`);
      else if (typeof schema.additionalProperties === 'object') out.push(...errors(schema.additionalProperties as Schema, v, `${path}.${key}`));
      if (schema.propertyNames) out.push(...errors(schema.propertyNames as Schema, key, `${path}.${key} (name)`));
    }
  }
  if (Array.isArray(schema.oneOf)) {
    const passing = (schema.oneOf as Schema[]).filter((s) => errors(s, value, path).length === 0).length;
    if (passing !== 1) out.push(`${path}: matches ${passing} of oneOf`);
  }
  return out;
}

describe('the JSON Schemas in assets/schema/', () => {
  it.each(schemaFiles().map((f) => [f.file, f.text] as const))('%s equals a fresh generation (run "npm run schema" after a schema change)', (file, text) => {
    expect(readFileSync(nodePath.join(SCHEMA_DIR, file), 'utf8')).toBe(text);
  });

  it('accepts every demo design and the parts library (JSON Schema 2020-12 semantics)', () => {
    const [design, parts] = schemaFiles().map((f) => JSON.parse(f.text) as Schema);
    for (const d of DEMO_DESIGNS) expect(errors(design as Schema, d.json), d.id).toEqual([]);
    expect(errors(parts as Schema, DEMO_PARTS_LIBRARY)).toEqual([]);
  });

  it('refuses out-of-range, wrong-type and unknown fields like the validator does', () => {
    const schema = designJsonSchema();
    expect(errors(schema, demoWith('synchronous-buck', { 'spec.maxDuty': 1 }))).toEqual(['$.spec.maxDuty: ≥ exclusiveMaximum']);
    expect(errors(schema, demoWith('synchronous-buck', { 'spec.vinMinV': '10.8' }))).toEqual(['$.spec.vinMinV: not number']);
    expect(errors(schema, demoWith('synchronous-buck', { 'topology.kind': 'flyback' }))).toEqual(['$.topology.kind: not in enum']);
    expect(errors(schema, demoWith('synchronous-buck', { 'spec.extra': 1 }))).toEqual(['$.spec.extra: not allowed']);
  });

  it('is draft 2020-12 and says where it comes from', () => {
    const schema = designJsonSchema();
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema'); // JSON Schema Core 2020-12 §8.1.1 meta-schema URI
    expect(schema.description).toContain('npm run schema');
  });
});
