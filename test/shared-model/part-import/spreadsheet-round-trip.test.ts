/**
 * Issue 17, done-when: a CSV of 50 generated MOSFETs with messy headers and units (five rows bad) is
 * mapped by guessing, the five problems are named by row and column, the 45 good parts are imported,
 * exported and re-imported to an identical library. All parts are invented.
 */
import { describe, expect, it } from 'vitest';
import { applyImport, checkMapping, guessMapping, partsToCsv, previewImport, readCsv, type Part } from '../../../shared-model/index.ts';

const HEADERS = ['Part No.', 'Description', 'VDSS (V)', 'ID max [A]', 'Rds(on) (mOhm)', 'RDS tempco (%/K)', 'Qg (nC)', 'Qgs', 'Qgd, nC', 'Vgs(th) V', 'Vplateau (V)', 'Rg (Ohm)', 'Coss (pF)', 'Coss at (V)', 'Vsd (mV)', 'Qrr (nC)', 'Tjmax (C)', 'RthJC (K/W)'];

/** Row i of the sheet: some cells carry their own units or engineering notation, as people type them. */
function row(i: number): string[] {
  const rds = (4 + i * 0.25).toFixed(2);
  return [
    `INV-Q${100 + i}`, `Invented N-FET ${i}`, String(30 + 10 * (i % 5)), String(20 + i), i % 7 === 0 ? `${rds} mΩ` : rds,
    '0.45', String(5 + i * 0.5), i % 3 === 0 ? `${(1 + i * 0.1).toFixed(1)}n` : `${(1 + i * 0.1).toFixed(1)} nC`, String(1 + i * 0.05),
    '1.8', '2.8', '1.1', String(200 + i), '15', String(800 + i), String(10 + i), '150', '2.5',
  ];
}

const BAD: Record<number, [number, string]> = {
  // data index → [column, bad text]
  4: [4, '0.001'], // 1 µΩ: below the RDS(on) range (design/numbers.ts conductionOhm ≥ 10 µΩ)
  11: [6, '4.7 µF'], // a capacitance in a charge column
  23: [9, 'about 2'], // not a number
  36: [16, '400'], // Tj max above 300 °C
  47: [17, ''], // θJC left blank
};

function sheet(): string {
  const lines = [HEADERS];
  for (let i = 0; i < 50; i++) {
    const cells = row(i);
    const bad = BAD[i];
    if (bad) cells[bad[0]] = bad[1];
    lines.push(cells);
  }
  return lines.map((cells) => cells.map((c) => (/[",]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(',')).join('\n');
}

describe('importing a spreadsheet of parts', () => {
  const table = readCsv(sheet());
  const mapping = guessMapping(table.rows[0]?.cells ?? [], 'mosfet');
  // The law has one form here; the sheet gives its coefficient, so only the form's name is fixed.
  const preview = previewImport(table, { ...mapping, fixed: [{ field: 'rdsTemperatureLaw.law', text: 'linear' }] });

  it('guesses every messy header and its unit', () => {
    expect(mapping.columns.map((c) => [c.field, c.unit])).toEqual([
      ['id', ''], ['name', ''], ['vdsRatingV', 'V'], ['idRatingA', 'A'], ['rdsOn25Ohm', 'mOhm'], ['rdsTemperatureLaw.alphaPerK', '%/K'],
      ['qgC', 'nC'], ['qgsC', ''], ['qgdC', 'nC'], ['vthV', 'V'], ['plateauV', 'V'], ['rgInternalOhm', 'Ohm'], ['outputCapacitance.cossF', 'pF'],
      ['outputCapacitance.atV', 'V'], ['bodyDiodeVsdV', 'mV'], ['bodyDiodeQrrC', 'nC'], ['tjMaxC', 'C'], ['thetaJcKPerW', 'K/W'],
    ]);
    expect(checkMapping(mapping)).toEqual([]);
  });

  it('names the five bad rows by row, column, value and allowed range', () => {
    expect(preview.rows).toHaveLength(50);
    expect(preview.bad.map((r) => r.row)).toEqual([6, 13, 25, 38, 49]); // header is row 1, data index i is row i + 2
    expect(preview.bad.map((r) => r.problems.length)).toEqual([1, 1, 1, 1, 1]);
    const messages = preview.bad.map((r) => r.problems[0]?.message);
    expect(messages[0]).toBe('Row 6, column "Rds(on) (mOhm)" (RDS(on) at 25 °C): "0.001" mOhm reads as 1 µΩ; allowed: 10 µΩ ≤ RDS(on) at 25 °C ≤ 100 Ω.');
    expect(messages[1]).toMatch(/^Row 13, column "Qg \(nC\)" \(Total gate charge Qg\): "4\.7 µF" is in F \(capacitance\), but this field takes charge \(C\)\.; allowed: 10 pC ≤ Total gate charge Qg ≤ 10 µC\.$/);
    expect(messages[2]).toMatch(/^Row 25, column "Vgs\(th\) V" \(Threshold voltage\): .*about 2.*; allowed: 100 mV ≤ Threshold voltage ≤ 30 V\.$/);
    expect(messages[3]).toBe('Row 38, column "Tjmax (C)" (Tj max): "400" C reads as 400 °C; allowed: 40 °C ≤ Tj max ≤ 300 °C.');
    expect(messages[4]).toBe('Row 49, column "RthJC (K/W)" (θJC): the cell is empty; allowed: 0 K/W ≤ θJC ≤ 200 K/W (every MOSFET needs it).');
    expect(preview.bad.map((r) => r.problems[0]?.header)).toEqual(['Rds(on) (mOhm)', 'Qg (nC)', 'Vgs(th) V', 'Tjmax (C)', 'RthJC (K/W)']);
  });

  it('reads the 45 good rows in SI units, whatever notation the cell used', () => {
    expect(preview.good).toHaveLength(45);
    const first = preview.good[0] as Extract<Part, { kind: 'mosfet' }>;
    expect(first.id).toBe('INV-Q100');
    expect(first.rdsOn25Ohm).toBe(0.004); // "4.00 mΩ": 1 mΩ = 1e-3 Ω (SI Brochure, 9th ed., Table 7)
    expect(first.qgsC).toBe(1e-9); // "1.0n" in a column without unit: n = 1e-9 (SI Brochure Table 7)
    expect(first.rdsTemperatureLaw).toEqual({ law: 'linear', alphaPerK: 0.0045 }); // 0.45 %/K = 0.0045 /K (1 % = 0.01)
    expect(first.bodyDiodeVsdV).toBe(0.8); // 800 mV
    expect(first.outputCapacitance).toEqual({ kind: 'capacitance', cossF: 2e-10, atV: 15 }); // 200 pF
    for (const [n, part] of preview.good.entries()) {
      const i = [...Array(50).keys()].filter((k) => !(k in BAD))[n] as number;
      const m = part as Extract<Part, { kind: 'mosfet' }>;
      expect(m.rdsOn25Ohm).toBeCloseTo((4 + i * 0.25) * 1e-3, 15); // mΩ → Ω (SI Brochure Table 7)
      expect(m.qgC).toBeCloseTo((5 + i * 0.5) * 1e-9, 20); // nC → C (SI Brochure Table 7)
    }
  });

  it('imports the good rows, exports them and reads back an identical library', () => {
    const applied = applyImport([], preview.good);
    expect(applied.added).toHaveLength(45);
    expect(applied.renamed).toEqual([]);
    const csv = partsToCsv(applied.parts);
    const again = readCsv(csv);
    const back = previewImport(again, guessMapping(again.rows[0]?.cells ?? []));
    expect(back.bad).toEqual([]);
    expect(back.good).toEqual(applied.parts);
    expect(partsToCsv(back.good)).toBe(csv);
  });
});
