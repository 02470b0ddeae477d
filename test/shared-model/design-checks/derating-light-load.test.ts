/**
 * Issue 11 leftovers: the current derating as a design setting (margins.currentDerating, default 0.8 —
 * common practice) and the light-load efficiency check. Expected values are worked by hand from the
 * formula named on each line on a near-lossless buck (test/helpers/near-ideal.ts), whose only
 * non-negligible loss at light load is the controller's bias Vin·Iq.
 */
import { describe, expect, it } from 'vitest';
import { designFieldLabel, reviewDesign, validateDesign } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { nearIdealDesign } from '../../helpers/near-ideal.ts';

// Buck 8–16 V → 5 V, 3 A, 500 kHz, 4.7 µH, nominal 12 V.
const buck = (): Design => nearIdealDesign({ kind: 'buck', rectifier: 'synchronous', vinV: 12, vinMinV: 8, vinMaxV: 16, voutV: 5, loadA: 3, fsHz: 500e3, inductanceH: 4.7e-6, outputCapacitanceF: 47e-6 });
// Switch peak at Vin max: Io + ΔI/2, ΔI = (Vin − Vo)·D/(L·fs) = 1.4628 A → 3.7314 A (Erickson & Maksimović ch. 2).
const peakA = 3 + ((16 - 5) * (5 / 16)) / (4.7e-6 * 500e3) / 2;

describe('the current derating is a design setting', () => {
  it('absent, the common-practice 0.8 applies: the switch needs ID ≥ peak / 0.8', () => {
    const s = reviewDesign(buck()).sizing;
    expect(s.stresses.currentDerating).toBe(0.8); // common practice, 80 % of a current rating
    closeTo(s.stresses.required.switchIdA, peakA / 0.8, 3e-3); // required rating = stress / derating (common practice); peak: Erickson & Maksimović ch. 2
  });

  it('margins.currentDerating 0.5 doubles the needed ID rating and halves the check limit', () => {
    const d = buck();
    d.margins.currentDerating = 0.5;
    const r = reviewDesign(d);
    closeTo(r.sizing.stresses.required.switchIdA, peakA / 0.5, 3e-3); // stress / derating (common practice)
    const c = r.checks.find((k) => k.id === 'switch-current');
    const idRating = d.parts.switch.kind === 'mosfet' ? d.parts.switch.idRatingA : NaN;
    closeTo(c?.limit ?? NaN, idRating * 0.5, 1e-12); // limit = rating × derating (common practice)
    closeTo(c?.value ?? NaN, peakA, 3e-3); // the peak switch current, Erickson & Maksimović ch. 2
  });

  it('a derating outside 0.1 … 1 is refused naming the on-screen label, the value and the range', () => {
    const d = buck() as unknown as { margins: Record<string, unknown> };
    d.margins.currentDerating = 1.5;
    const r = validateDesign(d);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const p = r.problems.find((x) => x.path === 'margins.currentDerating');
    expect(designFieldLabel('margins.currentDerating', undefined)).toBe('Usable share of current ratings'); // the editor's label
    expect(p?.message).toContain('Usable share of current ratings'); // the label
    expect(p?.message).toContain('1.5'); // the value
    expect(p?.message).toMatch(/0\.1 ≤ currentDerating ≤ 1/); // the range (design/numbers.ts "derating")
  });
});

describe('the light-load efficiency check', () => {
  const withBias = (): Design => {
    const d = buck();
    d.parts.controller.quiescentA = 5e-3;
    return d;
  };
  // At 10 % of rated load (0.3 A, common practice) and 12 V: Pout = 1.5 W, bias Vin·Iq = 60 mW (datasheet
  // quiescent current × supply, common practice) → η = 1.5 / 1.56 = 0.96154 (definition of efficiency).
  const eta10 = 1.5 / (1.5 + 12 * 5e-3);

  it('without a target it is left out and a note names the field', () => {
    const r = reviewDesign(withBias());
    expect(r.checks.some((c) => c.id === 'efficiency-at-light-load')).toBe(false);
    expect(r.notes.join(' ')).toContain('Efficiency at light load'); // the on-screen label of the target
  });

  it('reads 10 % of rated load at nominal Vin and fails a target above the hand value', () => {
    const d = withBias();
    d.spec.targets = { efficiencyAtLightLoad: 0.97 };
    const c = reviewDesign(d).checks.find((k) => k.id === 'efficiency-at-light-load');
    closeTo(c?.value ?? NaN, eta10, 1e-3); // Pout/(Pout + Vin·Iq), worked above
    expect(c?.status).toBe('fail'); // 0.9615 < 0.97
    expect(c?.where).toContain('10 % of rated load');
    expect(c?.source).toMatch(/common practice/);
  });

  it('passes a target below the hand value', () => {
    const d = withBias();
    d.spec.targets = { efficiencyAtLightLoad: 0.95 };
    expect(reviewDesign(d).checks.find((k) => k.id === 'efficiency-at-light-load')?.status).toBe('pass'); // 0.9615 ≥ 0.95
  });

  it('with a mission profile it reads the lightest loaded row (standby rows are skipped)', () => {
    const d = withBias();
    d.spec.targets = { efficiencyAtLightLoad: 0.95 };
    d.missionProfile = {
      name: 'test use', hoursPerDay: 24,
      rows: [
        { label: 'standby', vinV: 12, loadA: 0, fraction: 0.5 },
        { label: 'idle', vinV: 10, loadA: 0.1, fraction: 0.3 },
        { label: 'busy', vinV: 12, loadA: 3, fraction: 0.2 },
      ],
    };
    const c = reviewDesign(d).checks.find((k) => k.id === 'efficiency-at-light-load');
    // 0.1 A at 10 V: Pout = 0.5 W, Vin·Iq = 50 mW → η = 0.5/0.55 = 0.90909 (definition; common practice for Vin·Iq).
    closeTo(c?.value ?? NaN, 0.5 / 0.55, 1e-3);
    expect(c?.status).toBe('fail'); // 0.909 < 0.95: the light point of the profile is worse than 10 % load
    expect(c?.where).toContain('idle');
  });
});
