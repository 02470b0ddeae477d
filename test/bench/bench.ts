/**
 * `npm run bench`: speed of the engine, one line per figure with the median of several runs.
 *   1. µs per fully converged electro-thermal operating point (evaluate)      target ≤ 20 µs
 *   2. ms per 200-point load sweep (sweepLoad, defaults)                      target ≤ 5 ms
 *   3. ms per 10 000-sample Monte Carlo (monteCarlo, default tolerances)      target ≤ 300 ms
 *   4. the same operating point by the time-domain references: speed ratio and the largest relative
 *      difference in conduction losses                                     target ≥ 1000×, ≤ 1 %
 *      Like with like: the analytic operating point + conduction losses with the conduction parameters
 *      fixed at the converged temperatures, against (a) the cycle-by-cycle simulation
 *      (test/reference/cycle-by-cycle.ts, the target's reference) and (b) the shooting steady state
 *      (test/reference/steady-state.ts), both driven at the analytic duty, rated load
 *   5. ms per 200-point load sweep with every landmark refined on the engine (one keystroke's engine work,
 *      issue 5), in this process and in a child with a 1 MB semi-space (node --max-semi-space-size=1, the
 *      garbage-collection cost headless Chromium showed)                    target ≤ 5 ms each
 *   6. KB allocated per swept point and per sweep+landmarks (V8 sampling heap profiler, see
 *      sweep-budget.ts)                            target ≤ 4 KB per point (a sweep+landmarks of about 260
 *      evaluations then allocates less than the child's 1 MB semi-space: at most one scavenge per keystroke)
 * Extra lines: landmark refinement cost, and per-design point times. A benchmark, not a timed test.
 * Options: --quick (fewer runs), --wall (rank by wall-clock time instead of CPU time).
 * `npm run bench` bundles this file with esbuild and runs it with plain node: tsx's on-the-fly transform
 * wraps functions for their names, which costs the engine about 1.6× in its hot loop.
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
import type { Design } from '../../shared-model/index.ts';
import { engineConductionLosses } from '../reference/compare.ts';
import { simulateCycles } from '../reference/cycle-by-cycle.ts';
import { referenceSteadyState, type ReferenceResult } from '../reference/steady-state.ts';
import {
  CHILD_SEMI_SPACE_MB,
  sampledBytesPerCall,
  sweepWithLandmarks,
  timeInSmallYoungGeneration,
  YOUNG_CHILD_FLAG,
} from './sweep-budget.ts';

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
  // Warm-up: V8 needs a few thousand calls of the engine before its code is fully optimised, so run fn
  // for at least a second (or 5 000 calls), as a long interactive session would have done.
  const warmUntil = performance.now() + 1000;
  for (let n = 0; n < 5000 && performance.now() < warmUntil; n++) fn();
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
/** Calls per timed run of a sweep+landmarks: its time varies with the scavenges that fall in it. */
const KEYSTROKE_REPEAT = 10;

// The child of line 5 (small young generation): time the sweep+landmarks only, print it and stop.
if (process.argv.includes(YOUNG_CHILD_FLAG)) {
  const t = time(() => sweepWithLandmarks(main), RUNS, KEYSTROKE_REPEAT);
  console.log(`young-child:${JSON.stringify({ cpuMs: t.cpuMs, wallMs: t.wallMs })}`);
  process.exit(0);
}
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

// 4. The same operating point by the time-domain references. Like with like: what both sides compute is
// the electrical operating point and the conduction losses with the conduction parameters FIXED (at the
// temperatures the electro-thermal loop converged to, found once beforehand; the inductance the engine
// uses at the mean current). Analytic side:
// solveOperatingPoint + Irms²·R (VF0·Iavg + Rd·Irms² for a diode) per element. References, driven at the
// analytic duty: (a) the cycle-by-cycle simulation (test/reference/cycle-by-cycle.ts: odex, cycles until
// the state changes < 1e-9 per cycle) — the time-domain reference the 1000× target means;
// (b) the shooting steady state (test/reference/steady-state.ts: exact matrix exponentials, periodic
// state solved directly), shown for scale.
interface RefFigures {
  time: Timing;
  /** Reference time ÷ analytic time, by CPU and by wall clock. */
  cpuRatio: number;
  wallRatio: number;
  /** Largest relative conduction-loss difference over elements carrying ≥ 1 % of the conduction loss. */
  major: number;
  majorWhere: string;
  /** The same over every element, however small. */
  all: number;
  allWhere: string;
}

function lossDifferences(engine: Record<string, number>, ref: ReferenceResult['branches'], id: string) {
  const refLoss: Record<string, number> = Object.fromEntries(Object.entries(ref).map(([k, b]) => [k, b.conductionLossW]));
  const total = Object.values(refLoss).reduce((a, b) => a + b, 0);
  let major = 0;
  let majorWhere = '';
  let all = 0;
  let allWhere = '';
  for (const [element, w] of Object.entries(engine)) {
    const r = refLoss[element] ?? 0;
    if (Math.max(Math.abs(w), Math.abs(r)) < 1e-12) continue;
    const diff = Math.abs(w - r) / Math.max(Math.abs(r), 1e-12);
    if (diff > all) [all, allWhere] = [diff, `${id} ${element}, ${(r * 1000).toPrecision(3)} mW`];
    if (r >= 0.01 * total && diff > major) [major, majorWhere] = [diff, `${id} ${element}`];
  }
  return { major, majorWhere, all, allWhere };
}

/** Slowest ratios and largest differences over the designs. */
const worstOf = (list: RefFigures[]) => ({
  ratio: Math.min(...list.map((f) => (wallClock ? f.wallRatio : f.cpuRatio))),
  otherRatio: Math.min(...list.map((f) => (wallClock ? f.cpuRatio : f.wallRatio))),
  major: list.reduce((a, b) => (b.major > a.major ? b : a)),
});

const simulated: RefFigures[] = [];
const shot: RefFigures[] = [];
const details: string[] = [];
let sink = 0;
for (const id of ids) {
  const d = design(id);
  const e = evaluate(d);
  const t = (role: string) => e.temperatures.find((x) => x.part === role)?.celsius ?? e.conditions.ambientC;
  const cp = {
    ...conductionParameters(d, { switchC: t('switch'), rectifierC: t('rectifier'), inductorC: t('inductor'), senseC: t('senseResistor') }),
    outputCapacitorEsrOhm: esrAt(d.parts.outputCapacitor.part, t('outputCapacitor')) / d.parts.outputCapacitor.count,
  };
  const c = e.conditions;
  const op = solveOperatingPoint(d, c, cp);
  const engine = engineConductionLosses(d, op, cp);
  // The references hold a fixed inductance; give them the one the engine uses at this mean current
  // (the part's roll-off, a static part model), as they are given its duty and part temperatures.
  const r = { ...d, parts: { ...d.parts, inductor: { ...d.parts.inductor, inductanceH: op.inductanceH, rolloff: undefined } } };
  const analyticT = time(() => {
    sink += engineConductionLosses(d, solveOperatingPoint(d, c, cp), cp).switch;
  }, RUNS, quick ? 500 : 2000);
  const sim = simulateCycles(r, c, op.dutyCycle, cp);
  if (!sim.converged) throw new Error(`bench: the cycle-by-cycle simulation of ${id} did not settle in ${sim.cycles} cycles`);
  const simT = time(() => void simulateCycles(r, c, op.dutyCycle, cp), quick ? 1 : 3);
  const shootT = time(() => void referenceSteadyState(r, c, op.dutyCycle, cp), quick ? 3 : 5, 5);
  const figures = (x: Timing, branches: ReferenceResult['branches']): RefFigures => ({
    time: x,
    cpuRatio: x.cpuMs / analyticT.cpuMs,
    wallRatio: x.wallMs / analyticT.wallMs,
    ...lossDifferences(engine, branches, id),
  });
  const a = figures(simT, sim.branches);
  const b = figures(shootT, referenceSteadyState(r, c, op.dutyCycle, cp).branches);
  simulated.push(a);
  shot.push(b);
  const per = (x: Timing) => `${x.cpuMs.toFixed(3)} ms CPU / ${x.wallMs.toFixed(3)} ms wall`;
  details.push(
    `${id}: analytic ${(analyticT.cpuMs * 1000).toFixed(2)} µs CPU / ${(analyticT.wallMs * 1000).toFixed(2)} µs wall; ` +
      `cycle-by-cycle ${per(simT)} (${sim.cycles} cycles, ${sim.evaluations} evaluations, ${a.cpuRatio.toFixed(0)}× CPU, ` +
      `loss diff ${(a.major * 100).toFixed(3)} % ≥1 %-elements, ${(a.all * 100).toFixed(2)} % all: ${a.allWhere}); ` +
      `shooting ${per(shootT)} (${b.cpuRatio.toFixed(0)}× CPU, loss diff ${(b.major * 100).toFixed(3)} %, ${(b.all * 100).toFixed(2)} % all)`,
  );
}
const wa = worstOf(simulated);
const wb = worstOf(shot);
const other = wallClock ? 'CPU' : 'wall';
line(
  `reference: analytic operating point + conduction losses at fixed temperature vs (a) cycle-by-cycle time-domain simulation: ` +
    `${wa.ratio.toFixed(0)}× faster (${wallClock ? 'wall' : 'CPU'}; ${other} ${wa.otherRatio.toFixed(0)}×), largest conduction-loss difference ` +
    `${(wa.major.major * 100).toFixed(3)} % (${wa.major.majorWhere}); vs (b) shooting steady state: ${wb.ratio.toFixed(0)}× (${other} ` +
    `${wb.otherRatio.toFixed(0)}×), ${(wb.major.major * 100).toFixed(3)} % (${wb.major.majorWhere}). Compared: Irms²·R (diode VF0·Iavg + Rd·Irms²) ` +
    `of each element carrying ≥ 1 % of the conduction loss, same duty, part temperatures and inductance; slowest ratio and largest difference ` +
    `over ${ids.length} demo designs at rated load, medians of ${RUNS} (analytic) / ${quick ? 1 : 3} (a) / ${quick ? 3 : 5} (b) runs ` +
    `(target ≥ 1000× and ≤ 1 % against (a): ${verdict(wa.ratio >= 1000 && wa.major.major <= 0.01)})`,
);
line(`  ${details.join('\n  ')}`);
if (!Number.isFinite(sink)) line('(sink)');

// Extras.
const sweep = sweepLoad(main);
const landmarkT = time(() => void findLandmarks(sweep, { design: main }), RUNS);
line(`landmarks: ${both(landmarkT, 1, 'ms', 2)} to refine all landmarks of a 200-point sweep on the engine (synchronous-buck)`);

// 5. One keystroke's engine work: sweep + refined landmarks, here and with a 1 MB semi-space.
const keystroke = time(() => sweepWithLandmarks(main), RUNS, KEYSTROKE_REPEAT);
line(
  `sweep+landmarks: ${both(keystroke, 1, 'ms', 2)} per 200-point load sweep with every landmark refined (synchronous-buck, ` +
    `mean of ${KEYSTROKE_REPEAT} calls, median of ${RUNS} runs; target ≤ 5 ms: ${verdict(keystroke.ms <= 5)})`,
);
const child = timeInSmallYoungGeneration(process.argv[1]!, process.argv.slice(2));
if (typeof child === 'string') line(`sweep+landmarks, small young generation: ${child}`);
else {
  const ms = wallClock ? child.wallMs : child.cpuMs;
  line(
    `sweep+landmarks, small young generation: ${ms.toFixed(2)} ms (${wallClock ? 'wall' : 'CPU'}; ${wallClock ? 'CPU' : 'wall'} ` +
      `${(wallClock ? child.cpuMs : child.wallMs).toFixed(2)} ms) in a child node --max-semi-space-size=${CHILD_SEMI_SPACE_MB} ` +
      `(same figure; target ≤ 5 ms: ${verdict(ms <= 5)})`,
  );
}

// 6. Allocation.
const sweepBytes = await sampledBytesPerCall(() => void sweepLoad(main), quick ? 5 : 40);
const keystrokeBytes = await sampledBytesPerCall(() => sweepWithLandmarks(main), quick ? 5 : 40);
const perPointKB = sweepBytes / 200 / 1024;
line(
  `allocation: ${perPointKB.toFixed(2)} KB per swept point (200-point sweep ${(sweepBytes / 1024).toFixed(0)} KB), ` +
    `${(keystrokeBytes / 1024).toFixed(0)} KB per sweep+landmarks (synchronous-buck; V8 sampling heap profiler, 64 B interval, ` +
    `objects collected by minor and major GC included: an estimate; target ≤ 4 KB per point: ${verdict(perPointKB <= 4)})`,
);

const loadAverage = (await import('node:os')).loadavg()[0];
line(`machine: load average ${loadAverage.toFixed(1)} on ${(await import('node:os')).cpus().length} cores while measuring (CPU time is the figure; wall time shows the contention)`);
