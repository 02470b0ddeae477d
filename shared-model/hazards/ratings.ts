/**
 * Rating and life checks: each compares a value with its (derated) limit and says whether it is within.
 *
 * - temperature: part temperature ≤ limit − margin (design.margins.temperatureMarginK).
 * - saturation: inductor peak |current| ≤ Isat at the winding temperature,
 *   Isat(T) = Isat · (1 + c · (T − T_isat)), floored at 0 (ferrite: c < 0).
 * - voltage: blocking voltage ≤ rating · voltage derating; current: value ≤ rating.
 * - ripple-current: RMS current per capacitor ≤ rating · ripple derating.
 * - resistor-power: dissipation ≤ derated rating · resistor derating, the rating falling linearly from
 *   full power at deratingStartC to zero at zeroPowerC (common practice, datasheet derating curve).
 * - capacitor-life: electrolytic life L = L0 · 2^((T0 − T)/10 K) at the hot-spot temperature
 *   [common practice, "10 K rule"] ≥ the required hours (docs/methods.md §9: 2000 h at 105 °C → 32 000 h at
 *   65 °C). For this check the margin is (value − limit)/limit (more life is better); for all others
 *   (limit − value)/limit.
 * Each check returns a new record, or refills `into` when given (a caller that needs only the verdict of
 * many points reuses one record).
 */
import type { Role } from '../design/schema.ts';
import type { RatingCheck } from '../ledger/types.ts';

function check(part: Role, kind: RatingCheck['check'], value: number, limit: number, unit: string, note: string, into?: RatingCheck): RatingCheck {
  const marginFraction = limit > 0 ? (limit - value) / limit : value > 0 ? -1 : 0;
  return fill(into, part, kind, value, limit, unit, marginFraction, value <= limit, note);
}

function fill(
  into: RatingCheck | undefined,
  part: Role,
  kind: RatingCheck['check'],
  value: number,
  limit: number,
  unit: string,
  marginFraction: number,
  ok: boolean,
  note: string,
): RatingCheck {
  if (!into) return { part, check: kind, value, limit, unit, marginFraction, ok, note };
  into.part = part;
  into.check = kind;
  into.value = value;
  into.limit = limit;
  into.unit = unit;
  into.marginFraction = marginFraction;
  into.ok = ok;
  into.note = note;
  return into;
}

export function temperatureCheck(part: Role, celsius: number, limitC: number, marginK: number, into?: RatingCheck): RatingCheck {
  const derated = limitC - marginK;
  return check(part, 'temperature', celsius, derated, '°C', 'temperature against its limit less the temperature margin', into);
}

/** Isat at the winding temperature, A. */
export function isatAt(isatA: number, isatAtC: number, coPerK: number, tC: number): number {
  const v = isatA * (1 + coPerK * (tC - isatAtC));
  return v > 0 ? v : 0;
}

export function saturationCheck(peakA: number, isatHotA: number, into?: RatingCheck): RatingCheck {
  return check('inductor', 'saturation', Math.abs(peakA), isatHotA, 'A', 'peak |current| against Isat at the winding temperature', into);
}

export function voltageCheck(part: Role, stressV: number, ratingV: number, derating: number, into?: RatingCheck): RatingCheck {
  return check(part, 'voltage', stressV, ratingV * derating, 'V', 'blocking voltage against the rating × voltage derating', into);
}

export function currentCheck(part: Role, valueA: number, ratingA: number, what: string, into?: RatingCheck): RatingCheck {
  return check(part, 'current', valueA, ratingA, 'A', `${what} against the rating`, into);
}

export function rippleCheck(part: Role, perCapacitorRmsA: number, ratingA: number, derating: number, into?: RatingCheck): RatingCheck {
  return check(part, 'ripple-current', perCapacitorRmsA, ratingA * derating, 'A', 'RMS current per capacitor against the ripple rating × ripple derating', into);
}

/** Power rating of a resistor at temperature tC, W. */
export function resistorRatingAt(ratingW: number, startC: number, zeroC: number, tC: number): number {
  if (tC <= startC) return ratingW;
  if (!(zeroC > startC) || tC >= zeroC) return 0;
  return (ratingW * (zeroC - tC)) / (zeroC - startC);
}

export function resistorPowerCheck(part: Role, powerW: number, deratedAtTW: number, derating: number, into?: RatingCheck): RatingCheck {
  return check(part, 'resistor-power', powerW, deratedAtTW * derating, 'W', 'dissipation against the rating derated at the hot-spot temperature × resistor derating', into);
}

/** Electrolytic life at hot-spot temperature tC, h (10 K rule). */
export function electrolyticLifeHours(ratedHours: number, ratedC: number, tC: number): number {
  const v = ratedHours * Math.pow(2, Math.min((ratedC - tC) / 10, 1000));
  return Number.isFinite(v) ? v : Number.MAX_VALUE;
}

export function lifeCheck(part: Role, lifeH: number, requiredH: number, into?: RatingCheck): RatingCheck {
  const marginFraction = (lifeH - requiredH) / requiredH;
  const note = 'life at the hot-spot temperature by the 10 K rule (common practice) against the required hours';
  return fill(into, part, 'capacitor-life', lifeH, requiredH, 'h', marginFraction, lifeH >= requiredH, note);
}
