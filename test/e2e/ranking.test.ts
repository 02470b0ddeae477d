/**
 * Issue 11 §3 on screen: the "Rank parts" view ranks the library for a role on a pool of Web Workers in
 * headless Chromium — one per core the browser reports — and the table equals the one-thread ranking the
 * engine computes in Node on the same demo design and library (part order, and every score as the exact
 * double); a part is adopted with one action and undone with one; a long ranking shows its progress and
 * Cancel stops it; a role no part of the library fits is refused with a message naming the field by its
 * label. The suite checks that the page logged no error and met no CSP violation.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { rankLibrary } from '../../shared-model/index.ts';
import { demoDesign, demoParts } from '../helpers/demo.ts';
import { field } from './helpers/app-page.ts';
import { axeSeriousViolations } from './helpers/browser.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const LIBRARY_KEY = 'wattledger.library.v1'; // src-renderer/state/library.svelte.ts

async function openRanking(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Rank parts', exact: true }).click();
  await page.getByRole('heading', { name: 'Rank parts' }).waitFor();
}

const rows = (page: Page) => page.locator('[data-testid="rank-table"] tbody tr');

/** Seeds the app's own library before the app starts (the library screen reads it from localStorage). */
const seedLibrary = (parts: unknown[]) => `localStorage.setItem(${JSON.stringify(LIBRARY_KEY)}, ${JSON.stringify(JSON.stringify(parts))});`;

describe('rank parts', () => {
  it('ranks the control switch on every core exactly as one thread does, adopts a part and undoes it', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openRanking(page);
      await page.getByTestId('rank-by').selectOption('loss-at-rated');
      await page.getByTestId('rank-start').click();
      await page.locator('[data-testid="rank-table"]').waitFor({ timeout: 90_000 });
      const engine = rankLibrary(demoDesign(), { role: 'switch', library: demoParts(), by: 'loss-at-rated' }); // one thread, in Node
      const shown = await rows(page).evaluateAll((trs) => trs.map((tr) => ({ id: tr.getAttribute('data-part-id'), admissible: tr.getAttribute('data-admissible'), score: tr.querySelector('td[data-value]')?.getAttribute('data-value') })));
      const expected = [
        ...engine.ranking.map((p) => ({ id: p.partId, admissible: 'true', score: String(p.score) })),
        ...engine.inadmissible.map((p) => ({ id: p.partId, admissible: 'false', score: p.figures ? String(p.figures.lossAtRatedW) : '' })),
      ];
      expect(shown).toEqual(expected); // same order, same doubles (String() round-trips a double exactly)
      expect(engine.ranking.length).toBeGreaterThan(1);
      const cores = await page.evaluate(() => navigator.hardwareConcurrency);
      await expect(page.getByTestId('rank-status').textContent()).resolves.toContain(`${cores} worker${cores === 1 ? '' : 's'}`); // the pool used every core
      await expect(page.locator('[data-testid="cautions"]').first().textContent()).resolves.toMatch(/defer to\s+local codes, the applicable standards and licensed practice/); // team rules: cautions

      expect(await axeSeriousViolations(page)).toEqual([]); // axe-core (WCAG 2.1 AA), as every screen (issue 5)
      await app.screenshot('ranking');

      // Adopt the best part that is not already the design's switch.
      const original = demoDesign().parts.switch.id;
      const pick = engine.ranking.find((p) => p.partId !== original)!;
      await page.locator(`tr[data-part-id="${pick.partId}"]`).getByRole('button', { name: `Adopt ${pick.partName}` }).click();
      await expect(page.getByTestId('rank-adopted').textContent()).resolves.toContain(`${pick.partName} is now the control switch`);
      await page.locator(`tr[data-part-id="${pick.partId}"] .current`).waitFor();
      await page.getByTestId('rank-undo').click(); // the view's Undo: one step
      const adopt = page.locator(`tr[data-part-id="${pick.partId}"]`).getByRole('button', { name: `Adopt ${pick.partName}` });
      await adopt.waitFor();
      expect(await page.locator(`tr[data-part-id="${pick.partId}"] .current`).count()).toBe(0);
      // Adopt again: the design document holds the part; the app's own Undo (one step) restores the original.
      await adopt.click();
      await page.getByRole('button', { name: 'Design and results', exact: true }).click();
      await expect(field(page, 'parts.switch.id').inputValue()).resolves.toBe(pick.partId);
      await page.getByRole('button', { name: 'Undo', exact: true }).first().click();
      await expect(field(page, 'parts.switch.id').inputValue()).resolves.toBe(original);
    }));

  it('shows the progress of a long ranking and Cancel stops it', () => {
    const mosfet = demoParts().find((p) => p.kind === 'mosfet')!;
    const many = Array.from({ length: 1500 }, (_, i) => ({ ...mosfet, id: `many-${i}`, name: `Many ${i}`, rdsOn25Ohm: mosfet.rdsOn25Ohm * (1 + i / 1500) }));
    return suite.run(async (app) => {
      const { page } = app;
      await openRanking(page);
      await page.getByTestId('rank-start').click();
      await page.getByTestId('rank-progress').waitFor();
      await expect(page.getByTestId('rank-status').textContent()).resolves.toMatch(/Judged \d+ of 1500 parts/);
      await page.getByTestId('rank-cancel').click();
      await expect(page.getByTestId('rank-status').textContent()).resolves.toContain('Ranking cancelled');
      expect(await page.getByTestId('rank-progress').count()).toBe(0);
      expect(await page.getByTestId('rank-table').count()).toBe(0); // no partial ranking is shown
      await page.getByTestId('rank-start').waitFor(); // ready to rank again
    }, { initScript: seedLibrary(many) });
  });

  it('a role no part of the library fits gets a message naming the field, its value and what is allowed', () => {
    const inductors = demoParts().filter((p) => p.kind === 'inductor');
    return suite.run(async (app) => {
      const { page } = app;
      await openRanking(page);
      await page.getByTestId('rank-role').selectOption('switch');
      await page.getByTestId('rank-start').click();
      const text = ((await page.getByTestId('rank-problems').textContent()) ?? '').replace(/\s+/g, ' ');
      expect(text).toContain('Library (library): No part in the library fits the control switch role');
      expect(text).toContain(`Value: ${inductors.length} parts; allowed: at least one mosfet.`);
      expect(text).not.toMatch(/NaN|undefined|null/);
      expect(await page.getByTestId('rank-table').count()).toBe(0);
    }, { initScript: seedLibrary(inductors) });
  });
});
