/**
 * Safety: the contact the editor offers must name the contact the applied touch limit is for. The limit
 * for `held` is IEC 60950-1 Table 4C's row for handles held continuously in normal use (docs/methods.md
 * §11), so a label promising a few seconds of contact would pair a short contact with a long-contact limit.
 */
import { describe, expect, it } from 'vitest';
import { CONTACT_LABELS, contactSchema, TOUCH_LIMITS, touchLimitFor } from '../../../shared-model/index.ts';
import type { SurfaceMaterial } from '../../../shared-model/index.ts';
import { CONTACT_CHOICE } from '../../../src-renderer/editor/design-fields.ts';

const MATERIALS: SurfaceMaterial[] = ['metal', 'glass', 'plastic'];
const labelOf = (value: string): string => CONTACT_CHOICE.options.find((o) => o.value === value)?.label ?? '';

describe('the contact choice in the editor', () => {
  it('offers every contact of the design schema once, in the report\'s words', () => {
    expect(CONTACT_CHOICE.options.map((o) => o.value)).toEqual([...contactSchema.options]);
    for (const value of contactSchema.options) expect(labelOf(value)).toBe(CONTACT_LABELS[value]); // one wording for screen and report
  });

  it('calls `held` continuous contact, the contact its limit is for (IEC 60950-1 Table 4C, docs/methods.md §11)', () => {
    const label = labelOf('held');
    expect(label).toMatch(/continuously/);
    expect(label).not.toMatch(/second|brief|short/);
    for (const material of MATERIALS) {
      const applied = touchLimitFor(TOUCH_LIMITS, material, 'held');
      expect(applied?.fit, material).toBe('exact');
      expect(applied?.row.clause, material).toMatch(/held continuously/); // IEC 60950-1 Table 4C "held continuously in normal use" (from memory)
    }
    // The limits that apply: 55 / 65 / 75 °C for metal / glass / plastic (docs/methods.md §11, recalled values).
    expect(MATERIALS.map((m) => touchLimitFor(TOUCH_LIMITS, m, 'held')?.row.limitC)).toEqual([55, 65, 75]);
  });

  it('calls `brief` a short contact, and its limit is the short-period handle row (IEC 60950-1 Table 4C, docs/methods.md §11)', () => {
    expect(labelOf('brief')).toMatch(/short periods/);
    for (const material of MATERIALS) {
      expect(touchLimitFor(TOUCH_LIMITS, material, 'brief')?.row.clause, material).toMatch(/short periods/); // the strictest 'brief' row is the handle row
    }
    expect(MATERIALS.map((m) => touchLimitFor(TOUCH_LIMITS, m, 'brief')?.row.limitC)).toEqual([60, 70, 85]); // docs/methods.md §11
  });

  it('gives each long-contact choice the duration of its limit rows (ISO 13732-1 contact periods, docs/methods.md §11)', () => {
    const durations = { 'surface-1min': /\b1 minute\b/, 'surface-10min': /\b10 minutes\b/, 'surface-8h': /\b8 hours\b/ } as const;
    for (const [contact, words] of Object.entries(durations)) expect(labelOf(contact), contact).toMatch(words);
    // The long-contact limits fall as the contact lengthens: metal 51 > 48 > 43 °C (ISO 13732-1, docs/methods.md §11, from memory).
    expect((['surface-1min', 'surface-10min', 'surface-8h'] as const).map((c) => touchLimitFor(TOUCH_LIMITS, 'metal', c)?.row.limitC)).toEqual([51, 48, 43]);
  });
});
