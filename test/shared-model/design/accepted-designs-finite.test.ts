/**
 * Property (fast-check, seeded): any design the validator accepts, at any condition override it accepts,
 * evaluates with every number finite — the record of `evaluate` and the points of `sweepLoad`. Designs are
 * the demos with one to three numbers moved anywhere in their ranges (to an edge, anywhere on a log
 * scale, or within a factor of 100 of the demo's value); most land outside the cross-field rules and are
 * refused, the rest must evaluate. A modest number of cases: the heavy property suite is the engine's
 * (test/shared-model/ledger/properties.test.ts).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ConditionOverrides } from '../../../shared-model/index.ts';
import {
  checkConditionOverrides,
  CONDITION_RANGES,
  DEMO_DESIGNS,
  designJsonSchema,
  evaluate,
  sweepLoad,
  validateDesign,
} from '../../../shared-model/index.ts';
import type { NumberField } from './json-schema-numbers.ts';
import { documentWith, edgeValues, numberFields } from './json-schema-numbers.ts';

const SEED = 10_6;
const schema = designJsonSchema();
const fields = numberFields(schema);

/** Every number in `value` that is not finite, as "path = value". */
function nonFinite(value: unknown, path = '$'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
}

/**
 * Known engine defects this property finds, left to their owners (each must be removed from this list
 * when fixed; the tally below prints how often each was met). Empty: the runaway heatsink reading
 * −Infinity and the collapsed boost's infinite output pole were fixed under issue 10 §5.
 */
const KNOWN_DEFECTS: readonly RegExp[] = [];
const known = new Map<string, number>();
function unexpected(found: string[]): string[] {
  return found.filter((f) => {
    const hit = KNOWN_DEFECTS.find((k) => k.test(f));
    if (hit) known.set(hit.source, (known.get(hit.source) ?? 0) + 1);
    return hit === undefined;
  });
}

/** A position t in [0, 1] inside [lo, hi]: logarithmic where both are positive, linear otherwise. */
function within(lo: number, hi: number, t: number): number {
  return lo > 0 ? lo * (hi / lo) ** t : lo + (hi - lo) * t;
}

function bounds(f: NumberField): [number, number] {
  const { inside } = edgeValues(f.schema);
  return [Math.min(...inside), Math.max(...inside)];
}

type Move = { kind: 'edge'; which: 0 | 1 } | { kind: 'anywhere'; t: number } | { kind: 'near'; decades: number };

function valueFor(f: NumberField, base: unknown, move: Move): number {
  const [lo, hi] = bounds(f);
  let v: number;
  if (move.kind === 'edge') v = move.which === 0 ? lo : hi;
  else if (move.kind === 'anywhere') v = within(lo, hi, move.t);
  else {
    let here: unknown = base;
    for (const k of f.keys) here = here !== null && typeof here === 'object' ? (here as Record<string | number, unknown>)[k] : undefined;
    const own = typeof here === 'number' && here !== 0 ? here : within(lo, hi, 0.5);
    v = Math.min(hi, Math.max(lo, own * 10 ** move.decades));
  }
  return f.schema.type === 'integer' ? Math.round(v) : v;
}

const move: fc.Arbitrary<Move> = fc.oneof(
  fc.record({ kind: fc.constant('edge' as const), which: fc.constantFrom(0 as const, 1 as const) }),
  fc.record({ kind: fc.constant('anywhere' as const), t: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('near' as const), decades: fc.double({ min: -2, max: 2, noNaN: true }) }),
);

const position = fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { freq: 2 });

const cases = fc.record({
  demo: fc.integer({ min: 0, max: DEMO_DESIGNS.length - 1 }),
  changes: fc.array(fc.record({ field: fc.constantFrom(...fields), move }), { minLength: 1, maxLength: 3 }),
  vin: position,
  load: position,
  fs: position,
  ambient: position,
  sweep: fc.boolean(),
});

function overridesOf(c: { vin: number | null; load: number | null; fs: number | null; ambient: number | null }): ConditionOverrides {
  const r = CONDITION_RANGES;
  const o: ConditionOverrides = {};
  if (c.vin !== null) o.vinV = within(r.vinV.min ?? 0, r.vinV.max ?? 0, c.vin);
  if (c.load !== null) o.loadA = c.load < 0.05 ? 0 : within(1e-3, r.loadA.max ?? 0, c.load);
  if (c.fs !== null) o.switchingFrequencyHz = within(r.switchingFrequencyHz.min ?? 0, r.switchingFrequencyHz.max ?? 0, c.fs);
  if (c.ambient !== null) o.ambientC = within(r.ambientC.min ?? 0, r.ambientC.max ?? 0, c.ambient);
  return o;
}

describe('any design and override the validator accepts evaluates with every number finite (fast-check, seeded)', () => {
  it('evaluate and sweepLoad return finite numbers for accepted designs; the rest are refused with problems', () => {
    const tally = { accepted: 0, refused: 0, overridesRefused: 0, evaluated: 0, swept: 0 };
    fc.assert(
      fc.property(cases, (c) => {
        const base = DEMO_DESIGNS[c.demo]?.json;
        let doc = structuredClone(base) as Record<string, unknown>;
        for (const { field, move: m } of c.changes) doc = documentWith(schema, doc, field, valueFor(field, doc, m));
        const checked = validateDesign(doc);
        if (!checked.ok) {
          tally.refused += 1;
          expect(checked.problems.length).toBeGreaterThan(0);
          return;
        }
        tally.accepted += 1;
        let overrides = overridesOf(c);
        if (checkConditionOverrides(checked.design, overrides).length > 0) {
          tally.overridesRefused += 1;
          overrides = {};
        }
        const e = evaluate(checked.design, overrides);
        tally.evaluated += 1;
        expect(unexpected(nonFinite(e)), JSON.stringify({ changes: c.changes.map((x) => [x.field.path, valueFor(x.field, base, x.move)]), overrides })).toEqual([]);
        if (c.sweep) {
          const { vinV, switchingFrequencyHz, ambientC } = overrides;
          const s = sweepLoad(checked.design, { points: 6, conditions: { vinV, switchingFrequencyHz, ambientC } });
          tally.swept += 1;
          expect(unexpected(nonFinite(s)), JSON.stringify({ changes: c.changes.map((x) => x.field.path), overrides })).toEqual([]);
        }
      }),
      { seed: SEED, numRuns: 400 },
    );
    if (known.size > 0) console.info('known engine defects met (see KNOWN_DEFECTS):', Object.fromEntries(known));
    // the property is not vacuous: a good share of the cases were accepted, evaluated and swept
    expect(tally.evaluated).toBeGreaterThan(60);
    expect(tally.swept).toBeGreaterThan(25);
    expect(tally.refused).toBeGreaterThan(20);
  });
});
