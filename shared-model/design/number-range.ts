/**
 * A range of allowed numbers, as read from a zod number schema, and the words for it. One reading serves
 * the validator's problems (zod-problems.ts), the command line's options and the condition overrides
 * (overrides.ts), so a range is said the same way wherever a number is refused:
 *   "200 mV ≤ vinNomV ≤ 2 kV", "a whole number, 1 ≤ count ≤ 100", "0 < maxDuty < 1".
 */
import type { z } from 'zod';
import { formatEngineering } from '../units/engineering.ts';

export interface NumberRange {
  /** Lowest allowed value; undefined: no lower bound. */
  min?: number;
  /** False when `min` itself is refused (the value must be greater). */
  minInclusive: boolean;
  /** Highest allowed value; undefined: no upper bound. */
  max?: number;
  /** False when `max` itself is refused. */
  maxInclusive: boolean;
  /** Whole numbers only. */
  integer: boolean;
}

interface CheckDef {
  check: string;
  value?: number;
  inclusive?: boolean;
  format?: string;
}

type Schema = z.core.$ZodType;
const defOf = (s: Schema): { type: string; checks?: unknown[] } => (s as unknown as { _zod: { def: { type: string; checks?: unknown[] } } })._zod.def;

/** The bounds of a zod number schema (after optional/default wrappers are removed); undefined for other types. */
export function numberRangeOf(schema: Schema): NumberRange | undefined {
  const def = defOf(schema);
  if (def.type !== 'number') return undefined;
  const checks = ((def.checks ?? []) as { _zod: { def: CheckDef } }[]).map((c) => c._zod.def);
  const lo = checks.find((c) => c.check === 'greater_than');
  const hi = checks.find((c) => c.check === 'less_than');
  return {
    min: lo?.value,
    minInclusive: lo?.inclusive ?? true,
    max: hi?.value,
    maxInclusive: hi?.inclusive ?? true,
    integer: checks.some((c) => c.format === 'safeint'),
  };
}

/** True when `value` is a finite number the range allows. */
export function inRange(value: number, r: NumberRange): boolean {
  if (!Number.isFinite(value)) return false;
  if (r.integer && !Number.isInteger(value)) return false;
  if (r.min !== undefined && (r.minInclusive ? value < r.min : value <= r.min)) return false;
  if (r.max !== undefined && (r.maxInclusive ? value > r.max : value >= r.max)) return false;
  return true;
}

/** The range in words around `name`, numbers in `unit` with SI prefixes: "200 mV ≤ --vin ≤ 2 kV". */
export function rangeText(r: NumberRange, name: string, unit: string): string {
  // Whole numbers are written out exactly (4294967295, not 4.29497e9).
  const fmt = (v: number): string => (r.integer && unit === '' ? String(v) : formatEngineering(v, unit, 6));
  const whole = r.integer ? 'a whole number, ' : '';
  const label = name === '' ? 'value' : name;
  const left = r.min === undefined ? '' : `${fmt(r.min)} ${r.minInclusive ? '≤' : '<'} `;
  const right = r.max === undefined ? '' : ` ${r.maxInclusive ? '≤' : '<'} ${fmt(r.max)}`;
  if (left === '' && right === '') return `${whole}a finite number`;
  return `${whole}${left}${label}${right}`;
}
