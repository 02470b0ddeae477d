/**
 * Engine figures of issue 14, in this process: a full converged electro-thermal point (`evaluate`), a lean
 * point (the sweep path, `ledgerEvaluator(design).lean`), a 200-point sweep with landmarks
 * (`sweepWithLandmarks`, the call the app makes on each edit), a seeded 10 000-sample Monte Carlo, and the
 * allocation per swept point. Times are CPU time per call (wall time in the detail line).
 */
import { DEMO_DESIGNS, evaluate, ledgerEvaluator, monteCarlo, sweepLoad, sweepWithLandmarks, validateDesign } from '../../shared-model/index.ts';
import type { Design } from '../../shared-model/index.ts';
import { figureOf, median, type Figure } from './figures.ts';
import { CHILD_SEMI_SPACE_MB, sampledBytesPerCall, timeInSmallYoungGeneration } from './sweep-budget.ts';
import { scaled, timeRuns, type Runs } from './timing.ts';

export function demoDesign(id: string): Design {
  const r = validateDesign(DEMO_DESIGNS.find((d) => d.id === id)?.json);
  if (!r.ok) throw new Error(`bench: demo design ${id} is invalid`);
  return r.design;
}

/** The design every engine figure uses: the synchronous-buck demo (the app's first screen). */
export const BENCH_DESIGN_ID = 'synchronous-buck';

const wallLine = (r: Runs, k: number, unit: string) => `wall-clock median ${(median(r.wallMs) * k).toFixed(2)} ${unit} (CPU time is the figure)`;

/** Loads from 10 % to 120 % of rated: the points a sweep visits, in the order the timing cycles them. */
function loadsOf(design: Design): number[] {
  return Array.from({ length: 100 }, (_, i) => design.spec.ratedLoadA * (0.1 + (1.1 * i) / 99));
}

export function pointFigures(quick: boolean): Figure[] {
  const design = demoDesign(BENCH_DESIGN_ID);
  const loads = loadsOf(design);
  const runs = quick ? 3 : 7;
  const repeat = quick ? 200 : 1000;
  let k = 0;
  const full = timeRuns(() => void evaluate(design, { loadA: loads[k++ % loads.length] }), runs, repeat);
  const evaluator = ledgerEvaluator(design);
  let j = 0;
  const lean = timeRuns(() => void evaluator.lean({ loadA: loads[j++ % loads.length] }), runs, repeat);
  return [
    figureOf({
      name: 'point-full-us',
      unit: 'µs',
      goal: 2,
      samples: scaled(full.cpuMs, 1000),
      what: `one fully converged electro-thermal point with every loss term, rating and hazard record (evaluate), ${BENCH_DESIGN_ID}, 10–120 % load, mean of ${repeat} calls per run`,
      detail: [wallLine(full, 1000, 'µs')],
    }),
    figureOf({
      name: 'point-lean-us',
      unit: 'µs',
      goal: 2,
      samples: scaled(lean.cpuMs, 1000),
      what: `one converged point on the sweep path (ledgerEvaluator(design).lean, set-up done once), ${BENCH_DESIGN_ID}, 10–120 % load`,
      detail: [wallLine(lean, 1000, 'µs')],
    }),
  ];
}

/** Calls per timed run of a sweep+landmarks: its time varies with the scavenges that fall in it. */
export const SWEEP_REPEAT = 10;

export function sweepTimeMs(quick: boolean): Runs {
  const design = demoDesign(BENCH_DESIGN_ID);
  return timeRuns(() => void sweepWithLandmarks(design), quick ? 3 : 7, SWEEP_REPEAT);
}

export function sweepFigures(quick: boolean, script: string, args: string[]): Figure[] {
  const t = sweepTimeMs(quick);
  const child = timeInSmallYoungGeneration(script, args);
  const out = [
    figureOf({
      name: 'sweep-landmarks-ms',
      unit: 'ms',
      goal: 0.5,
      samples: t.cpuMs,
      what: `200-point load sweep with every landmark refined (sweepWithLandmarks, the call the app makes on each edit), ${BENCH_DESIGN_ID}, mean of ${SWEEP_REPEAT} calls per run`,
      detail: [wallLine(t, 1, 'ms')],
    }),
  ];
  if (typeof child === 'string') {
    console.error(`bench: sweep-landmarks-small-young-ms not measured: ${child}`);
  } else {
    out.push(
      figureOf({
        name: 'sweep-landmarks-small-young-ms',
        unit: 'ms',
        goal: null,
        samples: child.cpuMs,
        what: `the same in a child node --max-semi-space-size=${CHILD_SEMI_SPACE_MB} (the garbage-collection pressure headless Chromium showed)`,
        detail: [`wall-clock median ${median(child.wallMs).toFixed(2)} ms`],
      }),
    );
  }
  return out;
}

export function monteCarloFigure(quick: boolean): Figure {
  const design = demoDesign(BENCH_DESIGN_ID);
  const t = timeRuns(() => void monteCarlo(design, { seed: 1, samples: 10000 }), quick ? 1 : 3, 1, 0);
  return figureOf({
    name: 'monte-carlo-10k-ms',
    unit: 'ms',
    goal: 50,
    samples: t.cpuMs,
    what: `seeded Monte Carlo of 10 000 samples with the default tolerances (monteCarlo), ${BENCH_DESIGN_ID}, one thread`,
    detail: [wallLine(t, 1, 'ms')],
  });
}

export async function allocationFigure(quick: boolean): Promise<Figure> {
  const design = demoDesign(BENCH_DESIGN_ID);
  const calls = quick ? 5 : 40;
  const sweepBytes = await sampledBytesPerCall(() => void sweepLoad(design), calls);
  const withLandmarks = await sampledBytesPerCall(() => void sweepWithLandmarks(design), calls);
  return figureOf({
    name: 'alloc-per-point-kb',
    unit: 'KB',
    goal: 4,
    samples: [sweepBytes / 200 / 1024],
    what: `bytes allocated per swept point of a 200-point sweepLoad (V8 sampling heap profiler, 64 B interval, objects later collected included: an estimate), ${BENCH_DESIGN_ID}, mean of ${calls} sweeps`,
    detail: [`sweep with landmarks: ${(withLandmarks / 1024).toFixed(0)} KB per call; 200-point sweep alone ${(sweepBytes / 1024).toFixed(0)} KB`],
  });
}
