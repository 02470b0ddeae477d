/**
 * Issue 16 §3 (half-typed values): typing "45" into Ambient previews 4 then 45 in the results while
 * the undo history stays unchanged; Enter keeps 500 as one step that one undo takes back whole; an
 * invalid half-typed value ("-300" on the way to "-30") never blanks the charts. In both themes.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { Theme } from './helpers/browser.ts';
import { field, readSummary } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

const undoButton = (page: Page) => page.getByRole('button', { name: 'Undo', exact: true });

for (const theme of ['light', 'dark'] as Theme[]) {
  describe(`a half-typed value (${theme})`, () => {
    it('is previewed in the results but enters the history only on Enter, as one step', () =>
      suite.run(
        async ({ page }) => {
          await settled(page);
          const ambient = field(page, 'spec.ambientC');
          const before = await ambient.inputValue();
          expect(await undoButton(page).isDisabled()).toBe(true); // a fresh document has nothing to undo
          await ambient.click();
          await ambient.press('Control+A');
          await ambient.pressSequentially('45');
          expect(await page.getByTestId('results').getAttribute('data-previewing')).toBe('true'); // issue 16 §3: the preview is marked as one
          await expect.poll(() => page.getByTestId('preview-note').isVisible()).toBe(true); // issue 16 §3: and says so in words
          expect(await undoButton(page).isDisabled()).toBe(true); // issue 16 §3: history unchanged by a half-typed value
          await ambient.press('Enter');
          await expect.poll(() => undoButton(page).isDisabled()).toBe(false); // Enter is intent: the value enters the history
          expect(await page.getByTestId('results').getAttribute('data-previewing')).toBe('false');
          expect(await ambient.inputValue()).toBe('45 °C'); // Enter also writes the value back with its unit
          expect(await undoButton(page).getAttribute('title')).toContain('Ambient temperature'); // one step, named by the field's label
          await undoButton(page).click();
          await expect.poll(() => ambient.inputValue()).toBe(before); // issue 16 §3: one undo takes the whole entry back, not to "4"
          expect(await undoButton(page).isDisabled()).toBe(true); // and it was the only step
        },
        { theme },
      ));

    it('never blanks the charts while a value on its way is invalid', () =>
      suite.run(
        async ({ page }) => {
          await settled(page);
          const efficiency = (await readSummary(page)).get('efficiency');
          const ambient = field(page, 'spec.ambientC');
          await ambient.click();
          await ambient.press('Control+A');
          await ambient.pressSequentially('-300');
          await expect.poll(() => page.getByTestId('stale-note').isVisible()).toBe(true); // the draft is invalid (−300 °C is out of range)
          const canvas = page.getByTestId('efficiency-chart').locator('canvas');
          expect(await canvas.isVisible()).toBe(true); // issue 16 §3: the chart stays
          await expect.poll(async () => (await readSummary(page)).get('efficiency')).toBe(efficiency); // the figures are the last valid design's, not blank
          await ambient.press('Backspace');
          await ambient.press('Enter');
          await settled(page);
          expect(await ambient.inputValue()).toBe('-30 °C'); // the value meant is kept
        },
        { theme },
      ));
  });
}
