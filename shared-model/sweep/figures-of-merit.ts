/**
 * Efficiency figures of merit borrowed from external-power-supply rules, used here as a common yardstick:
 * - average efficiency: the arithmetic mean of the efficiencies at 25, 50, 75 and 100 % of rated load
 *   (US 10 CFR 430 Subpart B, Appendix Z, average active-mode efficiency);
 * - light-load efficiency: the efficiency at 10 % of rated load (EU Commission Regulation 2019/1782).
 * Each point is a full evaluation at exactly that load (no interpolation). Those rules are written for
 * external power supplies; for a DC-DC stage they are a convention, not a compliance test.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions } from '../operating-point/types.ts';
import { conditionsFor, evaluatorFor } from './evaluator.ts';
import type { PointEvaluator } from './types.ts';

export const AVERAGE_EFFICIENCY_FRACTIONS = [0.25, 0.5, 0.75, 1] as const;
export const LIGHT_LOAD_FRACTION = 0.1;

export interface FigureOfMeritPoint {
  fractionOfRated: number;
  loadA: number;
  efficiency: number;
}

export interface FiguresOfMerit {
  ratedLoadA: number;
  /** The 25/50/75/100 % points, then the 10 % point. */
  points: FigureOfMeritPoint[];
  /** Mean efficiency at 25/50/75/100 % of rated load. */
  averageEfficiency: number;
  /** Efficiency at 10 % of rated load. */
  lightLoadEfficiency: number;
  source: string;
}

export const FIGURES_OF_MERIT_SOURCE =
  'Average of 25/50/75/100 % load: US 10 CFR 430 Subpart B, Appendix Z; 10 % load: EU Regulation 2019/1782. ' +
  'Written for external power supplies; used here as a yardstick, not a compliance test.';

/** Figures of merit from any efficiency-versus-load function. */
export function figuresOfMeritOf(efficiencyAt: (loadA: number) => number, ratedLoadA: number): FiguresOfMerit {
  const at = (fractionOfRated: number): FigureOfMeritPoint => {
    const loadA = fractionOfRated * ratedLoadA;
    return { fractionOfRated, loadA, efficiency: efficiencyAt(loadA) };
  };
  const points = AVERAGE_EFFICIENCY_FRACTIONS.map(at);
  const averageEfficiency = points.reduce((s, p) => s + p.efficiency, 0) / points.length;
  const light = at(LIGHT_LOAD_FRACTION);
  return { ratedLoadA, points: [...points, light], averageEfficiency, lightLoadEfficiency: light.efficiency, source: FIGURES_OF_MERIT_SOURCE };
}

/** Figures of merit of a design at the given (default nominal) input voltage, ambient and frequency. */
export function figuresOfMerit(
  design: Design,
  options: { conditions?: Partial<Omit<Conditions, 'loadA'>>; evaluator?: PointEvaluator } = {},
): FiguresOfMerit {
  const evaluator = evaluatorFor(design, options.evaluator);
  const fixed = conditionsFor(design, options.conditions);
  return figuresOfMeritOf((loadA) => evaluator(design, { ...fixed, loadA }).efficiency, design.spec.ratedLoadA);
}
