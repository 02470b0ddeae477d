/**
 * A mission profile evaluated: each row is one electro-thermal operating point at its input voltage,
 * load and ambient (the design's nominal switching frequency), and the rows are weighted by their
 * fractions of the operating time fᵢ (Σ fᵢ = 1, mission/rules.ts):
 *   weighted efficiency   ηw = Σ fᵢ·ηᵢ  (the form of published weighting sets, e.g. the four-point
 *                              average of US 10 CFR 430 Subpart B, Appendix Z; mission/weightings.ts)
 *   energy efficiency     Σ fᵢ·Pout,ᵢ / Σ fᵢ·Pin,ᵢ (energy out over energy in, by definition)
 *   average loss          P̄ = Σ fᵢ·Ploss,ᵢ;  energy lost per day = P̄ · hours per day (Wh)
 *   battery share         energy lost per day / battery capacity
 *   part temperatures     time-weighted mean Σ fᵢ·Tᵢ and the hottest row.
 * The sums are divided by Σ fᵢ, which the rules keep within 1 ± 0.001, so the figures are exact averages.
 * Assumption: each row lasts long against the thermal time constants, so every row is a steady state.
 * A row that does not regulate or has no steady state makes the result `usable: false`; its numbers still
 * enter the sums (nothing hidden) and the row says why. Without a profile the design's rated point
 * stands in (basis "rated-point"). Docs: docs/methods.md §24.
 */
import type { Design, Role } from '../design/schema.ts';
import { isUsablePoint, unusableReason } from '../ledger/regulated.ts';
import { conditionsFor, pointSource } from '../sweep/evaluator.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import type { MissionProfile } from './schema.ts';
import type { MissionPartTemperature, MissionResult, MissionRowResult } from './types.ts';
import { ratedPointProfile } from './weightings.ts';

export interface MissionOptions {
  /** Evaluate this profile instead of the design's own (e.g. a published weighting set). */
  profile?: MissionProfile;
  evaluator?: PointEvaluator;
}

export function evaluateMission(design: Design, options: MissionOptions = {}): MissionResult {
  const own = options.profile ?? design.missionProfile;
  const profile = own ?? ratedPointProfile(design);
  const source = pointSource(design, options.evaluator);
  const rows: MissionRowResult[] = [];
  const temps = new Map<Role, MissionPartTemperature>();
  let weighted = 0;
  let energyIn = 0;
  let energyOut = 0;
  let loss = 0;
  let worstTouch: MissionResult['worstTouch'] = null;
  profile.rows.forEach((row, index) => {
    const conditions = conditionsFor(design, { vinV: row.vinV, loadA: row.loadA, ...(row.ambientC === undefined ? {} : { ambientC: row.ambientC }) });
    // The lean record is refilled by the next call: everything is read from it here.
    const e = source(conditions);
    const f = row.fraction;
    let hottestPart: Role | null = null;
    let hottestC = -Infinity;
    let hottestMarginK = Infinity;
    for (const t of e.temperatures) {
      if (t.celsius > hottestC) {
        hottestC = t.celsius;
        hottestPart = t.part;
      }
      if (t.marginK < hottestMarginK) hottestMarginK = t.marginK;
      const acc = temps.get(t.part) ?? { part: t.part, partName: t.partName, averageC: 0, worstC: -Infinity, worstRow: 0, worstMarginK: Infinity };
      acc.averageC += f * t.celsius;
      if (t.celsius > acc.worstC) {
        acc.worstC = t.celsius;
        acc.worstRow = index;
        acc.worstMarginK = t.marginK;
      }
      temps.set(t.part, acc);
    }
    for (const h of e.hazards) {
      if (worstTouch === null || h.marginK < worstTouch.marginK) worstTouch = { part: h.part, marginK: h.marginK, limitC: h.row.limitC, row: index };
    }
    const usable = isUsablePoint(e);
    rows.push({
      label: row.label ?? `row ${index + 1}`,
      vinV: conditions.vinV,
      loadA: conditions.loadA,
      ambientC: conditions.ambientC,
      fraction: f,
      efficiency: e.efficiency,
      inputW: e.inputPower,
      outputW: e.outputPower,
      lossW: e.totalLoss,
      hottestPart,
      hottestC: hottestPart === null ? conditions.ambientC : hottestC,
      hottestMarginK: hottestPart === null ? 0 : hottestMarginK,
      usable,
      reason: usable ? '' : unusableReason({ ...e, voutV: e.operatingPoint.voutV, targetVoutV: design.spec.voutV, loadA: conditions.loadA }),
    });
    weighted += f * e.efficiency;
    energyIn += f * e.inputPower;
    energyOut += f * e.outputPower;
    loss += f * e.totalLoss;
  });
  // The rules keep Σ fᵢ within 1 ± 0.001; dividing by it makes the figures exact averages.
  const total = profile.rows.reduce((sum, r) => sum + r.fraction, 0);
  const norm = total > 0 ? 1 / total : 0;
  weighted *= norm;
  loss *= norm;
  energyOut *= norm;
  for (const t of temps.values()) t.averageC *= norm;
  const energyLostPerDayWh = loss * profile.hoursPerDay;
  return {
    basis: own ? 'profile' : 'rated-point',
    name: profile.name,
    rows,
    weightedEfficiency: weighted,
    energyEfficiency: energyIn > 0 ? energyOut / energyIn : 0,
    averageLossW: loss,
    averageOutputW: energyOut,
    hoursPerDay: profile.hoursPerDay,
    energyLostPerDayWh,
    battery: profile.batteryWh === undefined ? null : { capacityWh: profile.batteryWh, shareLostPerDay: energyLostPerDayWh / profile.batteryWh },
    temperatures: [...temps.values()],
    worstTouch,
    usable: rows.every((r) => r.usable),
  };
}
