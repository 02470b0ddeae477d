/**
 * Builds a SizedValue from the worst corner of a quantity. Shared by every sizing file.
 */
import type { SolvedCorner } from './corners.ts';
import { worstCorner } from './corners.ts';
import type { SizedValue } from './types.ts';

export const SIZING_SOURCE = 'docs/methods.md §23';

export interface SizedSpec {
  unit: string;
  formula: string;
  /** Why the corner drives the result; `{corner}` is replaced with the corner's label. */
  reason: string;
  source?: string;
  smallest?: boolean;
}

/** The worst corner's value of `valueOf`, as a SizedValue. */
export function sized(corners: readonly SolvedCorner[], valueOf: (c: SolvedCorner) => number, spec: SizedSpec): SizedValue {
  const { at, value } = worstCorner(corners, valueOf, spec.smallest);
  return {
    value,
    unit: spec.unit,
    corner: at.corner.id,
    reason: spec.reason.replace('{corner}', at.corner.label),
    formula: spec.formula,
    source: spec.source ?? SIZING_SOURCE,
  };
}

/** A value derived from another sized value (same corner and reason). */
export function derived(from: SizedValue, value: number, unit: string, formula: string, source = SIZING_SOURCE): SizedValue {
  return { ...from, value, unit, formula, source };
}
