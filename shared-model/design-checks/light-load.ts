/**
 * The light-load check: the efficiency where a battery-powered product spends most of its time.
 *
 * The light-load point: the lightest row of the design's mission profile with a load above zero (its
 * input voltage, load and ambient) — the profile says how the product is used; without a profile,
 * 10 % of the rated load at nominal Vin (LIGHT_LOAD_FRACTION of the figures of merit; common practice: the lightest point of the published weighting
 * sets, mission/weightings.ts, and the usual light-load figure of datasheets). A standby row (0 A) has
 * no efficiency and is skipped. The point is a full electro-thermal evaluation (ledger/evaluate.ts), so
 * the controller's bias, gate drive, switching and core losses that dominate there are all in it.
 * Checked against spec.targets.efficiencyAtLightLoad (no warn band: below the target fails); a point
 * that does not regulate or reach a steady state fails. Without that target the check is left out and
 * a note says so.
 * Source: docs/methods.md §24 (checks), §25 (mission profile); common practice (10 % point).
 */
import type { Conditions } from '../operating-point/types.ts';
import type { Design } from '../design/schema.ts';
import { evaluate } from '../ledger/evaluate.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import { conditionsFor } from '../sweep/evaluator.ts';
import { LIGHT_LOAD_FRACTION } from '../sweep/figures-of-merit.ts';
import type { DesignCheck } from './types.ts';
import { designCheck } from './verdict.ts';
import { pct } from './words.ts';


const f4 = (x: number) => Number(x.toPrecision(4)).toString();

export interface LightLoadPoint {
  conditions: Conditions;
  /** "mission profile row 3 “standby”, Vin 3.7 V, load 20 mA" or "10 % of rated load, Vin nominal 12 V". */
  where: string;
}

/** The light-load point of `design` (see the header). */
export function lightLoadPoint(design: Design): LightLoadPoint {
  const rows = design.missionProfile?.rows ?? [];
  let pick = -1;
  rows.forEach((r, i) => {
    if (r.loadA > 0 && (pick < 0 || r.loadA < (rows[pick]?.loadA ?? Infinity))) pick = i;
  });
  const row = rows[pick];
  if (row) {
    const conditions = conditionsFor(design, { vinV: row.vinV, loadA: row.loadA, ...(row.ambientC === undefined ? {} : { ambientC: row.ambientC }) });
    const name = row.label ? ` “${row.label}”` : '';
    return { conditions, where: `mission profile row ${pick + 1}${name}, Vin ${f4(row.vinV)} V, load ${f4(row.loadA)} A` };
  }
  const loadA = LIGHT_LOAD_FRACTION * design.spec.ratedLoadA;
  return {
    conditions: conditionsFor(design, { vinV: design.spec.vinNomV, loadA }),
    where: `${Math.round(LIGHT_LOAD_FRACTION * 100)} % of rated load (${f4(loadA)} A), Vin nominal ${f4(design.spec.vinNomV)} V`,
  };
}

export function lightLoadEfficiencyCheck(design: Design): DesignCheck | null {
  const target = design.spec.targets?.efficiencyAtLightLoad;
  if (target === undefined) return null;
  const point = lightLoadPoint(design);
  const e = evaluate(design, point.conditions);
  const usable = isUsablePoint(e);
  const check = designCheck({
    id: 'efficiency-at-light-load', label: 'Efficiency at light load',
    value: e.efficiency, limit: target, unit: '', bound: 'min',
    ...(usable ? {} : { status: 'fail' as const }),
    source: 'specification target; common practice (10 % point without a mission profile); docs/methods.md §24, §25',
    message: (s) => !usable
      ? `At ${point.where} the design does not reach a regulated steady state, so the ${pct(target)} light-load target is not met.`
      : `The efficiency at ${point.where} is ${pct(e.efficiency)}, ${s === 'pass' ? 'meeting' : 'below'} the ${pct(target)} light-load target` +
        (s === 'pass' ? '.' : ` (the loss there is ${f4(e.totalLoss * 1000)} mW; controller bias, gate drive and core loss do not fall with load).`),
  });
  return { ...check, where: point.where };
}
