/**
 * Percent entry (issue 16 §4, "one convention per quantity"): a field whose value is a fraction (duty
 * limit, efficiency target, ripple ratio, deratings) is entered and shown in percent, as engineers
 * think of it. Its field description carries the unit "%": "90", "90 %" and "90%" all store 0.9;
 * "0.9" stores 0.009 (0.9 %), and the field's read-out says so. The stored document keeps the fraction.
 * Percent: ISO 80000-1 (% = 0.01).
 */
import { formatEngineering, parseEngineering, type EngineeringParse } from '../../shared-model/index.ts';

export const PERCENT = '%';

/** Reads the text typed into a percent field as a fraction. */
export function parsePercent(text: string): EngineeringParse {
  const bare = text.replace(/%\s*$/, '').trim();
  if (bare === '') return { ok: false, message: 'The value is empty; enter a number of percent.' };
  const parsed = parseEngineering(bare, '');
  if (!parsed.ok) return { ok: false, message: `"${text.trim()}" is not a percentage (enter e.g. "90" or "90 %").` };
  // Division by 100 (not multiplication by 0.01) keeps "90" exactly 0.9.
  return { ok: true, value: parsed.value / 100, unit: '' };
}

/** A fraction as the percent field shows it ("90 %"). */
export function showPercent(value: number, significantDigits = 6): string {
  return formatEngineering(value, PERCENT, significantDigits);
}
