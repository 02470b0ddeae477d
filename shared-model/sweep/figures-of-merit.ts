/**
 * Efficiency figures of merit borrowed from external-power-supply rules, used here as a common yardstick:
 * - average efficiency: the arithmetic mean of the efficiencies at 25, 50, 75 and 100 % of rated load
 *   (US 10 CFR 430 Subpart B, Appendix Z, average active-mode efficiency);
 * - light-load efficiency: the efficiency at 10 % of rated load (EU Commission Regulation 2019/1782).
 * Each point is a full evaluation at exactly that load (no interpolation). Those rules are written for
 * external power supplies; for a DC-DC stage they are a convention, not a compliance test.
 * A figure stands for the design only where its points are regulated and converged
 * (ledger/regulated.ts): otherwise it is "not available" with the reason, never a number.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions } from '../operating-point/types.ts';
import { isUsablePoint, unusableReason } from '../ledger/regulated.ts';
import { conditionsFor, evaluatorFor } from './evaluator.ts';
import type { PointEvaluator } from './types.ts';

export const AVERAGE_EFFICIENCY_FRACTIONS = [0.25, 0.5, 0.75, 1] as const;
export const LIGHT_LOAD_FRACTION = 0.1;

export interface FigureOfMeritPoint {
  fractionOfRated: number;
  loadA: number;
  /** Efficiency of the point as evaluated (for an unregulated point: at the lower output voltage). */
  efficiency: number;
  /** The output reaches its specified voltage at this load. */
  regulated: boolean;
  converged: boolean;
  /** Output voltage reached, V. */
  voutV: number;
}

/** A figure that stands for the design, or the reason it does not. */
export type Figure = { available: true; value: number } | { available: false; reason: string };

export interface FiguresOfMerit {
  ratedLoadA: number;
  /** The 25/50/75/100 % points, then the 10 % point. */
  points: FigureOfMeritPoint[];
  /** Mean efficiency at 25/50/75/100 % of rated load (available when all four are regulated and converged). */
  averageEfficiency: Figure;
  /** Efficiency at 10 % of rated load (available when that point is regulated and converged). */
  lightLoadEfficiency: Figure;
  source: string;
}

export const FIGURES_OF_MERIT_SOURCE =
  'Average of 25/50/75/100 % load: US 10 CFR 430 Subpart B, Appendix Z; 10 % load: EU Regulation 2019/1782. ' +
  'Written for external power supplies; used here as a yardstick, not a compliance test.';

/** What a figure-of-merit point is read from (an Evaluation or a lean evaluation has these fields). */
export interface EfficiencyPoint {
  efficiency: number;
  regulated: boolean;
  converged: boolean;
  operatingPoint: { voutV: number };
}

/** The figure over these points, or why it is not available. */
function figureOf(points: readonly FigureOfMeritPoint[], targetVoutV: number): Figure {
  const bad = points.find((p) => !isUsablePoint(p));
  if (bad) {
    const reason = unusableReason({ ...bad, targetVoutV });
    return { available: false, reason: `Not available: ${reason}.` };
  }
  return { available: true, value: points.reduce((s, p) => s + p.efficiency, 0) / points.length };
}

/** Figures of merit from any point-versus-load function; targetVoutV is the design's output voltage. */
export function figuresOfMeritOf(pointAt: (loadA: number) => EfficiencyPoint, ratedLoadA: number, targetVoutV: number): FiguresOfMerit {
  const at = (fractionOfRated: number): FigureOfMeritPoint => {
    const loadA = fractionOfRated * ratedLoadA;
    const e = pointAt(loadA);
    return { fractionOfRated, loadA, efficiency: e.efficiency, regulated: e.regulated, converged: e.converged, voutV: e.operatingPoint.voutV };
  };
  const points = AVERAGE_EFFICIENCY_FRACTIONS.map(at);
  const light = at(LIGHT_LOAD_FRACTION);
  return {
    ratedLoadA,
    points: [...points, light],
    averageEfficiency: figureOf(points, targetVoutV),
    lightLoadEfficiency: figureOf([light], targetVoutV),
    source: FIGURES_OF_MERIT_SOURCE,
  };
}

/** Figures of merit of a design at the given (default nominal) input voltage, ambient and frequency. */
export function figuresOfMerit(
  design: Design,
  options: { conditions?: Partial<Omit<Conditions, 'loadA'>>; evaluator?: PointEvaluator } = {},
): FiguresOfMerit {
  const evaluator = evaluatorFor(design, options.evaluator);
  const fixed = conditionsFor(design, options.conditions);
  return figuresOfMeritOf((loadA) => evaluator(design, { ...fixed, loadA }), design.spec.ratedLoadA, design.spec.voutV);
}
