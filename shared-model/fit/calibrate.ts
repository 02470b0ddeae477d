/**
 * Calibration: fit chosen model parameters (parameters.ts) to a bench measurement by bounded nonlinear
 * least squares (least-squares.ts), then state the fitted values with approximate 95 % intervals,
 * correlations and identifiability warnings (intervals.ts), the residuals before and after, and the
 * ledger at rated load before and after (docs/methods.md §18).
 * Residuals: (measured − model loss) / lossSigmaW for every point — efficiency is compared as loss in
 * watts, ΔP = Pout·(1/η_meas − 1/η_model) — and (measured − model surface temperature) / temperatureSigmaK
 * for every measured temperature. Default weights (our own rule): lossSigmaW = 0.2 % of the rated output
 * power (a bench power analyser's accuracy), temperatureSigmaK = 1 K (a calibrated thermocouple).
 * Only their ratio matters for the intervals, whose scale comes from the residuals themselves.
 */
import type { Design, Role } from '../design/schema.ts';
import { checkConditionOverrides } from '../design/overrides.ts';
import { evaluate } from '../ledger/evaluate.ts';
import type { OptionProblem } from '../sweep/types.ts';
import { measuredBalance } from '../measurement/loss.ts';
import { measurementHash } from '../measurement/hash.ts';
import type { Measurement } from '../measurement/schema.ts';
import { CALIBRATION_CAUTION } from './caution.ts';
import { parameterStatistics } from './intervals.ts';
import { leastSquares } from './least-squares.ts';
import { LOSS_GROUPS, lossByGroup } from './ledger-groups.ts';
import { modelPoints, pointConditions, type ModelPoint } from './point-model.ts';
import { applyParameters, defaultFitParameters, fitParameters, type FitParameter } from './parameters.ts';
import { calibrationSummary, calibrationWarnings } from './summary.ts';
import type { Calibration, FittedParameter, PointComparison, ResidualRms } from './types.ts';

export interface CalibrationOptions {
  /** Parameters that may move (default: defaultFitParameters). */
  parameters?: readonly string[];
  /** Allowed range per parameter name, replacing the default. */
  bounds?: Readonly<Record<string, { lower: number; upper: number }>>;
  lossSigmaW?: number;
  temperatureSigmaK?: number;
  maxIterations?: number;
}

export type CalibrationOutcome = { ok: true; calibration: Calibration } | { ok: false; problems: OptionProblem[] };

const ROLE_ORDER: readonly Role[] = ['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'senseResistor', 'controller'];

/** Roles with a measured temperature, per point and overall. */
function measuredRoles(m: Measurement): { perPoint: Role[][]; all: Role[] } {
  const perPoint = m.points.map((p) => ROLE_ORDER.filter((r) => p.temperaturesC?.[r] !== undefined));
  const all = ROLE_ORDER.filter((r) => perPoint.some((roles) => roles.includes(r)));
  return { perPoint, all };
}

function problem(path: string, value: unknown, allowed: string, message: string): OptionProblem {
  return { path, value, allowed, message };
}

/** Every problem with a calibration request, before any fitting. */
function checkRequest(design: Design, m: Measurement, names: readonly string[], o: CalibrationOptions, offered: FitParameter[]): OptionProblem[] {
  const out: OptionProblem[] = [];
  const known = offered.map((p) => p.name as string);
  for (const name of names)
    if (!known.includes(name))
      out.push(problem('parameters', name, `one of ${known.join(', ')}`, `The parameter "${name}" cannot be fitted for this design; choose from ${known.join(', ')}.`));
  if (new Set(names).size !== names.length) out.push(problem('parameters', names.join(','), 'each parameter once', 'A parameter is named twice.'));
  if (names.length === 0) out.push(problem('parameters', '', 'at least one parameter', 'Choose at least one parameter to fit.'));
  for (const [name, b] of Object.entries(o.bounds ?? {})) {
    const p = offered.find((q) => q.name === name);
    const hi = p?.unit === '×' ? 100 : (p?.upper ?? 0);
    if (!(Number.isFinite(b.lower) && Number.isFinite(b.upper) && b.lower >= 0 && b.lower < b.upper && b.upper <= hi))
      out.push(problem(`bounds.${name}`, `${b.lower} … ${b.upper}`, `0 ≤ lower < upper ≤ ${hi}`,
        `The bounds of ${name} (${b.lower} … ${b.upper}) must satisfy 0 ≤ lower < upper ≤ ${hi}.`));
  }
  for (const [key, sigma] of [['lossSigmaW', o.lossSigmaW], ['temperatureSigmaK', o.temperatureSigmaK]] as const)
    if (sigma !== undefined && !(Number.isFinite(sigma) && sigma > 0))
      out.push(problem(key, sigma, '> 0', `${key} must be a positive number (got ${sigma}).`));
  m.points.forEach((p, i) => {
    const c = pointConditions(design, p);
    for (const q of checkConditionOverrides(design, c))
      out.push(problem(`measurement.points[${i}].${q.path.replace('conditions.', '')}`, q.value, q.allowed, `Measured point ${i + 1}: ${q.message}`));
  });
  const values = m.points.length + measuredRoles(m).perPoint.reduce((s, r) => s + r.length, 0);
  if (out.length === 0 && values <= names.length)
    out.push(problem('parameters', names.length, `fewer than the ${values} measured values`,
      `${names.length} parameters cannot be fitted to ${values} measured values; measure more points or fit fewer parameters.`));
  return out;
}

const rms = (xs: number[]): number => (xs.length === 0 ? 0 : Math.sqrt(xs.reduce((s, x) => s + x * x, 0) / xs.length));

/** Fits `design` to `measurement` (see the header). Never throws for bad input: problems come back as data. */
export function calibrate(design: Design, measurement: Measurement, options: CalibrationOptions = {}): CalibrationOutcome {
  const roles = measuredRoles(measurement);
  const offered = fitParameters(design);
  const names = options.parameters ?? defaultFitParameters(design, roles.all);
  const problems = checkRequest(design, measurement, names, options, offered);
  if (problems.length > 0) return { ok: false, problems };
  const params = names.map((n) => offered.find((p) => p.name === n)!);
  const lower = params.map((p) => options.bounds?.[p.name]?.lower ?? p.lower);
  const upper = params.map((p) => options.bounds?.[p.name]?.upper ?? p.upper);
  const start = params.map((p, j) => Math.min(upper[j], Math.max(lower[j], p.initial)));
  const lossSigmaW = options.lossSigmaW ?? 0.002 * design.spec.voutV * design.spec.ratedLoadA;
  const temperatureSigmaK = options.temperatureSigmaK ?? 1;
  const measured = measurement.points.map((p) => measuredBalance(p, design.spec.voutV));
  const measuredT = measurement.points.map((p, i) => roles.perPoint[i].map((r) => p.temperaturesC![r]!));
  const m = measurement.points.length + measuredT.reduce((s, t) => s + t.length, 0);
  const r = new Float64Array(m);
  const residualsOf = (model: ModelPoint[]): Float64Array => {
    let k = 0;
    model.forEach((mp, i) => {
      r[k++] = (measured[i].lossW - mp.lossW) / lossSigmaW;
    });
    model.forEach((mp, i) => {
      measuredT[i].forEach((t, j) => {
        r[k++] = (t - mp.temperaturesC[j]) / temperatureSigmaK;
      });
    });
    return r;
  };
  const modelAt = (x: readonly number[]) => modelPoints(applyParameters(design, params, x), measurement.points, roles.perPoint);
  const fit = leastSquares(
    { residuals: (x) => residualsOf(modelAt(x)), start, lower, upper, scale: params.map((p) => p.typical) },
    { maxIterations: options.maxIterations ?? 50, differenceStep: 1e-5, stepTolerance: 1e-7, reductionTolerance: 1e-10 },
  );
  const stats = parameterStatistics(fit.jacobian, fit.residuals, fit.m, fit.n);
  const fitted: FittedParameter[] = params.map((p, j) => {
    const hw = stats.halfWidths[j];
    const known = hw !== null;
    return {
      name: p.name,
      label: p.label,
      unit: p.unit,
      initial: p.initial,
      fitted: fit.x[j],
      lower95: known ? fit.x[j] - hw : lower[j],
      upper95: known ? fit.x[j] + hw : upper[j],
      intervalKnown: known,
      standardError: stats.standardErrors[j],
      lower: lower[j],
      upper: upper[j],
      atBound: fit.atLower[j] ? 'lower' : fit.atUpper[j] ? 'upper' : null,
    };
  });
  const before = modelAt(start);
  const after = modelAt(fit.x);
  const points: PointComparison[] = measurement.points.map((p, i) => ({
    index: i,
    vinV: p.vinV,
    loadA: p.loadA,
    measuredEfficiency: measured[i].efficiency,
    efficiencyBefore: before[i].efficiency,
    efficiencyAfter: after[i].efficiency,
    measuredLossW: measured[i].lossW,
    lossBeforeW: before[i].lossW,
    lossAfterW: after[i].lossW,
    residualBeforePoints: 100 * (measured[i].efficiency - before[i].efficiency),
    residualAfterPoints: 100 * (measured[i].efficiency - after[i].efficiency),
    temperatures: roles.perPoint[i].map((role, j) => ({ role, measuredC: measuredT[i][j], beforeC: before[i].temperaturesC[j], afterC: after[i].temperaturesC[j] })),
  }));
  const residualRms = (side: 'lossBeforeW' | 'lossAfterW', t: 'beforeC' | 'afterC'): ResidualRms => ({
    lossW: rms(points.map((q) => q.measuredLossW - q[side])),
    temperatureK: rms(points.flatMap((q) => q.temperatures.map((x) => x.measuredC - x[t]))),
  });
  const adopted = applyParameters(design, params, fit.x);
  const ratedBefore = evaluate(applyParameters(design, params, start));
  const ratedAfter = evaluate(adopted);
  const gb = lossByGroup(ratedBefore.losses);
  const ga = lossByGroup(ratedAfter.losses);
  const groups = LOSS_GROUPS.map((group) => ({ group, beforeW: gb[group], afterW: ga[group] }));
  const measurementSha256 = measurementHash(measurement);
  const warnings = calibrationWarnings(fitted, stats.issues, fit.converged, [...before, ...after].some((q) => !q.converged));
  const calibratedDesign: Design = {
    ...adopted,
    measurements: measurement,
    calibration: {
      measurementSha256,
      parameters: fitted.map((p) => ({ name: p.name, initial: p.initial, fitted: p.fitted, lower95: p.lower95, upper95: p.upper95 })),
    },
  };
  const atRated = { beforeW: ratedBefore.totalLoss, afterW: ratedAfter.totalLoss, groups };
  return {
    ok: true,
    calibration: {
      measurementSha256,
      parameters: fitted,
      correlations: stats.correlations,
      points,
      residualRms: { before: residualRms('lossBeforeW', 'beforeC'), after: residualRms('lossAfterW', 'afterC') },
      atRated,
      summary: calibrationSummary(fitted, atRated),
      warnings,
      weights: { lossSigmaW, temperatureSigmaK },
      solver: { iterations: fit.iterations, evaluations: fit.evaluations, converged: fit.converged, degreesOfFreedom: stats.dof, tValue: stats.tValue },
      calibratedDesign,
      caution: CALIBRATION_CAUTION,
    },
  };
}


