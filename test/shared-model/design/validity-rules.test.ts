import { describe, expect, it } from 'vitest';
import type { Problem } from '../../../shared-model/index.ts';
import { DEMO_DESIGNS, DEMO_PARTS_LIBRARY, validateDesign, validatePartsLibrary } from '../../../shared-model/index.ts';
import { demoWith } from './fixtures.ts';

const problemsOf = (json: unknown): Problem[] => {
  const r = validateDesign(json);
  return r.ok ? [] : r.problems;
};
const at = (json: unknown, path: string): Problem | undefined => problemsOf(json).find((p) => p.path === path);

describe('the audit cases of issue 10 §6 get a clear refusal', () => {
  it.each([5e-324, 1e-300])('an inductance of %s H is refused, naming the field, the value and the range', (l) => {
    const p = at(demoWith('synchronous-buck', { 'parts.inductor.inductanceH': l, 'parts.inductor.rolloff': undefined }), 'parts.inductor.inductanceH');
    expect(p?.message).toBe(`Inductor — Inductance (parts.inductor.inductanceH) is ${l} H; allowed: 1 nH ≤ inductanceH ≤ 1 H.`); // design/numbers.ts: our own rule, 1 nH … 1 H
    expect(p?.value).toBe(l);
  });
});

describe('every demo design and the demo part library still validate', () => {
  it.each(DEMO_DESIGNS.map((d) => [d.id, d.json] as const))('%s has no problem', (_id, json) => {
    expect(problemsOf(json)).toEqual([]);
  });
  it('the invented parts library has no problem', () => {
    const r = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    expect(r.ok ? [] : r.problems).toEqual([]);
  });
});

describe('rule 1: the inductor ripple at nominal input stays within 100 × the rated inductor current (our own rule)', () => {
  // Buck demo at Vin,nom 14.4 V: D = 3.3/14.4, ΔI = (14.4 − 3.3)·D/(L·450 kHz) (docs/methods.md §1, worked here):
  // 100 × 5 A = 500 A is reached at L = 11.1·0.2291667/(500·450e3) = 11.3056 nH.
  const buck = (l: number) => demoWith('synchronous-buck', { 'parts.inductor.inductanceH': l, 'parts.inductor.rolloff': undefined });
  it('refuses 11.2 nH with the smallest valid inductance', () => {
    const p = at(buck(11.2e-9), 'parts.inductor.inductanceH');
    expect(p?.allowed).toBe('inductanceH ≥ 11.3056 nH at 450 kHz');
    expect(p?.message).toContain('Inductor — Inductance (parts.inductor.inductanceH) (11.2 nH) is far too small for Switching frequency (spec.switchingFrequencyHz) (450 kHz)');
    expect(p?.message).toContain('504.712 A peak to peak'); // 11.1 V · 0.2291667 / (11.2 nH · 450 kHz)
  });
  it('accepts 11.4 nH (a poor design, but the models still mean something)', () => {
    expect(at(buck(11.4e-9), 'parts.inductor.inductanceH')).toBeUndefined();
  });
  it('uses the boost relations: inductor current = load·Vout/Vin, ΔI = Vin·D/(L·fs)', () => {
    // Boost demo at 3.7 V: D = 1 − 3.7/12 = 0.6916667, IL = 12/3.7 A = 3.243243 A; ΔI = 3.7·D/(L·550 kHz) = 324.3243 A
    // at L = 3.7·0.6916667/(324.3243·550e3) = 14.3468 nH (docs/methods.md §1, worked here)
    const p = at(demoWith('diode-boost', { 'parts.inductor.inductanceH': 14e-9, 'parts.inductor.rolloff': undefined }), 'parts.inductor.inductanceH');
    expect(p?.allowed).toBe('inductanceH ≥ 14.3468 nH at 550 kHz');
    expect(at(demoWith('diode-boost', { 'parts.inductor.inductanceH': 14.5e-9, 'parts.inductor.rolloff': undefined }), 'parts.inductor.inductanceH')).toBeUndefined();
  });
});

describe('rule 2: the period is longer than the switch edges plus the dead times (our own rule)', () => {
  // Gate-charge method (docs/methods.md §4, worked here) with 999 Ω drive + 1 Ω Rg: Qgs2 + Qgd = 2.7 nC;
  // t_on = 2.7 nC·1000 Ω/(5 − 2.6) V = 1.125 µs; t_off = 2.7 nC·1000 Ω/2.6 V = 1.038462 µs; + 2 × 20 ns dead time
  // = 2.203462 µs → the highest frequency is 453.831 kHz.
  const slow = (fs: number) =>
    demoWith('synchronous-buck', { 'parts.controller.pullUpOhm': 999, 'parts.controller.pullDownOhm': 999, 'spec.switchingFrequencyHz': fs });
  it('refuses 460 kHz, naming the period, both edges and the dead times', () => {
    const p = at(slow(460e3), 'spec.switchingFrequencyHz');
    expect(p?.allowed).toBe('switchingFrequencyHz < 453.831 kHz');
    expect(p?.message).toContain('1.125 µs + 1.03846 µs');
    expect(p?.message).toContain('dead times Dead time before switch turn-on (topology.deadTimeBeforeOnS) + Dead time after switch turn-off (topology.deadTimeAfterOffS) (40 ns)');
  });
  it('accepts 450 kHz, where the edges leave 19 ns of the period', () => {
    expect(at(slow(450e3), 'spec.switchingFrequencyHz')).toBeUndefined();
  });
});

describe('rule 3: the output bank ripple stays below the output voltage (our own rule)', () => {
  it('boost: charge I·D·T, so R·C must exceed D·T', () => {
    // D = 1 − 3.7/12 = 0.6916667; Q = 1 A · D / 550 kHz = 1.257576 µC; with 3 capacitors C ≥ Q/(12 V · 3) = 34.9327 nF (worked here);
    // R·C = 12 Ω · 3 · 34.9 nF = 1.2564 µs against D·T = 1.25758 µs
    const p = at(demoWith('diode-boost', { 'parts.outputCapacitor.part.capacitanceF': 34.9e-9 }), 'parts.outputCapacitor.part.capacitanceF');
    expect(p?.allowed).toBe('capacitanceF ≥ 34.9327 nF with parts.outputCapacitor.count 3');
    expect(p?.message).toContain('the load resistance times the bank, 1.2564 µs, is not longer than the on time 1.25758 µs');
    expect(at(demoWith('diode-boost', { 'parts.outputCapacitor.part.capacitanceF': 35e-9 }), 'parts.outputCapacitor.part.capacitanceF')).toBeUndefined();
  });
  it('buck in CCM: charge ΔI·T/8', () => {
    // ΔI = 1.202719 A at 14.4 V (above); Q = ΔI/(8·450 kHz) = 334.089 nC; two capacitors: C ≥ Q/(3.3 V · 2) = 50.6195 nF
    const p = at(demoWith('synchronous-buck', { 'parts.outputCapacitor.part.capacitanceF': 50e-9 }), 'parts.outputCapacitor.part.capacitanceF');
    expect(p?.allowed).toBe('capacitanceF ≥ 50.6195 nF with parts.outputCapacitor.count 2');
    expect(at(demoWith('synchronous-buck', { 'parts.outputCapacitor.part.capacitanceF': 51e-9 }), 'parts.outputCapacitor.part.capacitanceF')).toBeUndefined();
  });
  it('buck in DCM at rated load: charge (Ipk − I)²·I·T/Ipk² with Ipk = √(2·I·ΔI)', () => {
    // Rated load 0.1 A < ΔI/2: Ipk = √(2·0.1·1.202719) = 0.4904526 A; Q = 0.3904526²·0.1/(0.4904526²·450e3) = 140.841 nC;
    // C ≥ Q/(3.3 V · 2) = 21.3396 nF (docs/methods.md §2 triangle areas, worked here)
    const doc = (c: number) => demoWith('synchronous-buck', { 'spec.ratedLoadA': 0.1, 'parts.outputCapacitor.part.capacitanceF': c });
    expect(at(doc(21e-9), 'parts.outputCapacitor.part.capacitanceF')?.allowed).toBe('capacitanceF ≥ 21.3396 nF with parts.outputCapacitor.count 2');
    expect(at(doc(21.5e-9), 'parts.outputCapacitor.part.capacitanceF')).toBeUndefined();
  });
});

describe('rule 4: a sense resistor drops at most half of min(Vin,min, Vout) at rated load (our own rule)', () => {
  it('buck, inductor position: 5 A, half of 3.3 V → at most 330 mΩ', () => {
    const p = at(demoWith('synchronous-buck', { 'parts.senseResistor.resistanceOhm': 0.34 }), 'parts.senseResistor.resistanceOhm');
    expect(p?.allowed).toBe('resistanceOhm ≤ 330 mΩ');
    expect(p?.message).toContain('would drop 1.7 V at rated load (5 A through the "inductor" position');
    expect(at(demoWith('synchronous-buck', { 'parts.senseResistor.resistanceOhm': 0.329 }), 'parts.senseResistor.resistanceOhm')).toBeUndefined();
  });
  it('boost, switch position: inductor current 1 A·12/3 = 4 A at Vin,min, half of 3 V → at most 375 mΩ', () => {
    expect(at(demoWith('diode-boost', { 'parts.senseResistor.resistanceOhm': 0.38 }), 'parts.senseResistor.resistanceOhm')?.allowed).toBe('resistanceOhm ≤ 375 mΩ');
    expect(at(demoWith('diode-boost', { 'parts.senseResistor.resistanceOhm': 0.37 }), 'parts.senseResistor.resistanceOhm')).toBeUndefined();
  });
});

describe('a duty limit that cannot reach the output anywhere in the input range is a notice, not a refusal', () => {
  it('boost 4.2 V → 12 V needs D = 1 − 4.2/12 = 0.65 at best (Erickson & Maksimović 2nd ed. ch. 2 [from memory]); maxDuty 0.6 is noted', () => {
    const r = validateDesign(demoWith('diode-boost', { 'spec.maxDuty': 0.6 }));
    expect(r.ok).toBe(true); // the engine still computes meaningful, unregulated results
    const note = r.ok ? r.warnings?.find((w) => w.path === 'spec.maxDuty') : undefined;
    expect(note?.message).toContain('needs a duty of 0.65 at the highest input spec.vinMaxV (4.2 V)');
  });
  it('buck 16.8 V → 3.3 V needs D = 0.196429; maxDuty 0.2 reaches it and gets no notice', () => {
    const r = validateDesign(demoWith('synchronous-buck', { 'spec.maxDuty': 0.2 }));
    expect(r.ok && (r.warnings ?? []).some((w) => w.path === 'spec.maxDuty')).toBe(false);
    const low = validateDesign(demoWith('synchronous-buck', { 'spec.maxDuty': 0.19 }));
    expect(low.ok && low.warnings?.some((w) => w.path === 'spec.maxDuty')).toBe(true);
  });
});
