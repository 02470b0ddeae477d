/**
 * Exact statistics of a branch current made of the three intervals of one period — on (t_on, a0 → a1),
 * off (t_off, b0 → b1) and idle (t_idle, constant c) — written into a reused record, without allocating.
 *
 * For a straight segment from i0 to i1 over dt (as waveform/stats.ts):
 *   ∫i dt = (i0 + i1)/2·dt,  ∫i² dt = (i0² + i0·i1 + i1²)/3·dt,  AC RMS from the segments shifted by the mean,
 *   slope part of the mean square Σ (dt/T)·(i1 − i0)²/12 (the rest, ī², is carried by the interval means).
 * Zero-length intervals are left out, as the operating point's record leaves out zero-length segments.
 *
 * Two forms of the idle interval's squares, both exact in real arithmetic:
 *   loop (the electro-thermal loop's iterates, kept as they have always been): c²·t and (c − m)²·t;
 *   record (`asRecord`): (c² + c² + c²)/3·t and ((c−m)² + (c−m)² + (c−m)²)/3·t, the straight-segment formula
 *     waveform/stats.ts applies to the record's idle segment — so the final point of a sweep carries the
 *     very bits of the OperatingPoint record (the two forms can differ in the last bit).
 * Peak and minimum: the largest and smallest segment end, compared in segment order as waveform/stats.ts.
 * Source: elementary integration of a linear function; docs/methods.md §1 (exact RMS of straight-line pieces).
 */

export interface IntervalStats {
  rmsA: number;
  acRmsA: number;
  averageA: number;
  peakA: number;
  minA: number;
  /** Σ (t/T)·(i1 − i0)²/12 over the segments, A²: the part of the mean square carried by the slopes. */
  rippleSqA2: number;
}

export function newIntervalStats(): IntervalStats {
  return { rmsA: 0, acRmsA: 0, averageA: 0, peakA: 0, minA: 0, rippleSqA2: 0 };
}

/**
 * Statistics of the three-interval waveform into `out`; `v` holds [t_on, t_off, t_idle, a0, a1, b0, b1, c]
 * (on a0→a1, off b0→b1, idle constant c). The numbers travel in a typed array rather than as arguments:
 * a call that is not inlined would box each one (a heap allocation per number per call).
 */
export function intervalStats(out: IntervalStats, v: Float64Array, asRecord: boolean): void {
  const tOn = v[0]!;
  const tOff = v[1]!;
  const tIdle = v[2]!;
  const a0 = v[3]!;
  const a1 = v[4]!;
  const b0 = v[5]!;
  const b1 = v[6]!;
  const c = v[7]!;
  let period = 0;
  let charge = 0;
  let peak = -Infinity;
  let min = Infinity;
  if (tOn > 0) {
    period += tOn;
    charge += 0.5 * (a0 + a1) * tOn;
    if (a0 > peak) peak = a0;
    if (a1 > peak) peak = a1;
    if (a0 < min) min = a0;
    if (a1 < min) min = a1;
  }
  if (tOff > 0) {
    period += tOff;
    charge += 0.5 * (b0 + b1) * tOff;
    if (b0 > peak) peak = b0;
    if (b1 > peak) peak = b1;
    if (b0 < min) min = b0;
    if (b1 < min) min = b1;
  }
  if (tIdle > 0) {
    period += tIdle;
    charge += c * tIdle;
    if (c > peak) peak = c;
    if (c < min) min = c;
  }
  if (!(period > 0)) {
    out.rmsA = 0;
    out.acRmsA = 0;
    out.averageA = 0;
    out.peakA = 0;
    out.minA = 0;
    out.rippleSqA2 = 0;
    return;
  }
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
    const x = c - m;
    if (asRecord) {
      sq += ((c * c + c * c + c * c) / 3) * tIdle;
      ac += ((x * x + x * x + x * x) / 3) * tIdle;
    } else {
      sq += c * c * tIdle;
      ac += x * x * tIdle;
    }
  }
  out.averageA = m;
  out.peakA = peak;
  out.minA = min;
  out.rippleSqA2 = slope / period;
  out.rmsA = Math.sqrt(sq / period);
  out.acRmsA = Math.sqrt(ac / period);
}
