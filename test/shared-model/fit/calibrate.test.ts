/**
 * Calibration against known truth: the demo buck's switching charge ×1.3 and core loss ×0.7 generate
 * a noisy measurement through the engine; the fit from the unperturbed design must recover them inside
 * its approximate 95 % intervals about 95 % of the time (the nominal coverage of a linearised interval,
 * Bates & Watts, Nonlinear Regression Analysis and Its Applications, 1988, §2.3 [memory]).
 */
import { describe, expect, it } from 'vitest';
import { calibrate, type Calibration } from '../../../shared-model/index.ts';

import { closeTo } from '../../helpers/close-to.ts';
import { benchPoints, syntheticMeasurement } from './synthetic.ts';
import { demoDesign } from '../../helpers/demo.ts';

const design = demoDesign('synchronous-buck');
const points = benchPoints(design);
const truth = { switchCharge: 1.3, coreLoss: 0.7 };

function fitted(c: Calibration, name: string) {
  const p = c.parameters.find((q) => q.name === name);
  if (!p) throw new Error(`no ${name}`);
  return p;
}

function run(seed: number, lossNoiseW: number): Calibration {
  const m = syntheticMeasurement(design, { truth, points, seed, lossNoiseW });
  const out = calibrate(design, m, { parameters: ['switchCharge', 'coreLoss'] });
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join(' '));
  return out.calibration;
}

describe('calibrate recovers known parameters', () => {
  it('finds the true switching-charge and core-loss scales from noise-free data', () => {
    const c = run(1, 0);
    closeTo(fitted(c, 'switchCharge').fitted, 1.3, 1e-4, 0, c.parameters); // truth set by the test (×1.3)
    closeTo(fitted(c, 'coreLoss').fitted, 0.7, 1e-3, 0, c.parameters); // truth set by the test (×0.7)
    expect(c.residualRms.after.lossW).toBeLessThan(1e-4 * c.residualRms.before.lossW); // exact data: the fit removes the gap
  });

  it('puts each true value inside its 95 % interval in about 95 % of 120 seeded noisy repetitions', () => {
    const reps = 120;
    let coveredCharge = 0;
    let coveredCore = 0;
    for (let seed = 1; seed <= reps; seed++) {
      const c = run(seed, 0.01); // 10 mW of noise on the input power, about 0.2 % of the rated output
      const q = fitted(c, 'switchCharge');
      const k = fitted(c, 'coreLoss');
      if (q.intervalKnown && q.lower95 <= 1.3 && 1.3 <= q.upper95) coveredCharge++;
      if (k.intervalKnown && k.lower95 <= 0.7 && 0.7 <= k.upper95) coveredCore++;
    }
    console.log(`coverage of the 95 % intervals over ${reps} seeds: switchCharge ${coveredCharge}/${reps}, coreLoss ${coveredCore}/${reps}`);
    // Binomial(120, 0.95): 108 … 119 holds with probability ≈ 0.98 (common practice: ±2.5σ band, σ = √(120·0.95·0.05) ≈ 2.4).
    for (const covered of [coveredCharge, coveredCore]) {
      expect(covered).toBeGreaterThanOrEqual(108);
      expect(covered).toBeLessThanOrEqual(119);
    }
  }, 120_000);
});
