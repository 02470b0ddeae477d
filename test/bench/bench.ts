/**
 * `npm run bench`: every speed figure of issue 14 in one run, each printed with its goal and written to
 * out/bench/figures.json as `{ figures: [{ name, value, unit, goal, better, min, median, runs, met, what,
 * detail }], machine }`. Figures are measurements, never test assertions (the machines are shared).
 *
 *   point-full-us, point-lean-us, sweep-landmarks-ms, monte-carlo-10k-ms   engine-figures.ts
 *   sweep-landmarks-small-young-ms, alloc-per-point-kb                    engine-figures.ts (extras)
 *   rank-10k-parts-s, rank-10k-parts-one-core-s, rank-demo-library-ms      rank-figure.ts
 *   cli-evaluate-ms                                                       cli-figure.ts
 *   time-domain-ratio                                                     time-domain-figure.ts
 *   fit-30-points-4-params-ms (issue 12)                                  fit-figure.ts
 *   keystroke-all-charts-ms, keystroke-one-chart-ms                       keystroke-browser.ts (child)
 *
 * Options: --quick (fewer runs; rank times 1 000 candidates and scales), --only a,b (named figures),
 * --no-browser (skip the Chromium figures).
 * `npm run bench` bundles this file with esbuild and runs it with plain node: tsx's on-the-fly transform
 * wraps functions for their names, which costs the engine about 1.6× in its hot loop. Engine times are
 * this process's CPU time (user + system), so other work on the machine inflates them little.
 */
import { spawnSync } from 'node:child_process';
import { cliFigure } from './cli-figure.ts';
import { allocationFigure, monteCarloFigure, pointFigures, sweepFigures, sweepTimeMs } from './engine-figures.ts';
import { fitFigure } from './fit-figure.ts';
import { lineOf, machineFacts, writeFigures, type Figure } from './figures.ts';
import { rankFigures } from './rank-figure.ts';
import { YOUNG_CHILD_FLAG } from './sweep-budget.ts';
import { timeDomainFigure } from './time-domain-figure.ts';

const quick = process.argv.includes('--quick');
const onlyArg = process.argv.indexOf('--only');
const only = onlyArg > 0 ? new Set((process.argv[onlyArg + 1] ?? '').split(',')) : null;
const wanted = (...names: string[]) => only === null || names.some((n) => only.has(n));

// The small-young-generation child: time the sweep+landmarks only, print it and stop.
if (process.argv.includes(YOUNG_CHILD_FLAG)) {
  console.log(`young-child:${JSON.stringify(sweepTimeMs(quick))}`);
  process.exit(0);
}

const figures: Figure[] = [];
const add = (f: Figure | Figure[]) => {
  for (const x of Array.isArray(f) ? f : [f]) {
    figures.push(x);
    console.log(lineOf(x));
  }
};

if (wanted('point-full-us', 'point-lean-us')) add(pointFigures(quick));
if (wanted('sweep-landmarks-ms', 'sweep-landmarks-small-young-ms')) add(sweepFigures(quick, process.argv[1]!, process.argv.slice(2)));
if (wanted('monte-carlo-10k-ms')) add(monteCarloFigure(quick));
if (wanted('alloc-per-point-kb')) add(await allocationFigure(quick));
if (wanted('cli-evaluate-ms')) add(cliFigure(quick));
if (wanted('time-domain-ratio')) add(timeDomainFigure(quick));
if (wanted('rank-10k-parts-s', 'rank-10k-parts-one-core-s', 'rank-demo-library-ms')) add(await rankFigures(quick));
if (wanted('fit-30-points-4-params-ms')) {
  const f = await fitFigure(quick ? 5 : 15);
  add({
    ...f,
    better: 'lower',
    met: f.goal === null ? null : f.value <= f.goal,
    what: 'one calibration of the demo buck against 30 synthetic measured points with 4 free parameters (shared-model/fit), CPU time',
  });
}
if (!process.argv.includes('--no-browser') && wanted('keystroke-all-charts-ms', 'keystroke-one-chart-ms')) {
  const child = spawnSync(process.execPath, ['--import', 'tsx', 'test/bench/keystroke-browser.ts', ...(quick ? ['--quick'] : [])], {
    encoding: 'utf8',
    timeout: 600_000,
  });
  const lines = (child.stdout ?? '').split('\n').filter((l) => l.startsWith('figure:'));
  if (child.status !== 0 || lines.length === 0) console.error(`bench: the browser figures failed (status ${child.status}): ${(child.stderr ?? '').trim().slice(-800)}`);
  for (const l of lines) add(JSON.parse(l.slice('figure:'.length)) as Figure);
}

const machine = machineFacts(quick);
writeFigures('out/bench/figures.json', figures, machine);
const missed = figures.filter((f) => f.met === false).map((f) => f.name);
console.log(
  `\n${figures.length} figures written to out/bench/figures.json; goals missed: ${missed.length ? missed.join(', ') : 'none'}. ` +
    `Machine: ${machine.cores} cores, load average ${machine.loadAverage.toFixed(1)} (figures are CPU time where the line says so; wall time shows contention).`,
);
