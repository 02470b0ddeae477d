/**
 * Issue 5: the part library screen: add, edit, duplicate, delete, import and export as JSON, the
 * invented demo parts marked as such, kept across reloads, and parts picked from it into the design.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { validatePartsLibrary } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { field, readOperatingPoint, valueAtKey } from './helpers/app-page.ts';
import { expectedOperatingPoint } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';
import { demoDesign } from '../helpers/demo.ts';

const suite = e2eSuite();
const list = (page: Page) => page.locator('nav[aria-label="Parts in the library"] li button');

async function openLibrary(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Part library', exact: true }).click();
  await page.getByRole('heading', { name: 'Part library' }).waitFor();
}

async function exportLibrary(page: Page) {
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export JSON' }).click();
  return JSON.parse(readFileSync((await (await download).path())!, 'utf8')) as unknown;
}

describe('part library', () => {
  it('marks every shipped demo part as invented and exports a library the engine accepts', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openLibrary(page);
      const count = await list(page).count();
      expect(count).toBeGreaterThan(0);
      expect(await page.locator('nav[aria-label="Parts in the library"] li button .badge').count()).toBe(count); // rule 2: invented parts are marked
      const exported = await exportLibrary(page);
      const check = validatePartsLibrary(exported);
      expect(check.ok).toBe(true); // shared-model parts-library validator
      if (check.ok) {
        expect(check.library.parts).toHaveLength(count);
        expect(check.library.parts.every((p) => p.invented === true)).toBe(true); // rule 2
      }
      await app.screenshot('library-start', { fullPage: false });
    }));

  it('adds, edits, duplicates and deletes parts, and keeps them across a reload', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openLibrary(page);
      const start = await list(page).count();
      await page.getByLabel('New part of kind').selectOption('diode');
      await page.getByRole('button', { name: 'Add', exact: true }).click();
      await expect(page.locator('#part-editor-title').textContent()).resolves.toContain('New diode');
      await page.locator('[data-path="name"]').fill('Bench diode 40 V');
      await page.locator('[data-path="vf0V"]').fill('310m');
      await page.getByRole('button', { name: 'Save changes' }).click();
      await page.getByRole('button', { name: 'Duplicate' }).click();
      await expect(page.locator('#part-editor-title').textContent()).resolves.toContain('Bench diode 40 V (copy)');
      expect(await list(page).count()).toBe(start + 2);

      await page.getByRole('button', { name: 'Delete' }).click();
      await page.getByRole('dialog').getByRole('button', { name: 'Delete' }).click();
      expect(await list(page).count()).toBe(start + 1);

      await page.reload();
      await openLibrary(page);
      expect(await list(page).count()).toBe(start + 1); // kept in localStorage
      const exported = await exportLibrary(page);
      const check = validatePartsLibrary(exported);
      const bench = check.ok ? check.library.parts.find((p) => p.name === 'Bench diode 40 V') : undefined;
      expect(bench?.kind).toBe('diode');
      if (bench?.kind === 'diode') closeTo(bench.vf0V, 0.31, 1e-12, 0); // "310m" = 0.31 V (SI prefix m = 1e-3, BIPM SI Brochure Table 7)
    }));

  it('refuses to save an invalid value and names it with the engine sentence', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openLibrary(page);
      await page.locator('[data-path="rdsOn25Ohm"]').fill('-3m');
      await expect(page.getByRole('button', { name: 'Save changes' }).isDisabled()).resolves.toBe(true);
      const note = await page.locator(`[id="${await page.locator('[data-path="rdsOn25Ohm"]').getAttribute('aria-describedby')}"]`).textContent();
      expect(note).toContain('RDS(on) at 25 °C: −3 mΩ'); // the field by its on-screen label, and the value (issue 16 §2)
      expect(note).toMatch(/must be (above|at least) .+ and at most /); // ... and the allowed range in words
      expect(note).not.toContain('rdsOn25Ohm');
    }));

  it('imports the good parts of a file and reports the bad ones', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openLibrary(page);
      const start = await list(page).count();
      const exported = (await exportLibrary(page)) as { parts: Record<string, unknown>[] };
      const good = { ...exported.parts[0], id: 'imported-good', name: 'Imported good part' };
      const bad = { ...exported.parts[0], id: 'imported-bad', name: 'Imported bad part', vdsRatingV: -30 };
      const chooser = page.waitForEvent('filechooser');
      await page.getByRole('button', { name: 'Import JSON…' }).click();
      await (await chooser).setFiles({ name: 'mixed.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ ...exported, parts: [good, bad] })) });
      const message = page.getByRole('status').filter({ hasText: 'Imported 1 part from mixed.json' });
      await message.waitFor();
      expect(await message.textContent()).toContain('part 2: vdsRatingV is -30'); // rule 6: the bad entry, its field and value
      expect(await list(page).count()).toBe(start + 1);
    }));

  it('puts a library part into the design as one undoable step', () =>
    suite.run(async (app) => {
      const { page } = app;
      const design = demoDesign();
      await page.locator('summary', { hasText: 'Inductor' }).click();
      const picker = page.locator('#pick-inductor');
      const options = await picker.locator('option:not([disabled])').evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value));
      const choice = options.find((value) => value.split('/')[1] !== design.parts.inductor.id)!; // value: library id / part id
      const other = choice.split('/')[1]!;
      await picker.selectOption(choice);
      await page.getByRole('button', { name: 'Use the chosen part as inductor' }).click();
      await expect(field(page, 'parts.inductor.id').inputValue()).resolves.toBe(other);
      const exported = validatePartsLibrary(await (async () => { await openLibrary(page); return exportLibrary(page); })());
      const part = exported.ok ? exported.library.parts.find((p) => p.id === other) : undefined;
      expect(part?.kind).toBe('inductor');
      await page.getByRole('button', { name: 'Design and results' }).click();
      if (part?.kind === 'inductor') {
        const expected = expectedOperatingPoint({ ...design, parts: { ...design.parts, inductor: part } });
        for (const row of (await readOperatingPoint(page)).values()) closeTo(row.value, valueAtKey(expected, row.key), 1e-12, 1e-15, { row: row.key }); // engine in Node
      }
      await page.getByRole('button', { name: 'Undo' }).click();
      await expect(field(page, 'parts.inductor.id').inputValue()).resolves.toBe(design.parts.inductor.id);
    }));
});
