/**
 * All landmarks of a load sweep at once: peak, knee, CCM/DCM boundary, pulse-skipping load, thermal
 * ceiling, regulation limit.
 * With the design (and optionally an evaluator) each landmark is placed by searching the engine between
 * the two sweep points that bracket it; without, by interpolating those points.
 * Peak, knee and mode boundary use only regulated, converged points (ledger/regulated.ts); the thermal
 * ceiling follows every point (a part overheats past the regulation limit too), the regulation limit finds
 * the first unregulated one.
 */
import type { Design } from '../design/schema.ts';
import { conditionsFor, pointRecorder } from '../sweep/evaluator.ts';
import { ColumnBook } from '../sweep/point-record.ts';
import type { PointEvaluator, LoadSweep, SweepPoint } from '../sweep/types.ts';
import { DEFAULT_KNEE_THRESHOLD_POINTS, findKnee } from './knee.ts';
import { findModeBoundary } from './mode-boundary.ts';
import { findPulseSkipping } from './pulse-skipping.ts';
import { findPeak } from './peak.ts';
import { findRegulationLimit, regulationCause } from './regulation-limit.ts';
import { findThermalCeiling } from './thermal-ceiling.ts';
import type { Landmark, Landmarks } from './types.ts';
import { isUsablePoint } from '../ledger/regulated.ts';

export interface LandmarkOptions {
  /** The knee threshold in percentage points below the peak (default 2). */
  kneeThresholdPoints?: number;
  /** The swept design: given, landmarks are refined on the engine between sweep points. */
  design?: Design;
  evaluator?: PointEvaluator;
}

/**
 * A function that evaluates the sweep's design at any load, as a point aligned with the sweep's columns:
 * through `evaluator` when given, else through a per-design evaluator made for this probe (its set-up
 * lives as long as the probe; the points are those of `evaluate`, sweep/evaluator.ts).
 */
export function loadProbe(design: Design, sweep: LoadSweep, evaluator?: PointEvaluator): (load: number) => SweepPoint {
  const record = pointRecorder(design, ColumnBook.resume(sweep.columns), evaluator);
  const fixed = { vinV: sweep.vinV, ambientC: sweep.ambientC, switchingFrequencyHz: sweep.switchingFrequencyHz };
  const cache = new Map<number, SweepPoint>();
  return (load) => {
    let p = cache.get(load);
    if (!p) {
      p = record(conditionsFor(design, { ...fixed, loadA: load }));
      cache.set(load, p);
    }
    return p;
  };
}

export function findLandmarks(sweep: LoadSweep, options: LandmarkOptions = {}): Landmarks {
  const probe = options.design ? loadProbe(options.design, sweep, options.evaluator) : undefined;
  const points = sweep.points;
  const loads = points.map((p) => p.loadA);
  const efficiency = points.map((p) => p.efficiency);
  const usable = points.map((p) => isUsablePoint(p) && regulationCause(p) === null);
  const efficiencyAt = probe ? (load: number) => probe(load).efficiency : undefined;
  const peak = findPeak(loads, efficiency, usable, efficiencyAt);
  const { index: _index, ...peakLandmark } = peak;
  return {
    peak: peakLandmark,
    knee: findKnee(loads, efficiency, peak, options.kneeThresholdPoints ?? DEFAULT_KNEE_THRESHOLD_POINTS, usable, efficiencyAt),
    modeBoundary: modeBoundaryOf(points, usable, probe),
    pulseSkipping: findPulseSkipping(sweep, options.design, probe),
    thermalCeiling: findThermalCeiling(sweep.columns, points, probe),
    regulationLimit: findRegulationLimit(points, probe),
  };
}

/** The mode boundary among the usable points (a change of mode past the regulation limit is no landmark). */
function modeBoundaryOf(points: readonly SweepPoint[], usable: readonly boolean[], probe?: (load: number) => SweepPoint): Landmark {
  const kept = points.filter((_, i) => usable[i]);
  if (kept.length === 0 && points.length > 0) {
    return { unit: '', load: null, value: null, reason: 'No swept point is regulated and converged.', note: null, method: 'none' };
  }
  return findModeBoundary(kept, probe);
}
