/**
 * Families of load sweeps: the same sweep at minimum, nominal and maximum input voltage (at the design's
 * ambient), and at two or more ambient temperatures (at nominal input voltage), each with its landmarks.
 * Default ambients: the design's ambient and 25 K hotter — set your own.
 */
import type { Design } from '../design/schema.ts';
import { sweepWithLandmarks } from '../landmarks/sweep-with-landmarks.ts';
import type { Landmarks } from '../landmarks/types.ts';
import { evaluatorFor } from './evaluator.ts';
import type { LoadSweep, LoadSweepOptions } from './types.ts';

export interface FamilyMember {
  /** Short label, e.g. "Vin min 9 V" or "ambient 50 °C". */
  label: string;
  sweep: LoadSweep;
  landmarks: Landmarks;
}

export interface SweepFamilies {
  byInputVoltage: FamilyMember[];
  byAmbient: FamilyMember[];
}

export interface FamilyOptions extends Omit<LoadSweepOptions, 'conditions'> {
  /** Ambient temperatures of the ambient family, °C (default: the design's ambient and 25 K hotter). */
  ambientsC?: number[];
  kneeThresholdPoints?: number;
  /** Refine landmarks on the engine (default true). */
  refineLandmarks?: boolean;
}

export const DEFAULT_EXTRA_AMBIENT_K = 25;

export function sweepFamilies(design: Design, options: FamilyOptions = {}): SweepFamilies {
  const { ambientsC, kneeThresholdPoints, refineLandmarks = true, ...sweepOptions } = options;
  // One set-up of the design serves every sweep of the family and every landmark refinement.
  const evaluator = evaluatorFor(design, sweepOptions.evaluator);
  const member = (label: string, conditions: LoadSweepOptions['conditions']): FamilyMember => ({
    label,
    ...sweepWithLandmarks(design, { ...sweepOptions, conditions, evaluator }, { kneeThresholdPoints, refine: refineLandmarks }),
  });
  const s = design.spec;
  const byInputVoltage = [
    member(`Vin min ${s.vinMinV} V`, { vinV: s.vinMinV }),
    member(`Vin nom ${s.vinNomV} V`, { vinV: s.vinNomV }),
    member(`Vin max ${s.vinMaxV} V`, { vinV: s.vinMaxV }),
  ];
  const ambients = ambientsC ?? [s.ambientC, s.ambientC + DEFAULT_EXTRA_AMBIENT_K];
  const byAmbient = ambients.map((ambientC) => member(`ambient ${ambientC} °C`, { vinV: s.vinNomV, ambientC }));
  return { byInputVoltage, byAmbient };
}
