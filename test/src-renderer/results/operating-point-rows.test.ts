import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign } from '../../../shared-model/index.ts';
import { operatingPointRows, ratingShare, ratingState } from '../../../src-renderer/results/operating-point-rows.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign } from '../../helpers/demo.ts';

function valueAt(record: unknown, key: string): unknown {
  return key.split('.').reduce<unknown>((node, part) => (node as Record<string, unknown>)[part], record);
}

describe('operating-point rows', () => {
  const design = demoDesign();
  const op = evaluate(design).operatingPoint;
  const rows = operatingPointRows(op, design);

  it('takes every value straight from the engine record, under its own key', () => {
    for (const row of rows) expect(row.value, row.key).toBe(valueAt(op, row.key)); // engine record (shared-model evaluate)
  });

  it('lists the quantities issue 2 asks for', () => {
    const keys = new Set(rows.map((r) => r.key));
    for (const key of ['dutyCycle', 'inductor.rippleA', 'inductor.peakA', 'inductor.valleyA', 'stats.switch.rmsA', 'stats.rectifier.rmsA', 'stats.inputCapacitor.rmsA', 'stats.outputCapacitor.rmsA', 'outputRipple.totalV', 'stress.switchV', 'stress.rectifierV'])
      expect(keys.has(key), key).toBe(true); // issue 2 §3 list of operating-point results
  });

  it('relates stresses to the part ratings', () => {
    const stress = rows.find((r) => r.key === 'stress.switchV')!;
    closeTo(ratingShare(stress)!, op.stress.switchV / design.parts.switch.vdsRatingV, 1e-15); // share = stress / VDS rating
    const over = { ...stress, value: stress.rating!.value * 1.01 };
    expect(ratingState(over)).toBe('over');
    const derated = { ...stress, value: stress.rating!.value * (design.margins.voltageDerating + 1) / 2 };
    expect(ratingState(derated)).toBe('derated'); // between the usable share (margins.voltageDerating) and the rating
  });

  it('counts capacitors in parallel in the ripple rating', () => {
    const row = rows.find((r) => r.key === 'stats.outputCapacitor.rmsA')!;
    const slot = design.parts.outputCapacitor;
    closeTo(row.rating!.value, slot.part.rippleRatingA * slot.count, 1e-15); // n equal capacitors share the ripple current
  });
});

describe('operating-point rows while pulses skip', () => {
  it('name the equivalent switching frequency, the pulse rate Io/Q, and the frequency while awake', () => {
    const base = demoDesign();
    const checked = validateDesign({ ...base, topology: { ...base.topology, lightLoad: 'pulse-skipping', pulseSkipping: { minPeakCurrentA: 0.5, sleepCurrentA: 20e-6 } } });
    if (!checked.ok) throw new Error(checked.problems.map((p) => p.message).join(' '));
    const e = evaluate(checked.design, { loadA: 0.01 });
    const row = operatingPointRows(e.operatingPoint, checked.design, e.conditions.switchingFrequencyHz).find((r) => r.key === 'conditions.switchingFrequencyHz')!;
    expect(row.label).toMatch(/^Equivalent switching frequency \(pulse skipping; switching frequency while awake: /);
    expect(row.value).toBeLessThan(e.conditions.switchingFrequencyHz / 4); // docs/methods.md §14: f = Io/Q, a few tens of kHz at 10 mA for a 0.5 A pulse
    const rated = evaluate(checked.design);
    const plain = operatingPointRows(rated.operatingPoint, checked.design, rated.conditions.switchingFrequencyHz).find((r) => r.key === 'conditions.switchingFrequencyHz')!;
    expect(plain.label).toBe('Switching frequency'); // at rated load it switches every period
  });
});
