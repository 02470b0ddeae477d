import { describe, expect, it } from 'vitest';
import { checkTolerances, worstCase } from '../../../shared-model/index.ts';
import { cornerVariations } from '../../../shared-model/tolerance/worst-case.ts';
import { resolveTolerances } from '../../../shared-model/tolerance/variation.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { evaluate, handCeilingDesign } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

const ZERO = { vinV: { min: 14.4, max: 14.4 }, ambientC: { min: 40, max: 40 }, rdsOnFraction: 0, dcrFraction: 0, esrFraction: 0, inductanceFraction: 0, frequencyFraction: 0 };

describe('worst-case corners', () => {
  const design = demoDesign('synchronous-buck.json');

  it('enumerates every combination of the extremes: 2⁷ corners for seven tolerances', () => {
    expect(cornerVariations(resolveTolerances(design))).toHaveLength(128); // full factorial of 7 two-level factors = 2⁷
    expect(cornerVariations(resolveTolerances(design, { ...ZERO, rdsOnFraction: 0.2 }))).toHaveLength(2); // one two-level factor
  });

  it('names the corner of worst efficiency: every resistance high', () => {
    const w = worstCase(design);
    for (const c of w.corners) expect(c.efficiency).toBeGreaterThanOrEqual(w.worstEfficiency.efficiency); // definition of the worst corner
    // Conduction loss is I²·R for RDS(on), DCR and ESR (docs/methods.md §1, §8, §9), so the worst corner has all three high.
    expect(w.worstEfficiency.label).toMatch(/RDS\(on\) \+20 %.*DCR \+10 %.*ESR \+20 %/); // docs/methods.md §1/§8/§9: loss rises with each resistance
    for (const c of w.corners) expect(c.worstMarginK).toBeGreaterThanOrEqual(w.worstTemperature.worstMarginK); // definition of the worst-temperature corner
  });

  it('puts the hottest inductor at high DCR and the highest ambient on an I²R-dominated design', () => {
    const d = handCeilingDesign();
    const w = worstCase(d, { loadA: 3 });
    const inductor = w.hottestByPart.find((p) => p.part === 'inductor');
    expect(inductor?.corner).toMatch(/ambient 50 °C.*DCR \+10 %/); // docs/methods.md §10 T = Ta + θ·I²·DCR(T): rises with Ta and DCR
    const e = evaluate(d, { loadA: 3, ambientC: 50, vinV: 16.8 });
    expect(inductor?.celsius).toBeGreaterThan(e.temperatures.find((t) => t.part === 'inductor')?.celsius ?? Infinity); // +10 % DCR adds heat over the nominal-DCR point
  });

  it('with zero tolerances has one corner, equal to the nominal point', () => {
    const w = worstCase(design, { tolerances: ZERO });
    expect(w.corners).toHaveLength(1); // 2⁰ combinations
    closeTo(w.corners[0].efficiency, w.nominal.efficiency, 1e-15); // no variation applied
  });

  it('names the field, value and range of a bad tolerance', () => {
    const p = checkTolerances({ rdsOnFraction: 1.5, vinV: { min: 20, max: 10 } });
    expect(p.map((x) => x.path).sort()).toEqual(['tolerances.rdsOnFraction', 'tolerances.vinV.max']); // team brief rule 6
  });
});
