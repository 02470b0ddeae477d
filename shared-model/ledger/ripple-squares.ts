/**
 * The slope part of each branch's mean square: a straight segment of mean ī and swing Δi has mean square
 * ī² + Δi²/12; Σ (t/T)·Δi²/12 over a branch's segments is the part the kernel prices as a loss paid by the
 * source at an unchanged duty (ledger/slots.ts), from the solver's record or from a lean point (which
 * computed it with its statistics, waveform/interval-stats.ts).
 * Source: elementary integration of a linear function; docs/methods.md §1.
 */
import type { OperatingPoint, Segment } from '../operating-point/types.ts';
import type { LeanPoint } from '../operating-point/lean-point.ts';

/**
 * Slope part of each branch's mean square, A² (see rippleSquaresOf). Key names of their own: a record
 * whose first keys were those of an object-valued record (`stats`) would share its hidden class, and
 * every number stored in it would then be boxed on the heap.
 */
export interface RippleSquares {
  switchA2: number;
  rectifierA2: number;
  inductorA2: number;
  inputCapacitorA2: number;
  outputCapacitorA2: number;
  senseA2: number;
}

export function newRippleSquares(): RippleSquares {
  return { switchA2: 0, rectifierA2: 0, inductorA2: 0, inputCapacitorA2: 0, outputCapacitorA2: 0, senseA2: 0 };
}

function slopeSquare(segments: readonly Segment[]): number {
  let period = 0;
  let sum = 0;
  for (let k = 0; k < segments.length; k++) {
    const s = segments[k]!;
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
  out.switchA2 = slopeSquare(w.switch.segments);
  out.rectifierA2 = slopeSquare(w.rectifier.segments);
  out.inductorA2 = slopeSquare(w.inductor.segments);
  out.inputCapacitorA2 = slopeSquare(w.inputCapacitor.segments);
  out.outputCapacitorA2 = slopeSquare(w.outputCapacitor.segments);
  out.senseA2 = slopeSquare(w.sense.segments);
  return out;
}

/** The slope parts of a lean point (already computed with its statistics). */
export function rippleSquaresOfLean(p: LeanPoint, out: RippleSquares): RippleSquares {
  out.switchA2 = p.stats.switch.rippleSqA2;
  out.rectifierA2 = p.stats.rectifier.rippleSqA2;
  out.inductorA2 = p.inductor.rippleSqA2;
  out.inputCapacitorA2 = p.stats.inputCapacitor.rippleSqA2;
  out.outputCapacitorA2 = p.stats.outputCapacitor.rippleSqA2;
  out.senseA2 = p.stats.sense.rippleSqA2;
  return out;
}
