import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../shared-model/index.ts';
import { noticesOf, surfaceRows } from '../../../src-renderer/results/notice-items.ts';
import { labelOf } from './demo.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('warnings and hazards in one list', () => {
  const design = demoDesign();
  // Well above the invented inductor's saturation current: the engine must warn (saturation check, docs/methods.md ratings).
  const heavy = evaluate(design, { loadA: 2 * design.parts.inductor.isatA });

  it('keeps every engine warning with its field path, the most severe first', () => {
    const notices = noticesOf(heavy, null, labelOf);
    expect(notices.length).toBeGreaterThanOrEqual(heavy.warnings.length); // every engine warning is listed
    for (const w of heavy.warnings) expect(notices.some((n) => n.text === w.message && n.path === (w.path ?? null))).toBe(true); // engine warning record
    const rank = { danger: 0, caution: 1, info: 2 };
    const order = notices.map((n) => rank[n.severity]);
    expect(order).toEqual([...order].sort((a, b) => a - b)); // danger, then caution, then notes (ordering check against Array.prototype.sort)
  });

  it('lists each touchable surface with its touch limit, smallest margin first', () => {
    const rows = surfaceRows(heavy.hazards, labelOf);
    expect(rows).toHaveLength(heavy.hazards.length); // one row per engine hazard record
    for (const r of rows) expect(r.path).toBe(`thermal.touch.${r.part}`); // the design field that sets touchability (schema: thermal.touch)
    expect(rows.map((r) => r.marginK)).toEqual([...rows.map((r) => r.marginK)].sort((a, b) => a - b)); // ordering (ECMAScript sort)
  });
});
