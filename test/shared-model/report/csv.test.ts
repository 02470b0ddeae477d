/**
 * CSV export of the sweep and the ledger, read back with an independent RFC 4180 reader written here:
 * every field count matches its header, and every number reads back to the engine's exact value.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, ledgerCsv, sweepCsv, sweepLoad } from '../../../shared-model/index.ts';
import { csvText } from '../../../shared-model/csv/write.ts';
import { demoDesign } from '../../helpers/demo.ts';

/** RFC 4180 reader: CRLF records, quoted fields with doubled quotes. */
function readCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      row.push(field);
      field = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
    } else field += c;
  }
  expect(field === '' && row.length === 0).toBe(true); // RFC 4180 §2.2: the last record ends with CRLF here
  return rows;
}

describe('csvText', () => {
  it('quotes fields holding commas, quotes or line breaks and doubles inner quotes', () => {
    expect(readCsv(`${['a,b', 'say "hi"', 'two\r\nlines', 'plain'].map(csvText).join(',')}\r\n`)).toEqual([['a,b', 'say "hi"', 'two\r\nlines', 'plain']]); // RFC 4180 §2.5–2.7
  });
});

describe('sweepCsv', () => {
  const design = demoDesign('synchronous-buck');
  const sweep = sweepLoad(design, { points: 25 });
  const rows = readCsv(sweepCsv(sweep));

  it('has a header and one record per point, each as long as the header', () => {
    expect(rows.length).toBe(sweep.points.length + 1);
    for (const r of rows) expect(r.length).toBe(rows[0]!.length); // RFC 4180 §2.4: same number of fields in each record
  });

  it('reads back the engine values exactly', () => {
    const header = rows[0]!;
    const col = (name: string) => header.indexOf(name);
    sweep.points.forEach((p, i) => {
      const r = rows[i + 1]!;
      expect(Number(r[col('load [A]')])).toBe(p.loadA); // ECMA-262 Number::toString round-trips exactly
      expect(Number(r[col('efficiency [1]')])).toBe(p.efficiency);
      expect(Number(r[col('total loss [W]')])).toBe(p.totalLoss);
      sweep.columns.losses.forEach((c, k) => expect(Number(r[col(`loss ${c.part} ${c.mechanism} [W]`)])).toBe(p.losses[k]));
      sweep.columns.temperatures.forEach((c, k) => expect(Number(r[col(`temperature ${c.part} [°C]`)])).toBe(p.temperaturesC[k]));
    });
  });
});

describe('ledgerCsv', () => {
  it('lists every loss term with its watts and the totals of the evaluation', () => {
    const e = evaluate(demoDesign('diode-boost'));
    const rows = readCsv(ledgerCsv(e));
    const body = rows.slice(1, 1 + e.losses.length);
    expect(body.map((r) => [r[0], r[2], Number(r[3])])).toEqual(e.losses.map((t) => [t.part, t.mechanism, t.watts])); // exact round trip (ECMA-262)
    const byName = new Map(rows.map((r) => [r[0], Number(r[3])]));
    expect(byName.get('total')).toBe(e.totalLoss);
    expect(byName.get('input power')).toBe(e.inputPower);
    expect(byName.get('output power')).toBe(e.outputPower);
    for (const r of rows) expect(r.length).toBe(rows[0]!.length); // RFC 4180 §2.4
  });
});
