import { describe, expect, it } from 'vitest';
import { findLandmarks, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { CEILING, evaluate, handCeilingDesign } from './hand-designs.ts';

/**
 * The inductor of this design dissipates Io²·DCR(T) only, with DCR(T) = DCR20·(1 + 0.00393·(T − 20 °C))
 * (IEC 60028 copper, docs/methods.md §8), through θ to ambient (docs/methods.md §10: T = Ta + θ·P). It reaches its
 * limit less the margin, T_lim = tMax − margin, at Io = √((T_lim − Ta)/(θ·DCR(T_lim))).
 */
describe('thermal ceiling on a design computed by hand', () => {
  const design = handCeilingDesign();
  const tLim = CEILING.tMaxC - CEILING.marginK;
  const byHand = Math.sqrt((tLim - CEILING.ambientC) / (CEILING.thetaKPerW * CEILING.dcr20Ohm * (1 + 0.00393 * (tLim - 20))));

  it('puts the ceiling where the I²R(T) closed form does', () => {
    closeTo(byHand, 4.15171, 1e-5); // √(70/(150·0.02·1.35370)) = √17.2374 = 4.15171 A by hand (docs/methods.md §8, §10)
    const marks = findLandmarks(sweepLoad(design), { design });
    expect(marks.thermalCeiling.part).toBe('inductor'); // only the inductor sits on a 150 K/W path (hand-designs.ts)
    closeTo(marks.thermalCeiling.load as number, byHand, 1e-6); // docs/methods.md §8 copper law + §10 fixed point, closed form above
    expect(marks.thermalCeiling.value).toBe(tLim); // 125 °C limit − 15 K margin (design margins)
  });

  it('has the inductor exactly at its derated limit at the ceiling load', () => {
    const e = evaluate(design, { loadA: byHand });
    const inductor = e.temperatures.find((t) => t.part === 'inductor');
    closeTo(inductor?.celsius ?? NaN, tLim, 0, 1e-4); // docs/methods.md §10: T = Ta + θ·Io²·DCR(T) = T_lim at the closed-form load
  });
});
