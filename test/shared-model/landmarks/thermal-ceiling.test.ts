import { describe, expect, it } from 'vitest';
import { findLandmarks, findThermalCeiling, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { syntheticDesign, syntheticEvaluator } from './synthetic.ts';

/**
 * A part dissipating I²·R(T), R(T) = R0·(1 + α·(T − 25 °C)), through θ to ambient Ta reaches T_lim at
 * I = √((T_lim − Ta)/(θ·R(T_lim))): at that load the fixed point T = Ta + θ·I²·R(T) (docs/methods.md §10)
 * sits exactly at T_lim.
 */
function ceilingByHand(r0: number, alpha: number, theta: number, ta: number, tLim: number): number {
  return Math.sqrt((tLim - ta) / (theta * r0 * (1 + alpha * (tLim - 25))));
}

describe('thermal ceiling', () => {
  const base = { voutV: 12, p0W: 0.2, aV: 0.05, b0Ohm: 0.02, alphaPerK: 0.004, thetaKPerW: 40, limitC: 125, marginK: 10 };
  const design = syntheticDesign(10);

  it('is the load where an I²R(T) part reaches its limit less the margin, as computed by hand', () => {
    const evaluator = syntheticEvaluator(base);
    const sweep = sweepLoad(design, { evaluator });
    const marks = findLandmarks(sweep, { design, evaluator });
    const expected = ceilingByHand(0.02, 0.004, 40, 25, 125 - 10); // docs/methods.md §10 fixed point solved for I at T_lim
    closeTo(expected, 9.0951, 0, 5e-5); // √(90/(40·0.02·1.36)) = √82.721 = 9.0951 A by hand
    closeTo(marks.thermalCeiling.load as number, expected, 1e-7); // docs/methods.md §10 fixed point, closed form above
    expect(marks.thermalCeiling.value).toBe(115); // threshold = limit 125 °C − margin 10 K (design margins, schema.ts)
    expect(marks.thermalCeiling.part).toBe('inductor'); // the only part with a limit in the stand-in
    expect(marks.thermalCeiling.limitKind).toBe('temperature'); // a temperature limit, not a touch limit: the stand-in has no hazards
  });

  it('interpolates between points without the engine to within a grid step', () => {
    const evaluator = syntheticEvaluator(base);
    const sweep = sweepLoad(design, { evaluator, spacing: 'linear' });
    const c = findThermalCeiling(sweep.columns, sweep.points);
    const step = sweep.points[1].loadA - sweep.points[0].loadA;
    expect(Math.abs((c.load as number) - ceilingByHand(0.02, 0.004, 40, 25, 115))).toBeLessThan(step / 10); // docs/methods.md §10 closed form; linear interpolation of a smooth margin
    expect(c.method).toBe('interpolated'); // no probe given: straight-line interpolation (thermal-ceiling.ts contract)
  });

  it('is null with a reason when no part reaches a limit in the swept range', () => {
    const evaluator = syntheticEvaluator({ ...base, thetaKPerW: 10 });
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    expect(ceilingByHand(0.02, 0.004, 10, 25, 115)).toBeGreaterThan(12); // docs/methods.md §10: ceiling 18.2 A, beyond the 12 A sweep end
    expect(marks.thermalCeiling.load).toBeNull(); // issue 4: null …
    expect(marks.thermalCeiling.reason).toMatch(/No part reaches/); // … with a reason
    expect(marks.thermalCeiling.perPart[0].reason).toMatch(/stays below/); // and a reason for each part
  });

  it('comes before a thermal runaway, which sets the regulation limit at θ·R0·α·I² = 1', () => {
    // α 0.02/K: loop gain θ·R0·α·I² reaches 1 at I = 1/√(θ·R0·α) (docs/methods.md §10 runaway criterion).
    const evaluator = syntheticEvaluator({ ...base, alphaPerK: 0.02 });
    const marks = findLandmarks(sweepLoad(design, { evaluator }), { design, evaluator });
    closeTo(marks.thermalCeiling.load as number, ceilingByHand(0.02, 0.02, 40, 25, 115), 1e-7); // docs/methods.md §10 closed form
    closeTo(marks.regulationLimit.load as number, 1 / Math.sqrt(40 * 0.02 * 0.02), 1e-6); // docs/methods.md §10: runaway where loop gain = 1
    expect(marks.regulationLimit.cause).toBe('thermal-runaway'); // docs/methods.md §10: loop gain reaches 1
  });
});
