import { describe, expect, it } from 'vitest';
import { findLandmarks, findModeBoundary, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { syntheticDesign, syntheticEvaluator } from './synthetic.ts';

const curve = { voutV: 12, p0W: 0.2, aV: 0.05, b0Ohm: 0.02 };
const design = syntheticDesign(10);

describe('CCM/DCM boundary', () => {
  it('is found at the load where the reported mode changes, refined on the engine', () => {
    // Stand-in: DCM below Io = ΔI/2 with ΔI = 2 × 0.8125 A (buck boundary K = Kcrit, docs/methods.md §2).
    const evaluator = syntheticEvaluator({ ...curve, boundaryA: 0.8125 });
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    closeTo(marks.modeBoundary.load as number, 0.8125, 1e-6); // docs/methods.md §2: boundary where mean current = ripple/2
    expect(marks.modeBoundary.method).toBe('refined'); // placed on the engine, not interpolated (find-landmarks.ts contract)
  });

  it('is the midpoint of the bracketing points without the engine', () => {
    const evaluator = syntheticEvaluator({ ...curve, boundaryA: 0.8125 });
    const sweep = sweepLoad(design, { evaluator, spacing: 'linear', fromA: 0.1, toA: 12, points: 120 });
    const b = findModeBoundary(sweep.points);
    const step = sweep.points[1].loadA - sweep.points[0].loadA;
    expect(Math.abs((b.load as number) - 0.8125)).toBeLessThanOrEqual(step / 2); // docs/methods.md §2 boundary; midpoint is within half a step
  });

  it('is null with a reason when the converter never leaves CCM', () => {
    const evaluator = syntheticEvaluator(curve);
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    expect(marks.modeBoundary.load).toBeNull(); // the stand-in reports CCM everywhere (forced PWM, docs/methods.md §2 last item)
    expect(marks.modeBoundary.reason).toMatch(/stays in CCM/); // issue 4: null with a reason
  });
});

describe('regulation limit', () => {
  it('is the load where the duty cycle reaches the controller maximum', () => {
    // Stand-in duty 0.1 per A with a 0.85 maximum: the limit is 8.5 A by hand.
    const evaluator = syntheticEvaluator({ ...curve, dutyPerA: 0.1, maxDuty: 0.85 });
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    closeTo(marks.regulationLimit.load as number, 0.85 / 0.1, 1e-6); // by hand: D = 0.1·Io = 0.85
    expect(marks.regulationLimit.cause).toBe('duty-limit'); // the stand-in raises duty-limit above 8.5 A (by construction)
    closeTo(marks.regulationLimit.value as number, 0.85, 1e-6); // the duty at the last regulating load is the maximum
  });

  it('excludes points beyond the limit from the peak search', () => {
    // Duty limit at 2 A lies below the unconstrained peak √(P0/b) = 3.16 A (docs/methods.md §12).
    const evaluator = syntheticEvaluator({ ...curve, dutyPerA: 0.5, maxDuty: 1 });
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    expect(marks.peak.load as number).toBeLessThanOrEqual(2); // by hand: 1/0.5 = 2 A limit
    expect(marks.peak.note).toMatch(/heaviest usable/); // the peak sits at the edge of the usable range
  });

  it('is null with a reason when the converter regulates across the whole range', () => {
    const evaluator = syntheticEvaluator(curve);
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    expect(marks.regulationLimit.load).toBeNull(); // the stand-in has no duty limit or runaway
    expect(marks.regulationLimit.reason).toMatch(/regulates up to/); // issue 4: null with a reason
  });
});
