import { describe, expect, it } from 'vitest';
import { axisValues, checkLoadSweepOptions, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { evaluate } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('axisValues', () => {
  it('spaces points evenly on a linear or a logarithmic scale, ends exact', () => {
    expect(axisValues(1, 5, 5, 'linear')).toEqual([1, 2, 3, 4, 5]); // x_i = from + i·(to − from)/(n − 1), by hand
    const log = axisValues(1, 1000, 4, 'log');
    [1, 10, 100, 1000].forEach((v, i) => closeTo(log[i], v, 1e-12)); // x_i = from·(to/from)^(i/(n − 1)): decades, by hand
  });
});

describe('sweepLoad on the demo synchronous buck', () => {
  const design = demoDesign('synchronous-buck.json');
  const sweep = sweepLoad(design);
  const rated = design.spec.ratedLoadA;

  it('defaults to 200 log-spaced points from 1 % to 120 % of rated load', () => {
    expect(sweep.points).toHaveLength(200); // issue 4: at least 200 points by default
    closeTo(sweep.points[0].loadA, 0.01 * rated, 1e-12); // issue 4: from about 1 % of rated
    closeTo(sweep.points[199].loadA, 1.2 * rated, 1e-12); // issue 4: to 120 % of rated
    closeTo(sweep.points[1].loadA / sweep.points[0].loadA, Math.pow(120, 1 / 199), 1e-12); // log spacing: constant ratio (1.2/0.01)^(1/199)
  });

  it('keeps, at every point, the numbers of a full evaluation at that load', () => {
    for (const i of [0, 57, 123, 199]) {
      const p = sweep.points[i];
      const e = evaluate(design, { loadA: p.loadA });
      expect(p.efficiency).toBe(e.efficiency); // a sweep point is one full electro-thermal evaluation (issue 4)
      expect(p.mode).toBe(e.conductionMode); // the conduction mode is kept per point (issue 4)
      for (const t of e.temperatures) {
        const j = sweep.columns.temperatures.findIndex((c) => c.part === t.part);
        expect(p.temperaturesC[j]).toBe(t.celsius); // every part's temperature is kept (issue 4)
      }
      for (const term of e.losses) {
        const j = sweep.columns.losses.findIndex((c) => c.part === term.part && c.mechanism === term.mechanism);
        expect(p.losses[j]).toBe(term.watts); // every part and mechanism is kept (issue 4)
      }
    }
  });

  it('conserves energy at every point: input = output + every loss term', () => {
    for (const p of sweep.points) {
      closeTo(p.inputPower, p.outputPower + p.losses.reduce((s, w) => s + w, 0), 1e-9); // first law: Pin = Pout + ΣPloss (docs/methods.md §1 last item)
      closeTo(p.efficiency, p.outputPower / p.inputPower, 1e-12); // definition of efficiency
    }
  });

  it('stores compact records, not full evaluations', () => {
    const keys = Object.keys(sweep.points[0]);
    expect(keys).not.toContain('operatingPoint'); // issue 4: keep memory reasonable — no waveforms per point
    expect(keys).not.toContain('conditions'); // compact record: conditions live once on the sweep (issue 4: keep memory reasonable)
    expect(JSON.stringify(sweep).length / sweep.points.length).toBeLessThan(4000); // about 50 numbers per point; our own budget of 4 kB a point
  });

  it('holds the chosen input voltage and honours linear spacing and a custom range', () => {
    const s = sweepLoad(design, { fromA: 0.5, toA: 5, points: 10, spacing: 'linear', conditions: { vinV: design.spec.vinMaxV } });
    expect(s.points.map((p) => p.loadA)).toEqual(axisValues(0.5, 5, 10, 'linear')); // custom linear range
    expect(s.points.every((p) => p.vinV === design.spec.vinMaxV)).toBe(true); // Vin held at the chosen value
  });

  it('names the field, value and allowed range of bad options', () => {
    const problems = checkLoadSweepOptions(design, { fromA: -1, points: 1.5 });
    expect(problems.map((p) => p.path)).toEqual(['load.from', 'load.points']); // team brief rule 6: field path
    expect(problems[0].allowed).toBe('> 0'); // team brief rule 6: allowed range
    expect(() => sweepLoad(design, { toA: 0 })).toThrow(/load.to/); // a programmer who skips the check gets a RangeError naming it
  });
});
