/**
 * Small helpers to build piecewise-linear current waveforms (see operating-point/types.ts).
 * Segments of zero duration are kept out so every segment carries time.
 */
import type { Segment, Waveform } from '../operating-point/types.ts';

/** One straight segment from i0A to i1A lasting durationS. */
export function segment(durationS: number, i0A: number, i1A: number): Segment {
  return { durationS, i0A, i1A };
}

/** A waveform from segments, dropping those with zero (or non-positive) duration. */
export function waveformOf(...segments: Segment[]): Waveform {
  return { segments: segments.filter((s) => s.durationS > 0) };
}

/** A constant current over one period. */
export function constantWaveform(periodS: number, currentA: number): Waveform {
  return waveformOf(segment(periodS, currentA, currentA));
}

/** The same waveform shifted by offsetA (for example a branch current minus its DC part). */
export function offsetWaveform(w: Waveform, offsetA: number): Waveform {
  return { segments: w.segments.map((s) => segment(s.durationS, s.i0A + offsetA, s.i1A + offsetA)) };
}

/** The waveform scaled by a factor (for example one of `count` identical parallel parts). */
export function scaleWaveform(w: Waveform, factor: number): Waveform {
  return { segments: w.segments.map((s) => segment(s.durationS, s.i0A * factor, s.i1A * factor)) };
}
