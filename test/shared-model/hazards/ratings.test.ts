import { describe, expect, it } from 'vitest';
import {
  electrolyticLifeHours,
  isatAt,
  lifeCheck,
  resistorRatingAt,
  rippleCheck,
  temperatureCheck,
  voltageCheck,
} from '../../../shared-model/hazards/ratings.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('rating and life checks', () => {
  it('electrolytic life doubles every 10 K: 2000 h at 105 °C → 32 000 h at 65 °C', () => {
    closeTo(electrolyticLifeHours(2000, 105, 65), 32000, 1e-12); // docs/methods.md §9 [common practice, 10 K rule]
    const c = lifeCheck('outputCapacitor', 32000, 20000);
    expect(c.ok).toBe(true);
    closeTo(c.marginFraction, (32000 - 20000) / 20000, 1e-12); // more life than required: positive margin
  });
  it('derates a resistor linearly from its start temperature to zero', () => {
    expect(resistorRatingAt(1, 70, 155, 25)).toBe(1);
    closeTo(resistorRatingAt(1, 70, 155, 112.5), 0.5, 1e-12); // halfway between 70 and 155 °C (datasheet derating line, common practice)
    expect(resistorRatingAt(1, 70, 155, 200)).toBe(0);
  });
  it('moves Isat with its temperature coefficient, never below 0', () => {
    closeTo(isatAt(10, 25, -0.002, 100), 10 * (1 - 0.15), 1e-12); // Isat(T) = Isat·(1 + c·(T − T0)) (ratings.ts header)
    expect(isatAt(10, 25, -0.02, 200)).toBe(0);
  });
  it('applies derating to voltage and ripple, and a margin to temperature', () => {
    expect(voltageCheck('switch', 25, 30, 0.8).ok).toBe(false); // 25 V > 0.8 × 30 V
    expect(rippleCheck('inputCapacitor', 1.5, 2, 0.8).ok).toBe(true); // 1.5 A ≤ 1.6 A
    const t = temperatureCheck('switch', 135, 150, 20);
    expect(t.limit).toBe(130);
    expect(t.ok).toBe(false);
    closeTo(t.marginFraction, (130 - 135) / 130, 1e-12);
  });
});
