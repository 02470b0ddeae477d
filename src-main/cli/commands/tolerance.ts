/**
 * `wattledger tolerance DESIGN.json [--samples N --seed S] [--json] [--load A] [--normal] [--vary-conditions]`:
 * worst-case corners over the tolerances (Vin range, ambient, RDS(on), DCR, ESR, inductance, fs) naming the
 * corners of worst efficiency and worst temperature, and a Monte Carlo with a visible seed (the same seed
 * always gives the same result, on any number of worker threads: src-main/pool). Tolerances are the engine's documented defaults (tolerance/variation.ts).
 */
import {
  DEFAULT_MONTE_CARLO_SAMPLES,
  DEFAULT_MONTE_CARLO_SEED,
  worstCase,
} from '../../../shared-model/index.ts';
import { monteCarloOnPool } from '../../pool/monte-carlo-pool.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { OPTION_RANGES } from '../number-option.ts';
import { renderTolerance, toleranceJson } from './tolerance-view.ts';

export const toleranceCommand: Command = {
  name: 'tolerance',
  summary: 'Worst-case corners and a seeded Monte Carlo over part and condition tolerances.',
  positionals: ['DESIGN.json'],
  flags: [
    {
      name: 'samples', kind: 'number', unit: '', placeholder: 'N', help: `Monte Carlo samples (default ${DEFAULT_MONTE_CARLO_SAMPLES}).`,
      range: OPTION_RANGES.samples,
    },
    {
      name: 'seed', kind: 'number', unit: '', placeholder: 'S', help: `Monte Carlo seed (default ${DEFAULT_MONTE_CARLO_SEED}).`,
      range: OPTION_RANGES.seed,
    },
    { name: 'load', kind: 'number', unit: 'A', placeholder: 'A', help: 'Load current (default: the rated load).', range: OPTION_RANGES.positiveLoad },
    { name: 'normal', kind: 'switch', help: 'Normal spreads (tolerance = 3σ) instead of uniform ones.' },
    { name: 'vary-conditions', kind: 'switch', help: 'Also vary Vin and ambient in the Monte Carlo (default: held at nominal).' },
    { name: 'workers', kind: 'number', unit: '', placeholder: 'N', help: 'Worker threads for the Monte Carlo (default: every core; the result is the same).', range: OPTION_RANGES.workers },
    { name: 'json', kind: 'switch', help: 'Print JSON (SI units: V, A, W, Hz, °C, K) instead of tables.' },
  ],
  details: [
    'Default tolerances (common practice, set your own in the app): Vin over the specified range,',
    'ambient ±10 K, RDS(on) ±20 %, DCR ±10 %, ESR ±20 %, L ±20 %, fs ±10 %.',
    'Corners bound a result only where it changes monotonically with each tolerance.',
  ],
  async run(args, io) {
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger tolerance');
    if (!loaded.ok) return EXIT.invalidDesign;
    const design = loaded.design;
    const loadA = args.numbers.load;
    const w = worstCase(design, { loadA });
    const mc = await monteCarloOnPool(design, {
      seed: args.numbers.seed ?? DEFAULT_MONTE_CARLO_SEED,
      samples: args.numbers.samples ?? DEFAULT_MONTE_CARLO_SAMPLES,
      distribution: args.switches.has('normal') ? 'normal' : 'uniform',
      spreadConditions: args.switches.has('vary-conditions'),
      loadA,
    }, { workers: args.numbers.workers });
    if (args.switches.has('json')) io.out(JSON.stringify(toleranceJson(design, w, mc), null, 2));
    else io.out(renderTolerance(design, w, mc));
    return EXIT.ok;
  },
};
