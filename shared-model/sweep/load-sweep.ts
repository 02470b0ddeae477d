/**
 * Load sweep: the design evaluated, fully electro-thermally, at every load of an axis (default 200 points
 * from 1 % to 120 % of rated load, logarithmic spacing), with the input voltage, ambient and switching
 * frequency held. Each point is reduced to a compact record (see point-record.ts), made from the ledger's
 * lean evaluation of the point (sweep/evaluator.ts) unless a stand-in evaluator is given.
 */
import type { Design } from '../design/schema.ts';
import { conditionsFor, pointRecorder } from './evaluator.ts';
import { ColumnBook } from './point-record.ts';
import { axisValues, checkAxis } from './spacing.ts';
import type { LoadSweep, LoadSweepOptions, OptionProblem, SweepSpacing } from './types.ts';

export const DEFAULT_SWEEP_POINTS = 200;
export const DEFAULT_SWEEP_FROM_FRACTION = 0.01;
export const DEFAULT_SWEEP_TO_FRACTION = 1.2;
export const DEFAULT_SWEEP_SPACING: SweepSpacing = 'log';

interface ResolvedAxis {
  from: number;
  to: number;
  points: number;
  spacing: SweepSpacing;
}

function resolveAxis(design: Design, options: LoadSweepOptions): ResolvedAxis {
  return {
    from: options.fromA ?? DEFAULT_SWEEP_FROM_FRACTION * design.spec.ratedLoadA,
    to: options.toA ?? DEFAULT_SWEEP_TO_FRACTION * design.spec.ratedLoadA,
    points: options.points ?? DEFAULT_SWEEP_POINTS,
    spacing: options.spacing ?? DEFAULT_SWEEP_SPACING,
  };
}

/** Every problem with the sweep options, each naming its field, value and allowed range. */
export function checkLoadSweepOptions(design: Design, options: LoadSweepOptions): OptionProblem[] {
  const a = resolveAxis(design, options);
  const problems = checkAxis('load', a.from, a.to, a.points, a.spacing);
  const c = options.conditions ?? {};
  const positive: [keyof typeof c, string][] = [
    ['vinV', 'V'],
    ['switchingFrequencyHz', 'Hz'],
  ];
  for (const [key, unit] of positive) {
    const v = c[key];
    if (v !== undefined && !(Number.isFinite(v) && v > 0)) {
      problems.push({ path: `conditions.${key}`, value: v, allowed: `> 0 ${unit}`, message: `conditions.${key} must be greater than 0 ${unit} (got ${v}).` });
    }
  }
  if (c.ambientC !== undefined && !(Number.isFinite(c.ambientC) && c.ambientC >= -273.15 && c.ambientC <= 1000)) {
    problems.push({ path: 'conditions.ambientC', value: c.ambientC, allowed: '-273.15 … 1000 °C', message: `conditions.ambientC must lie between -273.15 and 1000 °C (got ${c.ambientC}).` });
  }
  return problems;
}

/** Sweeps the load. Invalid options are a programmer error here: check them first with checkLoadSweepOptions. */
export function sweepLoad(design: Design, options: LoadSweepOptions = {}): LoadSweep {
  const problems = checkLoadSweepOptions(design, options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const axis = resolveAxis(design, options);
  const fixed = conditionsFor(design, options.conditions);
  const book = new ColumnBook();
  const record = pointRecorder(design, book, options.evaluator);
  const points = axisValues(axis.from, axis.to, axis.points, axis.spacing).map((loadA) => record({ ...fixed, loadA }));
  return {
    designName: design.name,
    ratedLoadA: design.spec.ratedLoadA,
    spacing: axis.spacing,
    vinV: fixed.vinV,
    ambientC: fixed.ambientC,
    switchingFrequencyHz: fixed.switchingFrequencyHz,
    columns: book.columns,
    points: book.finish(points),
  };
}
