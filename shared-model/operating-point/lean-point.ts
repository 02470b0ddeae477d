/**
 * The part of an operating point the loss kernel reads, and a lean, reusable implementation of it.
 *
 * `PointView` is a structural subset of OperatingPoint: the kernel runs on a `LeanPoint` inside the
 * electro-thermal loop and at the end. `leanPointAt` fills a LeanPoint from the solver's inductor-current
 * shape, reading every branch from the one table the record's waveforms come from (branch-table.ts;
 * t = 0 at control-switch turn-on; on D·T, rectifier D2·T, idle in DCM), with the exact straight-segment
 * statistics of waveform/interval-stats.ts, without allocating:
 *   ∫i dt = (i0 + i1)/2·dt, ∫i² dt = (i0² + i0·i1 + i1²)/3·dt, AC RMS from the segments shifted by the mean.
 * Filled `asRecord` it is also the final point of a sweep (`PointSummary`): the numbers of the solver's
 * OperatingPoint record to the last bit — the record takes its statistics from it (assemble.ts) — without the
 * record's waveforms. test/shared-model/ledger/joint-loop.test.ts checks both against the solver's record.
 * Source: docs/methods.md §1 (exact RMS of straight-line pieces).
 */
import type { Circuit } from './circuit.ts';
import { rectifierStressV, switchStressV, turnOffVoltageV, turnOnVoltageV } from './edges.ts';
import type { Shape } from './shape.ts';
import type { Conditions, ConductionMode, Segment, SwitchingEdge } from './types.ts';
import type { Warning } from '../warnings.ts';
import { intervalStats, newIntervalStats, type IntervalStats } from '../waveform/interval-stats.ts';
import { branchIntervals, INDUCTOR, INPUT_CAPACITOR, OUTPUT_CAPACITOR, RECTIFIER, SENSE, SWITCH } from './branch-table.ts';

export interface PointView {
  periodS: number;
  dutyCycle: number;
  rectifierFraction: number;
  idleFraction: number;
  mode: ConductionMode;
  voutV: number;
  inductanceH: number;
  inductor: { rmsA: number; acRmsA: number };
  /** The capacitor banks' currents as straight segments (read only where a capacitor has an ESR(f) table). */
  waveforms: { inductor: { segments: readonly Segment[] }; inputCapacitor: { segments: readonly Segment[] }; outputCapacitor: { segments: readonly Segment[] } };
  stats: {
    switch: { rmsA: number };
    rectifier: { rmsA: number; averageA: number };
    inputCapacitor: { rmsA: number };
    outputCapacitor: { rmsA: number };
    sense: { rmsA: number };
  };
  edges: { turnOn: SwitchingEdge; turnOff: SwitchingEdge };
  stress: { rectifierV: number };
}

/**
 * The fields of the final operating point that the ledger's warnings, checks and the sweep's compact
 * record read: satisfied by the solver's OperatingPoint record and by a LeanPoint filled `asRecord`.
 */
export interface PointSummary extends PointView {
  conditions: Conditions;
  outputPowerW: number;
  inductor: { rmsA: number; acRmsA: number; averageA: number; peakA: number; minA: number; rippleA: number; valleyA: number };
  waveforms: { inductor: { segments: readonly Segment[] }; inputCapacitor: { segments: readonly Segment[] }; outputCapacitor: { segments: readonly Segment[] }; inputA: number };
  stats: {
    switch: { rmsA: number; peakA: number };
    rectifier: { rmsA: number; averageA: number; peakA: number; minA: number };
    inputCapacitor: { rmsA: number };
    outputCapacitor: { rmsA: number };
    sense: { rmsA: number };
  };
  stress: { switchV: number; rectifierV: number };
  warnings: Warning[];
}

export interface LeanPoint extends PointSummary {
  inductor: IntervalStats & { rippleA: number; valleyA: number };
  stats: { switch: IntervalStats; rectifier: IntervalStats; inputCapacitor: IntervalStats; outputCapacitor: IntervalStats; sense: IntervalStats };
  waveforms: { inductor: { segments: Segment[] }; inputCapacitor: { segments: Segment[] }; outputCapacitor: { segments: Segment[] }; inputA: number };
  /** Segment records reused for the inductor waveform (on, off, idle). */
  pool: Segment[];
  /** The inductor's segment list for each set of non-empty intervals (bit 0 on, 1 off, 2 idle). */
  segmentSets: Segment[][];
  /** Interval durations and one branch's currents for intervalStats. */
  intervals: Float64Array;
}

const edge = (): SwitchingEdge => ({ currentA: 0, voltageV: 0, hard: false });
const threeSegments = (): Segment[] => [
  { durationS: 0, i0A: 0, i1A: 0 },
  { durationS: 0, i0A: 0, i1A: 0 },
  { durationS: 0, i0A: 0, i1A: 0 },
];

/** Writes the intervals v (branch-table.ts) into three reused segments (on, off, idle; empty ones have duration 0). */
function putIntervals(segments: Segment[], v: Float64Array): void {
  let g = segments[0]!;
  g.durationS = v[0]!; g.i0A = v[3]!; g.i1A = v[4]!;
  g = segments[1]!;
  g.durationS = v[1]!; g.i0A = v[5]!; g.i1A = v[6]!;
  g = segments[2]!;
  g.durationS = v[2]!; g.i0A = v[7]!; g.i1A = v[7]!;
}

export function newLeanPoint(): LeanPoint {
  const pool: Segment[] = [
    { durationS: 0, i0A: 0, i1A: 0 },
    { durationS: 0, i0A: 0, i1A: 0 },
    { durationS: 0, i0A: 0, i1A: 0 },
  ];
  const segmentSets: Segment[][] = [];
  for (let mask = 0; mask < 8; mask++) segmentSets.push(pool.filter((_, k) => (mask & (1 << k)) !== 0));
  return {
    conditions: { vinV: 0, loadA: 0, switchingFrequencyHz: 0, ambientC: 0 },
    periodS: 0, dutyCycle: 0, rectifierFraction: 0, idleFraction: 0, mode: 'CCM', voutV: 0, inductanceH: 0, outputPowerW: 0,
    // A plain literal (a spread here left the record in dictionary mode: slow, and every store allocated).
    inductor: { rmsA: 0, acRmsA: 0, averageA: 0, peakA: 0, minA: 0, rippleSqA2: 0, rippleA: 0, valleyA: 0 },
    waveforms: { inductor: { segments: segmentSets[0]! }, inputCapacitor: { segments: threeSegments() }, outputCapacitor: { segments: threeSegments() }, inputA: 0 },
    stats: {
      switch: newIntervalStats(),
      rectifier: newIntervalStats(),
      inputCapacitor: newIntervalStats(),
      outputCapacitor: newIntervalStats(),
      sense: newIntervalStats(),
    },
    edges: { turnOn: edge(), turnOff: edge() },
    stress: { switchV: 0, rectifierV: 0 },
    warnings: [],
    pool,
    segmentSets,
    intervals: new Float64Array(8),
  };
}

/** Sets pooled segment k (durationS, i0 → i1). */
function putSegment(p: LeanPoint, k: number, durationS: number, i0A: number, i1A: number): void {
  const g = p.pool[k]!;
  g.durationS = durationS;
  g.i0A = i0A;
  g.i1A = i1A;
}

/**
 * Fills `p` from the shape `s` of circuit `c` (see header); returns p. `asRecord`: the statistics with the
 * record's idle-interval formula (interval-stats.ts) and the summary fields (conditions, output power,
 * source current before source losses, switch stress), for the final point; `warnings` is left alone.
 */
export function leanPointAt(c: Circuit, s: Shape, p: LeanPoint, asRecord = false, conditions?: Conditions): LeanPoint {
  const T = c.periodS;
  const io = c.loadA;
  const iin = s.iin;
  const lo = s.dcm ? 0 : s.iv;
  const hi = s.ipk;
  const r = asRecord;
  p.periodS = T;
  p.dutyCycle = s.d;
  p.rectifierFraction = s.d2;
  p.idleFraction = s.dcm ? s.idle : 0;
  p.mode = s.dcm ? 'DCM' : 'CCM';
  p.voutV = s.vo;
  p.inductanceH = s.inductanceH;
  // Every branch from the one table (branch-table.ts), its statistics into the point's own record.
  const v = p.intervals;
  branchIntervals(c, s, INDUCTOR, v);
  intervalStats(p.inductor, v, r);
  let mask = 0;
  if (v[0]! > 0) { putSegment(p, 0, v[0]!, v[3]!, v[4]!); mask |= 1; }
  if (v[1]! > 0) { putSegment(p, 1, v[1]!, v[5]!, v[6]!); mask |= 2; }
  if (v[2]! > 0) { putSegment(p, 2, v[2]!, v[7]!, v[7]!); mask |= 4; }
  p.waveforms.inductor.segments = p.segmentSets[mask]!;
  branchIntervals(c, s, SWITCH, v);
  intervalStats(p.stats.switch, v, r);
  branchIntervals(c, s, RECTIFIER, v);
  intervalStats(p.stats.rectifier, v, r);
  branchIntervals(c, s, INPUT_CAPACITOR, v);
  intervalStats(p.stats.inputCapacitor, v, r);
  putIntervals(p.waveforms.inputCapacitor.segments, v);
  branchIntervals(c, s, OUTPUT_CAPACITOR, v);
  intervalStats(p.stats.outputCapacitor, v, r);
  putIntervals(p.waveforms.outputCapacitor.segments, v);
  branchIntervals(c, s, SENSE, v);
  intervalStats(p.stats.sense, v, r);
  const vo = s.vo;
  const vo1 = vo + c.rOutputSenseOhm * io;
  const on = p.edges.turnOn;
  on.currentA = lo;
  on.voltageV = turnOnVoltageV(c, s, vo1);
  on.hard = !s.dcm && lo > 0;
  const off = p.edges.turnOff;
  off.currentA = hi;
  off.voltageV = turnOffVoltageV(c, s, vo1);
  off.hard = hi > 0;
  p.stress.rectifierV = rectifierStressV(c, vo1);
  if (asRecord) {
    if (conditions) p.conditions = conditions;
    p.outputPowerW = vo * io;
    p.inductor.rippleA = s.ripple;
    p.inductor.valleyA = lo;
    p.waveforms.inputA = iin + 0;
    p.stress.switchV = switchStressV(c, s, vo1);
  }
  return p;
}
