/**
 * Condition overrides (an input voltage, load, switching frequency or ambient given at evaluation time,
 * by the command line or the app) pass the same gate as the design file:
 *   1. the range of the design field they stand for, read from the schema (spec.vinNomV, spec.ratedLoadA
 *      from no load up, spec.switchingFrequencyHz, spec.ambientC), so an override can never reach a value
 *      the file itself could not hold;
 *   2. the rules that say where the models stop meaning anything (rules-validity.ts and the dead-time rule
 *      of rules-spec.ts), applied to the design with the overridden input voltage (the input range widened
 *      to include it) and frequency. An evaluation outside the specified input range is a fair question
 *      (the result says the converter cannot regulate), so only the validity rules apply, not the order or
 *      direction of the specified inputs. Where a rule refuses, the valid range of the override is found by
 *      bisection between the design's own value (valid) and the override (refused).
 * Every problem names the override by its on-screen label and path ("Input voltage (conditions.vinV)"), its
 * value and the range that would be valid.
 */
import type { Problem } from './problems.ts';
import { describeValue, inUnit, problem } from './problems.ts';
import type { NumberRange } from './number-range.ts';
import { inRange, numberRangeOf, rangeText } from './number-range.ts';
import { unitOfKey } from './key-units.ts';
import { deadTimeRule } from './rules-spec.ts';
import { validityRules } from './rules-validity.ts';
import { labelProblems } from './labelled-problems.ts';
import { CONDITION_LABELS, designFieldLabel } from './field-labels.ts';
import type { Design } from './schema.ts';
import { designSchema } from './schema.ts';
import { schemaAt, unwrap } from './zod-problems.ts';

/** The conditions an evaluation may override (the engine's Conditions, each optional). */
export interface ConditionOverrides {
  vinV?: number;
  loadA?: number;
  switchingFrequencyHz?: number;
  ambientC?: number;
}

export type ConditionKey = keyof ConditionOverrides;

/** A range with the design field it comes from and the unit of its numbers. */
export interface FieldRange extends NumberRange {
  /** The design-document field whose range this is, e.g. "spec.vinNomV". */
  field: string;
  /** The on-screen label of what the range is for ("Input voltage, nominal"; an override: "Input voltage"). */
  label: string;
  unit: string;
}

/** The range of a number field of the design document, read from the schema ("spec.vinNomV"). */
export function designFieldRange(path: string): FieldRange {
  const keys = path.split('.');
  const schema = schemaAt(designSchema, keys, undefined);
  const range = schema ? numberRangeOf(unwrap(schema)) : undefined;
  if (!range) throw new Error(`${path} is not a number field of the design document`);
  return { ...range, field: path, label: designFieldLabel(path, undefined) ?? path, unit: unitOfKey(keys[keys.length - 1] ?? '') };
}

/** The allowed range of each override: its design field's range; a load may also be zero (no load). */
export const CONDITION_RANGES: Readonly<Record<ConditionKey, FieldRange>> = {
  vinV: { ...designFieldRange('spec.vinNomV'), label: CONDITION_LABELS.vinV },
  loadA: { ...designFieldRange('spec.ratedLoadA'), label: CONDITION_LABELS.loadA, min: 0, minInclusive: true },
  switchingFrequencyHz: { ...designFieldRange('spec.switchingFrequencyHz'), label: CONDITION_LABELS.switchingFrequencyHz },
  ambientC: { ...designFieldRange('spec.ambientC'), label: CONDITION_LABELS.ambientC },
};

const KEYS: readonly ConditionKey[] = ['vinV', 'loadA', 'switchingFrequencyHz', 'ambientC'];

/** The design as a plain document with the input voltage and frequency overridden (input range widened). */
function withOverrides(design: Design, o: ConditionOverrides): unknown {
  const spec = { ...design.spec };
  if (o.vinV !== undefined) {
    spec.vinNomV = o.vinV;
    spec.vinMinV = Math.min(spec.vinMinV, o.vinV);
    spec.vinMaxV = Math.max(spec.vinMaxV, o.vinV);
  }
  if (o.switchingFrequencyHz !== undefined) spec.switchingFrequencyHz = o.switchingFrequencyHz;
  return { ...design, spec };
}

const validityProblems = (design: Design, o: ConditionOverrides): Problem[] => {
  const doc = withOverrides(design, o);
  return [...validityRules(doc), ...deadTimeRule(doc)];
};

/** The valid end between the design's own value `good` and the refused override `bad`, by bisection in log scale. */
function validEdge(design: Design, key: 'vinV' | 'switchingFrequencyHz', good: number, bad: number): number {
  let lo = Math.log(good);
  let hi = Math.log(bad);
  for (let i = 0; i < 60; i += 1) {
    const mid = (lo + hi) / 2;
    if (validityProblems(design, { [key]: Math.exp(mid) }).length === 0) lo = mid;
    else hi = mid;
  }
  return Math.exp(lo);
}

function validityOf(design: Design, key: 'vinV' | 'switchingFrequencyHz', value: number): Problem | undefined {
  const found = validityProblems(design, { [key]: value });
  if (found.length === 0) return undefined;
  const own = key === 'vinV' ? design.spec.vinNomV : design.spec.switchingFrequencyHz;
  const edge = validEdge(design, key, own, value);
  const path = `conditions.${key}`;
  const allowed = `${path} ${value > own ? '≤' : '≥'} ${inUnit(edge, path)} for this design`;
  return problem(path, value, allowed,
    `${path} (${inUnit(value, path)}) takes this design where the models mean nothing: ${found.map((p) => p.message).join(' ')} With this design the override must be ${value > own ? 'at most' : 'at least'} ${inUnit(edge, path)}; allowed: ${allowed}.`);
}

/**
 * Every problem with the given overrides of a valid design: ranges first; then, for an input voltage or
 * frequency in range, the validity rules at that value (each override alone, then together).
 */
export function checkConditionOverrides(design: Design, o: ConditionOverrides): Problem[] {
  return labelProblems(overrideProblems(design, o), design);
}

function overrideProblems(design: Design, o: ConditionOverrides): Problem[] {
  const out: Problem[] = [];
  for (const key of KEYS) {
    const value = o[key];
    const range = CONDITION_RANGES[key];
    if (value !== undefined && !inRange(value, range)) {
      const path = `conditions.${key}`;
      const allowed = rangeText(range, path, range.unit);
      out.push(problem(path, value, allowed, `${path} is ${describeValue(value, range.unit)}; allowed: ${allowed} (the range of ${range.field} in a design).`));
    }
  }
  if (out.length > 0) return out;
  for (const key of ['vinV', 'switchingFrequencyHz'] as const) {
    const value = o[key];
    const found = value === undefined ? undefined : validityOf(design, key, value);
    if (found) out.push(found);
  }
  if (out.length === 0 && o.vinV !== undefined && o.switchingFrequencyHz !== undefined) {
    const both = validityProblems(design, o)[0];
    if (both)
      out.push(problem('conditions.switchingFrequencyHz', o.switchingFrequencyHz, 'another input voltage or switching frequency',
        `conditions.vinV (${inUnit(o.vinV, 'conditions.vinV')}) together with conditions.switchingFrequencyHz (${inUnit(o.switchingFrequencyHz, 'conditions.switchingFrequencyHz')}) take this design where the models mean nothing: ${both.message}`));
  }
  return out;
}
