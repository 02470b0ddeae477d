/**
 * The part of an operating point the loss kernel reads, and a lean, reusable implementation of it.
 *
 * `PointView` is a structural subset of OperatingPoint: the kernel runs on the solver's full record at
 * the end and on a `LeanPoint` inside the electro-thermal loop. `leanPointAt` fills a LeanPoint from the
 * solver's inductor-current shape with the same branch waveforms as operating-point/assemble.ts
 * (t = 0 at control-switch turn-on; on D·T, rectifier D2·T, idle in DCM) and the same exact
 * straight-segment statistics as waveform/stats.ts, without allocating:
 *   ∫i dt = (i0 + i1)/2·dt, ∫i² dt = (i0² + i0·i1 + i1²)/3·dt, AC RMS from the segments shifted by the mean.
 * test/shared-model/ledger/point-view.test.ts checks it against the solver's record.
 * Source: METHODS.md §1 (exact RMS of straight-line pieces).
 */
import type { Circuit } from '../operating-point/circuit.ts';
import { turnOffVoltageV, turnOnVoltageV } from '../operating-point/assemble.ts';
import type { Shape } from '../operating-point/shape.ts';
import type { ConductionMode, OperatingPoint, Segment, SwitchingEdge } from '../operating-point/types.ts';

export interface PointView {
  periodS: number;
  dutyCycle: number;
  rectifierFraction: number;
  idleFraction: number;
  mode: ConductionMode;
  voutV: number;
  inductanceH: number;
  inductor: { rmsA: number; acRmsA: number };
  waveforms: { inductor: { segments: readonly Segment[] } };
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

interface Stat {
  rmsA: number;
  acRmsA: number;
  averageA: number;
  /** Σ (t/T)·(i1 − i0)²/12 over the segments, A²: the part of the mean square carried by the slopes. */
  rippleSqA2: number;
}

/** Slope part of each branch's mean square, A² (see rippleSquaresOf). */
export interface RippleSquares {
  switch: number;
  rectifier: number;
  inductor: number;
  inputCapacitor: number;
  outputCapacitor: number;
  sense: number;
}

function slopeSquare(segments: readonly Segment[]): number {
  let period = 0;
  let sum = 0;
  for (const s of segments) {
    if (!(s.durationS > 0)) continue;
    period += s.durationS;
    const di = s.i1A - s.i0A;
    sum += (di * di * s.durationS) / 12;
  }
  return period > 0 ? sum / period : 0;
}

/**
 * The slope part of the mean square of each branch of a solver record: a straight segment of mean ī and
 * swing Δi has mean square ī² + Δi²/12; the Δi²/12 part, weighted by duration, is returned here.
 */
export function rippleSquaresOf(op: OperatingPoint, out: RippleSquares): RippleSquares {
  const w = op.waveforms;
  out.switch = slopeSquare(w.switch.segments);
  out.rectifier = slopeSquare(w.rectifier.segments);
  out.inductor = slopeSquare(w.inductor.segments);
  out.inputCapacitor = slopeSquare(w.inputCapacitor.segments);
  out.outputCapacitor = slopeSquare(w.outputCapacitor.segments);
  out.sense = slopeSquare(w.sense.segments);
  return out;
}

/** The slope parts of a lean point (already computed with its statistics). */
export function rippleSquaresOfLean(p: LeanPoint, out: RippleSquares): RippleSquares {
  out.switch = p.stats.switch.rippleSqA2;
  out.rectifier = p.stats.rectifier.rippleSqA2;
  out.inductor = p.inductor.rippleSqA2;
  out.inputCapacitor = p.stats.inputCapacitor.rippleSqA2;
  out.outputCapacitor = p.stats.outputCapacitor.rippleSqA2;
  out.sense = p.stats.sense.rippleSqA2;
  return out;
}

export interface LeanPoint extends PointView {
  inductor: Stat;
  stats: { switch: Stat; rectifier: Stat; inputCapacitor: Stat; outputCapacitor: Stat; sense: Stat };
  waveforms: { inductor: { segments: Segment[] } };
  /** Segment records reused for the inductor waveform. */
  pool: Segment[];
}

const stat = (): Stat => ({ rmsA: 0, acRmsA: 0, averageA: 0, rippleSqA2: 0 });
const edge = (): SwitchingEdge => ({ currentA: 0, voltageV: 0, hard: false });

export function newLeanPoint(): LeanPoint {
  return {
    periodS: 0, dutyCycle: 0, rectifierFraction: 0, idleFraction: 0, mode: 'CCM', voutV: 0, inductanceH: 0,
    inductor: stat(),
    waveforms: { inductor: { segments: [] } },
    stats: { switch: stat(), rectifier: stat(), inputCapacitor: stat(), outputCapacitor: stat(), sense: stat() },
    edges: { turnOn: edge(), turnOff: edge() },
    stress: { rectifierV: 0 },
    pool: [
      { durationS: 0, i0A: 0, i1A: 0 },
      { durationS: 0, i0A: 0, i1A: 0 },
      { durationS: 0, i0A: 0, i1A: 0 },
    ],
  };
}

/** Statistics of the three-interval waveform (on a0→a1, off b0→b1, idle constant c) into `out`. */
function stats3(out: Stat, tOn: number, tOff: number, tIdle: number, a0: number, a1: number, b0: number, b1: number, c: number): void {
  let period = 0;
  let charge = 0;
  if (tOn > 0) { period += tOn; charge += 0.5 * (a0 + a1) * tOn; }
  if (tOff > 0) { period += tOff; charge += 0.5 * (b0 + b1) * tOff; }
  if (tIdle > 0) { period += tIdle; charge += c * tIdle; }
  if (!(period > 0)) { out.rmsA = 0; out.acRmsA = 0; out.averageA = 0; out.rippleSqA2 = 0; return; }
  const m = charge / period;
  let sq = 0;
  let ac = 0;
  let slope = 0;
  if (tOn > 0) {
    slope += ((a1 - a0) * (a1 - a0) * tOn) / 12;
    sq += ((a0 * a0 + a0 * a1 + a1 * a1) / 3) * tOn;
    const x = a0 - m, y = a1 - m;
    ac += ((x * x + x * y + y * y) / 3) * tOn;
  }
  if (tOff > 0) {
    slope += ((b1 - b0) * (b1 - b0) * tOff) / 12;
    sq += ((b0 * b0 + b0 * b1 + b1 * b1) / 3) * tOff;
    const x = b0 - m, y = b1 - m;
    ac += ((x * x + x * y + y * y) / 3) * tOff;
  }
  if (tIdle > 0) {
    sq += c * c * tIdle;
    ac += (c - m) * (c - m) * tIdle;
  }
  out.averageA = m;
  out.rippleSqA2 = slope / period;
  out.rmsA = Math.sqrt(sq / period);
  out.acRmsA = Math.sqrt(ac / period);
}

/** Appends pooled segment k (durationS, i0 → i1) to the lean point's inductor waveform. */
function putSegment(p: LeanPoint, k: number, durationS: number, i0A: number, i1A: number): void {
  const g = p.pool[k]!;
  g.durationS = durationS;
  g.i0A = i0A;
  g.i1A = i1A;
  p.waveforms.inductor.segments.push(g);
}

/** Fills `p` from the shape `s` of circuit `c` (see header); returns p. */
export function leanPointAt(c: Circuit, s: Shape, p: LeanPoint): LeanPoint {
  const T = c.periodS;
  const io = c.loadA;
  const tOn = s.d * T;
  const tOff = s.d2 * T;
  const tIdle = s.dcm ? s.idle * T : 0;
  const lo = s.dcm ? 0 : s.iv;
  const hi = s.ipk;
  const iin = s.iin;
  p.periodS = T;
  p.dutyCycle = s.d;
  p.rectifierFraction = s.d2;
  p.idleFraction = s.dcm ? s.idle : 0;
  p.mode = s.dcm ? 'DCM' : 'CCM';
  p.voutV = s.vo;
  p.inductanceH = s.inductanceH;
  p.waveforms.inductor.segments.length = 0;
  if (tOn > 0) putSegment(p, 0, tOn, lo, hi);
  if (tOff > 0) putSegment(p, 1, tOff, hi, lo);
  if (tIdle > 0) putSegment(p, 2, tIdle, 0, 0);
  stats3(p.inductor, tOn, tOff, tIdle, lo, hi, hi, lo, 0);
  stats3(p.stats.switch, tOn, tOff, tIdle, lo, hi, 0, 0, 0);
  stats3(p.stats.rectifier, tOn, tOff, tIdle, 0, 0, hi, lo, 0);
  if (c.boost) {
    stats3(p.stats.inputCapacitor, tOn, tOff, tIdle, lo - iin, hi - iin, hi - iin, lo - iin, -iin);
    stats3(p.stats.outputCapacitor, tOn, tOff, tIdle, -io, -io, hi - io, lo - io, -io);
  } else {
    stats3(p.stats.inputCapacitor, tOn, tOff, tIdle, lo - iin, hi - iin, -iin, -iin, -iin);
    stats3(p.stats.outputCapacitor, tOn, tOff, tIdle, lo - io, hi - io, hi - io, lo - io, -io);
  }
  const sense = p.stats.sense;
  switch (c.senseAt) {
    case 'switch':
      stats3(sense, tOn, tOff, tIdle, lo, hi, 0, 0, 0);
      break;
    case 'inductor':
      stats3(sense, tOn, tOff, tIdle, lo, hi, hi, lo, 0);
      break;
    case 'input':
      stats3(sense, T, 0, 0, iin, iin, 0, 0, 0);
      break;
    case 'output':
      stats3(sense, T, 0, 0, io, io, 0, 0, 0);
      break;
    default:
      stats3(sense, T, 0, 0, 0, 0, 0, 0, 0);
  }
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
  p.stress.rectifierV = c.boost ? vo1 : c.vinV;
  return p;
}
