/** Export to CSV: units in the headers, formula injection neutralised, and a round trip to the same parts. */
import { describe, expect, it } from 'vitest';
import { applyImport, DEMO_PARTS_LIBRARY, guessMapping, partsToCsv, previewImport, readCsv, validatePartsLibrary, type Part } from '../../../shared-model/index.ts';

const checked = validatePartsLibrary(DEMO_PARTS_LIBRARY);
if (!checked.ok) throw new Error('the invented library is invalid');
const demo = checked.library.parts;
const reimport = (csv: string) => {
  const table = readCsv(csv);
  return previewImport(table, guessMapping(table.rows[0]?.cells ?? []));
};

describe('partsToCsv', () => {
  it('writes every kind of the invented library and reads back the same parts, bit for bit', () => {
    const back = reimport(partsToCsv(demo));
    expect(back.bad).toEqual([]);
    expect(back.good).toEqual(demo);
  });

  it('puts the unit of each number column in its header, with the prefix of the column median', () => {
    const headers = readCsv(partsToCsv(demo)).rows[0]?.cells ?? [];
    expect(headers.slice(0, 4)).toEqual(['Kind', 'Identifier', 'Name', 'Invented example']);
    expect(headers).toContain('RDS(on) at 25 °C [mΩ]');
    expect(headers).toContain('Total gate charge Qg [nC]');
    expect(headers).toContain('Inductance [µH]');
    expect(headers).toContain('Core area Ae [mm²]');
    expect(headers).toContain('Tj max [°C]');
    expect(headers.at(-1)).toBe('Notes');
  });

  it('neutralises text a spreadsheet would run as a formula, and still reads it back as written', () => {
    const part = { ...(demo.find((p) => p.kind === 'resistor') as Part), id: 'shunt-x', name: '=HYPERLINK("http://example.invalid")', notes: '+1 spare, @home, -ish' };
    const csv = partsToCsv([part]);
    expect(csv).toContain('"\'=HYPERLINK(""http://example.invalid"")"'); // OWASP CSV Injection: prefix a quote (docs/methods.md §19)
    expect(csv).toContain('"\'+1 spare, @home, -ish"');
    expect(reimport(csv).good).toEqual([part]);
  });

  it('reads back values of 17 significant digits exactly through a prefixed column', () => {
    const base = demo.find((p) => p.kind === 'mosfet') as Extract<Part, { kind: 'mosfet' }>;
    const odd = [0.1 + 0.2 - 0.29, 1 / 3 / 100, Math.PI / 1000, 0.007000000000000001].map((v, i) => ({ ...base, id: `odd-${i}`, rdsOn25Ohm: v }));
    const csv = partsToCsv([base, ...odd]);
    expect(readCsv(csv).rows[0]?.cells).toContain('RDS(on) at 25 °C [mΩ]');
    expect(reimport(csv).good).toEqual([base, ...odd]); // ECMA-262 Number::toString is the shortest round-trip decimal; a decimal shift keeps it
  });

  it('carries a list no cell can spell (a digitised Coss curve) as JSON text, and reads it back', () => {
    const base = demo.find((p) => p.kind === 'mosfet') as Extract<Part, { kind: 'mosfet' }>;
    const points = [{ vdsV: 1, cossF: 900e-12 }, { vdsV: 10, cossF: 300e-12 }, { vdsV: 30, cossF: 150e-12 }];
    const curved = { ...base, id: 'curved', outputCapacitance: { kind: 'table', points } } as unknown as Part;
    const csv = partsToCsv([curved]);
    expect(readCsv(csv).rows[1]?.cells).toContain(JSON.stringify(points));
    expect(reimport(csv).good).toEqual([curved]);
  });

  it('writes an empty column set for nothing but the identity columns', () => {
    expect(partsToCsv([])).toBe('Kind,Identifier,Name\r\n');
  });
});

describe('applyImport', () => {
  it('keeps ids unique and lists every renamed part', () => {
    const [a, b] = demo as [Part, Part];
    const applied = applyImport([a], [a, { ...b, id: a.id }]);
    expect(applied.parts.map((p) => p.id)).toEqual([a.id, `${a.id}-2`, `${a.id}-3`]);
    expect(applied.renamed).toEqual([{ from: a.id, to: `${a.id}-2`, name: a.name }, { from: a.id, to: `${a.id}-3`, name: b.name }]);
  });
});
