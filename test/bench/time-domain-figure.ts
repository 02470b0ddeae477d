/**
 * `time-domain-ratio`: how much faster the analytic engine answers than a time-domain simulation giving
 * the same answer within 1 %, compared honestly:
 *   - analytic side: a full converged electro-thermal point with every loss term (`evaluate`);
 *   - reference: the cycle-by-cycle simulation (test/reference/cycle-by-cycle.ts, odex), started the way a
 *     user of a simulator starts one — inductor and output capacitor at zero — run to its own steady-state
 *     criterion (state change < 1e-6 per cycle on 3 consecutive cycles), at the LOOSEST integrator
 *     tolerance whose answer still agrees within 1 % with a tight run (1e-11) on the compared quantities;
 *   - compared quantities: the conduction loss of each element carrying ≥ 1 % of the conduction loss
 *     (Irms²·R; diode VF0·Iavg + Rd·Irms²), at the same duty, part temperatures and inductance (the
 *     reference is driven at the engine's converged duty with the engine's converged temperatures).
 * The figure is the smallest ratio over the demo designs; both answers and their difference are printed.
 */
import { conductionParameters, DEMO_DESIGNS, esrAt, evaluate, solveOperatingPoint } from '../../shared-model/index.ts';
import type { Conditions, ConductionParameters, Design } from '../../shared-model/index.ts';
import { engineConductionLosses } from '../reference/compare.ts';
import { simulateCycles, type CycleResult } from '../reference/cycle-by-cycle.ts';
import { demoDesign } from './engine-figures.ts';
import { figureOf, median, type Figure } from './figures.ts';
import { timeRuns } from './timing.ts';

const TOLERANCES = [1e-3, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9];
const TIGHT = 1e-11;
const SETTLE = 1e-6;
const AGREE = 0.01;

interface Setup {
  design: Design;
  /** The design the reference integrates: the inductance the engine uses at this mean current. */
  reference: Design;
  conditions: Conditions;
  duty: number;
  cp: ConductionParameters;
  engine: Record<string, number>;
}

function setupOf(id: string): Setup {
  const design = demoDesign(id);
  const e = evaluate(design);
  const t = (role: string) => e.temperatures.find((x) => x.part === role)?.celsius ?? e.conditions.ambientC;
  const cp = {
    ...conductionParameters(design, { switchC: t('switch'), rectifierC: t('rectifier'), inductorC: t('inductor'), senseC: t('senseResistor') }),
    outputCapacitorEsrOhm: esrAt(design.parts.outputCapacitor.part, t('outputCapacitor')) / design.parts.outputCapacitor.count,
  };
  const op = solveOperatingPoint(design, e.conditions, cp);
  const reference = { ...design, parts: { ...design.parts, inductor: { ...design.parts.inductor, inductanceH: op.inductanceH, rolloff: undefined } } };
  return { design, reference, conditions: e.conditions, duty: op.dutyCycle, cp, engine: engineConductionLosses(design, op, cp) };
}

const fromZero = (s: Setup, rtol: number): CycleResult =>
  simulateCycles(s.reference, s.conditions, s.duty, s.cp, { relativeTolerance: rtol, relativeChange: SETTLE, startInductorA: 0, startOutputV: 0, maxCycles: 200_000 });

/** Largest relative difference over the elements carrying ≥ 1 % of `b`'s conduction loss. */
function difference(a: Record<string, number>, b: Record<string, number>): { rel: number; where: string } {
  const total = Object.values(b).reduce((x, y) => x + y, 0);
  let worst = { rel: 0, where: '' };
  for (const [k, w] of Object.entries(b)) {
    if (w < 0.01 * total) continue;
    const rel = Math.abs((a[k] ?? 0) - w) / w;
    if (rel > worst.rel) worst = { rel, where: k };
  }
  return worst;
}

const lossesOf = (r: CycleResult) => Object.fromEntries(Object.entries(r.branches).map(([k, b]) => [k, b.conductionLossW]));
const mW = (x: Record<string, number>) =>
  Object.entries(x)
    .filter(([, w]) => w > 1e-6)
    .map(([k, w]) => `${k} ${(w * 1000).toFixed(2)}`)
    .join(', ');

export function timeDomainFigure(quick: boolean): Figure {
  const detail: string[] = [];
  const ratios: number[] = [];
  for (const { id } of DEMO_DESIGNS) {
    const s = setupOf(id);
    const tight = fromZero(s, TIGHT);
    if (!tight.converged) {
      detail.push(`${id}: the tight reference did not settle in ${tight.cycles} cycles; skipped`);
      continue;
    }
    const truth = lossesOf(tight);
    let chosen: { rtol: number; result: CycleResult } | null = null;
    for (const rtol of TOLERANCES) {
      const r = fromZero(s, rtol);
      if (r.converged && difference(lossesOf(r), truth).rel <= AGREE) {
        chosen = { rtol, result: r };
        break;
      }
    }
    if (!chosen) chosen = { rtol: TIGHT, result: tight };
    const rtol = chosen.rtol;
    const refT = timeRuns(() => void fromZero(s, rtol), quick ? 1 : 3, 1, 0);
    const anaT = timeRuns(() => void evaluate(s.design), quick ? 3 : 7, quick ? 200 : 1000);
    const ratio = median(refT.cpuMs) / median(anaT.cpuMs);
    ratios.push(ratio);
    const d = difference(s.engine, lossesOf(chosen.result));
    detail.push(
      `${id}: analytic full point ${(median(anaT.cpuMs) * 1000).toFixed(1)} µs; reference ${median(refT.cpuMs).toFixed(1)} ms at rtol ${rtol} ` +
        `(${chosen.result.cycles} cycles from zero, ${chosen.result.evaluations} evaluations) → ${ratio.toFixed(0)}×; ` +
        `conduction loss mW — engine: ${mW(s.engine)}; reference: ${mW(lossesOf(chosen.result))}; largest difference ${(d.rel * 100).toFixed(2)} % (${d.where})`,
    );
  }
  return figureOf({
    name: 'time-domain-ratio',
    unit: '×',
    goal: 1e4,
    better: 'higher',
    samples: [Math.min(...ratios)],
    what: `reference CPU time ÷ full-point CPU time, smallest over ${ratios.length} demo designs at rated load (reference from zero, own steady-state criterion ${SETTLE}, loosest tolerance agreeing within ${AGREE * 100} % of a ${TIGHT} run)`,
    detail,
  });
}
