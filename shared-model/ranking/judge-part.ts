/**
 * One library part judged for a role of a design: the part is put into the role (compare/substitute-
 * part.ts) and the candidate design is evaluated
 * - at rated load at the lowest and highest input voltage (the corners of highest current and voltage
 *   stress, compare/role-fit.ts) for its ratings with derating;
 * - at nominal Vin and rated load (the loss-at-rated score);
 * - over the mission profile (mission/evaluate-mission.ts; the rated point when the design has none).
 * One set-up of the candidate design (sweep/evaluator.ts) serves every point.
 * Admissible (our own rule, every limit the design already states): every rating within its derated
 * limit; the rated point and every mission row regulated with an electro-thermal steady state
 * (ledger/regulated.ts); every part at or below its temperature limit less the design margin; every
 * touchable surface at or below its touch limit. An inadmissible part keeps its figures and says why.
 * Pure and independent of every other part: a pool may judge the library in any chunks (rank-library.ts).
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import { currentDeratingOf, ratingLimits, stressOf } from '../compare/role-fit.ts';
import { substitutePart } from '../compare/substitute-part.ts';
import { isUsablePoint, unusableReason } from '../ledger/regulated.ts';
import { evaluateMission } from '../mission/evaluate-mission.ts';
import { conditionsFor, evaluatorFor, pointSource } from '../sweep/evaluator.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import { ROLE_LABELS } from '../report/labels.ts';
import { bindingOf, ratingHeadroom, thermalHeadroom } from './binding.ts';
import type { BindingConstraint, PartFigures, PartVerdict, RankScore } from './types.ts';

export interface JudgeSettings {
  role: Role;
  by: RankScore;
  currentDerating?: number;
  evaluator?: PointEvaluator;
}

const ROLE_WORDS: Readonly<Record<Role, string>> = Object.fromEntries(Object.entries(ROLE_LABELS).map(([k, v]) => [k, v.toLowerCase()])) as Record<Role, string>;

const four = (x: number): string => Number(x.toPrecision(4)).toString();

export function judgePart(design: Design, part: Part, libraryIndex: number, settings: JudgeSettings): PartVerdict {
  const who = { libraryIndex, partId: part.id, partName: part.name };
  const sub = substitutePart(design, settings.role, part);
  if (!sub.ok) return { verdict: 'not-fitting', ...who, reason: sub.problem.message };
  const d = sub.design;
  const s = d.spec;
  const ev = evaluatorFor(d, settings.evaluator);
  const reasons: string[] = [];
  const constraints: BindingConstraint[] = [];

  const corners = [s.vinMinV, s.vinMaxV].map((vinV) => ev(d, conditionsFor(d, { vinV })));
  for (const r of ratingLimits(d, settings.role, part, stressOf(corners), settings.currentDerating ?? currentDeratingOf(d))) {
    constraints.push(ratingHeadroom(r));
    if (r.value > r.limit) reasons.push(`${r.what} ${four(r.value)} ${r.unit} exceeds the allowed ${four(r.limit)} ${r.unit}.`);
  }
  for (const c of corners) {
    if (!isUsablePoint(c)) reasons.push(`With this part the design is ${unusableReason({ ...c, voutV: c.operatingPoint.voutV, targetVoutV: s.voutV, loadA: c.conditions.loadA })} and Vin ${four(c.conditions.vinV)} V.`);
  }

  // The rated point, read at once (the lean record is refilled by the next point).
  const rated = pointSource(d, ev)(conditionsFor(d));
  const lossAtRatedW = rated.totalLoss;
  const efficiencyAtRated = rated.efficiency;
  if (!isUsablePoint(rated)) reasons.push(`With this part the design is ${unusableReason({ ...rated, voutV: rated.operatingPoint.voutV, targetVoutV: s.voutV, loadA: rated.conditions.loadA })} (rated point).`);
  let hottestPart: Role = settings.role;
  let hottestC = -Infinity;
  let worstMarginK = Infinity;
  let worstTouchMarginK: number | undefined;
  for (const t of rated.temperatures) {
    if (t.celsius > hottestC) [hottestC, hottestPart] = [t.celsius, t.part];
    worstMarginK = Math.min(worstMarginK, t.marginK);
    constraints.push(thermalHeadroom('temperature', `${ROLE_WORDS[t.part]} temperature at the rated point`, t.celsius, t.celsius + t.marginK, rated.conditions.ambientC));
    if (t.marginK < 0) reasons.push(`The ${ROLE_WORDS[t.part]} reaches ${four(t.celsius)} °C at the rated point, over its limit less the margin (${four(t.celsius + t.marginK)} °C).`);
  }
  for (const h of rated.hazards) {
    worstTouchMarginK = Math.min(worstTouchMarginK ?? Infinity, h.marginK);
    constraints.push(thermalHeadroom('touch', `${ROLE_WORDS[h.part]} surface at the rated point (touch limit)`, h.row.limitC - h.marginK, h.row.limitC, rated.conditions.ambientC));
    if (h.marginK < 0) reasons.push(`The ${ROLE_WORDS[h.part]} surface reaches ${four(h.row.limitC - h.marginK)} °C at the rated point, over its touch limit ${four(h.row.limitC)} °C.`);
  }

  const mission = evaluateMission(d, { evaluator: ev });
  // Without a profile the mission is the rated point itself, already checked above.
  const rows = mission.basis === 'profile' ? mission.rows : [];
  for (const row of rows) if (!row.usable) reasons.push(`Mission row "${row.label}": ${row.reason}.`);
  for (const t of rows.length > 0 ? mission.temperatures : []) {
    if (t.worstC > hottestC) [hottestC, hottestPart] = [t.worstC, t.part];
    worstMarginK = Math.min(worstMarginK, t.worstMarginK);
    const row = mission.rows[t.worstRow]!;
    constraints.push(thermalHeadroom('temperature', `${ROLE_WORDS[t.part]} temperature at mission row "${row.label}"`, t.worstC, t.worstC + t.worstMarginK, row.ambientC));
    if (t.worstMarginK < 0) reasons.push(`The ${ROLE_WORDS[t.part]} reaches ${four(t.worstC)} °C at mission row "${row.label}", over its limit less the margin (${four(t.worstC + t.worstMarginK)} °C).`);
  }
  const touch = rows.length > 0 ? mission.worstTouch : null;
  if (touch) {
    const row = mission.rows[touch.row]!;
    worstTouchMarginK = Math.min(worstTouchMarginK ?? Infinity, touch.marginK);
    constraints.push(thermalHeadroom('touch', `${ROLE_WORDS[touch.part]} surface at mission row "${row.label}" (touch limit)`, touch.limitC - touch.marginK, touch.limitC, row.ambientC));
    if (touch.marginK < 0) reasons.push(`The ${ROLE_WORDS[touch.part]} surface reaches ${four(touch.limitC - touch.marginK)} °C at mission row "${row.label}", over its touch limit ${four(touch.limitC)} °C.`);
  }

  const figures: PartFigures = {
    lossAtRatedW,
    efficiencyAtRated,
    weightedEfficiency: mission.weightedEfficiency,
    averageLossW: mission.averageLossW,
    energyPerDayWh: mission.energyLostPerDayWh,
    hottestPart,
    hottestC,
    worstMarginK,
    ...(worstTouchMarginK === undefined ? {} : { worstTouchMarginK }),
  };
  const binding = bindingOf(constraints);
  if (reasons.length > 0) return { verdict: 'inadmissible', ...who, reasons, figures, ...(binding ? { binding } : {}) };
  const score = settings.by === 'loss-at-rated' ? lossAtRatedW : settings.by === 'weighted-efficiency' ? mission.weightedEfficiency : mission.energyLostPerDayWh;
  // A design always has parts with temperatures, so a binding constraint exists; the fallback is the score's own.
  return { verdict: 'admissible', ...who, score, figures, binding: binding ?? thermalHeadroom('temperature', 'hottest part', hottestC, hottestC + worstMarginK, s.ambientC) };
}
