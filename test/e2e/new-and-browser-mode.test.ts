/**
 * Issue 16 §5: "New" offers a blank design of each topology (its empty fields say what they need, the
 * results wait for them) and the demos as templates; browser mode says in one place what it can and
 * cannot do and lists the names of the files opened or downloaded here; the recovery offer's date is
 * written year-month-day like the report's.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fieldNote, openThroughChooser, pasteInto } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';
import { demoText } from '../helpers/demo.ts';

const suite = e2eSuite();

async function chooseNew(page: Page, label: string): Promise<void> {
  await page.getByRole('button', { name: 'New', exact: true }).click();
  await page.getByTestId('new-design').getByRole('button', { name: label }).click();
}

describe('New', () => {
  it('starts a blank buck whose empty fields name themselves and whose results wait for them', () =>
    suite.run(async ({ page }) => {
      await chooseNew(page, 'Blank buck (step-down)');
      await expect.poll(() => field(page, 'spec.voutV').inputValue()).toBe('');
      expect(await field(page, 'topology.kind').inputValue()).toBe('buck');
      const note = await fieldNote(page, 'spec.voutV');
      expect(note).toContain('Output voltage'); // named by its label
      expect(note).toContain('empty'); // and says it is missing
      expect(note).not.toContain('spec.');
      await expect(page.getByTestId('blank-note').textContent()).resolves.toMatch(/fill in/);
      expect(await page.getByTestId('evaluation-summary').count()).toBe(0); // no numbers of another design under the blank one
      expect(await page.getByTestId('document-name').textContent()).toContain('New buck design');
    }));

  it('starts a blank boost and a copy of a demo', () =>
    suite.run(async ({ page }) => {
      await chooseNew(page, 'Blank boost (step-up)');
      await expect.poll(() => field(page, 'topology.kind').inputValue()).toBe('boost');
      expect(await field(page, 'spec.vinMinV').inputValue()).toBe('');
      await chooseNew(page, 'Portable work light 12 V bus (diode boost)'); // an untouched blank has nothing to discard
      await expect.poll(() => field(page, 'spec.voutV').inputValue()).toBe('12 V');
      await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
      expect(await page.getByTestId('evaluation-summary').isVisible()).toBe(true);
    }));

  it('leaves the design alone when the chooser is cancelled', () =>
    suite.run(async ({ page }) => {
      const before = await field(page, 'spec.voutV').inputValue();
      await page.getByRole('button', { name: 'New', exact: true }).click();
      await page.getByTestId('new-design').getByRole('heading', { name: 'New design' }).waitFor();
      await page.keyboard.press('Escape');
      expect(await page.getByTestId('new-design').isVisible()).toBe(false);
      expect(await field(page, 'spec.voutV').inputValue()).toBe(before);
    }));
});

describe('browser mode', () => {
  it('says what differs and lists the files opened and downloaded here', () =>
    suite.run(async ({ page }) => {
      await openThroughChooser(page, 'bench-rail.json', demoText());
      await page.getByText('Opened bench-rail.json').first().waitFor();
      const download = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Save as…' }).click();
      const name = (await download).suggestedFilename();
      await page.getByText('Browser mode: what differs').click();
      const panel = page.getByTestId('browser-mode');
      await expect(panel.textContent()).resolves.toContain('cannot write back'); // Save downloads a copy
      await expect(panel.textContent()).resolves.toContain('cannot reopen a file by its name');
      const items = await panel.locator('.recent li').allTextContents();
      expect(items[0]).toContain(name);
      expect(items[0]).toContain('downloaded');
      expect(items[1]).toContain('bench-rail.json');
      expect(items[1]).toMatch(/opened \d{4}-\d{2}-\d{2} \d{2}:\d{2}/); // ISO 8601 order, like the report's date
    }));

  it('dates the recovery offer year-month-day, like the report', () =>
    suite.run(async ({ page }) => {
      page.on('dialog', (dialog) => void dialog.accept());
      await pasteInto(page, 'spec.ratedLoadA', '2');
      await page.reload();
      const offer = page.getByTestId('recovery-offer');
      await offer.waitFor();
      expect(await offer.textContent()).toMatch(/snapshot is from \d{4}-\d{2}-\d{2} \d{2}:\d{2}/);
    }));
});
