import { describe, expect, it } from 'vitest';
import { AVERAGE_EFFICIENCY_FRACTIONS, figuresOfMerit, figuresOfMeritOf, LIGHT_LOAD_FRACTION } from '../../../shared-model/index.ts';
import type { Figure } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { efficiencyOf, syntheticDesign, syntheticEvaluator } from '../landmarks/synthetic.ts';

const curve = { voutV: 12, p0W: 0.2, aV: 0.05, b0Ohm: 0.02 }; // docs/methods.md §12 curve

function valueOf(f: Figure): number {
  if (!f.available) throw new Error(`figure not available: ${f.reason}`);
  return f.value;
}

describe('efficiency figures of merit', () => {
  it('averages the efficiencies at 25/50/75/100 % of rated load and reports the 10 % point', () => {
    expect([...AVERAGE_EFFICIENCY_FRACTIONS]).toEqual([0.25, 0.5, 0.75, 1]); // US 10 CFR 430 Subpart B, Appendix Z (average active-mode efficiency)
    expect(LIGHT_LOAD_FRACTION).toBe(0.1); // EU Regulation 2019/1782: efficiency at 10 % load
    const rated = 4;
    const held = (io: number) => ({ efficiency: efficiencyOf(curve, io), regulated: true, converged: true, operatingPoint: { voutV: curve.voutV } });
    const f = figuresOfMeritOf(held, rated, curve.voutV);
    const byHand = (efficiencyOf(curve, 1) + efficiencyOf(curve, 2) + efficiencyOf(curve, 3) + efficiencyOf(curve, 4)) / 4;
    closeTo(valueOf(f.averageEfficiency), byHand, 1e-12); // Appendix Z: arithmetic mean of four load points (docs/methods.md §12)
    closeTo(valueOf(f.lightLoadEfficiency), 4.8 / (4.8 + 0.2 + 0.02 + 0.02 * 0.16), 1e-12); // EU 2019/1782 10 % point: 0.4 A on docs/methods.md §12 curve, by hand
    expect(f.points.map((p) => p.loadA)).toEqual([1, 2, 3, 4, 0.4]); // 25/50/75/100/10 % of 4 A
  });

  it('evaluates the design at exactly those loads', () => {
    const seen: number[] = [];
    const evaluator = syntheticEvaluator(curve);
    const f = figuresOfMerit(syntheticDesign(8), {
      evaluator: (d, c) => {
        seen.push(c.loadA);
        return evaluator(d, c);
      },
    });
    expect(seen).toEqual([2, 4, 6, 8, 0.8]); // 25/50/75/100/10 % of 8 A (Appendix Z; EU 2019/1782)
    closeTo(valueOf(f.averageEfficiency), [2, 4, 6, 8].reduce((s, i) => s + efficiencyOf(curve, i), 0) / 4, 1e-12); // Appendix Z mean
  });

  it('is not available, with the reason, when a point it needs is not regulated (issue 10 §4)', () => {
    // Our own rule (ledger/regulated.ts): a figure stands for the design only on regulated, converged points.
    // The synthetic duty is 0.2/A against a limit of 1: 25/50 % of 8 A (2, 4 A) regulate, 75/100 % (6, 8 A) do not.
    const five = { ...curve, voutV: 5 }; // the synthetic design's spec.voutV
    const f = figuresOfMerit(syntheticDesign(8), { evaluator: syntheticEvaluator({ ...five, dutyPerA: 0.2, maxDuty: 1 }) });
    expect(f.averageEfficiency.available).toBe(false);
    if (!f.averageEfficiency.available) expect(f.averageEfficiency.reason).toMatch(/not regulated at 6\.000 A: the output reaches only 4\.167 V instead of 5\.000 V/); // 5 V · 1/1.2
    closeTo(valueOf(f.lightLoadEfficiency), efficiencyOf(five, 0.8), 1e-12); // the 10 % point (0.8 A, duty 0.16) still regulates
    expect(f.points.map((p) => p.regulated)).toEqual([true, true, false, false, true]);
  });
});
