/**
 * The corners a sizing is computed at: rated load at Vin min, nominal and max, plus — for a boost — the
 * input voltage of largest inductor volt-seconds when it lies inside the range.
 *
 * Why these corners: every current and voltage stress of a buck or boost grows with load, so rated load
 * is the worst load for all of them; over Vin the stresses are monotonic except the inductor ripple of a
 * boost. Its volt-seconds per period Vin·D·Ts = Vin·(1 − Vin/Vo)·Ts (ideal) peak at Vin = Vo/2
 * (d/dVin = 0), so that point is added when it lies strictly inside (Vin min, Vin max). A buck's
 * volt-seconds (Vin − Vo)·D·Ts = Vo·(1 − Vo/Vin)·Ts rise with Vin: Vin max already covers them.
 * Each corner is a full electro-thermal evaluation of the design with its parts (evaluate): the duty is
 * solved from the power balance with the design's own losses, never from an assumed efficiency.
 * Source: Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2 (ripple of the buck
 * and boost, from memory for the chapter); the maximum at Vo/2 is worked here (docs/methods.md §23).
 */
import type { Design } from '../design/schema.ts';
import { topologyOf } from '../topology/registry.ts';
import type { Evaluation } from '../ledger/types.ts';
import { evaluate } from '../ledger/evaluate.ts';
import type { CornerId, SizingCorner } from './types.ts';

export interface SolvedCorner {
  corner: SizingCorner;
  evaluation: Evaluation;
}

const f4 = (x: number) => Number(x.toPrecision(4)).toString();

const LABELS: Record<CornerId, string> = {
  'vin-min': 'Vin min',
  'vin-nom': 'Vin nominal',
  'vin-max': 'Vin max',
  'vin-ripple': 'Vin of largest ripple',
};

/** The input voltages of the corners, in order, without repeats (a fixed input gives one corner). */
export function cornerVoltages(design: Design): { id: CornerId; vinV: number }[] {
  const { spec } = design;
  const out: { id: CornerId; vinV: number }[] = [];
  const add = (id: CornerId, vinV: number) => {
    if (!out.some((c) => c.vinV === vinV)) out.push({ id, vinV });
  };
  add('vin-min', spec.vinMinV);
  add('vin-nom', spec.vinNomV);
  add('vin-max', spec.vinMaxV);
  const ripple = topologyOf(design).sizingWords.largestRippleVinV(spec.voutV);
  if (ripple !== undefined && ripple > spec.vinMinV && ripple < spec.vinMaxV) add('vin-ripple', ripple);
  return out;
}

/** Evaluates the design at each corner (rated load). */
export function solveCorners(design: Design): SolvedCorner[] {
  const loadA = design.spec.ratedLoadA;
  return cornerVoltages(design).map(({ id, vinV }) => {
    const evaluation = evaluate(design, { vinV, loadA });
    const op = evaluation.operatingPoint;
    return {
      evaluation,
      corner: {
        id,
        label: `${LABELS[id]} ${f4(vinV)} V, rated load ${f4(loadA)} A`,
        vinV,
        loadA,
        dutyCycle: op.dutyCycle,
        efficiency: evaluation.efficiency,
        regulated: op.regulated,
        converged: evaluation.converged,
        mode: op.mode,
      },
    };
  });
}

/** The corner where `valueOf` is largest (smallest with `smallest`), and that value. */
export function worstCorner(
  corners: readonly SolvedCorner[],
  valueOf: (c: SolvedCorner) => number,
  smallest = false,
): { at: SolvedCorner; value: number } {
  let at = corners[0]!;
  let value = valueOf(at);
  for (const c of corners.slice(1)) {
    const v = valueOf(c);
    if (smallest ? v < value : v > value) {
      at = c;
      value = v;
    }
  }
  return { at, value };
}
