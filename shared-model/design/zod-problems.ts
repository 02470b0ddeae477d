/**
 * Turns zod issues into Problems: the path as dotted text, the value found, and the allowed range read
 * from the schema itself (its number bounds, enum values, string lengths), so the allowed text can
 * never drift from the checks that produced the issue.
 */
import type { z } from 'zod';
import { unitOfKey } from './key-units.ts';
import { numberRangeOf, rangeText } from './number-range.ts';
import type { Problem } from './problems.ts';
import { pathToString, problem, valueAt } from './problems.ts';

export type Schema = z.core.$ZodType;
interface Def {
  type: string;
  [key: string]: unknown;
}
interface CheckDef {
  check: string;
  minimum?: number;
  maximum?: number;
}

export const defOf = (s: Schema): Def => (s as unknown as { _zod: { def: Def } })._zod.def;
const checksOf = (s: Schema): CheckDef[] =>
  ((defOf(s).checks as { _zod: { def: CheckDef } }[] | undefined) ?? []).map((c) => c._zod.def);

export function unwrap(s: Schema): Schema {
  let here = s;
  for (let d = defOf(here); d.type === 'optional' || d.type === 'nullable' || d.type === 'default'; d = defOf(here))
    here = d.innerType as Schema;
  return here;
}

/** The option of a discriminated union that the input's discriminator picks. */
export function pickOption(s: Schema, input: unknown): Schema | undefined {
  const def = defOf(s);
  const key = def.discriminator as string | undefined;
  const options = def.options as Schema[];
  if (key === undefined) return undefined;
  const wanted = valueAt(input, [key]);
  return options.find((o) => {
    const field = (defOf(o).shape as Record<string, Schema>)[key];
    return field !== undefined && ((defOf(field).values as unknown[] | undefined) ?? []).includes(wanted);
  });
}

/** The schema that checks the value at `path` (undefined where the input leaves the schema). */
export function schemaAt(root: Schema, path: readonly PropertyKey[], input: unknown): Schema | undefined {
  let here: Schema | undefined = root;
  for (let i = 0; i < path.length && here; i += 1) {
    let s = unwrap(here);
    if (defOf(s).type === 'union') {
      const picked = pickOption(s, valueAt(input, path.slice(0, i)));
      if (!picked) return undefined;
      s = picked;
    }
    const def = defOf(s);
    const key = path[i];
    if (def.type === 'object') here = (def.shape as Record<string, Schema>)[String(key)];
    else if (def.type === 'array') here = def.element as Schema;
    else if (def.type === 'record') here = def.valueType as Schema;
    else return undefined;
  }
  return here;
}

const quoteAll = (values: readonly unknown[]): string => values.map((v) => JSON.stringify(v)).join(', ');

function numberRange(s: Schema, key: string): string {
  const range = numberRangeOf(s);
  return range ? rangeText(range, key, unitOfKey(key)) : 'a finite number';
}

/** What a schema accepts, in words. */
export function describeSchema(schemaIn: Schema, key: string): string {
  const s = unwrap(schemaIn);
  const def = defOf(s);
  switch (def.type) {
    case 'number':
      return numberRange(s, key);
    case 'string': {
      const min = checksOf(s).find((c) => c.check === 'min_length')?.minimum;
      const max = checksOf(s).find((c) => c.check === 'max_length')?.maximum;
      if (min !== undefined && max !== undefined) return `text of ${min} to ${max} characters`;
      if (max !== undefined) return `text of at most ${max} characters`;
      return min !== undefined ? `text of at least ${min} character${min === 1 ? '' : 's'}` : 'text';
    }
    case 'boolean':
      return 'true or false';
    case 'enum':
      return `one of ${quoteAll(Object.values(def.entries as Record<string, unknown>))}`;
    case 'literal':
      return quoteAll(def.values as unknown[]);
    case 'array': {
      const max = checksOf(s).find((c) => c.check === 'max_length')?.maximum;
      return max === undefined ? 'a list' : `a list of at most ${max} items`;
    }
    case 'record':
      return `an object keyed by ${describeSchema(def.keyType as Schema, '')}`;
    case 'union': {
      const key2 = def.discriminator as string;
      const options = (def.options as Schema[]).map((o) =>
        quoteAll((defOf((defOf(o).shape as Record<string, Schema>)[key2] as Schema).values as unknown[])),
      );
      return `an object whose "${key2}" is one of ${options.join(', ')}`;
    }
    case 'object': {
      const shape = def.shape as Record<string, Schema>;
      const required = Object.keys(shape).filter((k) => defOf(shape[k] as Schema).type !== 'optional');
      const shown = required.length > 8 ? `${required.slice(0, 8).join(', ')}, …` : required.join(', ');
      return `an object with ${shown}`;
    }
    default:
      return `a value of type ${def.type}`;
  }
}

/** One Problem per zod issue (one per key for unrecognised keys). */
export function problemsFromZod(issues: readonly z.core.$ZodIssue[], root: Schema, input: unknown): Problem[] {
  const out: Problem[] = [];
  for (const issue of issues) {
    const path = issue.path;
    const key = String(path.filter((k) => typeof k === 'string').pop() ?? '');
    const value = valueAt(input, path);
    const dotted = pathToString(path);
    const schema = schemaAt(root, path, input);
    switch (issue.code) {
      case 'unrecognized_keys':
        for (const k of issue.keys) {
          const keyType = schema ? (defOf(unwrap(schema)).keyType as Schema | undefined) : undefined;
          const allowed = keyType ? describeSchema(keyType, '') : 'no other keys';
          out.push(problem(pathToString([...path, k]), valueAt(input, [...path, k]), allowed,
            `${pathToString([...path, k])} is not a key WattLedger knows here; allowed keys: ${allowed}.`));
        }
        break;
      case 'invalid_union':
        out.push(problem(dotted, value, issue.discriminator !== undefined && 'options' in issue && issue.options
          ? `one of ${quoteAll(issue.options)}` : schema ? describeSchema(schema, key) : issue.message));
        break;
      case 'invalid_value':
        out.push(problem(dotted, value, issue.values.length === 1 ? quoteAll(issue.values) : `one of ${quoteAll(issue.values)}`));
        break;
      case 'too_small':
      case 'too_big':
        if (issue.origin === 'array') {
          const bound = issue.code === 'too_big' ? `at most ${issue.maximum}` : `at least ${issue.minimum}`;
          out.push(problem(dotted, value, `a list of ${bound} items`));
        } else out.push(problem(dotted, value, schema ? describeSchema(schema, key) : issue.message));
        break;
      default:
        out.push(problem(dotted, value, schema ? describeSchema(schema, key) : issue.message));
    }
  }
  return out;
}
