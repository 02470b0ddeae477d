/**
 * `npm run bench`: speed of the engine, one line per figure with the median of several runs.
 *   1. µs per fully converged electro-thermal operating point (evaluate)      target ≤ 20 µs
 *   2. ms per 200-point load sweep (sweepLoad, defaults)                      target ≤ 5 ms
 *   3. ms per 10 000-sample Monte Carlo (monteCarlo, default tolerances)      target ≤ 300 ms
 *   4. the same operating point by the time-domain reference (test/reference/steady-state.ts): speed
 *      ratio and the largest relative difference in conduction losses     target ≥ 1000×, ≤ 1 %
 *      (rated load, conduction parameters at the converged temperatures, the analytic electrical
 *      solution at those parameters against the reference at the same duty)
 * Extra lines: landmark refinement cost, and per-design point times. A benchmark, not a timed test.
 * Options: --quick (fewer runs), --wall (rank by wall-clock time instead of CPU time).
 * Times are this process's CPU time (process.cpuUsage: user + system), so other work on the machine
 * inflates them little; the wall-clock median is printed beside it.
 */
import {
  conductionParameters,
  DEMO_DESIGNS,
  esrAt,
  evaluate,
  findLandmarks,
  monteCarlo,
  solveOperatingPoint,
  sweepLoad,
  validateDesign,
} from '../../shared-model/index.ts';
import type { Design, Evaluation } from '../../shared-model/index.ts';
import { engineConductionLosses } from '../reference/compare.ts';
import { referenceSteadyState } from '../reference/steady-state.ts';

const quick = process.argv.includes('--quick');
const wallClock = process.argv.includes('--wall');
const RUNS = quick ? 3 : 7;

function design(id: string): Design {
  const r = validateDesign(DEMO_DESIGNS.find((d) => d.id === id)?.json);
  if (!r.ok) throw new Error(`demo design ${id} is invalid`);
  return r.design;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

interface Timing {
  /** The figure used: CPU (default) or wall-clock median, ms per call. */
  ms: number;
  cpuMs: number;
  wallMs: number;
}

/** Medians over `runs` of the time of one call of `fn`, ms (each run repeats fn `repeat` times). */
function time(fn: () => void, runs: number, repeat = 1): Timing {
  fn(); // warm-up
  const cpu: number[] = [];
  const wall: number[] = [];
  for (let r = 0; r < runs; r++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < repeat; i++) fn();
    wall.push((performance.now() - t0) / repeat);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000 / repeat);
  }
  const cpuMs = median(cpu);
  const wallMs = median(wall);
  return { ms: wallClock ? wallMs : cpuMs, cpuMs, wallMs };
}

const both = (t: Timing, scale: number, unit: string, digits: number) =>
  `${(t.ms * scale).toFixed(digits)} ${unit} (${wallClock ? 'wall' : 'CPU'}; ${wallClock ? 'CPU' : 'wall'} ${((wallClock ? t.cpuMs : t.wallMs) * scale).toFixed(digits)} ${unit})`;

const verdict = (ok: boolean) => (ok ? 'meets target' : 'MISSES target');
const line = (text: string) => console.log(text);

const ids = DEMO_DESIGNS.map((d) => d.id);
const main = design('synchronous-buck');
const loads = Array.from({ length: 100 }, (_, i) => main.spec.ratedLoadA * (0.1 + (1.1 * i) / 99));

// 1. One converged point.
let k = 0;
const point = time(() => void evaluate(main, { loadA: loads[k++ % loads.length] }), RUNS, quick ? 200 : 1000);
line(`point: ${both(point, 1000, 'µs', 1)} per converged electro-thermal point (synchronous-buck, 10–120 % load, median of ${RUNS}; target ≤ 20 µs: ${verdict(point.ms * 1000 <= 20)})`);

// 2. A 200-point sweep.
const sweepT = time(() => void sweepLoad(main), RUNS);
line(`sweep: ${both(sweepT, 1, 'ms', 2)} per 200-point load sweep (synchronous-buck, median of ${RUNS}; target ≤ 5 ms: ${verdict(sweepT.ms <= 5)})`);

// 3. A 10 000-sample Monte Carlo.
const mcRuns = quick ? 1 : 3;
const mc = time(() => void monteCarlo(main, { seed: 1, samples: 10000 }), mcRuns);
line(`monte-carlo: ${both(mc, 1, 'ms', 0)} per 10 000-sample Monte Carlo (synchronous-buck, median of ${mcRuns}; target ≤ 300 ms: ${verdict(mc.ms <= 300)})`);

// 4. The same operating point by the time-domain reference.
function referenceCase(d: Design, e: Evaluation) {
  const t = (role: string) => e.temperatures.find((x) => x.part === role)?.celsius ?? e.conditions.ambientC;
  const cp = {
    ...conductionParameters(d, { switchC: t('switch'), rectifierC: t('rectifier'), inductorC: t('inductor'), senseC: t('senseResistor') }),
    outputCapacitorEsrOhm: esrAt(d.parts.outputCapacitor.part, t('outputCapacitor')) / d.parts.outputCapacitor.count,
  };
  // The reference circuit holds only the resistive elements, so it is driven at the duty the analytic
  // solver gives for that same circuit (volt-second balance with the drops, METHODS.md §1).
  const op = solveOperatingPoint(d, e.conditions, cp);
  return { cp, op, run: () => referenceSteadyState(d, e.conditions, op.dutyCycle, cp) };
}
let worstDiff = 0;
let worstWhere = '';
let worstMajor = 0;
let worstMajorWhere = '';
let worstRatio = Infinity;
let worstElectricalRatio = Infinity;
const ratios: string[] = [];
for (const id of ids) {
  const d = design(id);
  const e = evaluate(d);
  const { cp, op, run } = referenceCase(d, e);
  const ref = run();
  const engine = engineConductionLosses(d, op, cp);
  const refLoss: Record<string, number> = {
    switch: ref.branches.switch.conductionLossW,
    rectifier: ref.branches.rectifier.conductionLossW,
    inductor: ref.branches.inductor.conductionLossW,
    outputCapacitor: ref.branches.outputCapacitor.conductionLossW,
    inputCapacitor: ref.branches.inputCapacitor.conductionLossW,
    sense: ref.branches.sense.conductionLossW,
  };
  const totalRef = Object.values(refLoss).reduce((a, b) => a + b, 0);
  for (const [branch, w] of Object.entries(engine)) {
    const r = refLoss[branch] ?? 0;
    if (Math.max(Math.abs(w), Math.abs(r)) < 1e-12) continue;
    const diff = Math.abs(w - r) / Math.max(Math.abs(r), 1e-12);
    if (diff > worstDiff) {
      worstDiff = diff;
      worstWhere = `${id} ${branch}, ${(r * 1000).toPrecision(3)} mW`;
    }
    if (r >= 0.01 * totalRef && diff > worstMajor) {
      worstMajor = diff;
      worstMajorWhere = `${id} ${branch}`;
    }
  }
  const refT = time(run, quick ? 3 : 5, 5);
  const evalT = time(() => void evaluate(d), RUNS, quick ? 100 : 500);
  const opT = time(() => void solveOperatingPoint(d, e.conditions, cp), RUNS, quick ? 500 : 2000);
  worstRatio = Math.min(worstRatio, refT.ms / evalT.ms);
  worstElectricalRatio = Math.min(worstElectricalRatio, refT.ms / opT.ms);
  ratios.push(
    `${id}: reference ${refT.ms.toFixed(3)} ms, electro-thermal point ${(evalT.ms * 1000).toFixed(1)} µs (${(refT.ms / evalT.ms).toFixed(0)}×), ` +
      `electrical point alone ${(opT.ms * 1000).toFixed(2)} µs (${(refT.ms / opT.ms).toFixed(0)}×)`,
  );
}
line(
  `reference: analytic ${worstRatio.toFixed(0)}× faster than the time-domain reference (electro-thermal point; electrical point alone ${worstElectricalRatio.toFixed(0)}×) ` +
    `at the slowest of ${ids.length} demo designs; largest conduction-loss difference ${(worstMajor * 100).toFixed(3)} % over elements carrying ≥ 1 % ` +
    `of the conduction loss (${worstMajorWhere}), ${(worstDiff * 100).toFixed(2)} % over all (${worstWhere}) ` +
    `(target ≥ 1000× and ≤ 1 %: ${verdict(worstRatio >= 1000 && worstMajor <= 0.01)})`,
);
line(`  ${ratios.join('\n  ')}`);

// Extras.
const sweep = sweepLoad(main);
const landmarkT = time(() => void findLandmarks(sweep, { design: main }), RUNS);
line(`landmarks: ${both(landmarkT, 1, 'ms', 2)} to refine all landmarks of a 200-point sweep on the engine (synchronous-buck)`);
const loadAverage = (await import('node:os')).loadavg()[0];
line(`machine: load average ${loadAverage.toFixed(1)} on ${(await import('node:os')).cpus().length} cores while measuring (CPU time is the figure; wall time shows the contention)`);
