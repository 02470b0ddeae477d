/**
 * Phase shedding: the efficiency against load with 1 … N phases switching, the loads where dropping a
 * phase saves loss, and the efficiency with ideal shedding (the envelope).
 *
 * Definitions (our own, stated in the UI and report, docs/methods.md §15):
 * - Crossover n → n − 1: the highest load in the swept range below which n − 1 phases lose less than n
 *   (total loss, every part and the shared ones). Found on the sweep, then refined by bisection on the
 *   engine: diff(I) = loss_n(I) − loss_{n−1}(I) changes sign from ≤ 0 above to > 0 below.
 * - Hysteresis: a band of fraction h centred on the crossover — shed below I·(1 − h/2), add the phase back
 *   above I·(1 + h/2) — so a load resting at the crossover does not toggle a phase. The design's
 *   `topology.phaseShedding.hysteresisFraction`, else a suggested 10 % (our own rule).
 * - Envelope: at each load, the usable count (regulated and converged) with the least total loss.
 * Worked model (docs/methods.md §12 and §15): per-phase loss P0 + b·(I/n)² gives
 *   loss_n = n·P0 + b·I²/n, crossover n → n − 1 at I* = √(P0·n·(n − 1)/b).
 */
import type { Design } from '../design/schema.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import type { Conditions } from '../operating-point/types.ts';
import { DEFAULT_SWEEP_FROM_FRACTION, DEFAULT_SWEEP_SPACING, DEFAULT_SWEEP_TO_FRACTION } from '../sweep/load-sweep.ts';
import { axisValues } from '../sweep/spacing.ts';
import type { SweepSpacing } from '../sweep/types.ts';
import { evaluatePhasesWith, phaseLedgers } from './evaluate-phases.ts';
import { phaseCount } from './phase-design.ts';

/** Suggested hysteresis band when the design sets none (our own rule). */
export const SUGGESTED_HYSTERESIS = 0.1;

export interface PhaseCurvePoint {
  loadA: number;
  efficiency: number;
  totalLossW: number;
  /** Regulated and converged: only such points take part in crossovers and the envelope. */
  usable: boolean;
}

export interface PhaseCurve {
  activePhases: number;
  points: PhaseCurvePoint[];
}

export interface ShedLandmark {
  fromPhases: number;
  toPhases: number;
  found: boolean;
  /** Below this load n − 1 phases lose less, A. */
  crossoverA?: number;
  /** Suggested: drop the phase below this load, A. */
  shedBelowA?: number;
  /** Suggested: add the phase back above this load, A. */
  addAboveA?: number;
  /** Loss saved by shedding at shedBelowA (loss with n phases − with n − 1), W. */
  lossSavedAtShedW?: number;
  /** Efficiency at the crossover (both counts agree there). */
  efficiencyAtCrossover?: number;
  /** Why it was not found. */
  reason?: string;
}

export interface PhaseShedding {
  phases: number;
  /** The design sheds phases (topology.phaseShedding set). */
  enabled: boolean;
  hysteresisFraction: number;
  /** True when the hysteresis is our suggestion, not the design's. */
  hysteresisSuggested: boolean;
  curves: PhaseCurve[];
  /** Best usable count at each load (activePhases 0 where no count is usable). */
  envelope: { loadA: number; efficiency: number; activePhases: number }[];
  landmarks: ShedLandmark[];
  definition: string;
}

export interface SheddingOptions {
  fromA?: number;
  toA?: number;
  points?: number;
  spacing?: SweepSpacing;
  conditions?: Partial<Omit<Conditions, 'loadA'>>;
}

export const SHEDDING_DEFINITION =
  'Crossover n → n − 1: the highest load below which n − 1 phases lose less than n (total loss). ' +
  'Suggested thresholds: shed below crossover × (1 − h/2), add back above crossover × (1 + h/2). ' +
  'Envelope: at each load, the usable phase count with the least loss.';

/**
 * The crossover of diff(I) = loss_n − loss_{n−1} on an ascending load grid: the highest interval where
 * diff is > 0 below and ≤ 0 above, refined by bisection to a relative width `rtol`. Null entries of the
 * grid (unusable points) break intervals. Returns null when there is no such interval.
 */
export function findCrossover(diff: (loadA: number) => number | null, loads: readonly number[], rtol = 1e-7): number | null {
  const values = loads.map(diff);
  for (let j = loads.length - 1; j > 0; j--) {
    const hi = values[j];
    const lo = values[j - 1];
    if (hi === null || lo === null || hi === undefined || lo === undefined) continue;
    if (!(hi <= 0 && lo > 0)) continue;
    let a = loads[j - 1]!;
    let b = loads[j]!;
    for (let k = 0; k < 200 && b - a > rtol * b; k++) {
      const m = 0.5 * (a + b);
      const v = diff(m);
      if (v === null) break;
      if (v > 0) a = m;
      else b = m;
    }
    return 0.5 * (a + b);
  }
  return null;
}

/** Curves for 1 … N phases, crossovers with suggested hysteresis, and the envelope. */
export function phaseShedding(design: Design, options: SheddingOptions = {}): PhaseShedding {
  const phases = phaseCount(design);
  const rated = design.spec.ratedLoadA;
  const loads = axisValues(
    options.fromA ?? DEFAULT_SWEEP_FROM_FRACTION * rated, options.toA ?? DEFAULT_SWEEP_TO_FRACTION * rated, options.points ?? 60, options.spacing ?? DEFAULT_SWEEP_SPACING,
  );
  const ledgers = phaseLedgers(design);
  const at = (n: number, loadA: number) => evaluatePhasesWith(design, ledgers, { ...options.conditions, loadA }, { activePhases: n });
  const curves: PhaseCurve[] = [];
  for (let n = 1; n <= phases; n++)
    curves.push({
      activePhases: n,
      points: loads.map((loadA) => {
        const p = at(n, loadA);
        return { loadA, efficiency: p.efficiency, totalLossW: p.totalLoss, usable: isUsablePoint(p) };
      }),
    });
  const setH = design.topology.phaseShedding?.hysteresisFraction;
  const h = setH ?? SUGGESTED_HYSTERESIS;
  const landmarks: ShedLandmark[] = [];
  for (let n = phases; n >= 2; n--) {
    const diff = (loadA: number): number | null => {
      const a = at(n, loadA);
      const b = at(n - 1, loadA);
      return isUsablePoint(a) && isUsablePoint(b) ? a.totalLoss - b.totalLoss : null;
    };
    const upper = curves[n - 1]!.points;
    const lower = curves[n - 2]!.points;
    const grid = (j: number): number | null => (upper[j]!.usable && lower[j]!.usable ? upper[j]!.totalLossW - lower[j]!.totalLossW : null);
    const onGrid = loads.map((_, j) => grid(j));
    const crossing = findCrossover((loadA) => {
      const j = loads.indexOf(loadA);
      return j >= 0 ? onGrid[j]! : diff(loadA);
    }, loads);
    if (crossing === null) {
      const usable = onGrid.filter((v): v is number => v !== null);
      const reason =
        usable.length === 0 ? `no load in the range where both ${n} and ${n - 1} phases regulate and settle`
        : usable.every((v) => v > 0) ? `${n - 1} phases lose less than ${n} over the whole range swept`
        : usable.every((v) => v <= 0) ? `${n} phases lose less than ${n - 1} over the whole range swept: shedding this phase never saves loss here`
        : `the loss difference changes sign more than once without a clear crossover`;
      landmarks.push({ fromPhases: n, toPhases: n - 1, found: false, reason });
      continue;
    }
    const shedBelowA = crossing * (1 - h / 2);
    const a = at(n, shedBelowA);
    const b = at(n - 1, shedBelowA);
    landmarks.push({
      fromPhases: n,
      toPhases: n - 1,
      found: true,
      crossoverA: crossing,
      shedBelowA,
      addAboveA: crossing * (1 + h / 2),
      lossSavedAtShedW: a.totalLoss - b.totalLoss,
      efficiencyAtCrossover: at(n, crossing).efficiency,
    });
  }
  const envelope = loads.map((loadA, j) => {
    let best = -1;
    for (let n = 1; n <= phases; n++) {
      const p = curves[n - 1]!.points[j]!;
      if (p.usable && (best < 0 || p.totalLossW < curves[best - 1]!.points[j]!.totalLossW)) best = n;
    }
    return { loadA, efficiency: best > 0 ? curves[best - 1]!.points[j]!.efficiency : 0, activePhases: Math.max(best, 0) };
  });
  return { phases, enabled: design.topology.phaseShedding !== undefined, hysteresisFraction: h, hysteresisSuggested: setH === undefined, curves, envelope, landmarks, definition: SHEDDING_DEFINITION };
}
