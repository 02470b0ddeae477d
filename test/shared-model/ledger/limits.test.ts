import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../shared-model/index.ts';
import { DIODE_BOOST, SYNC_BUCK, design, valid } from '../../helpers/ledger-designs.ts';
import { closeTo } from '../../helpers/close-to.ts';

function finite(x: unknown): boolean {
  return !JSON.stringify(x, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? 'NON-FINITE' : v)).includes('NON-FINITE');
}

describe('evaluate at the limits of regulation', () => {
  it('an unregulated boost at its duty limit keeps input = output + Σ terms and says so', () => {
    const d = valid(design({ ...DIODE_BOOST, maxDuty: 0.5 })); // 5 V → 12 V needs D ≈ 0.6 (docs/methods.md §1: M = 1/D′)
    const e = evaluate(d);
    expect(e.warnings.some((w) => w.code === 'cannot-regulate')).toBe(true);
    expect(e.operatingPoint.regulated).toBe(false);
    closeTo(e.inputPower, e.outputPower + e.totalLoss, 1e-9); // issue 3: input = output + Σ terms
    expect(e.operatingPoint.voutV).toBeLessThan(d.spec.voutV);
    expect(finite(e)).toBe(true);
  });
  it('a buck asked for more than its duty limit stays finite and warned', () => {
    const d = valid(design({ ...SYNC_BUCK, voutV: 11.5, maxDuty: 0.9 }));
    const e = evaluate(d);
    expect(e.warnings.some((w) => w.code === 'cannot-regulate' || w.code === 'duty-limit')).toBe(true);
    closeTo(e.inputPower, e.outputPower + e.totalLoss, 1e-9);
    expect(finite(e)).toBe(true);
  });
  it('a light-load point whose losses exceed what the duty limit can supply falls back to the solver and stays finite', () => {
    const d = valid(design({ ...SYNC_BUCK, voutV: 10.5, maxDuty: 0.9 }, (x) => {
      x.parts.controller.quiescentA = 0.05;
    }));
    const e = evaluate(d, { loadA: 0.01 });
    expect(finite(e)).toBe(true);
    closeTo(e.inputPower, e.outputPower + e.totalLoss, 1e-9);
  });
});

describe('evaluate with impossible conditions', () => {
  it('throws a RangeError naming the field (a programmer error: callers validate user input)', () => {
    const d = valid(design(SYNC_BUCK));
    expect(() => evaluate(d, { vinV: Number.NaN })).toThrow(/conditions\.vinV/);
    expect(() => evaluate(d, { loadA: -1 })).toThrow(/conditions\.loadA/);
    expect(() => evaluate(d, { switchingFrequencyHz: 0 })).toThrow(RangeError);
  });
});
