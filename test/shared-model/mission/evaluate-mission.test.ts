import { describe, expect, it } from 'vitest';
import { evaluate, evaluateMission, profileFromWeighting, WEIGHTING_SETS } from '../../../shared-model/index.ts';
import type { Design, MissionProfile, PointEvaluator } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign } from '../../helpers/demo.ts';

/**
 * A stand-in converter whose loss follows docs/methods.md §12, P = P0 + a·Io + b·Io² at Vo = 12 V
 * (P0 0.2 W, a 0.05 V, b 0.02 Ω), so each row's efficiency is Pout/(Pout + P) by hand. The rest of the
 * record (temperatures, flags) comes from the demo's own evaluation.
 */
const quadratic: PointEvaluator = (design, conditions) => {
  const e = evaluate(design, conditions);
  const io = conditions.loadA;
  const outputPower = 12 * io;
  const totalLoss = 0.2 + 0.05 * io + 0.02 * io * io;
  return { ...e, outputPower, totalLoss, inputPower: outputPower + totalLoss, efficiency: outputPower / (outputPower + totalLoss) };
};

function withProfile(design: Design, profile: MissionProfile): Design {
  return { ...design, missionProfile: profile };
}

describe('evaluateMission', () => {
  it('the four-point set weights 25, 50, 75 and 100 % of rated load equally', () => {
    const set = WEIGHTING_SETS.find((w) => w.id === 'four-point')!;
    expect(set.points.map((p) => p.loadFraction)).toEqual([0.25, 0.5, 0.75, 1]); // US 10 CFR 430 Subpart B, Appendix Z: 25/50/75/100 % load
    expect(set.points.map((p) => p.weight)).toEqual([0.25, 0.25, 0.25, 0.25]); // Appendix Z: the arithmetic average of the four
  });

  it('the inverter sets carry their published weights', () => {
    const eu = WEIGHTING_SETS.find((w) => w.id === 'european')!;
    expect(eu.points.map((p) => [p.loadFraction, p.weight])).toEqual([[0.05, 0.03], [0.1, 0.06], [0.2, 0.13], [0.3, 0.1], [0.5, 0.48], [1, 0.2]]); // EN 50530 European efficiency (from memory)
    const cec = WEIGHTING_SETS.find((w) => w.id === 'californian')!;
    expect(cec.points.map((p) => [p.loadFraction, p.weight])).toEqual([[0.1, 0.04], [0.2, 0.05], [0.3, 0.12], [0.5, 0.21], [0.75, 0.53], [1, 0.05]]); // CEC weighted efficiency (from memory)
  });

  it('weighted efficiency, average loss, energy per day and battery share of the four-point set, by hand', () => {
    const demo = demoDesign('synchronous-buck'); // rated 5 A
    const profile = { ...profileFromWeighting(demo, 'four-point'), hoursPerDay: 8, batteryWh: 20 };
    const m = evaluateMission(withProfile(demo, profile), { evaluator: quadratic });
    // Rows 1.25, 2.5, 3.75, 5 A: Pout 15, 30, 45, 60 W; loss 0.29375, 0.45, 0.66875, 0.95 W (docs/methods.md §12 model)
    // η 15/15.29375 = 0.980792808, 30/30.45 = 0.985221675, 45/45.66875 = 0.985356507, 60/60.95 = 0.984413454 (by hand)
    closeTo(m.weightedEfficiency, 0.983946111, 1e-8); // mean of the four (10 CFR 430 Appendix Z average)
    closeTo(m.averageLossW, 0.590625, 1e-12); // (0.29375 + 0.45 + 0.66875 + 0.95)/4, by hand
    closeTo(m.energyEfficiency, 37.5 / (37.5 + 0.590625), 1e-12); // energy out over energy in: mean Pout 37.5 W (definition)
    closeTo(m.energyLostPerDayWh, 4.725, 1e-12); // 0.590625 W × 8 h, by hand
    closeTo(m.battery!.shareLostPerDay, 0.23625, 1e-12); // 4.725 Wh / 20 Wh, by hand
    expect(m.basis).toBe('profile');
  });

  it('the European set weights light load as published, by hand', () => {
    const demo = demoDesign('synchronous-buck');
    const m = evaluateMission(demo, { profile: profileFromWeighting(demo, 'european'), evaluator: quadratic });
    // 0.03·η(0.25 A) + 0.06·η(0.5 A) + 0.13·η(1 A) + 0.10·η(1.5 A) + 0.48·η(2.5 A) + 0.20·η(5 A) (EN 50530, from memory), worked by hand
    closeTo(m.weightedEfficiency, 0.980971313, 1e-8);
    closeTo(m.averageLossW, 0.4933125, 1e-12); // Σ wᵢ·(0.2 + 0.05·I + 0.02·I²), by hand
  });

  it('on the real engine the four-point figure is the plain mean of four evaluations', () => {
    const demo = demoDesign('synchronous-buck');
    const m = evaluateMission(demo, { profile: profileFromWeighting(demo, 'four-point') });
    const loads = [1.25, 2.5, 3.75, 5]; // 25/50/75/100 % of 5 A (10 CFR 430 Appendix Z)
    const etas = loads.map((loadA) => evaluate(demo, { loadA }).efficiency);
    closeTo(m.weightedEfficiency, (etas[0]! + etas[1]! + etas[2]! + etas[3]!) / 4, 1e-12); // Appendix Z: arithmetic average
    expect(m.usable).toBe(true);
  });

  it('part temperatures: the time-weighted mean and the hottest row', () => {
    const demo = demoDesign('synchronous-buck');
    const rows = [
      { label: 'sleep', vinV: 14.4, loadA: 0.2, fraction: 0.75 },
      { label: 'burst', vinV: 10.8, loadA: 5, ambientC: 55, fraction: 0.25 },
    ];
    const m = evaluateMission(withProfile(demo, { name: 'field', rows, hoursPerDay: 24 }));
    const sleep = evaluate(demo, { vinV: 14.4, loadA: 0.2 });
    const burst = evaluate(demo, { vinV: 10.8, loadA: 5, ambientC: 55 });
    const t = m.temperatures.find((x) => x.part === 'switch')!;
    const ts = sleep.temperatures.find((x) => x.part === 'switch')!.celsius;
    const tb = burst.temperatures.find((x) => x.part === 'switch')!.celsius;
    closeTo(t.averageC, 0.75 * ts + 0.25 * tb, 1e-12); // time-weighted mean (definition)
    expect(t.worstRow).toBe(1); // the burst row at 55 °C ambient and rated load is the hot one (common practice)
    expect(m.rows[1]!.ambientC).toBe(55);
    closeTo(m.averageLossW, 0.75 * sleep.totalLoss + 0.25 * burst.totalLoss, 1e-12); // Σ fᵢ·Ploss,ᵢ (definition)
  });

  it('without a profile the rated point stands in and says so', () => {
    const demo = demoDesign('synchronous-buck');
    const m = evaluateMission(demo);
    expect(m.basis).toBe('rated-point');
    expect(m.rows).toHaveLength(1);
    expect(m.averageLossW).toBe(evaluate(demo).totalLoss); // one row of fraction 1 at nominal Vin, rated load
    expect(m.battery).toBeNull();
  });

  it('a row past the duty limit makes the mission unusable and says why', () => {
    const demo = demoDesign('synchronous-buck');
    const capped = { ...demo, spec: { ...demo.spec, maxDuty: 0.25 } }; // 3.3 V / 10.8 V needs D ≈ 0.31 (docs/methods.md §1: buck M = D)
    const m = evaluateMission(withProfile(capped, { name: 'low input', rows: [{ vinV: 16.8, loadA: 1, fraction: 0.5 }, { vinV: 10.8, loadA: 5, fraction: 0.5 }], hoursPerDay: 24 }));
    expect(m.usable).toBe(false);
    expect(m.rows[0]!.usable).toBe(true); // 3.3/16.8 = 0.196 < 0.25
    expect(m.rows[1]!.reason).toMatch(/not regulated/);
  });
});
