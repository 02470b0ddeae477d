/**
 * sweepWithLandmarks: one call, one per-design set-up. Its records must equal the two-step path it
 * replaces — sweepLoad, then findLandmarks on the design (refined) or without it (interpolated) — each
 * step making its own set-up. That path is the independent check: the shared evaluator changes the cost,
 * never a number.
 */
import { describe, expect, it } from 'vitest';
import { findLandmarks, sweepLoad, sweepWithLandmarks } from '../../../shared-model/index.ts';
import { demoDesign } from '../../helpers/demo.ts';

const DEMOS = ['synchronous-buck.json', 'diode-boost.json', 'hot-fin-buck.json'];

describe.each(DEMOS)('sweepWithLandmarks on the demo design %s', (file) => {
  const design = demoDesign(file);
  const options = { points: 60, spacing: 'log' as const, conditions: { vinV: design.spec.vinMaxV } };

  it('equals sweepLoad followed by findLandmarks refined on the design', () => {
    const together = sweepWithLandmarks(design, options, { kneeThresholdPoints: 3 });
    const sweep = sweepLoad(design, options);
    expect(together.sweep).toStrictEqual(sweep); // two-step path, its own set-up per step
    expect(together.landmarks).toStrictEqual(findLandmarks(sweep, { design, kneeThresholdPoints: 3 })); // same, refined on the engine
  });

  it('interpolates between sweep points when refine is false, as findLandmarks does without the design', () => {
    const together = sweepWithLandmarks(design, options, { refine: false });
    expect(together.landmarks).toStrictEqual(findLandmarks(sweepLoad(design, options))); // two-step path, no refinement
    expect(together.landmarks).not.toStrictEqual(sweepWithLandmarks(design, options).landmarks); // and refinement does move them
  });
});
