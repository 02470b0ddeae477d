/**
 * Issue 16 "done when": the browser walk at 1024×700 and 1440×900 in both themes. On each: a result (the
 * headline figures and the efficiency chart) shows without scrolling; no two landmark labels of the
 * efficiency chart overlap (the boxes the chart drew); an invalid value is named by its on-screen label,
 * never by its document path; a half-typed value leaves the undo history unchanged; and axe-core finds
 * no violation of any impact on the design screen (valid and with an error shown), the part library,
 * the report, the "New" chooser and the browser-mode note. Screenshots: .artifacts/screenshots/walk-*.png.
 */
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { axeViolations, type AppSession, type Theme } from './helpers/browser.ts';
import { field, fieldNote } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const SIZES = [
  { width: 1024, height: 700 },
  { width: 1440, height: 900 },
] as const;

interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

const overlap = (a: Box, b: Box) =>
  Math.min(a.left + a.width, b.left + b.width) - Math.max(a.left, b.left) > 0.5 && Math.min(a.top + a.height, b.top + b.height) - Math.max(a.top, b.top) > 0.5;

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

async function inViewport(locator: Locator): Promise<boolean> {
  return locator.evaluate((element) => {
    const box = element.getBoundingClientRect();
    return box.top >= 0 && box.left >= 0 && box.bottom <= innerHeight && box.right <= innerWidth && box.height > 0;
  });
}

async function noViolations(app: AppSession, screen: string, tag: string): Promise<void> {
  const violations = await axeViolations(app.page);
  if (violations.length > 0) console.log(JSON.stringify(violations));
  expect(violations, `axe on ${screen} at ${tag}`).toEqual([]); // issue 16: axe-core 0 violations of any impact
  await app.screenshot(`walk-${screen}-${tag}`, { fullPage: false });
}

const undoButton = (page: Page) => page.getByRole('button', { name: 'Undo', exact: true });

for (const size of SIZES) {
  for (const theme of ['light', 'dark'] as Theme[]) {
    const tag = `${size.width}x${size.height}`;
    describe(`the walk at ${size.width}×${size.height} (${theme})`, () => {
      it('shows a result at once, keeps labels apart, names errors by label, keeps half-typed values out of the history, and passes axe', () =>
        suite.run(
          async (app) => {
            const { page } = app;
            await settled(page);
            expect(await page.evaluate(() => scrollY)).toBe(0);
            expect(await inViewport(page.getByTestId('evaluation-summary')), 'headline figures').toBe(true); // issue 16 §1
            const canvas = page.getByTestId('efficiency-chart').locator('canvas');
            expect(await inViewport(canvas), 'efficiency chart').toBe(true); // issue 16 §1
            await page.waitForFunction(() => document.querySelector('[data-testid="efficiency-chart"] canvas')?.getAttribute('data-label-boxes') !== null);
            const drawn = JSON.parse((await canvas.getAttribute('data-label-boxes')) ?? '{}') as { labels: (Box & { text: string })[] };
            expect(drawn.labels.length).toBeGreaterThan(1); // knee, peak, mode boundary, rated…
            const collisions = drawn.labels.flatMap((a, i) => drawn.labels.slice(i + 1).filter((b) => overlap(a, b)).map((b) => `${a.text} / ${b.text}`));
            expect(collisions).toEqual([]); // issue 16 §4: no two landmark labels overlap
            await noViolations(app, 'design', tag);

            // A half-typed value: previewed, not in the history.
            const ambient = field(page, 'spec.ambientC');
            await ambient.click();
            await ambient.press('Control+A');
            await ambient.pressSequentially('45');
            await expect.poll(() => page.getByTestId('preview-note').isVisible()).toBe(true);
            expect(await undoButton(page).isDisabled()).toBe(true); // issue 16 §3: history unchanged by a half-typed value
            await ambient.press('Enter');
            await expect.poll(() => undoButton(page).isDisabled()).toBe(false);

            // An error, by the label on screen.
            const vout = field(page, 'spec.voutV');
            await vout.fill('-3');
            await vout.press('Tab');
            const note = await fieldNote(page, 'spec.voutV');
            expect(note).toContain('Output voltage'); // issue 16 §2: the on-screen label
            expect(note).not.toContain('spec.'); // never the document path
            const summary = (await page.getByRole('status', { name: 'Invalid fields' }).textContent()) ?? '';
            expect(summary).toContain('Output voltage');
            expect(summary).not.toMatch(/\b(spec|parts|thermal|margins)\.[a-z]/);
            await noViolations(app, 'design-error', tag);
            await vout.fill('3.3');
            await vout.press('Tab');

            await page.getByRole('button', { name: 'Part library', exact: true }).click();
            await page.getByRole('heading', { name: 'Part library', level: 1 }).waitFor();
            await noViolations(app, 'library', tag);

            await page.getByRole('button', { name: 'Report', exact: true }).click();
            await page.getByRole('button', { name: 'Print to PDF…' }).and(page.locator(':enabled')).waitFor({ timeout: 90_000 });
            await noViolations(app, 'report', tag);

            await page.getByRole('button', { name: 'Design and results', exact: true }).click();
            await page.getByRole('button', { name: 'New', exact: true }).click();
            const discard = page.getByRole('button', { name: 'Discard changes' });
            await discard.click();
            await page.getByTestId('new-design').getByRole('heading', { name: 'New design' }).waitFor();
            await noViolations(app, 'new', tag);
            await page.keyboard.press('Escape');

            await page.getByText('Browser mode: what differs').click();
            await page.getByText('Recently opened or downloaded here').waitFor();
            await noViolations(app, 'browser-mode', tag);
          },
          { theme, viewport: size },
        ));
    });
  }
}
