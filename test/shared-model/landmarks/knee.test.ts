import { describe, expect, it } from 'vitest';
import { axisValues, DEFAULT_KNEE_THRESHOLD_POINTS, findKnee, findLandmarks, findPeak, kneeDefinition, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { efficiencyOf, syntheticDesign, syntheticEvaluator } from './synthetic.ts';

// docs/methods.md §12 curve: Vo 12 V, P0 0.2 W, a 0.05 V, b 0.02 Ω.
const curve = { voutV: 12, p0W: 0.2, aV: 0.05, b0Ohm: 0.02 };
const etaStar = 12 / (12 + 0.05 + 2 * Math.sqrt(0.2 * 0.02)); // docs/methods.md §12 closed form η*

/** Knee in closed form: the smaller root of b·I² + (a − Vo(1 − ηt)/ηt)·I + P0 = 0, ηt = η* − X/100. */
function kneeByHand(points: number): number {
  const target = etaStar - points / 100;
  const B = curve.aV - (curve.voutV * (1 - target)) / target;
  return (-B - Math.sqrt(B * B - 4 * curve.b0Ohm * curve.p0W)) / (2 * curve.b0Ohm);
}

describe('light-load knee: the lightest load within X percentage points of the peak', () => {
  const loads = axisValues(0.01, 12, 200, 'log');
  const eff = loads.map((io) => efficiencyOf(curve, io));
  const probe = (io: number) => efficiencyOf(curve, io);
  const peak = findPeak(loads, eff, undefined, probe);

  it('states its definition in one sentence that names the threshold', () => {
    expect(kneeDefinition(3)).toMatch(/lightest load at which efficiency comes within 3 percentage points of its peak/); // our definition (docs/methods.md §12: define ours, state it)
    expect(kneeDefinition(3).split('. ').length).toBe(1); // one sentence, as issue 4 requires
    expect(DEFAULT_KNEE_THRESHOLD_POINTS).toBe(2); // our documented default (knee.ts header)
  });

  it('puts the 2-point knee of the docs/methods.md §12 curve at 0.543704 A', () => {
    closeTo(kneeByHand(2), 0.543704, 1e-6); // same quadratic root evaluated independently in Python 3 (float64) during test design
    closeTo(findKnee(loads, eff, peak, 2, undefined, probe).load as number, 0.543704, 1e-6); // docs/methods.md §12 model, Python 3 root
  });

  for (const points of [1, 2, 5]) {
    it(`matches the closed-form knee for a ${points}-point threshold`, () => {
      const knee = findKnee(loads, eff, peak, points, undefined, probe);
      closeTo(knee.load as number, kneeByHand(points), 1e-7); // quadratic root from docs/methods.md §12 loss model (knee.ts header)
      closeTo(knee.value as number, etaStar - points / 100, 1e-9); // definition: efficiency at the knee is η* − X points
      expect(knee.thresholdPoints).toBe(points); // the threshold is a setting (issue 4)
    });
  }

  it('lands within a fifth of a grid step of the closed form by interpolation alone', () => {
    const knee = findKnee(loads, eff, findPeak(loads, eff), 2);
    const expected = kneeByHand(2); // docs/methods.md §12 loss model, quadratic root
    const i = loads.findIndex((x) => x > expected);
    expect(Math.abs((knee.load as number) - expected)).toBeLessThan((loads[i] - loads[i - 1]) / 5); // straight-line interpolation of a smooth curve within one step
  });

  it('moves to heavier loads as the threshold tightens', () => {
    const k1 = findKnee(loads, eff, peak, 1, undefined, probe).load as number;
    const k5 = findKnee(loads, eff, peak, 5, undefined, probe).load as number;
    expect(k1).toBeGreaterThan(k5); // η rises monotonically below Io* (docs/methods.md §12), so a tighter band is reached later
  });

  it('is null with a reason when the sweep starts above the knee', () => {
    const heavy = axisValues(1, 12, 200, 'log');
    const e = heavy.map(probe);
    const knee = findKnee(heavy, e, findPeak(heavy, e), 2);
    expect(kneeByHand(2)).toBeLessThan(1); // docs/methods.md §12 closed form puts the 2-point knee below 1 A
    expect(knee.load).toBeNull(); // so no swept point lies below it
    expect(knee.reason).toMatch(/below the swept range/); // the reason says why (issue 4: null with a reason)
  });

  it('is found through a full sweep and carries its definition', () => {
    const design = syntheticDesign(10);
    const evaluator = syntheticEvaluator(curve);
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator, kneeThresholdPoints: 2 });
    closeTo(marks.knee.load as number, kneeByHand(2), 1e-7); // docs/methods.md §12 loss model, quadratic root
    expect(marks.knee.definition).toBe(kneeDefinition(2)); // the definition travels with the landmark (issue 4)
  });
});
