/**
 * Worst-case corners: the design evaluated (fully electro-thermally, at one load, default rated) at every
 * combination of the extremes of each tolerance — Vin min/max, ambient min/max, RDS(on), DCR, ESR,
 * inductance and switching frequency each at −/+ its spread (up to 2⁷ = 128 corners; a tolerance of zero
 * width contributes one level). Names the corner of lowest efficiency, the corner closest to (or furthest
 * over) a temperature limit, and each part's hottest corner.
 * Caution: corners bound a result only where it changes monotonically with each tolerance; use the Monte
 * Carlo for the interior.
 * The corners run on the lean path with one set-up, the parts varied in place in one copy of the design
 * (sample-evaluator.ts); the results are those of evaluating each corner alone. With a caller's own
 * evaluator, corners that differ only in Vin, ambient and fs share one varied design (16 for 128 corners).
 */
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation } from '../ledger/types.ts';
import type { Conditions } from '../operating-point/types.ts';
import { conditionsFor, evaluatorFor } from '../sweep/evaluator.ts';
import type { PointEvaluator } from '../sweep/types.ts';
import type { Tolerances, ResolvedTolerances, Variation } from './variation.ts';
import { applyVariation, checkTolerances, describeVariation, nominalVariation, partsKey, resolveTolerances, varyConditions, varyDesign } from './variation.ts';
import { sampleEvaluator } from './sample-evaluator.ts';

export interface CornerTemperature {
  part: Role;
  partName: string;
  celsius: number;
  limitC: number;
  marginK: number;
}

export interface ToleranceCorner {
  label: string;
  variation: Variation;
  efficiency: number;
  totalLoss: number;
  converged: boolean;
  temperatures: CornerTemperature[];
  /** The smallest margin of any part below its derated limit, K, and whose it is. */
  worstMarginK: number;
  worstPart: Role | null;
  warningCodes: string[];
}

export interface WorstCaseOptions {
  tolerances?: Tolerances;
  loadA?: number;
  conditions?: Partial<Omit<Conditions, 'loadA'>>;
  evaluator?: PointEvaluator;
}

export interface WorstCase {
  loadA: number;
  tolerances: ResolvedTolerances;
  nominal: ToleranceCorner;
  corners: ToleranceCorner[];
  worstEfficiency: ToleranceCorner;
  worstTemperature: ToleranceCorner;
  hottestByPart: { part: Role; partName: string; corner: string; celsius: number; marginK: number }[];
  caution: string;
}

export const CORNER_CAUTION =
  'Corners bound a result only where it changes monotonically with each tolerance; the Monte Carlo covers the interior. ' +
  'Estimates only: measure on hardware.';

/** The extreme levels of each tolerance as variations (full factorial). */
export function cornerVariations(t: ResolvedTolerances): Variation[] {
  const levels = (lo: number, hi: number) => (lo === hi ? [lo] : [lo, hi]);
  const spread = (f: number) => levels(1 - f, 1 + f);
  const out: Variation[] = [];
  for (const vinV of levels(t.vinV.min, t.vinV.max))
    for (const ambientC of levels(t.ambientC.min, t.ambientC.max))
      for (const rds of spread(t.rdsOnFraction))
        for (const dcr of spread(t.dcrFraction))
          for (const esr of spread(t.esrFraction))
            for (const l of spread(t.inductanceFraction))
              for (const f of spread(t.frequencyFraction))
                out.push({
                  vinV,
                  ambientC,
                  switchRdsOnScale: rds,
                  rectifierRdsOnScale: rds,
                  dcrScale: dcr,
                  inductanceScale: l,
                  inputEsrScale: esr,
                  outputEsrScale: esr,
                  frequencyScale: f,
                });
  return out;
}

export function evaluateCorner(design: Design, base: Conditions, v: Variation, evaluator: PointEvaluator): ToleranceCorner {
  const applied = applyVariation(design, base, v);
  return cornerRecord(v, evaluator(applied.design, applied.conditions));
}

/** What a corner reads of an evaluation (the full record and the lean one both carry it). */
type CornerSource = Pick<Evaluation, 'efficiency' | 'totalLoss' | 'converged' | 'temperatures' | 'warnings'>;

function cornerRecord(v: Variation, e: CornerSource): ToleranceCorner {
  let worstMarginK = Infinity;
  let worstPart: Role | null = null;
  const temperatures = e.temperatures.map((t) => {
    if (t.marginK < worstMarginK) {
      worstMarginK = t.marginK;
      worstPart = t.part;
    }
    return { part: t.part, partName: t.partName, celsius: t.celsius, limitC: t.limit, marginK: t.marginK };
  });
  return {
    label: describeVariation(v),
    variation: v,
    efficiency: e.efficiency,
    totalLoss: e.totalLoss,
    converged: e.converged,
    temperatures,
    worstMarginK: Number.isFinite(worstMarginK) ? worstMarginK : 0,
    worstPart,
    warningCodes: [...new Set(e.warnings.map((w) => w.code))],
  };
}

export function worstCase(design: Design, options: WorstCaseOptions = {}): WorstCase {
  const problems = checkTolerances(options.tolerances ?? {});
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const tolerances = resolveTolerances(design, options.tolerances);
  const base = conditionsFor(design, { ...options.conditions, loadA: options.loadA });
  const lean = options.evaluator ? null : sampleEvaluator(design);
  const byParts = new Map<string, { design: Design; evaluate: PointEvaluator }>();
  const corner = (v: Variation): ToleranceCorner => {
    if (lean) return cornerRecord(v, lean(v, varyConditions(base, v)));
    const key = partsKey(v);
    let entry = byParts.get(key);
    if (!entry) {
      const varied = varyDesign(design, v);
      entry = { design: varied, evaluate: evaluatorFor(varied, options.evaluator) };
      byParts.set(key, entry);
    }
    return cornerRecord(v, entry.evaluate(entry.design, varyConditions(base, v)));
  };
  const nominal = corner(nominalVariation(base));
  const corners = cornerVariations(tolerances).map(corner);
  // A corner that does not converge (runaway) is worse than any that does.
  const rank = (c: ToleranceCorner) => (c.converged ? 0 : 1);
  let worstEfficiency = corners[0];
  let worstTemperature = corners[0];
  for (const c of corners) {
    if (rank(c) > rank(worstEfficiency) || (rank(c) === rank(worstEfficiency) && c.efficiency < worstEfficiency.efficiency)) worstEfficiency = c;
    if (rank(c) > rank(worstTemperature) || (rank(c) === rank(worstTemperature) && c.worstMarginK < worstTemperature.worstMarginK)) worstTemperature = c;
  }
  const hottestByPart = nominal.temperatures.map((t, j) => {
    let best = corners[0];
    for (const c of corners) if ((c.temperatures[j]?.celsius ?? -Infinity) > (best.temperatures[j]?.celsius ?? -Infinity)) best = c;
    const bt = best.temperatures[j] ?? t;
    return { part: t.part, partName: t.partName, corner: best.label, celsius: bt.celsius, marginK: bt.marginK };
  });
  return { loadA: base.loadA, tolerances, nominal, corners, worstEfficiency, worstTemperature, hottestByPart, caution: CORNER_CAUTION };
}
