/**
 * Monte Carlo tolerance analysis with a visible, settable seed.
 *
 * Each sample draws, in a fixed order from one MT19937 stream (prng.ts): Vin, ambient, switch RDS(on),
 * rectifier RDS(on), inductor DCR, inductance, input-capacitor ESR, output-capacitor ESR, switching
 * frequency — nine draws per sample whatever the design, so a seed always gives the same samples.
 * Distributions: "uniform" (scale uniform on 1 ± spread; Vin and ambient uniform over their range) or
 * "normal" (scale normal with the spread at 3 standard deviations, redrawn beyond ±3σ [common practice];
 * Vin and ambient then normal about the middle of the range, also cut at its ends). Vin and ambient vary
 * only with `spreadConditions`; otherwise they stay at the chosen conditions.
 * Result: distribution of efficiency and of each part's temperature (summary, histogram), the fraction of
 * samples over each part's derated limit, its absolute limit, its touch limit, below the efficiency target,
 * and not regulating. With every tolerance zero every sample equals the nominal evaluation.
 * Chunkable for a pool of workers: runMonteCarloSamples evaluates samples [from, to) (drawing the one
 * stream from its start, so a sample's variation never depends on the split) and summarizeMonteCarlo puts
 * chunks together; monteCarlo is both on one thread, and a pool's result equals it exactly.
 * The samples run on the lean path with one set-up (sample-evaluator.ts: the parts varied in place in a
 * copy of the design; the same numbers as evaluate on the varied design). A caller's own `evaluator` (a
 * stand-in, the multiphase evaluator) is called with a new varied design for each sample instead.
 */
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation, PartTemperature } from '../ledger/types.ts';
import type { Warning } from '../warnings.ts';
import type { Conditions } from '../operating-point/types.ts';
import { conditionsFor, defaultEvaluator, evaluatorFor } from '../sweep/evaluator.ts';
import type { PointEvaluator, OptionProblem } from '../sweep/types.ts';
import type { RandomSource } from './prng.ts';
import { createRandom, isValidSeed } from './prng.ts';
import type { SampleHistogram, SampleSummary } from './statistics.ts';
import { sampleHistogram, summarizeSamples } from './statistics.ts';
import type { ResolvedTolerances, Tolerances, Variation } from './variation.ts';
import { applyVariation, checkTolerances, partsNominal, resolveTolerances, varyConditions } from './variation.ts';
import { sampleEvaluator } from './sample-evaluator.ts';

export type MonteCarloDistribution = 'uniform' | 'normal';
export const DEFAULT_MONTE_CARLO_SAMPLES = 2000;
export const MAX_MONTE_CARLO_SAMPLES = 1_000_000;
export const DEFAULT_MONTE_CARLO_SEED = 1;

export interface MonteCarloOptions {
  seed: number;
  samples?: number;
  distribution?: MonteCarloDistribution;
  tolerances?: Tolerances;
  /** Also vary Vin and ambient over their tolerance ranges (default false: held at `conditions`). */
  spreadConditions?: boolean;
  loadA?: number;
  conditions?: Partial<Omit<Conditions, 'loadA'>>;
  /** Efficiency below which a sample counts as failing (default: the design's target at rated load, if any). */
  efficiencyTarget?: number;
  /** Keep every sample's efficiency and temperatures in the result (default false). */
  keepSamples?: boolean;
  histogramBins?: number;
  evaluator?: PointEvaluator;
}

export interface PartDistribution {
  part: Role;
  partName: string;
  limitC: number;
  deratedLimitC: number;
  summary: SampleSummary;
  histogram: SampleHistogram;
  /** Fraction of samples over the limit less the design margin, and over the limit itself. */
  fractionOverDerated: number;
  fractionOverLimit: number;
  /** Fraction over the touch limit of its surface (null: the part is not touchable). */
  fractionOverTouch: number | null;
}

export interface MonteCarlo {
  seed: number;
  samples: number;
  distribution: MonteCarloDistribution;
  spreadConditions: boolean;
  tolerances: ResolvedTolerances;
  loadA: number;
  nominal: { efficiency: number; temperatures: { part: Role; celsius: number }[] };
  efficiency: { summary: SampleSummary; histogram: SampleHistogram };
  temperatures: PartDistribution[];
  efficiencyTarget: { target: number; fractionBelow: number } | null;
  /** Fraction of samples that cannot regulate (duty limit, cannot regulate, thermal runaway). */
  fractionNotRegulating: number;
  values?: { efficiency: number[]; temperaturesC: number[][] };
}

export function checkMonteCarloOptions(options: MonteCarloOptions): OptionProblem[] {
  const problems = checkTolerances(options.tolerances ?? {});
  if (!isValidSeed(options.seed)) {
    problems.push({ path: 'seed', value: options.seed, allowed: 'whole number 0 … 4294967295', message: `seed must be a whole number from 0 to 4294967295 (got ${options.seed}).` });
  }
  const n = options.samples ?? DEFAULT_MONTE_CARLO_SAMPLES;
  if (!Number.isInteger(n) || n < 1 || n > MAX_MONTE_CARLO_SAMPLES) {
    problems.push({ path: 'samples', value: n, allowed: `whole number 1 … ${MAX_MONTE_CARLO_SAMPLES}`, message: `samples must be a whole number from 1 to ${MAX_MONTE_CARLO_SAMPLES} (got ${n}).` });
  }
  const d = options.distribution ?? 'uniform';
  if (d !== 'uniform' && d !== 'normal') {
    problems.push({ path: 'distribution', value: d, allowed: '"uniform" or "normal"', message: `distribution must be "uniform" or "normal" (got ${String(d)}).` });
  }
  return problems;
}

/** A draw in [−1, 1]: uniform, or a normal deviate divided by 3 and redrawn beyond ±3σ. */
function unitDraw(rng: RandomSource, distribution: MonteCarloDistribution): number {
  if (distribution === 'uniform') return 2 * rng.nextFloat() - 1;
  for (;;) {
    const z = rng.nextNormal();
    if (Math.abs(z) <= 3) return z / 3;
  }
}

/** Draws one variation (nine draws, always in the same order). */
export function drawVariation(rng: RandomSource, t: ResolvedTolerances, distribution: MonteCarloDistribution, base: Conditions, spreadConditions: boolean): Variation {
  const vinDraw = unitDraw(rng, distribution);
  const ambientDraw = unitDraw(rng, distribution);
  return {
    vinV: spreadConditions ? (t.vinV.min + t.vinV.max) / 2 + (vinDraw * (t.vinV.max - t.vinV.min)) / 2 : base.vinV,
    ambientC: spreadConditions ? (t.ambientC.min + t.ambientC.max) / 2 + (ambientDraw * (t.ambientC.max - t.ambientC.min)) / 2 : base.ambientC,
    switchRdsOnScale: 1 + t.rdsOnFraction * unitDraw(rng, distribution),
    rectifierRdsOnScale: 1 + t.rdsOnFraction * unitDraw(rng, distribution),
    dcrScale: 1 + t.dcrFraction * unitDraw(rng, distribution),
    inductanceScale: 1 + t.inductanceFraction * unitDraw(rng, distribution),
    inputEsrScale: 1 + t.esrFraction * unitDraw(rng, distribution),
    outputEsrScale: 1 + t.esrFraction * unitDraw(rng, distribution),
    frequencyScale: 1 + t.frequencyFraction * unitDraw(rng, distribution),
  };
}

const NOT_REGULATING = new Set(['duty-limit', 'cannot-regulate', 'thermal-runaway']);

/** What every chunk and the summary share: the options resolved and the nominal evaluation. */
interface MonteCarloSetup {
  n: number;
  distribution: MonteCarloDistribution;
  spreadConditions: boolean;
  tolerances: ResolvedTolerances;
  base: Conditions;
  nominalEval: Evaluation;
  nominalEvaluator: PointEvaluator;
  evaluator: PointEvaluator;
  parts: Role[];
}

function setupOf(design: Design, options: MonteCarloOptions): MonteCarloSetup {
  const problems = checkMonteCarloOptions(options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const nominalEvaluator = evaluatorFor(design, options.evaluator);
  const base = conditionsFor(design, { ...options.conditions, loadA: options.loadA });
  const nominalEval = nominalEvaluator(design, base);
  return {
    n: options.samples ?? DEFAULT_MONTE_CARLO_SAMPLES,
    distribution: options.distribution ?? 'uniform',
    spreadConditions: options.spreadConditions ?? false,
    tolerances: resolveTolerances(design, options.tolerances),
    base,
    nominalEval,
    nominalEvaluator,
    evaluator: options.evaluator ?? defaultEvaluator,
    parts: nominalEval.temperatures.map((t) => t.part),
  };
}

/**
 * Samples [from, to) of a Monte Carlo: each sample's efficiency and part temperatures (part-major, aligned
 * with the nominal evaluation's parts) and the counts over limits. The one MT19937 stream is drawn from
 * its start, so sample i has the same variation whatever chunk evaluates it: chunks run anywhere (a pool
 * of workers) and put together by summarizeMonteCarlo give exactly monteCarlo's result.
 */
export interface MonteCarloSampleChunk {
  from: number;
  to: number;
  efficiency: number[];
  temperaturesC: number[][];
  overDerated: number[];
  overLimit: number[];
  overTouch: number[];
  notRegulating: number;
}

export function runMonteCarloSamples(design: Design, options: MonteCarloOptions, from = 0, to?: number): MonteCarloSampleChunk {
  const setup = setupOf(design, options);
  const { parts, tolerances, distribution, base, spreadConditions, nominalEvaluator, evaluator } = setup;
  const end = Math.min(to ?? setup.n, setup.n);
  const start = Math.max(0, Math.min(from, end));
  const count = end - start;
  const efficiency = new Array<number>(count).fill(0);
  const temps = parts.map(() => new Array<number>(count).fill(0));
  const overDerated = new Array<number>(parts.length).fill(0);
  const overLimit = new Array<number>(parts.length).fill(0);
  const overTouch = new Array<number>(parts.length).fill(0);
  let notRegulating = 0;
  const rng = createRandom(options.seed);
  const evaluateSample = samplesOf(design, base, options.evaluator ? { nominalEvaluator, evaluator } : null);
  for (let i = 0; i < end; i++) {
    const v = drawVariation(rng, tolerances, distribution, base, spreadConditions);
    if (i < start) continue;
    const k = i - start;
    const e = evaluateSample(v);
    efficiency[k] = e.efficiency;
    let runaway = false;
    for (let w = 0; w < e.warnings.length; w++) {
      if (e.warnings[w].code === 'thermal-runaway') runaway = true;
    }
    for (let w = 0; w < e.warnings.length; w++) {
      if (NOT_REGULATING.has(e.warnings[w].code)) {
        notRegulating += 1;
        break;
      }
    }
    for (let j = 0; j < parts.length; j++) {
      let t: PartTemperature | undefined = e.temperatures[j];
      if (t?.part !== parts[j]) {
        t = undefined;
        for (const x of e.temperatures) if (x.part === parts[j]) t = x;
      }
      if (!t) continue;
      temps[j][k] = t.celsius;
      if (t.marginK < 0) overDerated[j] += 1;
      if (t.celsius > t.limit) overLimit[j] += 1;
    }
    for (const h of e.hazards) {
      const j = parts.indexOf(h.part);
      // As the full record's Hazard.exceeded (ledger/keep.ts): below the touch limit, or no steady state.
      if (j >= 0 && (h.marginK < 0 || runaway)) overTouch[j] += 1;
    }
  }
  return { from: start, to: end, efficiency, temperaturesC: temps, overDerated, overLimit, overTouch, notRegulating };
}

/** What the sample loop reads of an evaluation (the full record and the lean one both carry it). */
interface SampleResult {
  efficiency: number;
  warnings: readonly Warning[];
  temperatures: readonly PartTemperature[];
  hazards: readonly { part: Role; marginK: number }[];
}

/**
 * Each sample's evaluation: the lean path with one set-up (sample-evaluator.ts), or the caller's own
 * evaluator on a new varied design (nominal parts: the nominal evaluator).
 */
function samplesOf(
  design: Design,
  base: Conditions,
  given: { nominalEvaluator: PointEvaluator; evaluator: PointEvaluator } | null,
): (v: Variation) => SampleResult {
  if (!given) {
    const lean = sampleEvaluator(design);
    return (v) => lean(v, varyConditions(base, v));
  }
  return (v) => {
    if (partsNominal(v)) return given.nominalEvaluator(design, varyConditions(base, v));
    const applied = applyVariation(design, base, v);
    return given.evaluator(applied.design, applied.conditions);
  };
}

/** Chunks covering samples 0 … n − 1 (in any order) put together into the Monte Carlo result. */
export function summarizeMonteCarlo(design: Design, options: MonteCarloOptions, chunks: readonly MonteCarloSampleChunk[]): MonteCarlo {
  const { n, parts, nominalEval, tolerances, distribution, spreadConditions, base } = setupOf(design, options);
  const efficiency = new Float64Array(n);
  const temps = parts.map(() => new Float64Array(n));
  const overDerated = new Array<number>(parts.length).fill(0);
  const overLimit = new Array<number>(parts.length).fill(0);
  const overTouch = new Array<number>(parts.length).fill(0);
  let notRegulating = 0;
  let covered = 0;
  for (const c of chunks) {
    efficiency.set(c.efficiency, c.from);
    for (let j = 0; j < parts.length; j++) {
      temps[j].set(c.temperaturesC[j] ?? [], c.from);
      overDerated[j] += c.overDerated[j] ?? 0;
      overLimit[j] += c.overLimit[j] ?? 0;
      overTouch[j] += c.overTouch[j] ?? 0;
    }
    notRegulating += c.notRegulating;
    covered += c.to - c.from;
  }
  if (covered !== n) throw new Error(`Monte Carlo chunks cover ${covered} samples, not ${n}`);
  const touchParts = new Map(nominalEval.hazards.map((h, k) => [h.part, k]));
  const bins = options.histogramBins ?? 30;
  const target = options.efficiencyTarget ?? design.spec.targets?.efficiencyAtRated;
  let below = 0;
  if (target !== undefined) for (let i = 0; i < n; i++) if (efficiency[i] < target) below += 1;
  const result: MonteCarlo = {
    seed: options.seed,
    samples: n,
    distribution,
    spreadConditions,
    tolerances,
    loadA: base.loadA,
    nominal: { efficiency: nominalEval.efficiency, temperatures: nominalEval.temperatures.map((t) => ({ part: t.part, celsius: t.celsius })) },
    efficiency: { summary: summarizeSamples(efficiency), histogram: sampleHistogram(efficiency, bins) },
    temperatures: nominalEval.temperatures.map((t, j) => ({
      part: t.part,
      partName: t.partName,
      limitC: t.limit,
      deratedLimitC: t.celsius + t.marginK,
      summary: summarizeSamples(temps[j]),
      histogram: sampleHistogram(temps[j], bins),
      fractionOverDerated: overDerated[j] / n,
      fractionOverLimit: overLimit[j] / n,
      fractionOverTouch: touchParts.has(t.part) ? overTouch[j] / n : null,
    })),
    efficiencyTarget: target === undefined ? null : { target, fractionBelow: below / n },
    fractionNotRegulating: notRegulating / n,
  };
  if (options.keepSamples) result.values = { efficiency: Array.from(efficiency), temperaturesC: temps.map((a) => Array.from(a)) };
  return result;
}

export function monteCarlo(design: Design, options: MonteCarloOptions): MonteCarlo {
  return summarizeMonteCarlo(design, options, [runMonteCarloSamples(design, options)]);
}
