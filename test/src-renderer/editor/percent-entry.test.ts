import { describe, expect, it } from 'vitest';
import { parsePercent, showPercent } from '../../../src-renderer/editor/percent-entry.ts';

describe('percent entry', () => {
  it('reads a bare number as percent, with or without the sign', () => {
    expect(parsePercent('90')).toEqual({ ok: true, value: 0.9, unit: '' }); // ISO 80000-1: 1 % = 0.01
    expect(parsePercent('90 %')).toEqual({ ok: true, value: 0.9, unit: '' });
    expect(parsePercent('92.5%')).toEqual({ ok: true, value: 0.925, unit: '' });
    expect(parsePercent(' 30 ')).toEqual({ ok: true, value: 0.3, unit: '' });
  });

  it('reads "0.9" as 0.9 %, not 90 %', () => {
    const read = parsePercent('0.9');
    expect(read.ok && read.value).toBeCloseTo(0.009, 15); // ISO 80000-1: 0.9 % = 0.009
  });

  it('refuses text that is not a percentage, quoting it', () => {
    for (const text of ['', '%', 'ninety', '90 V', '4,5']) {
      const read = parsePercent(text);
      expect(read.ok, text).toBe(false);
    }
    const read = parsePercent('90 V');
    expect(!read.ok && read.message).toContain('"90 V"');
  });

  it('shows a fraction in percent and reads back the same fraction', () => {
    expect(showPercent(0.9)).toBe('90 %'); // ISO 80000-1
    expect(showPercent(0.2397)).toBe('23.97 %');
    for (const fraction of [0.9, 0.925, 0.3, 0.8, 0.05]) {
      const back = parsePercent(showPercent(fraction));
      expect(back.ok && back.value).toBe(fraction);
    }
  });
});
