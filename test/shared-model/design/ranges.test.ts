import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import type { Problem } from '../../../shared-model/index.ts';
import {
  DEMO_DESIGNS,
  DEMO_PARTS_LIBRARY,
  describeValue,
  designJsonSchema,
  parseEngineering,
  partsLibraryJsonSchema,
  unitOfPath,
  validateDesign,
  validatePartsLibrary,
} from '../../../shared-model/index.ts';
import type { JsonSchema, NumberField } from './json-schema-numbers.ts';
import { documentWith, edgeValues, numberFields, unboundedFields } from './json-schema-numbers.ts';

const designSchema = designJsonSchema();
const librarySchema = partsLibraryJsonSchema();
const designFields = numberFields(designSchema);
const libraryFields = numberFields(librarySchema);
const base = DEMO_DESIGNS.find((d) => d.id === 'synchronous-buck')?.json;

const problemsOf = (r: { ok: true } | { ok: false; problems: Problem[] }): Problem[] => (r.ok ? [] : r.problems);

/** The bounds an "allowed" text states ("1 nH ≤ inductanceH ≤ 1 H"), read back with engineering entry. */
function statedBounds(allowed: string, unit: string): { lo?: [number, string]; hi?: [number, string] } {
  const parts = allowed.replace(/^a whole number, /, '').split(/ ([≤<]) /);
  const read = (text: string | undefined): number => {
    const r = parseEngineering(text ?? '', unit);
    return r.ok ? r.value : Number.NaN;
  };
  if (parts.length === 5) return { lo: [read(parts[0]), parts[1] ?? ''], hi: [read(parts[4]), parts[3] ?? ''] };
  return {};
}

/** Checks a refused edge value: the problem names the field, the value and a range stating the schema's bounds. */
function expectRefusal(problems: Problem[], field: NumberField, value: number): void {
  const p = problems.find((x) => x.path === field.path);
  expect(p, `${field.path} = ${value} was not refused; got ${JSON.stringify(problems.map((x) => x.path))}`).toBeDefined();
  if (!p) return;
  const unit = unitOfPath(field.path);
  expect(p.value).toBe(value);
  expect(p.message).toContain(field.path); // team rules, Tests: the message names the field…
  expect(p.message).toContain(describeValue(value, unit)); // …the value…
  const { lo, hi } = statedBounds(p.allowed, unit); // …and the allowed range, with the schema's own bounds
  const s = field.schema;
  const min = (s.minimum ?? s.exclusiveMinimum) as number;
  const max = (s.maximum ?? s.exclusiveMaximum) as number;
  expect(lo?.[0], p.allowed).toBeCloseTo(min, 12);
  expect(lo?.[1], p.allowed).toBe(typeof s.exclusiveMinimum === 'number' ? '<' : '≤');
  expect(Math.abs((hi?.[0] ?? Number.NaN) - max) / Math.max(1, Math.abs(max)), p.allowed).toBeLessThan(1e-9);
  expect(hi?.[1], p.allowed).toBe(typeof s.exclusiveMaximum === 'number' ? '<' : '≤');
  expect(p.message).toContain(p.allowed);
}

/** The schema refusal reads "<path> is <value>; allowed: …"; a cross-field rule on the same field reads otherwise. */
const rangeRefusal = (problems: Problem[], field: NumberField): Problem | undefined =>
  problems.find((x) => x.path === field.path && x.message.startsWith(`${field.path} is `));

describe('every number of the design document and the parts library has a lower and an upper bound', () => {
  it('design document: no number without both bounds in the JSON Schema', () => {
    // every union option is walked: both rectifier kinds, all three thermal paths, every core-loss and winding model
    expect(designFields.map((f) => f.path)).toEqual(expect.arrayContaining([
      'parts.rectifier.vf0V', 'parts.rectifier.rdsOn25Ohm', 'thermal.paths.switch.riseK', 'thermal.paths.switch.thetaCsKPerW',
      'parts.inductor.coreLoss.k', 'parts.inductor.coreLoss.lossWPerM3', 'parts.inductor.acWinding.porosity',
      'parts.switch.outputCapacitance.eossJ', 'thermal.customTouchLimits[0].limitC', 'parts.inputCapacitor.part.life.ratedHours',
    ]));
    expect(unboundedFields(designFields)).toEqual([]);
  });

  it('parts library: no number without both bounds in the JSON Schema', () => {
    expect(libraryFields.map((f) => f.path)).toEqual(expect.arrayContaining(['parts[0].vdsRatingV', 'parts[0].vf0V', 'parts[0].inductanceH', 'parts[0].esrOhm', 'parts[0].resistanceOhm', 'parts[0].driveV']));
    expect(unboundedFields(libraryFields)).toEqual([]);
  });

  it('the generator names a field without bounds, wherever it sits (so a new unbounded field fails the tests above)', () => {
    const schema: JsonSchema = {
      type: 'object',
      properties: {
        a: { type: 'number', minimum: 0 },
        b: { oneOf: [{ type: 'object', properties: { kind: { type: 'string', const: 'x' }, c: { type: 'number' } } }] },
        list: { type: 'array', items: { type: 'object', properties: { d: { type: 'integer', maximum: 3 } } } },
        version: { type: 'number', const: 1 },
      },
    };
    expect(unboundedFields(numberFields(schema))).toEqual(['a: no upper bound', 'b.c: no lower bound', 'b.c: no upper bound', 'list[0].d: no lower bound']);
    // and a zod field added without a range shows up through the generated JSON Schema too
    const added = z.toJSONSchema(z.object({ spec: z.object({ newThingV: z.number() }) })) as JsonSchema;
    expect(unboundedFields(numberFields(added))).toEqual(['spec.newThingV: no lower bound', 'spec.newThingV: no upper bound']);
  });

  it('every bound says why in the JSON Schema description', () => {
    const silent = [...designFields, ...libraryFields].filter((f) => typeof f.schema.description !== 'string' || !/(common practice|our own rule|fraction)/.test(f.schema.description));
    expect(silent.map((f) => f.path)).toEqual([]);
  });
});

describe('design document: a value just inside each bound passes the range, one just outside is refused naming field, value and range', () => {
  it.each(designFields.map((f) => [f.path, f] as const))('%s', (_path, field) => {
    const { inside, outside } = edgeValues(field.schema);
    for (const v of outside) expectRefusal(problemsOf(validateDesign(documentWith(designSchema, base, field, v))), field, v);
    for (const v of inside) expect(rangeRefusal(problemsOf(validateDesign(documentWith(designSchema, base, field, v))), field), `${field.path} = ${v}`).toBeUndefined();
  });
});

describe('parts library: a value just inside each bound passes, one just outside is refused naming field, value and range', () => {
  it.each(libraryFields.map((f) => [f.path, f] as const))('%s', (_path, field) => {
    const { inside, outside } = edgeValues(field.schema);
    for (const v of outside) expectRefusal(problemsOf(validatePartsLibrary(documentWith(librarySchema, DEMO_PARTS_LIBRARY, field, v))), field, v);
    for (const v of inside) expect(rangeRefusal(problemsOf(validatePartsLibrary(documentWith(librarySchema, DEMO_PARTS_LIBRARY, field, v))), field)).toBeUndefined();
  });
});
