/**
 * A multiphase point as the ordinary `Evaluation` record, so sweeps, landmarks, comparison, ranking,
 * tolerance and the report read a multiphase design through the evaluator seam they already have
 * (`LoadSweepOptions.evaluator`, a `PointEvaluator`).
 *
 * Flattening: each (part, mechanism) term is the sum over the phases (the set of terms is the one-phase
 * design's, so sweep columns stay stable); each part's temperature is its hottest copy (phase 1 when a
 * mismatch is set); checks and hazards are those of the worst phase and of the shared parts; the operating
 * point is phase 1's (its output ripple is one phase's — the summed currents are in the PhasedEvaluation).
 * The per-phase rows stay in the PhasedEvaluation (`evaluatePhases`), which the results and report show.
 */
import type { Evaluation, LossTerm, PartTemperature } from '../ledger/types.ts';
import type { PhasedEvaluation } from './types.ts';

export function asEvaluation(p: PhasedEvaluation): Evaluation {
  const first = p.phaseRecords[0]!;
  const losses: LossTerm[] = [];
  const byKey = new Map<string, LossTerm>();
  for (const row of p.rows) {
    const key = `${row.part}|${row.mechanism}`;
    const seen = byKey.get(key);
    if (seen) seen.watts += row.watts;
    else {
      const { phase: _phase, ...term } = row;
      const copy: LossTerm = { ...term, inputs: term.inputs.slice() };
      if (p.activePhases > 1 && row.phase !== 'shared') copy.formula = `Σ over ${p.activePhases} phases of ${term.formula}`;
      byKey.set(key, copy);
      losses.push(copy);
    }
  }
  // Keep the one-phase design's order of terms (sweep columns are aligned with it).
  const order = new Map(first.losses.map((t, i) => [`${t.part}|${t.mechanism}`, i]));
  losses.sort((a, b) => (order.get(`${a.part}|${a.mechanism}`) ?? 0) - (order.get(`${b.part}|${b.mechanism}`) ?? 0));
  const hottest = new Map<string, PartTemperature>();
  for (const t of p.temperatures) {
    const seen = hottest.get(t.part);
    if (!seen || t.celsius > seen.celsius) {
      const { phase: _phase, ...plain } = t;
      hottest.set(t.part, plain);
    }
  }
  const temperatures = first.temperatures.map((t) => hottest.get(t.part) ?? t);
  return {
    conditions: p.conditions,
    regulated: p.regulated,
    converged: p.converged,
    iterations: p.phaseRecords.reduce((a, r) => a + r.iterations, 0),
    efficiency: p.efficiency,
    inputPower: p.inputPower,
    outputPower: p.outputPower,
    totalLoss: p.totalLoss,
    dutyCycle: p.dutyCycle,
    conductionMode: p.conductionMode,
    losses,
    temperatures,
    hazards: p.hazards.map(({ phase: _phase, ...h }) => h),
    checks: p.checks.map(({ phase: _phase, ...c }) => c),
    warnings: p.warnings,
    operatingPoint: first.operatingPoint,
    heatsinks: first.heatsinks,
  };
}
