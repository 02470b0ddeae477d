/**
 * One keystroke's engine work — the default 200-point load sweep of the first demo design plus every
 * landmark refined on the engine — timed call by call; prints the medians of 101 calls after 40 warm-up
 * calls. Plain enough to bundle for Node or for a browser page (no Node APIs):
 *   npx esbuild --bundle --platform=node --format=esm test/bench/keystroke.ts --outfile=/tmp/keystroke.mjs
 *   node --max-semi-space-size=1 /tmp/keystroke.mjs
 *   npx esbuild --bundle --platform=browser --format=iife test/bench/keystroke.ts --outfile=/tmp/keystroke.js
 *   (then load /tmp/keystroke.js into about:blank in headless Chromium and read the console line).
 * `npm run bench` prints the same figure with CPU time and the allocation (bench.ts, sweep-budget.ts).
 */
import { DEMO_DESIGNS, findLandmarks, sweepLoad, validateDesign } from '../../shared-model/index.ts';

const checked = validateDesign(DEMO_DESIGNS[0]!.json);
if (!checked.ok) throw new Error('the first demo design is invalid');
const design = checked.design;

const keystroke = () => findLandmarks(sweepLoad(design), { design });
const sweepOnly = () => sweepLoad(design);

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[s.length >> 1]!;
}

function timings(fn: () => unknown, calls: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < calls; i++) {
    const t0 = performance.now();
    fn();
    out.push(performance.now() - t0);
  }
  return out;
}

for (let i = 0; i < 40; i++) keystroke();
const both = timings(keystroke, 101);
const sweep = timings(sweepOnly, 101);
console.log(
  `sweep+landmarks median ${median(both).toFixed(2)} ms (min ${Math.min(...both).toFixed(2)}), ` +
    `sweep median ${median(sweep).toFixed(2)} ms, ${DEMO_DESIGNS[0]!.id}, medians of 101 calls`,
);
