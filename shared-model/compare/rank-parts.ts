/**
 * Ranking of library parts for one role: every part whose kind fits the role and whose ratings cover the
 * role's stress (role-fit.ts) is put into the design and scored by one criterion at nominal input
 * voltage and the design's ambient:
 * - "loss-at-rated": total converter loss at rated load, W (lower is better);
 * - "average-efficiency": mean efficiency at 25/50/75/100 % of rated load (higher is better;
 *   US 10 CFR 430 Subpart B, Appendix Z);
 * - "hottest-junction": the highest junction or hot-spot temperature of any part at rated load, °C
 *   (lower is better).
 * Parts that do not fit are listed with the reasons.
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import { conditionsFor, evaluatorFor } from '../sweep/evaluator.ts';
import { figuresOfMeritOf } from '../sweep/figures-of-merit.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import { DEFAULT_CURRENT_DERATING, ratingShortfalls, stressOf } from './role-fit.ts';
import { substitutePart } from './substitute-part.ts';

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
      const fom = figuresOfMeritOf((loadA) => evaluator(d, conditionsFor(d, { loadA })).efficiency, s.ratedLoadA);
      scored.push({ ...base, score: fom.averageEfficiency, unit: '' });
    }
  }
  const higherIsBetter = options.criterion === 'average-efficiency';
  scored.sort((a, b) => (higherIsBetter ? b.score - a.score : a.score - b.score) || a.partId.localeCompare(b.partId));
  return { role: options.role, criterion: options.criterion, ranked: scored.map((p, i) => ({ rank: i + 1, ...p })), rejected };
}
