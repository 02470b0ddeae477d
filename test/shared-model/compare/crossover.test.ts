import { describe, expect, it } from 'vitest';
import { axisValues, findCrossovers, winnersOf } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

// Two loss curves P0 + k·I + R·I²: A switches cheaply but conducts worse, B the reverse.
const a = { p0: 0.3, k: 0.02, r: 0.03 };
const b = { p0: 0.3, k: 0.08, r: 0.015 };
const loss = (c: typeof a, i: number) => c.p0 + c.k * i + c.r * i * i;
// Equal P0: the curves cross where (Ra − Rb)·I = kb − ka, I× = 0.06/0.015 = 4 A (by hand).
const crossByHand = (b.k - a.k) / (a.r - b.r);

describe('crossover of two loss curves', () => {
  const loads = axisValues(0.1, 10, 200, 'log');
  const curves = [loads.map((i) => loss(a, i)), loads.map((i) => loss(b, i))];

  it('names the winner at each load', () => {
    const w = winnersOf(curves);
    expect(w[0]).toBe(0); // by hand at 0.1 A: A 0.3023 W < B 0.3081 W
    expect(w[w.length - 1]).toBe(1); // by hand at 10 A: A 3.5 W > B 2.6 W
  });

  it('finds the crossover load where the winner changes, by hand 4 A', () => {
    closeTo(crossByHand, 4, 1e-12); // (0.08 − 0.02)/(0.03 − 0.015) = 4 A by hand
    const refined = findCrossovers(loads, curves, (k, i) => loss(k === 0 ? a : b, i));
    expect(refined).toHaveLength(1); // a quadratic difference with equal P0 has one positive root (by hand)
    closeTo(refined[0].load, 4, 1e-9); // root of (Ra − Rb)·I² + (ka − kb)·I = 0, by hand
    expect([refined[0].from, refined[0].to]).toEqual([0, 1]); // A wins below, B above
  });

  it('finds both crossings of curves that cross twice', () => {
    // D − B = 0.12 − 0.08·I + 0.01·I² = 0.01·(I − 2)·(I − 6): roots 2 A and 6 A (by hand).
    const d = { p0: 0.42, k: 0, r: 0.025 };
    const two = [loads.map((i) => loss(b, i)), loads.map((i) => loss(d, i))];
    const found = findCrossovers(loads, two, (k, i) => loss(k === 0 ? b : d, i));
    expect(found.map((x) => [x.from, x.to])).toEqual([[0, 1], [1, 0]]); // by hand: B wins below 2 A and above 6 A, D between
    closeTo(found[0].load, 2, 1e-9); // factorised difference, by hand
    closeTo(found[1].load, 6, 1e-9); // factorised difference, by hand
    const interpolated = findCrossovers(loads, two);
    // Straight-line error ≈ h²·|d''|/(8·|d'|) = 0.046²·0.02/(8·0.04) ≈ 1.3e-4 A (h: log step near 2 A; Taylor bound).
    expect(Math.abs(interpolated[0].load - 2)).toBeLessThan(1e-3); // linear interpolation of a smooth difference, bound above
  });
});
