/**
 * Issue 5, compare: (2) put two MOSFETs side by side and read the crossover — the page's crossover load
 * and the parts on each side checked against the engine's compareParts run here in Node (not typed in);
 * one click adopts the winner through the document (undo takes it back); screenshots in both themes.
 * The suite checks after each test that the page logged no error and met no CSP violation.
 */
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { compareParts, parseEngineering, validatePartsLibrary } from '../../shared-model/index.ts';
import type { Part } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { field } from './helpers/app-page.ts';
import { SCREENSHOT_DIR } from './helpers/browser.ts';

import { e2eSuite } from './helpers/suite.ts';
import { repoRoot } from './helpers/build.ts';
import { demoDesign } from '../helpers/demo.ts';

const suite = e2eSuite();
// Two invented MOSFETs of the demo library for the control switch: the low-RDS(on) 30 V part and the
// 60 V part with smaller charges trade places as the load grows (a crossover inside the swept range).
const PAIR = ['nfet-30v-4m5', 'nfet-60v-15m'];

function libraryParts(ids: string[]): Part[] {
  const check = validatePartsLibrary(JSON.parse(readFileSync(join(repoRoot, 'assets', 'parts', 'library.json'), 'utf8')));
  if (!check.ok) throw new Error('demo library invalid');
  return ids.map((id) => {
    const part = check.library.parts.find((p) => p.id === id);
    if (!part) throw new Error(`demo library has no ${id}`);
    return part;
  });
}

/** Ticks exactly `ids` (in that order) for the control switch and waits for the comparison. */
async function compare(page: Page, ids: string[]): Promise<void> {
  const section = page.locator('#results-compare');
  await section.scrollIntoViewIfNeeded();
  await page.locator('#compare-role').selectOption('switch');
  for (const box of await section.locator('input[data-part-id]').all()) if (await box.isChecked()) await box.uncheck();
  for (const id of ids) await section.locator(`input[data-part-id="${id}"]`).check();
  await page.getByTestId('compare-ledger').waitFor({ timeout: 120_000 });
  await page.waitForFunction(() => document.querySelector('#results-compare')?.getAttribute('data-busy') === 'false', null, { timeout: 120_000 });
}

describe('compare: two MOSFETs side by side', () => {
  it('reads the crossover load the engine finds, with the winner on each side', () =>
    suite.run(async ({ page }) => {
      await compare(page, PAIR);
      const design = demoDesign();
      const outcome = compareParts(design, {
        role: 'switch',
        parts: libraryParts(PAIR),
        loadA: design.spec.ratedLoadA,
        sweep: { spacing: 'log', conditions: { vinV: design.spec.vinNomV } },
      });
      if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join(' '));
      const expected = outcome.comparison.crossovers;
      expect(expected.length).toBeGreaterThan(0); // the pair was chosen for a crossover inside the sweep (engine in Node)
      const shown = await page.locator('[data-testid="crossovers"] li[data-load]').evaluateAll((items) =>
        items.map((li) => ({ load: Number(li.getAttribute('data-load')), from: li.getAttribute('data-from'), to: li.getAttribute('data-to'), text: li.textContent ?? '' })),
      );
      expect(shown).toHaveLength(expected.length); // engine compareParts in Node
      shown.forEach((c, i) => {
        closeTo(c.load, expected[i].load, 1e-6, 0, { c, expected: expected[i] }); // engine compareParts in Node (refined on the engine)
        expect([c.from, c.to]).toEqual([expected[i].fromPartId, expected[i].toPartId]); // engine: which part wins below and above
        const text = parseEngineering(/At ([^:]+):/.exec(c.text)?.[1] ?? '', 'A');
        expect(text.ok).toBe(true);
        if (text.ok) closeTo(text.value, expected[i].load, 5e-4, 0, { text: c.text }); // 4 significant digits shown
      });
      // Side-by-side totals equal the engine's ledgers at the rated load.
      const totals = await page.locator('[data-testid="compare-ledger"] tfoot tr').first().locator('td[data-value]').evaluateAll((tds) => tds.map((td) => Number((td as HTMLElement).dataset.value)));
      totals.forEach((w, k) => closeTo(w, outcome.comparison.alternatives[k].evaluation.totalLoss, 1e-9, 0, { k })); // engine compareParts in Node
    }));

  it('adopts the winner with one click, as an edit that undo takes back', () =>
    suite.run(async ({ page }) => {
      const before = await field(page, 'parts.switch.rdsOn25Ohm').inputValue().catch(() => null);
      await compare(page, PAIR);
      const design = demoDesign();
      const outcome = compareParts(design, { role: 'switch', parts: libraryParts(PAIR), sweep: { spacing: 'log' } });
      if (!outcome.ok) throw new Error('compare refused');
      const alts = outcome.comparison.alternatives;
      const winner = alts.reduce((best, a) => (a.evaluation.totalLoss < best.evaluation.totalLoss ? a : best)); // lowest engine total at rated load
      await expect(page.getByTestId('compare-verdict').textContent()).resolves.toContain(winner.partName);
      await page.getByTestId('compare-verdict').getByRole('button', { name: /Use it as control switch/ }).click();
      await page.waitForFunction(() => document.querySelector('[data-testid="compare-verdict"] button')?.textContent?.includes('Already in the design') ?? false, null, { timeout: 60_000 });
      expect(await field(page, 'parts.switch.rdsOn25Ohm').inputValue()).not.toBe(before); // the design's switch is now the winner
      await page.getByRole('button', { name: /^Undo/ }).click();
      await page.waitForFunction(() => !document.querySelector('[data-testid="compare-verdict"] button')?.textContent?.includes('Already'), null, { timeout: 60_000 });
      if (before !== null) await expect(field(page, 'parts.switch.rdsOn25Ohm').inputValue()).resolves.toBe(before); // issue 5: undo for every edit
    }));

  for (const theme of ['light', 'dark'] as const) {
    it(`is photographed with a comparison on screen (${theme})`, () =>
      suite.run(
        async ({ page }) => {
          await compare(page, PAIR);
          mkdirSync(SCREENSHOT_DIR, { recursive: true });
          await page.locator('#results-compare').screenshot({ path: join(SCREENSHOT_DIR, `compare-${theme}.png`), animations: 'disabled' });
          await page.getByRole('button', { name: 'Widen' }).click();
          await page.locator('#results-compare').scrollIntoViewIfNeeded();
          await page.screenshot({ path: join(SCREENSHOT_DIR, `compare-wide-${theme}.png`), animations: 'disabled' });
        },
        { theme, viewport: { width: 1400, height: 1400 } },
      ));
  }
});
