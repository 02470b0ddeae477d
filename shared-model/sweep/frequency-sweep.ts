/**
 * Switching-frequency sweep at one load: total loss against fs (default 61 points, fs/5 … 5·fs, log
 * spacing), the frequency of lowest total loss (golden-section search on the engine between the points
 * that bracket the lowest sampled loss) and what dominates each side: the loss mechanism that grows most
 * from the optimum to each end of the range (below the optimum typically ripple-driven terms — core,
 * AC winding, RMS — above it the switching terms: overlap, Coss, gate, dead time, recovery).
 */
import type { Design } from '../design/schema.ts';
import { findMaximum } from '../landmarks/search.ts';
import type { Conditions } from '../operating-point/types.ts';
import { conditionsFor, pointRecorder } from './evaluator.ts';
import { ColumnBook, lossByMechanism } from './point-record.ts';
import { axisValues, checkAxis } from './spacing.ts';
import type { PointEvaluator, OptionProblem, SweepSpacing, SweepColumns, SweepPoint } from './types.ts';

export interface FrequencySweepOptions {
  /** Load to sweep at, A (default: rated). */
  loadA?: number;
  fromHz?: number;
  toHz?: number;
  points?: number;
  spacing?: SweepSpacing;
  conditions?: Partial<Omit<Conditions, 'loadA' | 'switchingFrequencyHz'>>;
  evaluator?: PointEvaluator;
}

export interface FrequencySide {
  /** The frequency at this end of the range, Hz. */
  endHz: number;
  /** Total loss at this end, W. */
  totalLoss: number;
  /** The mechanism whose loss grows most from the optimum to this end, and by how much (W), or null. */
  growingMechanism: string | null;
  growthW: number;
  /** The largest single mechanism at this end and its loss, W. */
  largestMechanism: string | null;
  largestW: number;
}

export interface FrequencySweep {
  loadA: number;
  columns: SweepColumns;
  points: SweepPoint[];
  optimum: { frequencyHz: number; totalLoss: number; note: string | null };
  below: FrequencySide;
  above: FrequencySide;
}

export function checkFrequencySweepOptions(design: Design, options: FrequencySweepOptions): OptionProblem[] {
  const fs = design.spec.switchingFrequencyHz;
  const problems = checkAxis('frequency', options.fromHz ?? fs / 5, options.toHz ?? fs * 5, options.points ?? 61, options.spacing ?? 'log');
  if (options.loadA !== undefined && !(Number.isFinite(options.loadA) && options.loadA > 0)) {
    problems.push({ path: 'loadA', value: options.loadA, allowed: '> 0 A', message: `loadA must be greater than 0 A (got ${options.loadA}).` });
  }
  return problems;
}

export function sweepFrequency(design: Design, options: FrequencySweepOptions = {}): FrequencySweep {
  const problems = checkFrequencySweepOptions(design, options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const fs = design.spec.switchingFrequencyHz;
  const loadA = options.loadA ?? design.spec.ratedLoadA;
  const fixed = conditionsFor(design, { ...options.conditions, loadA });
  const book = new ColumnBook();
  const record = pointRecorder(design, book, options.evaluator);
  const at = (hz: number) => record({ ...fixed, switchingFrequencyHz: hz });
  const freqs = axisValues(options.fromHz ?? fs / 5, options.toHz ?? fs * 5, options.points ?? 61, options.spacing ?? 'log');
  const points = freqs.map(at);
  let best = 0;
  for (let i = 1; i < points.length; i++) if (points[i].totalLoss < points[best].totalLoss) best = i;
  let optimumPoint = points[best];
  let note: string | null = null;
  if (best > 0 && best < points.length - 1) {
    // Search in log f: the loss curve is close to symmetric there.
    const lo = Math.log(freqs[best - 1]);
    const hi = Math.log(freqs[best + 1]);
    const found = findMaximum((u) => -at(Math.exp(u)).totalLoss, lo, hi);
    const candidate = at(Math.exp(found.x));
    if (candidate.totalLoss <= optimumPoint.totalLoss) optimumPoint = candidate;
  } else {
    note = `The lowest loss lies at the ${best === 0 ? 'lowest' : 'highest'} swept frequency; the optimum may lie outside the range.`;
  }
  const columns = book.columns;
  book.finish(points);
  book.finish([optimumPoint]);
  const side = (end: SweepPoint): FrequencySide => describeSide(columns, optimumPoint, end);
  return {
    loadA,
    columns,
    points,
    optimum: { frequencyHz: optimumPoint.switchingFrequencyHz, totalLoss: optimumPoint.totalLoss, note },
    below: side(points[0]),
    above: side(points[points.length - 1]),
  };
}

function describeSide(columns: SweepColumns, optimum: SweepPoint, end: SweepPoint): FrequencySide {
  const atOptimum = lossByMechanism(columns, optimum);
  const atEnd = lossByMechanism(columns, end);
  let growingMechanism: string | null = null;
  let growthW = 0;
  let largestMechanism: string | null = null;
  let largestW = 0;
  for (const [mechanism, watts] of atEnd) {
    const growth = watts - (atOptimum.get(mechanism) ?? 0);
    if (growth > growthW) {
      growthW = growth;
      growingMechanism = mechanism;
    }
    if (watts > largestW) {
      largestW = watts;
      largestMechanism = mechanism;
    }
  }
  return { endHz: end.switchingFrequencyHz, totalLoss: end.totalLoss, growingMechanism, growthW, largestMechanism, largestW };
}
