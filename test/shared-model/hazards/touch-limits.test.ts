import { describe, expect, it } from 'vitest';
import { TOUCH_LIMITS } from '../../../shared-model/hazards/touch-limits.ts';
import { hazardCaution, touchHazard, touchLimitFor } from '../../../shared-model/hazards/touch-check.ts';
import { touchLimitRowSchema, type TouchLimitRow } from '../../../shared-model/index.ts';

const row = (id: string) => TOUCH_LIMITS.find((r) => r.id === id)!;

describe('the shipped touch-limit table', () => {
  it('holds the docs/methods.md §11 values, every row flagged as recalled', () => {
    expect(row('iso13732-metal-1min').limitC).toBe(51); // docs/methods.md §11: ISO 13732-1 metal 51 °C at 1 min [memory]
    expect(row('iso13732-metal-10min').limitC).toBe(48); // docs/methods.md §11: metal 48 °C at 10 min [memory]
    expect(row('iso13732-metal-8h').limitC).toBe(43); // docs/methods.md §11: metal 43 °C at 8 h [memory]
    expect(row('iso13732-plastic-1min').limitC).toBe(60); // docs/methods.md §11: plastics 60 °C at 1 min [memory]
    expect(row('iec60950-metal-handle-brief').limitC).toBe(60); // docs/methods.md §11: IEC 60950-1 Table 4C, held briefly 60/70/85 [memory]
    expect(row('iec60950-glass-handle-brief').limitC).toBe(70);
    expect(row('iec60950-plastic-handle-brief').limitC).toBe(85);
    expect(row('iec60950-metal-held').limitC).toBe(55); // docs/methods.md §11: held continuously 55/65/75 [memory]
    expect(row('iec60950-glass-held').limitC).toBe(65);
    expect(row('iec60950-plastic-held').limitC).toBe(75);
    expect(row('iec60950-metal-surface').limitC).toBe(70); // docs/methods.md §11: external surfaces 70/80/95 [memory]
    expect(row('iec60950-glass-surface').limitC).toBe(80);
    expect(row('iec60950-plastic-surface').limitC).toBe(95);
    expect(TOUCH_LIMITS.every((r) => r.recalled)).toBe(true); // docs/methods.md §11: numbers with low confidence, all recalled
  });
  it('is valid against the document schema, with unique ids and a standard on every row', () => {
    for (const r of TOUCH_LIMITS) expect(touchLimitRowSchema.safeParse(r).success).toBe(true);
    expect(new Set(TOUCH_LIMITS.map((r) => r.id)).size).toBe(TOUCH_LIMITS.length);
    const standards = new Set(TOUCH_LIMITS.map((r) => r.standard.split(' ')[0] + ' ' + r.standard.split(' ')[1]));
    expect([...standards].sort()).toEqual(['IEC 60950-1', 'IEC 62368-1', 'ISO 13732-1:2006'].sort()); // issue 3: the three named standards
  });
});

describe('choosing the row', () => {
  it('takes the strictest row for the material and contact', () => {
    expect(touchLimitFor(TOUCH_LIMITS, 'metal', 'brief')).toEqual({ row: row('iec60950-metal-handle-brief'), fit: 'exact' }); // 60 < 70 (docs/methods.md §11)
    expect(touchLimitFor(TOUCH_LIMITS, 'metal', 'surface-8h')!.row.limitC).toBe(43); // docs/methods.md §11
  });
  it('falls back to the strictest row of the contact when the material has none, and says so', () => {
    const pick = touchLimitFor(TOUCH_LIMITS, 'glass', 'surface-1min')!;
    expect(pick.fit).toBe('other-material');
    expect(pick.row.limitC).toBe(51); // strictest 1-minute row (metal, docs/methods.md §11)
    expect(hazardCaution(pick.row, pick.fit, 'glass', 'surface-1min')).toContain('no row for glass');
  });
  it('uses a custom table as given (it replaces the shipped one)', () => {
    const custom: TouchLimitRow[] = [
      { id: 'house', standard: 'House rule', clause: 'lab policy', material: 'metal', contact: 'held', limitC: 45, recalled: false, note: '' },
    ];
    expect(touchLimitFor(custom, 'metal', 'held')!.row.id).toBe('house');
    expect(touchLimitFor([], 'metal', 'held')).toBeUndefined();
  });
});

describe('hazard records', () => {
  it('name the margin, flag an exceeded limit and carry the caution', () => {
    const h = touchHazard('switch', 'Invented FET', 63.5, row('iec60950-metal-handle-brief'), 'exact', 'metal', 'brief');
    expect(h.marginK).toBeCloseTo(60 - 63.5, 12); // limit − surface
    expect(h.exceeded).toBe(true);
    for (const phrase of ['Estimate only', 'current edition', 'measure the surface on hardware', 'local codes', 'licensed practice', 'recalled']) {
      expect(h.caution).toContain(phrase); // BRIEF rule 4 and issue 3: the cautions travel with every hazard
    }
  });
});
