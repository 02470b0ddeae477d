/**
 * Issue 17: the import screen. Cells pasted from a spreadsheet (tab-separated, messy headers, units in
 * headers and cells, one bad row) are mapped by guess, the preview names the bad row's row, column, value
 * and allowed range, the good rows go into the part library, and the library's CSV export reads back to
 * the same values. Every part is invented.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { guessMapping, previewImport, readCsv, type Part } from '../../shared-model/index.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();

const HEADERS = ['Part No.', 'Description', 'VDSS (V)', 'ID max [A]', 'Rds(on) (mOhm)', 'RDS tempco (%/K)', 'Qg (nC)', 'Qgs', 'Qgd, nC', 'Vgs(th) V', 'Vplateau (V)', 'Rg (Ohm)', 'Coss (pF)', 'Coss at (V)', 'Vsd (mV)', 'Qrr (nC)', 'Tjmax (C)', 'RthJC (K/W)'];
const row = (i: number, rds: string): string[] => [`INV-E${i}`, `Invented screen FET ${i}`, '40', '25', rds, '0.45', '9', '2.1n', '2', '1.8', '2.9', '1.2', '250', '20', '780', '12', '150', '2.5'];
const ROWS = [row(1, '8'), row(2, '6.5 mΩ'), row(3, '0.001'), row(4, '5m'), row(5, '4.2'), row(6, '3.9')];
const PASTE = [HEADERS, ...ROWS].map((cells) => cells.join('\t')).join('\n');

const libraryList = (page: Page) => page.locator('nav[aria-label="Parts in the library"] li button');

describe('import screen', () => {
  it('maps pasted cells, names the bad row, imports the good rows and exports them as CSV', () =>
    suite.run(async (app) => {
      const { page } = app;
      await page.getByRole('button', { name: 'Part library', exact: true }).click();
      const before = await libraryList(page).count();
      await page.getByRole('button', { name: 'Import from a spreadsheet…' }).click();
      await page.getByRole('heading', { name: 'Import parts from a spreadsheet' }).waitFor();
      await page.getByLabel(/Or paste cells/).fill(PASTE);
      await page.getByRole('button', { name: 'Read the pasted cells' }).click();

      // The guessed mapping, to confirm: the field and the unit taken from the header.
      await expect(page.getByLabel('Part field for column Rds(on) (mOhm)').inputValue()).resolves.toBe('rdsOn25Ohm');
      await expect(page.getByLabel('Unit of column Rds(on) (mOhm)').inputValue()).resolves.toBe('mOhm');
      await expect(page.getByLabel('Part field for column Tjmax (C)').inputValue()).resolves.toBe('tjMaxC');

      const status = page.getByRole('status').filter({ hasText: 'rows ready to import' });
      await expect(status.textContent()).resolves.toBe('5 of 6 rows ready to import; 1 row has problems and will be left out until fixed.');
      const problems = await page.getByRole('list', { name: 'Rows with problems' }).locator('li').allTextContents();
      expect(problems).toEqual(['Row 4, column "Rds(on) (mOhm)" (RDS(on) at 25 °C): "0.001" mOhm reads as 1 µΩ; allowed: 10 µΩ ≤ RDS(on) at 25 °C ≤ 100 Ω.']); // design/numbers.ts conductionOhm: 10 µΩ … 100 Ω

      await page.getByRole('button', { name: 'Import 5 good parts' }).click();
      await page.getByRole('status').filter({ hasText: 'Imported 5 parts from the pasted cells into the part library.' }).waitFor();

      await page.getByRole('button', { name: 'Part library', exact: true }).click();
      expect(await libraryList(page).count()).toBe(before + 5);
      const download = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Export CSV' }).click();
      const csv = readFileSync((await (await download).path())!, 'utf8');
      const table = readCsv(csv);
      expect(table.rows[0]?.cells).toContain('RDS(on) at 25 °C [mΩ]'); // units in the headers
      const back = previewImport(table, guessMapping(table.rows[0]?.cells ?? []));
      expect(back.bad).toEqual([]);
      const rds = (id: string) => (back.good.find((p) => p.id === id) as Extract<Part, { kind: 'mosfet' }> | undefined)?.rdsOn25Ohm;
      expect([rds('INV-E1'), rds('INV-E2'), rds('INV-E4'), rds('INV-E5'), rds('INV-E6')]).toEqual([0.008, 0.0065, 0.005, 0.0042, 0.0039]); // mΩ → Ω: m = 1e-3 (SI Brochure, 9th ed., Table 7)
      expect(rds('INV-E3')).toBeUndefined(); // the bad row was not imported
      const e1 = back.good.find((p) => p.id === 'INV-E1') as Extract<Part, { kind: 'mosfet' }>;
      expect(e1.qgsC).toBe(2.1e-9); // "2.1n": n = 1e-9 (SI Brochure Table 7)
      expect(e1.bodyDiodeVsdV).toBe(0.78); // 780 mV
    }));

  it('asks for what the mapping lacks and takes a value for every row', () =>
    suite.run(async (app) => {
      const { page } = app;
      await page.getByRole('button', { name: 'Import parts', exact: true }).click();
      const withoutTheta = [HEADERS.slice(0, -1), ...ROWS.map((r) => r.slice(0, -1))].map((cells) => cells.join('\t')).join('\n');
      await page.getByLabel(/Or paste cells/).fill(withoutTheta);
      await page.getByRole('button', { name: 'Read the pasted cells' }).click();
      const alert = page.getByRole('alert').filter({ hasText: 'The mapping is not complete yet' });
      await expect(alert.textContent()).resolves.toContain('No column gives θJC, which every MOSFET needs');
      await page.getByLabel('Value for every row: θJC').fill('3 K/W');
      await page.getByLabel('Value for every row: θJC').press('Tab');
      const status = page.getByRole('status').filter({ hasText: 'rows ready to import' });
      await expect(status.textContent()).resolves.toBe('5 of 6 rows ready to import; 1 row has problems and will be left out until fixed.');
    }));
});
