import { describe, expect, it } from 'vitest';
import { axisValues, findLandmarks, findPeak, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { efficiencyOf, syntheticDesign, syntheticEvaluator } from './synthetic.ts';

// docs/methods.md §12 check: Vo 12 V, P0 0.2 W, a 0.05 V, b 0.02 Ω → Io* 3.162278 A, η* 0.985506.
const curve = { voutV: 12, p0W: 0.2, aV: 0.05, b0Ohm: 0.02 };

describe('findPeak on P0 + a·Io + b·Io²', () => {
  const loads = axisValues(0.05, 12, 200, 'log');
  const eff = loads.map((io) => efficiencyOf(curve, io));

  it('finds the peak at √(P0/b) with η* = Vo/(Vo + a + 2√(P0·b)) when refined on the curve', () => {
    const peak = findPeak(loads, eff, undefined, (io) => efficiencyOf(curve, io));
    closeTo(peak.load as number, 3.162278, 1e-6); // docs/methods.md §12 worked value Io* = √(0.2/0.02)
    closeTo(peak.value as number, 0.985506, 0, 5e-7); // docs/methods.md §12 worked value η* (given to 6 decimals)
    closeTo(peak.value as number, 12 / (12 + 0.05 + 2 * Math.sqrt(0.2 * 0.02)), 1e-12); // docs/methods.md §12 closed form
    expect(peak.method).toBe('refined'); // refined on the curve (peak.ts contract)
  });

  it('places the peak within a tenth of a grid step by the three-point parabola alone', () => {
    const peak = findPeak(loads, eff);
    const step = loads[peak.index + 1] - loads[peak.index];
    expect(Math.abs((peak.load as number) - Math.sqrt(0.2 / 0.02))).toBeLessThan(step / 10); // docs/methods.md §12 Io* = √(P0/b); interpolation must beat the grid step
    closeTo(peak.value as number, 0.985506, 0, 1e-6); // docs/methods.md §12 η*; the parabola is exact to 2nd order at a smooth maximum
    expect(peak.method).toBe('interpolated'); // no probe given: parabola (peak.ts contract)
  });

  it('reports a peak at the edge of the range with a note when efficiency still rises', () => {
    const rising = loads.map((io) => efficiencyOf({ ...curve, b0Ohm: 0 }, io)); // b = 0: Io* = √(P0/0) → ∞ (docs/methods.md §12)
    const peak = findPeak(loads, rising);
    expect(peak.load).toBe(12); // by construction: the heaviest swept load
    expect(peak.note).toMatch(/heaviest/); // the true peak lies beyond the range (docs/methods.md §12 with b = 0)
  });

  it('finds the same peak through a full sweep of a stand-in evaluator', () => {
    const design = syntheticDesign(6);
    const evaluator = syntheticEvaluator(curve);
    const sweep = sweepLoad(design, { evaluator });
    expect(sweep.points).toHaveLength(200); // issue 4: at least 200 points by default
    closeTo(sweep.points[0].loadA, 0.06, 1e-12); // issue 4: default sweep starts at about 1 % of rated (6 A)
    closeTo(sweep.points[199].loadA, 7.2, 1e-12); // issue 4: default sweep ends at 120 % of rated
    const marks = findLandmarks(sweep, { design, evaluator });
    closeTo(marks.peak.load as number, 3.162278, 1e-6); // docs/methods.md §12 worked value Io*
    closeTo(marks.peak.value as number, 0.985506, 0, 5e-7); // docs/methods.md §12 worked value η*
  });
});
