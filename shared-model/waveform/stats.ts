/**
 * Exact statistics of a periodic piecewise-linear current.
 *
 * For a straight segment from i0 to i1 over dt:
 *   ∫ i dt  = (i0 + i1)/2 · dt
 *   ∫ i² dt = (i0² + i0·i1 + i1²)/3 · dt
 * so mean = Σ∫i/T and RMS = √(Σ∫i²/T) are exact, not sampled. The AC RMS (RMS of i − mean) is
 * integrated the same way on the shifted segments, which avoids the cancellation of √(RMS² − mean²).
 * Source: elementary integration of a linear function; docs/methods.md §1 (exact RMS of straight-line pieces).
 * A waveform whose period is 0 (no segments or all durations 0) has all statistics 0.
 */
import type { CurrentStats, Waveform } from '../operating-point/types.ts';

/** Sum of the segment durations, s. */
export function periodOf(w: Waveform): number {
  let t = 0;
  for (const s of w.segments) t += s.durationS;
  return t;
}

/** Mean, RMS, AC RMS, peak and minimum of a piecewise-linear periodic current, exactly. */
export function waveformStats(w: Waveform): CurrentStats {
  let period = 0;
  let charge = 0;
  let peak = -Infinity;
  let min = Infinity;
  for (const s of w.segments) {
    const dt = s.durationS;
    if (!(dt > 0)) continue;
    period += dt;
    charge += 0.5 * (s.i0A + s.i1A) * dt;
    if (s.i0A > peak) peak = s.i0A;
    if (s.i1A > peak) peak = s.i1A;
    if (s.i0A < min) min = s.i0A;
    if (s.i1A < min) min = s.i1A;
  }
  if (!(period > 0)) return { averageA: 0, rmsA: 0, acRmsA: 0, peakA: 0, minA: 0 };
  const mean = charge / period;
  let sq = 0;
  let acSq = 0;
  for (const s of w.segments) {
    const dt = s.durationS;
    if (!(dt > 0)) continue;
    sq += ((s.i0A * s.i0A + s.i0A * s.i1A + s.i1A * s.i1A) / 3) * dt;
    const a = s.i0A - mean;
    const b = s.i1A - mean;
    acSq += ((a * a + a * b + b * b) / 3) * dt;
  }
  return {
    averageA: mean,
    rmsA: Math.sqrt(sq / period),
    acRmsA: Math.sqrt(acSq / period),
    peakA: peak,
    minA: min,
  };
}
