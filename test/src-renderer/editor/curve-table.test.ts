/**
 * Pasted datasheet curves (issue 13 §2): spreadsheet, CSV and plain columns in engineering notation;
 * every unreadable cell named by row and column. Expected values are the numbers written in the text
 * (SI prefixes: BIPM SI Brochure, 9th ed., Table 7).
 */
import { describe, expect, it } from 'vitest';
import { parsePastedTable, plotPoints, plotSeries, tableText } from '../../../src-renderer/editor/curve-table.ts';

const COLUMNS = [
  { key: 'vdsV', label: 'VDS', unit: 'V' },
  { key: 'cossF', label: 'Coss', unit: 'F' },
];

describe('parsePastedTable', () => {
  it('reads tab-separated spreadsheet rows with a header and SI prefixes', () => {
    const r = parsePastedTable('VDS (V)\tCoss (pF)\n0\t1.2n\n5 V\t600 pF\n15\t330p\n', COLUMNS, 200);
    expect(r).toEqual({
      ok: true,
      skippedHeader: true,
      rows: [
        { vdsV: 0, cossF: 1.2e-9 },
        { vdsV: 5, cossF: 600e-12 },
        { vdsV: 15, cossF: 330e-12 },
      ],
    });
  });

  it('reads semicolon CSV with decimal commas, comma CSV and space-separated columns', () => {
    const rows = (text: string) => {
      const r = parsePastedTable(text, COLUMNS, 200);
      if (!r.ok) throw new Error(r.messages.join(' '));
      return r.rows.map((row) => [row.vdsV, Number(row.cossF!.toPrecision(12))]); // 12 digits: parsing "1.5n" is 1.5 × 1e-9 in binary
    };
    expect(rows('0;1,5n\n2,5;700p')).toEqual([[0, 1.5e-9], [2.5, 700e-12]]);
    expect(rows('0,1.5n\n10,400p')).toEqual([[0, 1.5e-9], [10, 400e-12]]);
    expect(rows('0   1.5e-9\n10  4e-10')).toEqual([[0, 1.5e-9], [10, 4e-10]]);
  });

  it('names the row and the column of every cell it cannot read, counting the header', () => {
    const r = parsePastedTable('VDS\tCoss\n0\t1n\n5\tabc\n7\n9\t2 mA', COLUMNS, 200);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.messages[0]).toMatch(/^Row 3, Coss: "abc"/);
    expect(r.messages[1]).toBe('Row 4 ("7") has 1 cell; each row needs 2: VDS then Coss.');
    expect(r.messages[2]).toMatch(/^Row 5, Coss: "2 mA"/); // a current is not a capacitance
  });

  it('refuses more rows than a curve takes and an empty paste', () => {
    const many = Array.from({ length: 5 }, (_, i) => `${i}\t1n`).join('\n');
    const r = parsePastedTable(many, COLUMNS, 4);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.messages[0]).toBe('5 rows were pasted; a curve takes at most 4 points.');
    expect(parsePastedTable('  \n', COLUMNS, 4)).toEqual({ ok: false, messages: ['Nothing to read: paste two columns, one point per line.'] });
  });

  it('writes rows back as spreadsheet text', () => {
    expect(tableText([{ vdsV: 1, cossF: 2e-10 }], COLUMNS)).toBe('VDS (V)\tCoss (F)\n1\t2e-10');
  });
});

describe('plotPoints', () => {
  it('maps the first point of a falling curve to the top left and the last to the bottom right', () => {
    const rows = [
      { vdsV: 0, cossF: 1e-9 },
      { vdsV: 10, cossF: 1e-10 },
      { vdsV: 20, cossF: 1e-11 },
    ];
    expect(plotPoints(rows, 'vdsV', 'cossF', 100, 50, true)).toBe('0.0,0.0 50.0,25.0 100.0,50.0'); // log10 spacing: one decade per half height
    expect(plotPoints(rows.slice(0, 1), 'vdsV', 'cossF', 100, 50, true)).toBe('');
  });
});

describe('plotSeries', () => {
  it('draws one line per temperature of a VF(IF, Tj) family on shared axes', () => {
    const rows = [
      { tjC: 25, ifA: 0, vfV: 0.4 },
      { tjC: 25, ifA: 10, vfV: 0.8 },
      { tjC: 125, ifA: 0, vfV: 0.2 },
      { tjC: 125, ifA: 10, vfV: 0.6 },
    ];
    // x 0…10 A over 100, y 0.2…0.8 V over 60 (top = highest VF): hand-placed corners.
    expect(plotSeries(rows, 'ifA', 'vfV', 'tjC', 100, 60, false)).toEqual([
      { name: 25, points: '0.0,40.0 100.0,0.0' },
      { name: 125, points: '0.0,60.0 100.0,20.0' },
    ]);
  });
});

describe('plotSeries on log-log axes (an ESR(f) table spans decades)', () => {
  it('spaces decades evenly on both axes and leaves out points at or below zero', () => {
    const rows = [
      { frequencyHz: 1e3, esrOhm: 0.1 },
      { frequencyHz: 1e4, esrOhm: 0.01 },
      { frequencyHz: 1e5, esrOhm: 0.01 },
      { frequencyHz: 0, esrOhm: 0.05 },
    ];
    // log10 x 3…5 over 100, log10 y −2…−1 over 50 (top = highest ESR): one decade = 50 across, 50 down (hand).
    expect(plotSeries(rows, 'frequencyHz', 'esrOhm', undefined, 100, 50, true, true)).toEqual([{ name: undefined, points: '0.0,0.0 50.0,50.0 100.0,50.0' }]);
  });
});
