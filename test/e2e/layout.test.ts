/**
 * Issue 16 §1 (small screens): at 1024×700 and 1440×900, in both themes, a result — the headline
 * figures and the efficiency chart — shows without scrolling; the skip link and the editor/results
 * links reach the other side in one action; "Widen" never covers the header or the screen tabs, at
 * any scroll position, and says how to come back. Screenshots: .artifacts/screenshots/layout-*.png.
 */
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import type { Theme } from './helpers/browser.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const SIZES = [
  { width: 1024, height: 700 },
  { width: 1440, height: 900 },
] as const;

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

/** The element's box relative to the viewport, and whether it lies wholly inside it. */
async function inViewport(locator: Locator): Promise<{ top: number; bottom: number; inside: boolean }> {
  return locator.evaluate((element) => {
    const box = element.getBoundingClientRect();
    return { top: box.top, bottom: box.bottom, inside: box.top >= 0 && box.left >= 0 && box.bottom <= innerHeight && box.right <= innerWidth && box.height > 0 };
  });
}

/** Is the focused element inside the element matched by `selector`? */
function focusInside(page: Page, selector: string): Promise<boolean> {
  return page.evaluate((s) => document.querySelector(s)?.contains(document.activeElement) ?? false, selector);
}

for (const size of SIZES) {
  for (const theme of ['light', 'dark'] as Theme[]) {
    describe(`the design screen at ${size.width}×${size.height} (${theme})`, () => {
      it('shows the headline figures and the efficiency chart without scrolling', () =>
        suite.run(
          async (app) => {
            const { page } = app;
            await settled(page);
            expect(await page.evaluate(() => scrollY)).toBe(0);
            const figures = await inViewport(page.getByTestId('evaluation-summary'));
            expect(figures.inside, `headline figures at ${JSON.stringify(figures)}`).toBe(true); // issue 16 §1
            const chart = await inViewport(page.getByTestId('efficiency-chart').locator('canvas'));
            expect(chart.inside, `efficiency chart at ${JSON.stringify(chart)}`).toBe(true); // issue 16 §1
            await app.screenshot(`layout-${size.width}x${size.height}`, { fullPage: false });
          },
          { theme, viewport: size },
        ));
    });
  }
}

describe('moving between the editor and the results', () => {
  it('offers a skip link as the first Tab stop that lands the keyboard in the results', () =>
    suite.run(
      async ({ page }) => {
        await settled(page);
        await page.keyboard.press('Tab');
        await expect(page.evaluate(() => document.activeElement?.textContent?.trim())).resolves.toBe('Skip to the results');
        await page.keyboard.press('Enter');
        await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('results-title');
        await page.keyboard.press('Tab');
        expect(await focusInside(page, '[data-testid="results"]')).toBe(true); // the next Tab stop is a result control
      },
      { viewport: SIZES[0] },
    ));

  it('reaches the results from the editor and back in one action each, from anywhere on the page', () =>
    suite.run(
      async ({ page }) => {
        await settled(page);
        await page.getByRole('link', { name: 'Touch and margins' }).click();
        await page.getByRole('navigation', { name: 'Design sections' }).getByRole('link', { name: /Results/ }).click();
        await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('results-title');
        expect((await inViewport(page.getByTestId('evaluation-summary'))).inside).toBe(true);
        await page.getByTestId('results').getByRole('link', { name: /Design/ }).first().click();
        await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('editor-title');
        const editorTop = await inViewport(page.locator('#editor-title'));
        expect(editorTop.inside, JSON.stringify(editorTop)).toBe(true);
      },
      { viewport: { width: 900, height: 700 } }, // one column: the results are far below the editor
    ));
});

describe('Widen', () => {
  it('keeps the header and the screen tabs uncovered when the page is scrolled, says how to return, and returns on Escape', () =>
    suite.run(
      async ({ page }) => {
        await settled(page);
        await page.evaluate(() => scrollTo(0, 1500));
        await page.getByRole('button', { name: 'Widen' }).click();
        const hint = page.getByText(/Escape/);
        await expect(hint.isVisible()).resolves.toBe(true);
        const overlap = await page.evaluate(() => {
          const results = document.querySelector('[data-testid="results"]')!.getBoundingClientRect();
          const tabs = document.querySelector('nav[aria-label="Screens"]')!.getBoundingClientRect();
          return results.top < tabs.bottom;
        });
        expect(overlap).toBe(false); // the wide column starts below the screen tabs
        await page.evaluate(() => scrollTo(0, 0));
        const tab = page.getByRole('button', { name: 'Part library', exact: true });
        const tabBox = (await tab.boundingBox())!;
        const hit = await page.evaluate(([x, y]) => document.elementFromPoint(x!, y!)?.textContent?.trim(), [tabBox.x + tabBox.width / 2, tabBox.y + tabBox.height / 2]);
        expect(hit).toBe('Part library'); // nothing lies over the tab
        expect(await page.locator('[data-path="spec.voutV"]').isVisible()).toBe(false);
        await page.keyboard.press('Escape');
        await page.locator('[data-path="spec.voutV"]').waitFor({ state: 'visible' });
        await expect(page.evaluate(() => document.activeElement?.textContent?.trim())).resolves.toBe('Widen');
      },
      { viewport: SIZES[0] },
    ));
});

describe('headings', () => {
  it('gives the design screen a level-one heading', () =>
    suite.run(async ({ page }) => {
      await expect(page.locator('h1').textContent()).resolves.toBe('Design and results');
    }));
});
