/**
 * Issue 17 §1 in the browser: a part library file opens beside the app's own library, a design takes a
 * part from it and says where the part came from; a changed entry is reported field by field with both
 * values and updated in one action; the library is saved (a download in a browser) and closed, and the
 * design still evaluates from its own copy ("Library missing"). Every part is invented.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { parsePartsLibraryText, type Part } from '../../shared-model/index.ts';
import { field } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';
import { demoParts } from '../helpers/demo.ts';

const suite = e2eSuite();

const choke = { ...demoParts().find((p) => p.kind === 'inductor')!, id: 'inv-choke-7', name: 'Invented bench choke 7', dcr20Ohm: 0.011, invented: true } as Part;
const LIBRARY = JSON.stringify({ format: 'wattledger.parts', version: 2, id: 'bench-approved', name: 'Bench approved', notes: 'Invented parts for a test.', parts: [choke] });

const inductorCard = (page: Page) => page.locator('details.part', { has: page.locator('summary', { hasText: 'Inductor' }) });

/** Opens the inductor's card in the design editor (the editor is built anew when its screen returns). */
async function openInductor(page: Page): Promise<void> {
  if (!(await inductorCard(page).evaluate((d) => (d as HTMLDetailsElement).open))) await inductorCard(page).locator('summary').click();
}

async function toLibrary(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Part library', exact: true }).click();
  await page.getByRole('heading', { name: 'Part library' }).waitFor();
}

async function toDesign(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Design and results' }).click();
}

describe('part library files', () => {
  it('opens a library file, links a design part to it, reports and updates a changed entry, saves and closes it', () =>
    suite.run(async (app) => {
      const { page } = app;
      await toLibrary(page);
      const chooser = page.waitForEvent('filechooser');
      await page.getByRole('button', { name: 'Open library…' }).click();
      await (await chooser).setFiles({ name: 'bench.json', mimeType: 'application/json', buffer: Buffer.from(LIBRARY) });
      await page.getByRole('status').filter({ hasText: 'Opened “Bench approved” (1 part) from bench.json.' }).waitFor();
      await expect(page.getByLabel('Library', { exact: true }).locator('option').allTextContents()).resolves.toEqual(['My WattLedger parts', 'Bench approved']);
      await expect(page.getByTestId('library-place').textContent()).resolves.toBe('file bench.json');
      await expect(page.locator('nav[aria-label="Parts in the library"] li button').allTextContents()).resolves.toEqual(['Invented bench choke 7 invented']);

      // The design editor lists the parts by library and links the one taken.
      await toDesign(page);
      await openInductor(page);
      await expect(page.locator('#pick-inductor optgroup').evaluateAll((groups) => groups.map((g) => (g as HTMLOptGroupElement).label))).resolves.toEqual(['My WattLedger parts', 'Bench approved']);
      await page.locator('#pick-inductor').selectOption('bench-approved/inv-choke-7');
      await page.getByRole('button', { name: 'Use the chosen part as inductor' }).click();
      await expect(inductorCard(page).locator('summary .linked').textContent()).resolves.toBe('Same as library');
      await expect(inductorCard(page).getByRole('group', { name: 'Library link' }).textContent()).resolves.toContain('from “Bench approved”, entry inv-choke-7.');

      // The library entry changes: the design reports the field with both values and keeps its copy.
      await toLibrary(page);
      await page.locator('[data-path="dcr20Ohm"]').fill('14m');
      await page.getByRole('button', { name: 'Save changes' }).click();
      await expect(page.getByLabel('Library', { exact: true }).locator('option:checked').textContent()).resolves.toBe('Bench approved (unsaved changes)');
      await toDesign(page);
      await openInductor(page);
      await expect(inductorCard(page).locator('summary .linked').textContent()).resolves.toBe('Differs from library');
      const rows = await inductorCard(page).locator('table tbody tr').evaluateAll((trs) => trs.map((tr) => Array.from(tr.children, (c) => c.textContent)));
      expect(rows).toEqual([['DCR at 20 °C', '11 mΩ', '14 mΩ']]); // m = 1e-3 (SI Brochure, 9th ed., Table 7)
      await expect(field(page, 'parts.inductor.dcr20Ohm').inputValue()).resolves.toBe('11 mΩ');

      await inductorCard(page).getByRole('button', { name: 'Update from library' }).click();
      await expect(inductorCard(page).locator('summary .linked').textContent()).resolves.toBe('Same as library');
      await expect(field(page, 'parts.inductor.dcr20Ohm').inputValue()).resolves.toBe('14 mΩ');

      // Save (a download in a browser) writes a library the engine reads back with the new value.
      await toLibrary(page);
      const download = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Save library', exact: true }).click();
      const saved = parsePartsLibraryText(readFileSync((await (await download).path())!, 'utf8'));
      expect(saved.ok && saved.library.id).toBe('bench-approved');
      expect(saved.ok && (saved.library.parts[0] as Extract<Part, { kind: 'inductor' }>).dcr20Ohm).toBe(0.014); // "14m" = 0.014 Ω (SI Brochure Table 7)

      // Closed: the design still evaluates from its copy and says the library is missing.
      await page.getByRole('button', { name: 'Close library' }).click();
      await expect(page.getByLabel('Library', { exact: true }).locator('option').allTextContents()).resolves.toEqual(['My WattLedger parts']);
      await toDesign(page);
      await expect(inductorCard(page).locator('summary .linked').textContent()).resolves.toBe('Library missing');
      await expect(page.getByRole('alert').count()).resolves.toBe(0);
      await app.screenshot('library-link-missing', { fullPage: false });
    }));
});
