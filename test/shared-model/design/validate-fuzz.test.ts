import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, parseDesignText, validateDesign } from '../../../shared-model/index.ts';
import type { Json } from './fixtures.ts';

const SEED = 7_2024;

/** Dotted paths of every leaf (number, string, boolean) of a JSON tree; list items as numeric keys. */
function leaves(doc: unknown, prefix: string[] = []): string[][] {
  if (doc !== null && typeof doc === 'object')
    return Object.entries(doc).flatMap(([k, v]) => leaves(v, [...prefix, k]));
  return [prefix];
}

function setAt(doc: Json, path: readonly string[], value: unknown): void {
  let here = doc as Record<string, unknown>;
  for (const key of path.slice(0, -1)) here = here[key] as Record<string, unknown>;
  const last = path[path.length - 1] as string;
  if (value === undefined) delete here[last];
  else here[last] = value;
}

const BAD_VALUES: readonly unknown[] = [
  Number.NaN,
  Number.POSITIVE_INFINITY,
  Number.NEGATIVE_INFINITY,
  -1,
  0,
  -1e300,
  1e300,
  '12',
  '',
  null,
  [],
  {},
  true,
  undefined,
];

function checkShape(result: ReturnType<typeof validateDesign>): void {
  if (result.ok) return;
  expect(result.problems.length).toBeGreaterThan(0);
  for (const p of result.problems) {
    expect(typeof p.path).toBe('string');
    expect(p.allowed.length).toBeGreaterThan(0);
    expect(p.message.length).toBeGreaterThan(0);
    if (p.path !== '') expect(p.message, p.message).toContain(p.path.replace(/\[\d+\]$/, '')); // team brief rule 6: the message names the field
  }
}

describe('validateDesign never throws and always explains (fast-check, seeded)', () => {
  it('answers any JSON value with a typed result', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (json) => checkShape(validateDesign(json))),
      { seed: SEED, numRuns: 500 },
    );
  });

  it('answers any JavaScript value, including NaN, Infinity, undefined, symbols and functions', () => {
    fc.assert(
      fc.property(fc.anything({ withBigInt: true, withMap: true, withSet: true, withTypedArray: true }), (value) =>
        checkShape(validateDesign(value)),
      ),
      { seed: SEED, numRuns: 500 },
    );
  });

  it('refuses a demo with any leaf set to a bad value when that value is non-finite, and never throws', () => {
    const docs = DEMO_DESIGNS.map((d) => d.json as Json);
    const arbitrary = fc
      .integer({ min: 0, max: docs.length - 1 })
      .chain((i) => {
        const paths = leaves(docs[i]);
        return fc.record({
          index: fc.constant(i),
          changes: fc.array(fc.record({ path: fc.constantFrom(...paths), value: fc.constantFrom(...BAD_VALUES) }), { minLength: 1, maxLength: 4 }),
        });
      });
    fc.assert(
      fc.property(arbitrary, ({ index, changes }) => {
        const doc = structuredClone(docs[index]) as Json;
        for (const c of changes) setAt(doc, c.path, c.value);
        const result = validateDesign(doc);
        checkShape(result);
        const nonFinite = changes.some((c) => typeof c.value === 'number' && !Number.isFinite(c.value));
        if (nonFinite) expect(result.ok).toBe(false); // issue 2: non-finite numbers are refused on load
      }),
      { seed: SEED, numRuns: 600 },
    );
  });

  it('answers any text given as a file', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), (text) => {
        const r = parseDesignText(text);
        expect(r.ok).toBe(false);
        checkShape(r);
      }),
      { seed: SEED, numRuns: 300 },
    );
  });
});
