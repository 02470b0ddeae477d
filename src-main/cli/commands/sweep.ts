/**
 * `wattledger sweep DESIGN.json [--csv | --json] [--from A --to A --points N] [--spacing linear|log]
 * [--vin V] [--fs Hz] [--ambient °C] [--knee-points X]`: efficiency, losses and temperatures against
 * load (every point electro-thermal) with the landmarks found by the engine — peak, knee (with our
 * definition), CCM/DCM boundary, thermal ceiling, regulation limit — and the average-efficiency figures
 * of merit.
 * In CSV mode the cautions go to stderr so the table stays clean.
 */
import { checkLoadSweepOptions, designPointEvaluator, figuresOfMerit, phaseCount, phaseShedding, sweepWithLandmarks } from '../../../shared-model/index.ts';
import type { LoadSweepOptions, SweepSpacing } from '../../../shared-model/index.ts';
import { CAUTION_LINE } from '../cautions.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { OPTION_RANGES } from '../number-option.ts';
import { CONDITION_FLAGS, conditionOverrides, overridesFit } from './conditions.ts';
import { renderSweep, sweepCsv, sweepJson } from './sweep-view.ts';

/** Option paths of the engine's checks and the flags that set them. */
const FLAG_OF_PATH: Record<string, string> = {
  'load.from': '--from',
  'load.to': '--to',
  'load.points': '--points',
  'load.spacing': '--spacing',
  'conditions.vinV': '--vin',
  'conditions.switchingFrequencyHz': '--fs',
  'conditions.ambientC': '--ambient',
};

/** Points per active-phase curve in the JSON's phaseShedding (each is N evaluations of one phase). */
const SHEDDING_POINTS = 60;

export const sweepCommand: Command = {
  name: 'sweep',
  summary: 'Efficiency, losses and temperatures against load, with peak, knee and thermal ceiling.',
  positionals: ['DESIGN.json'],
  flags: [
    { name: 'from', kind: 'number', unit: 'A', placeholder: 'A', help: 'Lightest load (default 1 % of rated).', range: OPTION_RANGES.positiveLoad },
    { name: 'to', kind: 'number', unit: 'A', placeholder: 'A', help: 'Heaviest load (default 120 % of rated).', range: OPTION_RANGES.positiveLoad },
    { name: 'points', kind: 'number', unit: '', placeholder: 'N', help: 'Number of points (default 200).', range: OPTION_RANGES.sweepPoints },
    {
      name: 'spacing', kind: 'text', placeholder: 'linear|log', help: 'Point spacing (default log).',
      check: (v) => (v === 'linear' || v === 'log' ? null : `must be "linear" or "log"; got "${v}".`),
    },
    {
      name: 'knee-points', kind: 'number', unit: '', placeholder: 'X',
      help: 'Knee threshold in percentage points below the peak (default 2).', range: OPTION_RANGES.kneePoints,
    },
    ...CONDITION_FLAGS.filter((f) => f.name !== 'load'),
    { name: 'csv', kind: 'switch', help: 'Print every point as CSV (units in the column names).' },
  ],
  details: [
    'JSON: points (load A, efficiency, totalLoss W, temperatures °C by part, margins K, losses W, mode,',
    'warnings) and landmarks (peak, knee, modeBoundary, pulseSkipping, thermalCeiling, regulationLimit), each with load',
    'and value when found, else found: false with a reason. Peak, knee and figures of merit use regulated, converged points',
    'only; a point past the regulation limit has regulated: false and the output it reaches (voutV). The knee is our own',
    'definition, printed with it.',
    'A multiphase design (topology.phases > 1) sweeps every phase, or the best phase count at each load when',
    'it sheds phases (topology.phaseShedding); JSON then adds phaseShedding: the efficiency curve of each',
    'active-phase count, the crossover loads with suggested hysteresis thresholds, and the envelope.',
  ],
  async run(args, io) {
    if (args.switches.has('csv') && args.switches.has('json')) {
      io.err('wattledger sweep: choose one of --csv and --json.');
      return EXIT.usage;
    }
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger sweep');
    if (!loaded.ok) return EXIT.invalidDesign;
    const design = loaded.design;
    const { vinV, switchingFrequencyHz, ambientC } = conditionOverrides(args);
    if (!overridesFit(design, { vinV, switchingFrequencyHz, ambientC }, io, 'wattledger sweep')) return EXIT.usage;
    const options: LoadSweepOptions = {
      fromA: args.numbers.from,
      toA: args.numbers.to,
      points: args.numbers.points,
      spacing: args.texts.spacing as SweepSpacing | undefined,
      conditions: { vinV, switchingFrequencyHz, ambientC },
      evaluator: designPointEvaluator(design),
    };
    const problems = checkLoadSweepOptions(design, options);
    if (problems.length > 0) {
      const flag = (path: string) => FLAG_OF_PATH[path] ?? path;
      io.err(`wattledger sweep: ${problems.map((p) => `${flag(p.path)} ${JSON.stringify(p.value)} is not allowed (allowed: ${p.allowed}). ${p.message}`).join(' ')}`);
      return EXIT.usage;
    }
    const { sweep, landmarks } = sweepWithLandmarks(design, options, { kneeThresholdPoints: args.numbers['knee-points'] });
    const fixed = { vinV: sweep.vinV, ambientC: sweep.ambientC };
    const figures = figuresOfMerit(design, { conditions: fixed, evaluator: options.evaluator });
    if (args.switches.has('csv')) {
      io.out(sweepCsv(sweep));
      io.err(CAUTION_LINE);
    } else if (args.switches.has('json')) {
      const json = sweepJson(design, sweep, landmarks, figures) as Record<string, unknown>;
      if (phaseCount(design) > 1)
        json.phaseShedding = phaseShedding(design, {
          fromA: options.fromA, toA: options.toA, spacing: options.spacing, conditions: options.conditions,
          points: Math.min(options.points ?? SHEDDING_POINTS, SHEDDING_POINTS),
        });
      io.out(JSON.stringify(json, null, 2));
    } else {
      io.out(renderSweep(design, sweep, landmarks, figures));
    }
    return EXIT.ok;
  },
};
