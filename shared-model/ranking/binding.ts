/**
 * The binding constraint of a part in a design: of every limit checked — ratings against the role's
 * stress (compare/role-fit.ts), each part's temperature against its limit less the design margin, each
 * touchable surface against its touch limit — the one with the least headroom. Headroom (our own rule,
 * so that volts, amperes and kelvin compare): a rating (limit − value)/limit; a temperature or touch
 * limit the margin over the rise the limit allows above the ambient, margin/(limit − ambient).
 */
import type { RatingLimit } from '../compare/role-fit.ts';
import type { BindingConstraint } from './types.ts';

export function ratingHeadroom(r: RatingLimit): BindingConstraint {
  return { kind: 'rating', what: r.what, value: r.value, limit: r.limit, unit: r.unit, headroom: r.limit > 0 ? (r.limit - r.value) / r.limit : -1 };
}

/** A temperature (°C) against its limit (°C) above an ambient (°C). */
export function thermalHeadroom(kind: 'temperature' | 'touch', what: string, celsius: number, limitC: number, ambientC: number): BindingConstraint {
  const rise = limitC - ambientC;
  const margin = limitC - celsius;
  return { kind, what, value: celsius, limit: limitC, unit: '°C', headroom: rise > 0 ? margin / rise : margin >= 0 ? 0 : -1 };
}

/** The constraint with the least headroom (the first such in the given order on a tie). */
export function bindingOf(constraints: readonly BindingConstraint[]): BindingConstraint | undefined {
  let best: BindingConstraint | undefined;
  for (const c of constraints) if (best === undefined || c.headroom < best.headroom) best = c;
  return best;
}
