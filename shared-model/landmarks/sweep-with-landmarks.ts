/**
 * A load sweep and its landmarks in one call, through one per-design set-up (sweep/evaluator.ts) that
 * serves every swept point and every landmark search between them. The numbers are those of
 * `sweepLoad` followed by `findLandmarks` with the design (the evaluator changes only the cost).
 */
import type { Design } from '../design/schema.ts';
import { evaluatorFor } from '../sweep/evaluator.ts';
import { sweepLoad } from '../sweep/load-sweep.ts';
import type { LoadSweep, LoadSweepOptions } from '../sweep/types.ts';
import { findLandmarks } from './find-landmarks.ts';
import type { Landmarks } from './types.ts';

export interface SweepWithLandmarks {
  sweep: LoadSweep;
  landmarks: Landmarks;
}

export interface SweepLandmarkOptions {
  /** The knee threshold in percentage points below the peak (default 2). */
  kneeThresholdPoints?: number;
  /** Refine each landmark on the engine between sweep points (default true); false interpolates them. */
  refine?: boolean;
}

export function sweepWithLandmarks(design: Design, options: LoadSweepOptions = {}, landmarks: SweepLandmarkOptions = {}): SweepWithLandmarks {
  const evaluator = evaluatorFor(design, options.evaluator);
  const sweep = sweepLoad(design, { ...options, evaluator });
  const refine = landmarks.refine ?? true;
  return { sweep, landmarks: findLandmarks(sweep, { kneeThresholdPoints: landmarks.kneeThresholdPoints, design: refine ? design : undefined, evaluator }) };
}
