/**
 * Issue 5: an accessibility scan (axe-core) of every screen with no serious or critical violation, in
 * the light and the dark theme; a screenshot of every screen in both themes (.artifacts/screenshots);
 * and no CSP violation during the whole walk (checked by the suite after each test).
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openThroughChooser, pasteInto } from './helpers/app-page.ts';
import { axeSeriousViolations, type AppSession, type Theme } from './helpers/browser.ts';

import { e2eSuite } from './helpers/suite.ts';
import { demoText } from '../helpers/demo.ts';

const suite = e2eSuite();

async function scan(app: AppSession, screen: string): Promise<void> {
  const violations = await axeSeriousViolations(app.page);
  expect(violations, `axe on ${screen} (${app.theme})`).toEqual([]); // axe-core 4.14 rules (WCAG 2.1 AA); issue 5: no serious violations
  await app.screenshot(screen);
  await app.screenshot(`${screen}-top`, { fullPage: false });
}

async function themeInUse(page: Page): Promise<string | undefined> {
  return page.evaluate(() => document.documentElement.dataset.theme);
}

for (const theme of ['light', 'dark'] as Theme[]) {
  describe(`every screen in the ${theme} theme`, () => {
    it('passes axe and is photographed', () =>
      suite.run(
        async (app) => {
          const { page } = app;
          expect(await themeInUse(page)).toBe(theme); // follows prefers-color-scheme
          await scan(app, 'design');

          await page.locator('summary', { hasText: 'Control switch' }).click();
          await scan(app, 'design-part-open');

          await pasteInto(page, 'spec.voutV', '20');
          await scan(app, 'design-invalid-field');

          await openThroughChooser(page, 'cut-short.json', demoText().slice(0, 300));
          await page.getByRole('alert').filter({ hasText: 'cut-short.json' }).waitFor();
          await scan(app, 'message-open-refused');

          await page.getByRole('button', { name: 'New' }).click(); // unsaved changes: asks first
          await page.getByRole('dialog').waitFor();
          await scan(app, 'question-discard');
          await page.keyboard.press('Escape');

          await page.getByRole('button', { name: 'Part library', exact: true }).click();
          await page.getByRole('heading', { name: 'Part library' }).waitFor();
          await scan(app, 'library');

          await page.locator('[data-path="rdsOn25Ohm"]').fill('-3m');
          await scan(app, 'library-invalid-value');
        },
        { theme },
      ));

    it('shows the recovery offer accessibly', () =>
      suite.run(
        async (app) => {
          const { page } = app;
          page.on('dialog', (dialog) => void dialog.accept());
          await pasteInto(page, 'spec.ratedLoadA', '2');
          await page.reload();
          await page.getByTestId('recovery-offer').waitFor();
          await scan(app, 'recovery-offer');
        },
        { theme },
      ));
  });
}

describe('theme toggle', () => {
  it('switches between light and dark and remembers the choice', () =>
    suite.run(async (app) => {
      const { page } = app;
      expect(await themeInUse(page)).toBe('light');
      await expect(page.getByTestId('theme-toggle').innerText()).resolves.toMatch(/off$/); // issue 16 §5: the label shows the state
      await page.getByRole('button', { name: 'Dark theme' }).click();
      expect(await themeInUse(page)).toBe('dark');
      await expect(page.getByTestId('theme-toggle').innerText()).resolves.toMatch(/on$/);
      await expect(page.getByRole('button', { name: 'Dark theme' }).getAttribute('aria-pressed')).resolves.toBe('true');
      await page.reload();
      await page.locator('main').waitFor();
      expect(await themeInUse(page)).toBe('dark'); // the choice outlives a reload
      const background = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
      expect(background).not.toBe('rgb(244, 245, 247)'); // not the light background of app.css
    }));
});
