import { describe, expect, it } from 'vitest';
import { designFieldLabel, pathMessage, validateDesign } from '../../../shared-model/index.ts';
import { demoDesign } from '../../helpers/demo.ts';

const boost = demoDesign('diode-boost');

describe('validation messages name each field by its on-screen label (issue 10 §6)', () => {
  it('labels the specification, part, bank, thermal and margin fields as the editor shows them', () => {
    expect(designFieldLabel('spec.voutV', boost)).toBe('Output voltage'); // the editor's Specification section
    expect(designFieldLabel('parts.inductor.inductanceH', boost)).toBe('Inductor — Inductance');
    expect(designFieldLabel('parts.outputCapacitor.part.esrOhm', boost)).toBe('Output capacitors — ESR at fs');
    expect(designFieldLabel('parts.outputCapacitor.count', boost)).toBe('Output capacitors — Number in parallel');
    expect(designFieldLabel('thermal.heatsinks[0].thetaSaKPerW', boost)).toMatch(/^Heatsink “.+” — θSA \(sink to ambient\)$/);
    expect(designFieldLabel('margins.voltageDerating', boost)).toBe('Usable share of voltage ratings');
    expect(designFieldLabel('topology.pulseSkipping.minPeakCurrentA', boost)).toBe('Minimum peak current of a pulse');
    expect(designFieldLabel('topology.phases', boost)).toBe('Interleaved phases'); // the editor's topology section (issue 13 §1)
    expect(designFieldLabel('topology.phaseShedding.hysteresisFraction', boost)).toBe('Shedding hysteresis, share of the crossover load');
    expect(designFieldLabel('spec.noSuchKey', boost)).toBeUndefined(); // no field on screen: the path stays alone
  });

  it('a phase count or shedding hysteresis out of range names the label, value and range (issue 13 §1)', () => {
    const doc = structuredClone(boost) as unknown as { topology: Record<string, unknown> };
    doc.topology.phases = 9;
    doc.topology.phaseShedding = { hysteresisFraction: 0.9 };
    const r = validateDesign(doc);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const phases = r.problems.find((p) => p.path === 'topology.phases');
    expect(phases?.message).toMatch(/^Interleaved phases \(topology\.phases\) is 9; allowed: .*1 ≤ phases ≤ 8/); // design/numbers.ts phaseCount
    const band = r.problems.find((p) => p.path === 'topology.phaseShedding.hysteresisFraction');
    expect(band?.message).toMatch(/^Shedding hysteresis, share of the crossover load \(topology\.phaseShedding\.hysteresisFraction\) is 0\.9; allowed: 0 ≤ .* ≤ 0\.5/);
  });

  it('a refused design says label, path, value and range in one sentence, and the sentence in paths comes back', () => {
    const doc = structuredClone(boost) as unknown as { spec: Record<string, unknown>; parts: { inductor: Record<string, unknown> } };
    doc.spec.vinMinV = 20; // above Vin,max 4.2 V: a cross-field rule naming two fields
    doc.parts.inductor.inductanceH = 5e-324; // issue 10 §6 audit case
    const r = validateDesign(doc);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const l = r.problems.find((p) => p.path === 'parts.inductor.inductanceH');
    expect(l?.message).toBe('Inductor — Inductance (parts.inductor.inductanceH) is 5e-324 H; allowed: 1 nH ≤ inductanceH ≤ 1 H.'); // design/numbers.ts range
    const order = r.problems.find((p) => p.path === 'spec.vinMaxV');
    expect(order?.message).toContain('Input voltage, highest (spec.vinMaxV) (4.2 V) is below Input voltage, lowest (spec.vinMinV) (20 V)');
    expect(order && pathMessage(order)).toContain('spec.vinMaxV (4.2 V) is below spec.vinMinV (20 V)');
    for (const p of r.problems) expect(pathMessage(p)).not.toMatch(/ \((?:spec|parts|thermal|margins|topology)\./); // every label added is taken out again
  });
});
