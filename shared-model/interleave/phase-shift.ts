/**
 * Phase-shifted sums of piecewise-linear periodic currents: what a capacitor shared by N interleaved
 * phases carries.
 *
 * Model: phase k runs the same cycle delayed by k·T/N (k = 0 … N − 1). Shifting a waveform by s rotates its
 * segment list (a segment cut at the shift point becomes two). The sum of several waveforms of one period
 * is piecewise linear between the union of all their breakpoints; on each interval of that union every
 * waveform is a single straight piece, so its value at the interval's two ends (right limit at the start,
 * left limit at the end, which keeps the jumps of a switch current) adds exactly. The result is again a
 * Waveform, so waveform/stats.ts gives its exact mean and RMS.
 * Assumptions: the waveforms share one period; the phases are shifted evenly (360°/N apart).
 * Source: superposition of branch currents at a node (Kirchhoff's current law); the interleaving picture is
 * that of the multiphase literature (docs/methods.md §15).
 */
import type { Segment, Waveform } from '../operating-point/types.ts';
import { periodOf } from '../waveform/stats.ts';

/** Breakpoints closer than this fraction of the period are merged (floating-point sums of durations). */
const MERGE_FRACTION = 1e-12;

/** The waveform delayed by `delayS` (0 ≤ delay < period): the value at t is the original's at t − delay. */
export function delayWaveform(w: Waveform, delayS: number): Waveform {
  const period = periodOf(w);
  if (!(period > 0)) return { segments: [] };
  const shift = ((delayS % period) + period) % period;
  if (shift === 0) return { segments: w.segments.slice() };
  // The original's time period − shift becomes the new time origin.
  const cut = period - shift;
  const head: Segment[] = [];
  const tail: Segment[] = [];
  let t = 0;
  for (const s of w.segments) {
    const t1 = t + s.durationS;
    if (t1 <= cut) tail.push(s);
    else if (t >= cut) head.push(s);
    else {
      const f = (cut - t) / s.durationS;
      const iCut = s.i0A + (s.i1A - s.i0A) * f;
      tail.push({ durationS: cut - t, i0A: s.i0A, i1A: iCut });
      head.push({ durationS: t1 - cut, i0A: iCut, i1A: s.i1A });
    }
    t = t1;
  }
  return { segments: [...head, ...tail].filter((s) => s.durationS > 0) };
}

/** Start times of a waveform's segments and its period. */
function breakpoints(w: Waveform): number[] {
  const out: number[] = [];
  let t = 0;
  for (const s of w.segments) {
    out.push(t);
    t += s.durationS;
  }
  return out;
}

/** Value of waveform `w` (segment start times `starts`) on the piece that holds (t0, t1): ends at t0 and t1. */
function valuesOn(w: Waveform, starts: number[], t0: number, t1: number): [number, number] {
  const mid = 0.5 * (t0 + t1);
  let k = 0;
  while (k + 1 < starts.length && starts[k + 1]! <= mid) k++;
  const s = w.segments[k]!;
  const a = starts[k]!;
  const slope = (s.i1A - s.i0A) / s.durationS;
  return [s.i0A + slope * (t0 - a), s.i0A + slope * (t1 - a)];
}

/** The exact sum of waveforms of one period (an empty list sums to no segments). */
export function sumWaveforms(ws: readonly Waveform[]): Waveform {
  const live = ws.filter((w) => periodOf(w) > 0);
  if (live.length === 0) return { segments: [] };
  const period = periodOf(live[0]!);
  const starts = live.map(breakpoints);
  const all = starts.flat().concat([period]).sort((a, b) => a - b);
  const cuts: number[] = [];
  for (const t of all) if (cuts.length === 0 || t - cuts[cuts.length - 1]! > MERGE_FRACTION * period) cuts.push(t);
  if (period - cuts[cuts.length - 1]! > MERGE_FRACTION * period) cuts.push(period);
  else cuts[cuts.length - 1] = period;
  const segments: Segment[] = [];
  for (let j = 0; j + 1 < cuts.length; j++) {
    const t0 = cuts[j]!;
    const t1 = cuts[j + 1]!;
    let i0 = 0;
    let i1 = 0;
    for (let k = 0; k < live.length; k++) {
      const [a, b] = valuesOn(live[k]!, starts[k]!, t0, t1);
      i0 += a;
      i1 += b;
    }
    segments.push({ durationS: t1 - t0, i0A: i0, i1A: i1 });
  }
  return { segments };
}

/**
 * The current of a node fed by N interleaved phases: phase k's waveform delayed by k·T/N. `phaseWaveforms`
 * gives one waveform per phase (all the same for identical phases).
 */
export function interleavedSum(phaseWaveforms: readonly Waveform[]): Waveform {
  const n = phaseWaveforms.length;
  if (n === 0) return { segments: [] };
  const period = periodOf(phaseWaveforms[0]!);
  return sumWaveforms(phaseWaveforms.map((w, k) => delayWaveform(w, (k * period) / n)));
}
