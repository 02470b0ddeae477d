/**
 * Two-axis grid for heat maps: load × input voltage, or load × switching frequency. Every cell is a full
 * electro-thermal evaluation; the grid keeps per cell the efficiency, total loss, the smallest temperature
 * margin of any part (K; negative: over a derated limit) and which part that is.
 * Arrays are row-major: row r is the r-th value of the second axis, column c the c-th load.
 */
import type { Design, Role } from '../design/schema.ts';
import type { Conditions } from '../operating-point/types.ts';
import { conditionsFor, pointSource } from './evaluator.ts';
import { axisValues, checkAxis } from './spacing.ts';
import type { PointEvaluator, OptionProblem, SweepSpacing } from './types.ts';

export type GridAxis = 'vin' | 'frequency';

export interface AxisOptions {
  from?: number;
  to?: number;
  points?: number;
  spacing?: SweepSpacing;
}

export interface GridOptions {
  /** The second axis (default: input voltage). */
  axis?: GridAxis;
  /** Load axis (default 40 points, 5 % … 120 % of rated, linear). */
  load?: AxisOptions;
  /** Second axis (default 25 points over Vin min … max, or fs/3 … 3·fs on a log scale). */
  second?: AxisOptions;
  conditions?: Partial<Omit<Conditions, 'loadA'>>;
  evaluator?: PointEvaluator;
}

export interface LoadGrid {
  axis: GridAxis;
  loadsA: number[];
  /** Input voltages (V) or switching frequencies (Hz). */
  secondValues: number[];
  efficiency: number[][];
  totalLoss: number[][];
  worstMarginK: number[][];
  worstPart: (Role | null)[][];
  converged: boolean[][];
}

function resolve(design: Design, options: GridOptions) {
  const s = design.spec;
  const axis = options.axis ?? 'vin';
  const l = options.load ?? {};
  const q = options.second ?? {};
  const load = { from: l.from ?? 0.05 * s.ratedLoadA, to: l.to ?? 1.2 * s.ratedLoadA, points: l.points ?? 40, spacing: l.spacing ?? ('linear' as SweepSpacing) };
  const second =
    axis === 'vin'
      ? { from: q.from ?? s.vinMinV, to: q.to ?? s.vinMaxV, points: q.points ?? 25, spacing: q.spacing ?? ('linear' as SweepSpacing) }
      : { from: q.from ?? s.switchingFrequencyHz / 3, to: q.to ?? s.switchingFrequencyHz * 3, points: q.points ?? 25, spacing: q.spacing ?? ('log' as SweepSpacing) };
  return { axis, load, second };
}

export function checkGridOptions(design: Design, options: GridOptions): OptionProblem[] {
  const r = resolve(design, options);
  const problems: OptionProblem[] = [];
  if (r.axis !== 'vin' && r.axis !== 'frequency') {
    problems.push({ path: 'axis', value: r.axis, allowed: '"vin" or "frequency"', message: `axis must be "vin" or "frequency" (got ${String(r.axis)}).` });
  }
  problems.push(...checkAxis('load', r.load.from, r.load.to, r.load.points, r.load.spacing));
  problems.push(...checkAxis('second', r.second.from, r.second.to, r.second.points, r.second.spacing));
  const cells = r.load.points * r.second.points;
  if (cells > 40000) {
    problems.push({ path: 'second.points', value: r.second.points, allowed: 'load.points × second.points ≤ 40000', message: `The grid has ${cells} cells; at most 40000 are allowed.` });
  }
  return problems;
}

export function sweepGrid(design: Design, options: GridOptions = {}): LoadGrid {
  const problems = checkGridOptions(design, options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const r = resolve(design, options);
  const pointAt = pointSource(design, options.evaluator);
  const fixed = conditionsFor(design, options.conditions);
  const loadsA = axisValues(r.load.from, r.load.to, r.load.points, r.load.spacing);
  const secondValues = axisValues(r.second.from, r.second.to, r.second.points, r.second.spacing);
  const grid: LoadGrid = { axis: r.axis, loadsA, secondValues, efficiency: [], totalLoss: [], worstMarginK: [], worstPart: [], converged: [] };
  for (const value of secondValues) {
    const base: Conditions = r.axis === 'vin' ? { ...fixed, vinV: value } : { ...fixed, switchingFrequencyHz: value };
    const eff: number[] = [];
    const loss: number[] = [];
    const margin: number[] = [];
    const part: (Role | null)[] = [];
    const ok: boolean[] = [];
    for (const loadA of loadsA) {
      const e = pointAt({ ...base, loadA });
      eff.push(e.efficiency);
      loss.push(e.totalLoss);
      let worst: number = Infinity;
      let who: Role | null = null;
      for (let k = 0; k < e.temperatures.length; k++) {
        const t = e.temperatures[k]!;
        if (t.marginK < worst) {
          worst = t.marginK;
          who = t.part;
        }
      }
      margin.push(Number.isFinite(worst) ? worst : 0);
      part.push(who);
      ok.push(e.converged);
    }
    grid.efficiency.push(eff);
    grid.totalLoss.push(loss);
    grid.worstMarginK.push(margin);
    grid.worstPart.push(part);
    grid.converged.push(ok);
  }
  return grid;
}
