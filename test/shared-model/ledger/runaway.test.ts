/**
 * Issue 10 §5: runaway and hazards. The part blamed is the one with the largest contribution to the loop
 * gain θpath·dP/dT (docs/methods.md §10: the fixed point T = Ta + θ·P(T) is stable while θ·dP/dT < 1);
 * a runaway record says so (hazard rows read "runaway", never within the limit); every surface
 * temperature lies between ambient and its part; derived figures stay finite when the output collapses.
 */
import { describe, expect, it } from 'vitest';
import type { Design } from '../../../shared-model/index.ts';
import { DEMO_DESIGNS, evaluate, RUNAWAY_BAND_K, sweepLoad, validateDesign } from '../../../shared-model/index.ts';
import { solveElectroThermal } from '../../../shared-model/thermal/fixed-point.ts';
import { thermalNetwork } from '../../../shared-model/thermal/network.ts';

function demo(id: string): Design {
  const r = validateDesign(DEMO_DESIGNS.find((d) => d.id === id)!.json);
  if (!r.ok) throw new Error(id);
  return r.design;
}

describe('the part blamed for a runaway drives it', () => {
  it('on a shared sink, the node with the larger θpath·dP/dT is blamed even when it is not the first', () => {
    // Node 0: a constant 1 W (dP/dT = 0); node 1: P = 2 W·(1 + 0.02/K·(T − 25 °C)) (docs/methods.md §10 form).
    // Paths: own θ 2 and 3 K/W, shared θSA 20 K/W → node 1 alone: (3 + 20)·2·0.02 = 0.92, plus the sink's
    // heating by node 0 — the group runs away; node 0 contributes 0 to the loop gain.
    const lossAt = (t: Float64Array, p: Float64Array, slopes: Float64Array) => {
      p[0] = 1;
      slopes[0] = 0;
      p[1] = 2 * (1 + 0.02 * (t[1]! - 25));
      slopes[1] = 2 * 0.02;
    };
    // Node 0 has the lower limit (100 °C): heated through the sink, it passes its ceiling first.
    const ceiling = Float64Array.from([100 + RUNAWAY_BAND_K, 150 + RUNAWAY_BAND_K]);
    const sol = solveElectroThermal(thermalNetwork([2, 3], [0, 0], [20]), 25, ceiling, lossAt);
    // By hand: T1 = 25 + 20·(1 + P1) + 3·P1, P1 = 2 + 0.04·(T1 − 25) → P1 = 35 W, T1 = 850 °C, far past both ceilings.
    expect(sol.converged).toBe(false);
    expect(sol.runawayNode).toBe(1); // the temperature-dependent loss drives it, not node 0
  });

  it('the diode-boost demo at 120 °C ambient blames the leaking Schottky, not the MOSFET on the same sink (issue 10 §5 audit case)', () => {
    const e = evaluate(demo('diode-boost'), { ambientC: 120 });
    const w = e.warnings.find((x) => x.code === 'thermal-runaway');
    expect(e.converged).toBe(false);
    expect(w?.part).toBe('rectifier'); // reverse leakage roughly doubles every ~10 K (docs/methods.md §6): the Schottky's dP/dT dominates
    expect(w?.message).toMatch(/Schottky/);
  });
});

describe('a runaway record never reads as a steady state', () => {
  it('every hazard row reads "runaway" and counts as too hot, never within its limit', () => {
    const e = evaluate(demo('diode-boost'), { ambientC: 120 });
    expect(e.hazards.length).toBeGreaterThan(0);
    for (const h of e.hazards) {
      expect(h.status).toBe('runaway'); // issue 10 §5: runaway/unknown, never "ok"
      expect(h.exceeded).toBe(true);
    }
  });

  it('a converged point keeps its hazard status from the margin (within when the margin is positive)', () => {
    const e = evaluate(demo('diode-boost'));
    expect(e.converged).toBe(true);
    for (const h of e.hazards) expect(h.status).toBe(h.marginK < 0 ? 'too-hot' : 'within'); // common practice: a surface over its touch limit is a hazard
  });
});

describe('surface temperatures lie between ambient and their part', () => {
  const cases: [string, Parameters<typeof evaluate>[1]][] = [
    ['diode-boost', { ambientC: 120 }],
    ['diode-boost', { loadA: 50 }],
    ['hot-fin-buck', { loadA: 40, ambientC: 150 }],
    ['synchronous-buck', { loadA: 30, ambientC: 100 }],
    ['synchronous-buck', {}],
  ];
  for (const [id, c] of cases) {
    it(`${id} at ${JSON.stringify(c)}`, () => {
      const e = evaluate(demo(id), c);
      for (const t of e.temperatures) {
        expect(t.surfaceC, t.part).toBeGreaterThanOrEqual(e.conditions.ambientC); // a passive surface heated by the part: never below ambient (thermodynamics)
        expect(t.surfaceC, t.part).toBeLessThanOrEqual(Math.max(t.celsius, e.conditions.ambientC)); // heat flows outward from the junction (common practice)
      }
      for (const h of e.hazards) expect(h.surfaceC).toBeGreaterThanOrEqual(e.conditions.ambientC);
      for (const s of e.heatsinks) expect(Number.isFinite(s.celsius) && s.celsius >= e.conditions.ambientC).toBe(true);
    });
  }

  it('the sweep points hold the same bounds', () => {
    const s = sweepLoad(demo('diode-boost'), { points: 12, toA: 50, conditions: { ambientC: 60 } });
    for (const p of s.points) for (const v of p.surfacesC) expect(v).toBeGreaterThanOrEqual(p.ambientC);
  });
});

describe('derived figures stay finite when the output collapses', () => {
  it('the boost demo at 50 A: the output pole and RHP zero are finite numbers (issue 10 §5 audit case)', () => {
    const e = evaluate(demo('diode-boost'), { loadA: 50 });
    expect(e.regulated).toBe(false);
    const ss = e.operatingPoint.smallSignal;
    expect(ss).toBeDefined();
    expect(Number.isFinite(ss!.outputPoleHz) && ss!.outputPoleHz > 0).toBe(true); // ωp = (1/R + g)/C on the design's load line (docs/methods.md §13)
    expect(Number.isFinite(ss!.rhpZeroHz)).toBe(true);
  });
});
