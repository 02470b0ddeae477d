import { describe, expect, it } from 'vitest';
import { validateDesign } from '../../../shared-model/index.ts';
import { demoText } from '../../helpers/demo.ts';

function withProfile(profile: unknown): unknown {
  const doc = JSON.parse(demoText('synchronous-buck')) as Record<string, unknown>;
  return { ...doc, missionProfile: profile };
}

const row = (vinV: number, loadA: number, fraction: number) => ({ vinV, loadA, fraction });

describe('mission profile rules', () => {
  it('a design without a profile reads as before (no migration needed)', () => {
    const r = validateDesign(JSON.parse(demoText('synchronous-buck')));
    expect(r.ok && r.design.missionProfile).toBe(undefined);
  });

  it('refuses fractions that do not add up to 1, naming the rows, the sum and the allowed range', () => {
    const r = validateDesign(withProfile({ name: 'short', rows: [row(14.4, 1, 0.5), row(14.4, 5, 0.3)], hoursPerDay: 8 }));
    expect(r.ok).toBe(false);
    const p = !r.ok ? r.problems.find((x) => x.path === 'missionProfile.rows') : undefined;
    expect(p?.value).toBe(0.8);
    expect(p?.message).toMatch(/add up to 0\.8; they must add up to 1/); // a time budget covers every hour once (definition)
    expect(p?.allowed).toMatch(/1 \(±0\.001\)/);
    expect(p?.message).toMatch(/^Mission profile — Share of time: /); // the editor's column label names the field (team rules)
  });

  it('names a row\'s field by the editor\'s labels: row number and column', () => {
    const r = validateDesign(withProfile({ name: 'x', rows: [row(20, 1, 1)], hoursPerDay: 24 }));
    const p = !r.ok ? r.problems.find((x) => x.path === 'missionProfile.rows[0].vinV') : undefined;
    expect(p?.message).toContain('Mission profile row 1 — Vin'); // the on-screen label
    expect(p?.message).toContain('20 V'); // the value
    const hours = validateDesign(withProfile({ name: 'x', rows: [row(14.4, 1, 1)], hoursPerDay: 25 }));
    const h = !hours.ok ? hours.problems.find((x) => x.path === 'missionProfile.hoursPerDay') : undefined;
    expect(h?.message).toMatch(/^Mission profile — Hours of use per day/); // the label
    expect(h?.message).toContain('25'); // the value
    expect(h?.message).toMatch(/24/); // the range's upper end
  });

  it('accepts thirds typed to three decimals', () => {
    const r = validateDesign(withProfile({ name: 'thirds', rows: [row(14.4, 1, 0.333), row(12, 2, 0.333), row(16.8, 5, 0.334)], hoursPerDay: 24, batteryWh: 50 }));
    expect(r.ok).toBe(true);
  });

  it('refuses a row outside the specified input range', () => {
    const r = validateDesign(withProfile({ name: 'x', rows: [row(20, 1, 1)], hoursPerDay: 24 }));
    const p = !r.ok ? r.problems.find((x) => x.path === 'missionProfile.rows[0].vinV') : undefined;
    expect(p?.message).toMatch(/outside the specified input range 10\.8 V … 16\.8 V/);
  });

  it('refuses a negative fraction, a day longer than 24 h and an empty table by their ranges', () => {
    const r = validateDesign(withProfile({ name: 'x', rows: [row(14.4, 1, -0.1), row(14.4, 1, 1.1)], hoursPerDay: 25 }));
    const paths = !r.ok ? r.problems.map((p) => p.path) : [];
    expect(paths).toContain('missionProfile.rows[0].fraction');
    expect(paths).toContain('missionProfile.hoursPerDay');
    const empty = validateDesign(withProfile({ name: 'x', rows: [], hoursPerDay: 8 }));
    expect(!empty.ok && empty.problems.some((p) => p.path === 'missionProfile.rows')).toBe(true);
  });
});
