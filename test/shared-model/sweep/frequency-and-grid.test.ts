import { describe, expect, it } from 'vitest';
import { sweepFamilies, sweepFrequency, sweepGrid } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { evaluate, handCrossoverDesign } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

const SWITCHING = ['turn-on overlap', 'turn-off overlap', 'output capacitance', 'gate drive', 'dead-time diode', 'reverse recovery', 'junction capacitance'];

describe('sweepFrequency', () => {
  it('scales every gate-charge overlap loss in proportion to fs on a ripple-free design', () => {
    const design = handCrossoverDesign();
    const s = sweepFrequency(design, { points: 9 });
    const j = s.columns.losses.findIndex((c) => c.part === 'switch' && c.mechanism === 'turn-off overlap');
    const perHz = s.points.map((p) => p.losses[j] / p.switchingFrequencyHz);
    perHz.forEach((e) => closeTo(e, perHz[0], 1e-3)); // docs/methods.md §4: P = Eoff·fs with Eoff independent of fs at fixed Ioff (ripple-free)
  });

  it('finds the lowest total loss between the points and names what grows on each side', () => {
    const design = demoDesign('synchronous-buck.json');
    const s = sweepFrequency(design);
    const f = s.optimum.frequencyHz;
    for (const p of s.points) expect(p.totalLoss).toBeGreaterThanOrEqual(s.optimum.totalLoss - 1e-12); // definition of the minimum
    const at = (hz: number) => evaluate(design, { switchingFrequencyHz: hz }).totalLoss;
    if (s.optimum.note === null) {
      expect(at(f * 1.02)).toBeGreaterThan(s.optimum.totalLoss); // a local minimum on the engine
      expect(at(f / 1.02)).toBeGreaterThan(s.optimum.totalLoss); // local minimum, other side
    }
    expect(SWITCHING).toContain(s.above.growingMechanism); // docs/methods.md §4: switching terms grow ∝ fs above the optimum
    expect(SWITCHING).not.toContain(s.below.growingMechanism); // below it the ripple-driven terms (ΔI ∝ 1/fs, docs/methods.md §1) grow
  });
});

describe('families and grids', () => {
  const design = demoDesign('synchronous-buck.json');

  it('sweeps at Vin min, nom, max and at two ambients', () => {
    const f = sweepFamilies(design, { points: 40, refineLandmarks: false });
    expect(f.byInputVoltage.map((m) => m.sweep.vinV)).toEqual([design.spec.vinMinV, design.spec.vinNomV, design.spec.vinMaxV]); // issue 4: Vin min/nom/max
    expect(f.byAmbient.map((m) => m.sweep.ambientC)).toEqual([design.spec.ambientC, design.spec.ambientC + 25]); // issue 4: two or more ambients (our default +25 K)
    const hot = f.byAmbient[1].sweep.points.at(-1);
    const cool = f.byAmbient[0].sweep.points.at(-1);
    expect(hot && cool && Math.min(...hot.temperaturesC.map((t, i) => t - cool.temperaturesC[i]))).toBeGreaterThan(24); // docs/methods.md §10: Tj = Ta + rise; rise only grows with the hotter RDS(on)/DCR
  });

  it('fills a load × Vin grid whose cells equal single evaluations', () => {
    const g = sweepGrid(design, { load: { points: 5 }, second: { points: 3 } });
    expect(g.efficiency).toHaveLength(3); // rows: the second axis (grid.ts contract)
    expect(g.efficiency[0]).toHaveLength(5); // columns: loads
    const e = evaluate(design, { vinV: g.secondValues[2], loadA: g.loadsA[4] });
    expect(g.efficiency[2][4]).toBe(e.efficiency); // every cell is a full electro-thermal evaluation (issue 4)
    expect(g.totalLoss[2][4]).toBe(e.totalLoss); // every cell is a full evaluation (issue 4)
  });

  it('fills a load × fs grid', () => {
    const g = sweepGrid(design, { axis: 'frequency', load: { points: 3 }, second: { points: 3 } });
    closeTo(g.secondValues[1], design.spec.switchingFrequencyHz, 1e-12); // default fs/3 … 3·fs on a log scale has fs in the middle
    expect(g.efficiency[1][2]).toBe(evaluate(design, { switchingFrequencyHz: g.secondValues[1], loadA: g.loadsA[2] }).efficiency); // cell = evaluation
  });
});
