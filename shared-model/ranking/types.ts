/**
 * Records of a library ranked for one role (ranking/rank-library.ts). SI units: W, V, A; energy per day
 * in Wh; temperatures °C, margins K; headroom as a fraction of the limit.
 */
import type { Part } from '../design/parts.ts';
import type { Role } from '../design/schema.ts';
import type { PointEvaluator } from '../sweep/types.ts';

/**
 * What a part is scored by:
 * - "loss-at-rated": total converter loss at nominal Vin and rated load, W (lower is better);
 * - "weighted-efficiency": the mission profile's weighted efficiency Σ fᵢ·ηᵢ (higher is better);
 * - "energy": energy lost per day over the mission profile, Wh (lower is better).
 * Without a mission profile the rated point stands in (mission/weightings.ts ratedPointProfile).
 */
export type RankScore = 'loss-at-rated' | 'weighted-efficiency' | 'energy';
export const RANK_SCORES: readonly RankScore[] = ['loss-at-rated', 'weighted-efficiency', 'energy'];

export interface RankLibraryOptions {
  role: Role;
  library: readonly Part[];
  /** Default "energy". */
  by?: RankScore;
  /** Fraction of a current rating that may be used (default 0.8, common practice). */
  currentDerating?: number;
  /** A stand-in evaluator (tests); default: the ledger's per-design evaluator. */
  evaluator?: PointEvaluator;
}

/** The limit closest to being reached: a rating, a temperature limit less the margin, or a touch limit. */
export interface BindingConstraint {
  kind: 'rating' | 'temperature' | 'touch';
  what: string;
  value: number;
  limit: number;
  unit: string;
  /**
   * What is left of the limit, as a fraction (negative: past it). Ratings (limit − value)/limit;
   * temperatures and touch limits: margin over the allowed rise above the ambient (limit − ambient).
   */
  headroom: number;
}

/** The figures of one part in the design. */
export interface PartFigures {
  lossAtRatedW: number;
  efficiencyAtRated: number;
  weightedEfficiency: number;
  averageLossW: number;
  energyPerDayWh: number;
  /** The hottest part of the design with this part, over the rated point and the mission rows. */
  hottestPart: Role;
  hottestC: number;
  /** The smallest margin of any part to its derated limit, K. */
  worstMarginK: number;
  /** The smallest touch margin, K (absent: nothing touchable). */
  worstTouchMarginK?: number;
}

/** One library part judged (the work unit a pool's chunk returns). */
export type PartVerdict =
  | { verdict: 'admissible'; libraryIndex: number; partId: string; partName: string; score: number; figures: PartFigures; binding: BindingConstraint }
  | { verdict: 'inadmissible'; libraryIndex: number; partId: string; partName: string; reasons: string[]; figures?: PartFigures; binding?: BindingConstraint }
  | { verdict: 'not-fitting'; libraryIndex: number; partId: string; partName: string; reason: string };

export type RankedPart = Extract<PartVerdict, { verdict: 'admissible' }> & {
  rank: number;
  /** On the front of score against hottest temperature: no other admissible part is better in both. */
  pareto: boolean;
};
export type InadmissiblePart = Extract<PartVerdict, { verdict: 'inadmissible' }>;

export interface LibraryRanking {
  role: Role;
  by: RankScore;
  unit: 'W' | '' | 'Wh';
  better: 'lower' | 'higher';
  /** "profile": scored over the design's mission profile; "rated-point": the design has none. */
  basis: 'profile' | 'rated-point';
  missionName: string;
  /** Admissible parts, best first. */
  ranking: RankedPart[];
  /** Parts that fit the role but break a rating, a temperature or touch limit, or regulation. */
  inadmissible: InadmissiblePart[];
  /** How many library parts are of a kind the role does not take. */
  notFitting: number;
}
