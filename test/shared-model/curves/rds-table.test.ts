/**
 * Normalised RDS(on)(Tj) tables (issue 13 §2): RDS(on) read off a digitised datasheet curve, checked by
 * hand interpolation and against the linear law it samples; the curve's shape rules and the notice
 * when it ends below Tj max; and the conduction loss the ledger builds with it.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, rdsOnAt, validateDesign } from '../../../shared-model/index.ts';
import type { Design, Mosfet, RdsPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { design, SYNC_BUCK, valid } from '../../helpers/ledger-designs.ts';

/** A stated normalised curve: 0.8 at −25 °C, 1.0 at 25 °C, 1.5 at 100 °C, 1.9 at 150 °C. */
const STATED: RdsPoint[] = [
  { tjC: -25, ratio: 0.8 },
  { tjC: 25, ratio: 1 },
  { tjC: 100, ratio: 1.5 },
  { tjC: 150, ratio: 1.9 },
];

const fet = (points: RdsPoint[]): Mosfet => {
  const d = design(SYNC_BUCK);
  if (d.parts.switch.kind !== 'mosfet') throw new Error('test switch is not a MOSFET');
  return { ...d.parts.switch, rdsOn25Ohm: 0.01, rdsTemperatureLaw: { law: 'table', points } };
};

describe('RDS(on) from a normalised curve (straight lines between the points: common practice)', () => {
  it('interpolates the stated curve by hand', () => {
    closeTo(rdsOnAt(fet(STATED), 25), 0.01, 1e-12); // the 25 °C point
    closeTo(rdsOnAt(fet(STATED), 60), 0.01 * (1 + (35 / 75) * 0.5), 1e-12); // 1 + (60−25)/(100−25)·(1.5−1) = 1.2333 (hand)
    closeTo(rdsOnAt(fet(STATED), 125), 0.01 * 1.7, 1e-12); // halfway from 1.5 to 1.9 (hand)
    closeTo(rdsOnAt(fet(STATED), 0), 0.01 * 0.9, 1e-12); // halfway from 0.8 to 1.0 (hand)
  });
  it('holds the end ratios outside the table', () => {
    closeTo(rdsOnAt(fet(STATED), 175), 0.019, 1e-12);
    closeTo(rdsOnAt(fet(STATED), -55), 0.008, 1e-12);
  });
  it('reproduces the linear law R25·(1 + α(T − 25)) it samples, between the samples too (a straight line interpolates exactly)', () => {
    const alpha = 0.0045; // per K (docs/methods.md §5 linear law)
    const sampled = [-40, 25, 80, 175].map((tjC) => ({ tjC, ratio: 1 + alpha * (tjC - 25) }));
    const linear: Mosfet = { ...fet(sampled), rdsTemperatureLaw: { law: 'linear', alphaPerK: alpha } };
    for (const t of [-40, -10, 25, 47, 80, 133, 175]) closeTo(rdsOnAt(fet(sampled), t), rdsOnAt(linear, t), 1e-12, 0, { t });
  });
});

function withSwitchLaw(d: Design, points: RdsPoint[]): Design {
  if (d.parts.switch.kind !== 'mosfet') throw new Error('test switch is not a MOSFET');
  return { ...d, parts: { ...d.parts, switch: { ...d.parts.switch, rdsTemperatureLaw: { law: 'table', points } } } };
}

describe('RDS(on)(Tj) table rules (RDS(on) of silicon rises with Tj: Baliga, Fundamentals of Power Semiconductor Devices, §6 [memory])', () => {
  const base = valid(design(SYNC_BUCK));
  it('refuses a ratio that falls as Tj rises, naming the point and the rule', () => {
    const r = validateDesign(withSwitchLaw(base, [STATED[0]!, STATED[1]!, { tjC: 100, ratio: 0.9 }, STATED[3]!]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const p = r.problems.find((x) => x.path === 'parts.switch.rdsTemperatureLaw.points[2].ratio');
    expect(p?.message).toMatch(/^Point 3 \(100 °C, 0\.9\) after \(25 °C, 1\) of the RDS\(on\)\(Tj\) table.*must not fall/);
  });
  it('refuses temperatures that do not rise', () => {
    const r = validateDesign(withSwitchLaw(base, [STATED[1]!, STATED[0]!, STATED[2]!]));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.some((x) => x.path === 'parts.switch.rdsTemperatureLaw.points[1].tjC')).toBe(true);
  });
  it('gives a notice when the table ends below Tj max', () => {
    const r = validateDesign(withSwitchLaw(base, STATED.slice(0, 3)));
    expect(r.ok).toBe(true);
    if (r.ok) expect((r.warnings ?? []).map((n) => n.message).join('\n')).toMatch(/RDS\(on\)\(Tj\) table of parts\.switch ends at 100 °C, below its Tj max/);
  });
});

describe('the ledger with an RDS(on)(Tj) table', () => {
  it('charges the switch Irms²·RDS(on) with the ratio read off the curve at its converged junction temperature (hand interpolation)', () => {
    const d = valid(withSwitchLaw(valid(design(SYNC_BUCK)), STATED));
    const e = evaluate(d);
    const tj = e.temperatures.find((t) => t.part === 'switch')!.celsius;
    expect(tj).toBeGreaterThan(25);
    expect(tj).toBeLessThan(100); // on the 25–100 °C segment
    const term = e.losses.find((t) => t.part === 'switch' && t.mechanism === 'conduction')!;
    const r = term.inputs.find((i) => i.unit === 'Ω')!.value;
    const r25 = d.parts.switch.kind === 'mosfet' ? d.parts.switch.rdsOn25Ohm : NaN;
    closeTo(r, r25 * (1 + ((tj - 25) / 75) * 0.5), 1e-6); // hand interpolation on the stated 25–100 °C segment
  });
});
