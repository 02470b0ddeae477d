/**
 * Synthetic bench measurements for the calibration tests: a demo design with known parameters changed,
 * evaluated by the engine at chosen points, plus seeded Gaussian noise on the input power (and on
 * temperatures when asked). The truth is known, so a fit can be checked against it.
 */
import { fitParameters, modelPoints, type Design, type FitParameterName, type Measurement, type Role } from '../../../shared-model/index.ts';
import { applyParameters } from '../../../shared-model/fit/parameters.ts';
import { createRandom } from '../../../shared-model/tolerance/prng.ts';

export interface SyntheticOptions {
  truth: Partial<Record<FitParameterName, number>>;
  points: { vinV: number; loadA: number }[];
  seed: number;
  lossNoiseW: number;
  temperatureRoles?: Role[];
  temperatureNoiseK?: number;
}

export function perturbed(design: Design, truth: Partial<Record<FitParameterName, number>>): Design {
  const offered = fitParameters(design);
  const names = Object.keys(truth) as FitParameterName[];
  return applyParameters(design, names.map((n) => offered.find((p) => p.name === n)!), names.map((n) => truth[n]!));
}

export function syntheticMeasurement(design: Design, o: SyntheticOptions): Measurement {
  const truthDesign = perturbed(design, o.truth);
  const roles = o.temperatureRoles ?? [];
  const model = modelPoints(truthDesign, o.points, o.points.map(() => roles));
  const rng = createRandom(o.seed);
  return {
    name: `synthetic, seed ${o.seed}`,
    points: o.points.map((p, i) => {
      const loss = model[i].lossW + o.lossNoiseW * rng.nextNormal();
      const point = { ...p, inputPowerW: design.spec.voutV * p.loadA + loss };
      if (roles.length === 0) return point;
      const temperaturesC = Object.fromEntries(roles.map((r, j) => [r, model[i].temperaturesC[j] + (o.temperatureNoiseK ?? 0) * rng.nextNormal()]));
      return { ...point, temperaturesC };
    }),
  };
}

/** 30 points: loads from 0.5 A to 5 A at the demo's lowest and highest input voltage (alternating). */
export function benchPoints(design: Design, count = 30): { vinV: number; loadA: number }[] {
  const { vinMinV, vinMaxV, ratedLoadA } = design.spec;
  return Array.from({ length: count }, (_, i) => ({
    vinV: i % 2 === 0 ? vinMinV : vinMaxV,
    loadA: Number((ratedLoadA * (0.1 + (0.9 * i) / (count - 1))).toFixed(4)),
  }));
}
