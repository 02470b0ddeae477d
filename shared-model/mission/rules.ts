/**
 * Cross-field rules of the mission profile (run on the raw document, like design/rules-*.ts):
 * - the time fractions of the rows add up to 1, within FRACTION_SUM_TOLERANCE (our own rule: a profile
 *   typed as thirds, 0.333 + 0.333 + 0.334, must pass; one that leaves 10 % of the time unaccounted
 *   must not);
 * - each row's input voltage lies within the specified input range spec.vinMinV … spec.vinMaxV (our own
 *   rule: the profile describes the product's use within its specification; a question outside it is an
 *   evaluation override, design/overrides.ts).
 */
import type { Problem } from '../design/problems.ts';
import { inUnit, problem } from '../design/problems.ts';
import { isObject, list, num } from '../design/read.ts';

const FRACTION_SUM_TOLERANCE = 1e-3;

export function missionRules(doc: unknown): Problem[] {
  if (!isObject(doc) || !isObject(doc.missionProfile)) return [];
  const out: Problem[] = [];
  const rows = list(doc, 'missionProfile.rows');
  const fractions = rows.map((r) => (isObject(r) && typeof r.fraction === 'number' && Number.isFinite(r.fraction) ? r.fraction : undefined));
  if (rows.length > 0 && fractions.every((f) => f !== undefined)) {
    const sum = fractions.reduce<number>((s, f) => s + (f ?? 0), 0);
    if (Math.abs(sum - 1) > FRACTION_SUM_TOLERANCE) {
      const shown = Number(sum.toPrecision(6));
      out.push(problem('missionProfile.rows', shown, `fractions adding up to 1 (±${FRACTION_SUM_TOLERANCE})`,
        `The shares of time of the mission profile add up to ${shown}; they must add up to 1 (within ±${FRACTION_SUM_TOLERANCE}), so that every hour of operation is counted once.`));
    }
  }
  const min = num(doc, 'spec.vinMinV');
  const max = num(doc, 'spec.vinMaxV');
  rows.forEach((row, i) => {
    const path = `missionProfile.rows[${i}].vinV`;
    const vin = isObject(row) && typeof row.vinV === 'number' && Number.isFinite(row.vinV) ? row.vinV : undefined;
    if (vin === undefined || min === undefined || max === undefined || min > max) return;
    if (vin < min || vin > max) {
      const allowed = `${inUnit(min, 'spec.vinMinV')} … ${inUnit(max, 'spec.vinMaxV')}`;
      out.push(problem(path, vin, allowed,
        `Mission profile row ${i + 1}: the input voltage ${inUnit(vin, path)} lies outside the specified input range ${allowed} (spec.vinMinV … spec.vinMaxV).`));
    }
  });
  return out;
}
