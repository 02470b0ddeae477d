/**
 * `cli-evaluate-ms`: wall time of the shipped command line evaluating a demo design, as a user runs it
 * (`node out/cli/wattledger.js evaluate assets/designs/synchronous-buck.json --json`, the plain-JavaScript
 * build `npm install` makes; no TypeScript loader at run time). Process start to exit.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { figureOf, type Figure } from './figures.ts';

const CLI = 'out/cli/wattledger.js';
const ARGS = [CLI, 'evaluate', 'assets/designs/synchronous-buck.json', '--json'];

export function cliFigure(quick: boolean): Figure {
  if (!existsSync(CLI)) {
    const b = spawnSync('npx', ['tsx', 'src-main/dev/build-package.ts'], { encoding: 'utf8' });
    if (b.status !== 0) throw new Error(`bench: could not build the command line: ${b.stderr}`);
  }
  const runs = quick ? 5 : 15;
  const samples: number[] = [];
  spawnSync(process.execPath, ARGS); // warm the file cache
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const r = spawnSync(process.execPath, ARGS, { encoding: 'utf8' });
    samples.push(performance.now() - t0);
    if (r.status !== 0) throw new Error(`bench: ${ARGS.join(' ')} exited ${r.status}: ${r.stderr}`);
  }
  return figureOf({
    name: 'cli-evaluate-ms',
    unit: 'ms',
    goal: 120,
    samples,
    what: `wall time of \`node ${ARGS.join(' ')}\`, process start to exit`,
  });
}
