/**
 * A capacitor's ESR(f) curve met by the harmonics of the current it carries.
 *
 * What: the ESR loss of a periodic current i(t) in a capacitor whose ESR depends on frequency is
 *   P = I0²·ESR(f_lo) + Σ_{h ≥ 1} I_h²·ESR(h·fs),
 * I_h the RMS of harmonic h (I_h² = 2·|c_h|²) and I0 the mean (zero in steady state; it is given the ESR
 * of the table's first point). `spectralEsrOhm` returns the equivalent single ESR P / Irms².
 *
 * Formula: the Fourier coefficients of a piecewise-linear periodic waveform follow exactly from its
 * breakpoints t_k, the jumps J_k = i(t_k+) − i(t_k−) and the slope changes S_k = i'(t_k+) − i'(t_k−):
 *   c_h = (1/T) · Σ_k [ J_k/(jω) + S_k/(jω)² ] · e^{−jω t_k},   ω = 2πh/T
 * (integrate (1/T)∫ i(t) e^{−jωt} dt by parts twice; i'' = 0 between breakpoints). No truncation error:
 * harmonics are summed one by one while h·fs is inside the table; above the table's last frequency the
 * ESR is held, so the rest of the spectrum, Irms² − I0² − Σ I_h² (Parseval), meets the last ESR at once.
 * Only when the table reaches beyond MAX_HARMONICS·fs are the harmonics above that given the ESR at
 * (MAX_HARMONICS + 1)·fs (stated; at 100 kHz that is a table beyond 100 MHz).
 * Assumptions: the ESR is a linear resistance at each frequency (superposition); straight lines between
 * the table's points in f; ESR(f, T) = ESR(f) · ratio(T) (separable, temperature applied by the caller).
 * Source: Fourier series by breakpoints — Bracewell, "The Fourier Transform and Its Applications", the
 * derivative theorem [from memory]; Parseval's theorem (any signals text); docs/methods.md §26.
 */
import type { EsrFrequencyPoint } from '../design/parts.ts';
import type { Segment } from '../operating-point/types.ts';
import { pointCurveAt } from './temperature-curves.ts';

/** Most harmonics summed one by one (see header). */
export const MAX_HARMONICS = 1000;

/**
 * Mean, mean square and the harmonic RMS² of the periodic straight-line waveform `segments` (durations add
 * to one period): I_h² for h = 1…count written into `out[h − 1]` when `out` is given. Returns the mean square.
 * Zero-duration segments are skipped (a jump).
 */
export function harmonicRmsSquares(segments: readonly Segment[], count: number, out: Float64Array): { meanA: number; meanSquareA2: number } {
  let T = 0;
  let mean = 0;
  let sq = 0;
  for (const g of segments) {
    const d = g.durationS;
    if (!(d > 0)) continue;
    T += d;
    mean += 0.5 * (g.i0A + g.i1A) * d;
    sq += ((g.i0A * g.i0A + g.i0A * g.i1A + g.i1A * g.i1A) / 3) * d;
  }
  if (!(T > 0)) {
    out.fill(0, 0, count);
    return { meanA: 0, meanSquareA2: 0 };
  }
  for (let h = 1; h <= count; h++) out[h - 1] = harmonicSquare(segments, T, h);
  return { meanA: mean / T, meanSquareA2: sq / T };
}

/** I_h² = 2|c_h|² of harmonic h of the waveform (period T), by breakpoints (see header). */
export function harmonicSquare(segments: readonly Segment[], T: number, h: number): number {
  const w = (2 * Math.PI * h) / T;
  const n = segments.length;
  // The last non-empty segment before the first: the waveform wraps around.
  let prev = -1;
  for (let k = n - 1; k >= 0; k--) {
    if (segments[k]!.durationS > 0) {
      prev = k;
      break;
    }
  }
  if (prev < 0) return 0;
  let re = 0;
  let im = 0;
  let t = 0;
  for (let k = 0; k < n; k++) {
    const g = segments[k]!;
    const d = g.durationS;
    if (!(d > 0)) continue;
    const p = segments[prev]!;
    const jump = g.i0A - p.i1A;
    const slopeChange = (g.i1A - g.i0A) / d - (p.i1A - p.i0A) / p.durationS;
    // [J/(jω) + S/(jω)²]·e^{−jωt} = (B − jJ/ω)(cos θ − j sin θ), B = −S/ω².
    const b = -slopeChange / (w * w);
    const a = jump / w;
    const th = w * t;
    const c = Math.cos(th);
    const s = Math.sin(th);
    re += b * c - a * s;
    im += -b * s - a * c;
    t += d;
    prev = k;
  }
  return (2 * (re * re + im * im)) / (T * T);
}

const scratch = new Float64Array(MAX_HARMONICS);

const fOf = (p: EsrFrequencyPoint): number => p.frequencyHz;
const esrOf = (p: EsrFrequencyPoint): number => p.esrOhm;

/** ESR at f from the table, straight lines between points, the end values held outside it. */
export function esrAtFrequency(points: readonly EsrFrequencyPoint[], f: number): number {
  return pointCurveAt(points, fOf, esrOf, f);
}

/**
 * The single ESR that dissipates what the spectrum of `segments` dissipates in the ESR(f) table
 * (frequencies strictly rising): P / Irms². With no current it is the ESR at the fundamental.
 * One module scratch array; no allocation per harmonic.
 */
export function spectralEsrOhm(segments: readonly Segment[], periodS: number, table: readonly EsrFrequencyPoint[]): number {
  const fs = 1 / periodS;
  const last = table[table.length - 1]!.frequencyHz;
  let count = Math.ceil(last / fs);
  if (!(count >= 1)) count = 1;
  const capped = count > MAX_HARMONICS;
  if (capped) count = MAX_HARMONICS;
  const stats = harmonicRmsSquares(segments, count, scratch);
  const ms = stats.meanSquareA2;
  if (!(ms > 0)) return esrAtFrequency(table, fs);
  const m2 = stats.meanA * stats.meanA;
  let p = m2 * table[0]!.esrOhm;
  let rest = ms - m2;
  for (let h = 1; h <= count; h++) {
    const ih2 = scratch[h - 1]!;
    p += ih2 * esrAtFrequency(table, h * fs);
    rest -= ih2;
  }
  if (rest > 0) p += rest * (capped ? esrAtFrequency(table, (count + 1) * fs) : table[table.length - 1]!.esrOhm);
  return p / ms;
}
