/**
 * Issue 5: keyboard-only use of the main flow: reach a field with Tab, edit it, see the results follow,
 * undo, open a part and edit it, go to the part library and edit a part there. Every stop of the Tab
 * order shows a visible focus indicator.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { closeTo } from '../helpers/close-to.ts';
import { readOperatingPoint, valueAtKey } from './helpers/app-page.ts';
import { expectedOperatingPoint } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';
import { demoDesign } from '../helpers/demo.ts';

const suite = e2eSuite();

interface FocusStop {
  match: boolean;
  description: string;
  outline: string;
}

/**
 * Presses Tab until the focused element matches the CSS `selector` (and holds `text`, when given);
 * every stop on the way must show a focus outline.
 */
async function tabTo(page: Page, selector: string, text = '', key = 'Tab', maxStops = 80): Promise<number> {
  for (let stops = 1; stops <= maxStops; stops++) {
    await page.keyboard.press(key);
    const stop: FocusStop = await page.evaluate(([sel, txt]) => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return { match: false, description: 'body', outline: 'none' };
      const style = getComputedStyle(el);
      const description = `${el.tagName.toLowerCase()} ${el.getAttribute('data-path') ?? el.textContent?.trim().slice(0, 40) ?? ''}`;
      return { match: el.matches(sel) && (el.textContent ?? '').includes(txt), description, outline: `${style.outlineStyle} ${style.outlineWidth}` };
    }, [selector, text] as const);
    if (stop.description !== 'body') expect(stop.outline, `focus indicator on ${stop.description}`).not.toMatch(/^none|\s0px$/); // WCAG 2.2 SC 2.4.7 Focus Visible
    if (stop.match) return stops;
  }
  throw new Error(`Tab never reached ${selector} in ${maxStops} stops`);
}

async function expectTable(page: Page, design = demoDesign()) {
  const expected = expectedOperatingPoint(design);
  for (const row of (await readOperatingPoint(page)).values()) closeTo(row.value, valueAtKey(expected, row.key), 1e-12, 1e-15, { row: row.key }); // engine in Node
}

describe('keyboard-only use', () => {
  it('edits the specification and a part, undoes, with Tab, typing and Enter only', () =>
    suite.run(async (app) => {
      const { page } = app;
      const stops = await tabTo(page, '[data-path="spec.switchingFrequencyHz"]');
      expect(stops).toBeLessThan(40); // the specification comes early in the Tab order
      await page.keyboard.press('Control+a');
      await page.keyboard.type('400k');
      await page.keyboard.press('Tab');
      const design = demoDesign();
      await expectTable(page, { ...design, spec: { ...design.spec, switchingFrequencyHz: 400e3 } });
      await page.keyboard.press('Control+z');
      await expectTable(page, design);

      await tabTo(page, 'summary', 'Inductor');
      await page.keyboard.press('Enter'); // opens the part
      await tabTo(page, '[data-path="parts.inductor.inductanceH"]');
      await page.keyboard.press('Control+a');
      await page.keyboard.type('6u8');
      await page.keyboard.press('Tab');
      await expectTable(page, { ...design, parts: { ...design.parts, inductor: { ...design.parts.inductor, inductanceH: 6.8e-6 } } });
      await app.screenshot('keyboard-part-open');
    }));

  it('reaches the part library and saves an edited part with the keyboard', () =>
    suite.run(async (app) => {
      const { page } = app;
      await tabTo(page, 'nav[aria-label="Screens"] button', 'Part library');
      await page.keyboard.press('Enter');
      await page.getByRole('heading', { name: 'Part library' }).waitFor();
      const second = page.locator('nav[aria-label="Parts in the library"] button').nth(1);
      const name = ((await second.locator('span').first().textContent()) ?? '').trim();
      await tabTo(page, `nav[aria-label="Parts in the library"] li:nth-child(2) button`);
      await page.keyboard.press('Enter');
      await expect(page.locator('#part-editor-title').textContent()).resolves.toContain(name);
      await tabTo(page, '[data-path="rdsOn25Ohm"]');
      await page.keyboard.press('Control+a');
      await page.keyboard.type('7 mΩ');
      await tabTo(page, 'button', 'Save changes', 'Shift+Tab');
      await page.keyboard.press('Enter');
      await page.getByText(`Saved ${name} in the part library.`).waitFor();
      const stored = await page.evaluate(() => localStorage.getItem('wattledger.library.v1'));
      const part = (JSON.parse(stored!) as { parts: { name: string; rdsOn25Ohm?: number }[] }).parts.find((p) => p.name === name);
      closeTo(part!.rdsOn25Ohm!, 7e-3, 1e-12, 0); // "7 mΩ" is 7e-3 Ω (SI prefix m = 1e-3, BIPM SI Brochure Table 7)
    }));
});
