/**
 * The ranking view's rows (src-renderer/ranking/rank-rows.ts): every fitting part once, admissible parts
 * in the engine's order, parts turned down after them with every reason, and the texts of score, hottest
 * part, margin and binding constraint read from the engine's record (not recomputed).
 */
import { describe, expect, it } from 'vitest';
import { rankLibrary } from '../../../shared-model/index.ts';
import { bindingText, rankRows, scoreText } from '../../../src-renderer/ranking/rank-rows.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';

describe('ranking rows', () => {
  it('lists every fitting part: admissible in rank order, then the parts turned down with their reasons', () => {
    const design = demoDesign();
    // A hot ambient turns parts down (temperature limits less the margin): both kinds of row appear.
    const hot = { ...design, spec: { ...design.spec, ambientC: 95 } };
    const r = rankLibrary(hot, { role: 'switch', library: demoParts(), by: 'loss-at-rated' });
    expect(r.inadmissible.length).toBeGreaterThan(0);
    const rows = rankRows(r);
    expect(rows.length).toBe(r.ranking.length + r.inadmissible.length);
    expect(rows.filter((x) => x.admissible).map((x) => x.partId)).toEqual(r.ranking.map((p) => p.partId));
    expect(rows.slice(r.ranking.length).every((x) => !x.admissible && x.rank === null && x.reasons.length > 0)).toBe(true);
    for (const row of rows) expect(`${row.scoreText} ${row.hottestText} ${row.marginText} ${row.bindingText}`).not.toMatch(/NaN|undefined|null/);
  });

  it('says scores and headroom in words a reader checks by hand', () => {
    expect(scoreText({ by: 'weighted-efficiency', unit: '' }, 0.91234)).toBe('91.23 %'); // a fraction shown as a percentage
    expect(scoreText({ by: 'energy', unit: 'Wh' }, 12.81023)).toBe('12.81 Wh');
    // headroom (limit − value)/limit = (24 − 16.83)/24 = 0.29875 → 29.9 % (arithmetic)
    expect(bindingText({ kind: 'rating', what: 'Blocking voltage', value: 16.83, limit: 24, unit: 'V', headroom: (24 - 16.83) / 24 })).toBe('Blocking voltage: 16.83 V of 24 V (29.9 % left)');
    expect(bindingText({ kind: 'rating', what: 'Drain current', value: 12, limit: 10, unit: 'A', headroom: -0.2 })).toContain('20.0 % past it');
  });
});
