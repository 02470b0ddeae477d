/**
 * Ranking of library parts for one role: every part whose kind fits the role and whose ratings cover the
 * role's stress (role-fit.ts) is put into the design and scored by one criterion at nominal input
 * voltage and the design's ambient:
 * - "loss-at-rated": total converter loss at rated load, W (lower is better);
 * - "average-efficiency": mean efficiency at 25/50/75/100 % of rated load (higher is better;
 *   US 10 CFR 430 Subpart B, Appendix Z);
 * - "hottest-junction": the highest junction or hot-spot temperature of any part at rated load, °C
 *   (lower is better).
 * Parts that do not fit are listed with the reasons, and so are parts with which the design does not
 * regulate or has no steady state at the points the criterion needs (ledger/regulated.ts).
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import { conditionsFor, evaluatorFor } from '../sweep/evaluator.ts';
import { figuresOfMeritOf } from '../sweep/figures-of-merit.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import { DEFAULT_CURRENT_DERATING, ratingShortfalls, stressOf } from './role-fit.ts';
import { substitutePart } from './substitute-part.ts';
import { isUsablePoint, unusableReason } from '../ledger/regulated.ts';

export type RankCriterion = 'loss-at-rated' | 'average-efficiency' | 'hottest-junction';
export const RANK_CRITERIA: readonly RankCriterion[] = ['loss-at-rated', 'average-efficiency', 'hottest-junction'];

export interface RankOptions {
  role: Role;
  library: readonly Part[];
  criterion: RankCriterion;
  /** Fraction of a current rating that may be used (default 0.8). */
  currentDerating?: number;
  evaluator?: PointEvaluator;
}

export interface RankedPart {
  rank: number;
  partId: string;
  partName: string;
  /** The criterion's value: W, efficiency (ratio) or °C. */
  score: number;
  unit: 'W' | '' | '°C';
  totalLossAtRatedW: number;
  efficiencyAtRated: number;
  hottestC: number;
  hottestPart: Role | null;
}

export interface RejectedPart {
  partId: string;
  partName: string;
  reasons: string[];
}

export interface Ranking {
  role: Role;
  criterion: RankCriterion;
  ranked: RankedPart[];
  rejected: RejectedPart[];
}

export function rankParts(design: Design, options: RankOptions): Ranking {
  const derating = options.currentDerating ?? DEFAULT_CURRENT_DERATING;
  const s = design.spec;
  const scored: Omit<RankedPart, 'rank'>[] = [];
  const rejected: RejectedPart[] = [];
  for (const part of options.library) {
    const sub = substitutePart(design, options.role, part);
    if (!sub.ok) {
      rejected.push({ partId: part.id, partName: part.name, reasons: [sub.problem.message] });
      continue;
    }
    const d = sub.design;
    // One set-up of the candidate design serves its corners, its rated point and its figures of merit.
    const evaluator = evaluatorFor(d, options.evaluator);
    const corners = [s.vinMinV, s.vinMaxV].map((vinV) => evaluator(d, conditionsFor(d, { vinV })));
    const reasons = ratingShortfalls(d, options.role, part, stressOf(corners), derating);
    if (reasons.length > 0) {
      rejected.push({ partId: part.id, partName: part.name, reasons });
      continue;
    }
    const rated = evaluator(d, conditionsFor(d));
    // Only a regulated, converged rated point may speak for the part (ledger/regulated.ts).
    if (!isUsablePoint(rated)) {
      const reason = unusableReason({ ...rated, voutV: rated.operatingPoint.voutV, targetVoutV: s.voutV, loadA: rated.conditions.loadA });
      rejected.push({ partId: part.id, partName: part.name, reasons: [`With this part the design cannot be ranked: ${reason}.`] });
      continue;
    }
    let hottestC = -Infinity;
    let hottestPart: Role | null = null;
    for (const t of rated.temperatures) {
      if (t.celsius > hottestC) {
        hottestC = t.celsius;
        hottestPart = t.part;
      }
    }
    const base = { partId: part.id, partName: part.name, totalLossAtRatedW: rated.totalLoss, efficiencyAtRated: rated.efficiency, hottestC, hottestPart };
    if (options.criterion === 'loss-at-rated') scored.push({ ...base, score: rated.totalLoss, unit: 'W' });
    else if (options.criterion === 'hottest-junction') scored.push({ ...base, score: hottestC, unit: '°C' });
    else {
      const fom = figuresOfMeritOf((loadA) => evaluator(d, conditionsFor(d, { loadA })), s.ratedLoadA, s.voutV).averageEfficiency;
      if (!fom.available) {
        rejected.push({ partId: part.id, partName: part.name, reasons: [`With this part the average efficiency is ${fom.reason.charAt(0).toLowerCase()}${fom.reason.slice(1)}`] });
        continue;
      }
      scored.push({ ...base, score: fom.value, unit: '' });
    }
  }
  const higherIsBetter = options.criterion === 'average-efficiency';
  scored.sort((a, b) => (higherIsBetter ? b.score - a.score : a.score - b.score) || a.partId.localeCompare(b.partId));
  return { role: options.role, criterion: options.criterion, ranked: scored.map((p, i) => ({ rank: i + 1, ...p })), rejected };
}
