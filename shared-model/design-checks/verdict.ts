/**
 * One design check from its value and limit: status, margin and the sentence.
 *
 * Status (our own rule): for an upper limit ('max'), pass when value ≤ limit; warn when limit < value ≤
 * failAt; fail above failAt. failAt is the full rating when the limit is a derated rating (so a stress in
 * the derating band warns and a stress past the rating fails), the limit itself for targets and hard
 * limits (no warn band), and +∞ for guidance that cannot fail (a ramp the controller must provide).
 * A lower limit ('min') mirrors this. Margin: (limit − value)/limit ('max'), (value − limit)/limit
 * ('min'); a zero limit gives 0 when met and −1 when not (never NaN).
 */
import type { SolvedCorner } from '../sizing/corners.ts';
import type { CheckStatus, DesignCheck } from './types.ts';

/** What a check is made from: the record's own fields, and how its status and sentence come about. */
export type CheckSpec = Pick<DesignCheck, 'id' | 'label' | 'part' | 'value' | 'limit' | 'unit' | 'bound' | 'source'> & {
  /** Where the check turns from warn to fail; default: the limit (no warn band). */
  failAt?: number;
  /** Replaces the status computed from the numbers (a check decided by a flag, e.g. regulation). */
  status?: CheckStatus;
  at?: SolvedCorner;
  /** The sentence for the status found. */
  message: (status: CheckStatus) => string;
};

function statusOf(s: CheckSpec): CheckStatus {
  const failAt = s.failAt ?? s.limit;
  if (s.bound === 'max') return s.value <= s.limit ? 'pass' : s.value <= failAt ? 'warn' : 'fail';
  return s.value >= s.limit ? 'pass' : s.value >= failAt ? 'warn' : 'fail';
}

function marginOf(value: number, limit: number, bound: 'max' | 'min'): number {
  const met = bound === 'max' ? value <= limit : value >= limit;
  if (limit === 0) return met ? 0 : -1;
  return (bound === 'max' ? limit - value : value - limit) / Math.abs(limit);
}

export function designCheck(s: CheckSpec): DesignCheck {
  const status = s.status ?? statusOf(s);
  return {
    id: s.id,
    label: s.label,
    ...(s.part ? { part: s.part } : {}),
    value: s.value,
    limit: s.limit,
    unit: s.unit,
    bound: s.bound,
    status,
    passed: status === 'pass',
    marginFraction: marginOf(s.value, s.limit, s.bound),
    ...(s.at ? { corner: s.at.corner.id, where: s.at.corner.label } : {}),
    message: s.message(status),
    source: s.source,
  };
}

/**
 * The corner where `ratio` (value over its limit, larger is worse) is largest, with its value; `null`
 * when there is no corner. Used so that a limit that moves with temperature is read where it binds.
 */
export function worstOf(corners: readonly SolvedCorner[], ratio: (c: SolvedCorner) => number): SolvedCorner | null {
  let at: SolvedCorner | null = null;
  let worst = -Infinity;
  for (const c of corners) {
    const r = ratio(c);
    if (r > worst) {
      worst = r;
      at = c;
    }
  }
  return at;
}
