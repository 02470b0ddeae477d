/**
 * Issue 13 §2 in the editor: a datasheet curve (the switch's Coss(VDS)) chosen as the form of the output
 * capacitance, pasted from spreadsheet columns, shown with its preview, and used by the results; a paste
 * that cannot be read names the row and the column and leaves the design alone; a curve that breaks the
 * physics (Coss rising with VDS) gets the validator's sentence in place.
 */
import { demoDesign } from '../helpers/demo.ts';
import { describe, expect, it } from 'vitest';
import type { Design } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { field, readSummary } from './helpers/app-page.ts';
import { expectedEvaluation } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';
import type { Page } from 'playwright-core';

const suite = e2eSuite();

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

/** Opens the switch's part card and chooses the Coss(VDS) curve form. */
async function chooseCurve(page: Page): Promise<void> {
  const select = field(page, 'parts.switch.outputCapacitance.kind');
  if (!(await select.isVisible())) await page.locator('details.part', { has: page.locator('[data-path="parts.switch.name"]') }).locator('summary').click();
  await select.selectOption('table');
}

const PASTED = 'VDS (V)\tCoss (F)\n0\t1.5n\n4\t700p\n12\t380p\n24\t260p\n30\t240p';
const withCurve = (points: { vdsV: number; cossF: number }[]): Design => {
  const d = demoDesign();
  if (d.parts.switch.kind !== 'mosfet') throw new Error('demo switch is not a MOSFET');
  return { ...d, parts: { ...d.parts, switch: { ...d.parts.switch, outputCapacitance: { kind: 'table', points } } } };
};

describe('a Coss(VDS) curve in the editor', () => {
  it('takes two pasted spreadsheet columns, previews them and evaluates with them', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      await chooseCurve(page);
      const curve = page.locator('.curve[data-path="parts.switch.outputCapacitance.points"]');
      await expect(curve.locator('tbody tr').count()).resolves.toBe(4); // the starting curve of the form
      await curve.getByText('Paste two columns').click();
      await curve.locator('textarea').fill(PASTED);
      await curve.getByRole('button', { name: 'Replace the points with these' }).click();
      await expect(curve.locator('tbody tr').count()).resolves.toBe(5);
      await curve.getByText('Read 5 points (the header row was skipped).').waitFor();
      await expect(field(page, 'parts.switch.outputCapacitance.points[2].cossF').inputValue()).resolves.toBe('380 pF');
      await expect(curve.locator('polyline').getAttribute('points')).resolves.toMatch(/^0\.0,0\.0 /); // highest Coss at 0 V: top left of the preview
      await settled(page);
      const expected = expectedEvaluation(
        withCurve([
          { vdsV: 0, cossF: 1.5e-9 },
          { vdsV: 4, cossF: 700e-12 },
          { vdsV: 12, cossF: 380e-12 },
          { vdsV: 24, cossF: 260e-12 },
          { vdsV: 30, cossF: 240e-12 },
        ]),
      );
      const summary = await readSummary(page);
      closeTo(summary.get('totalLoss') ?? NaN, expected.totalLoss, 1e-9); // engine evaluate in Node on the same design
      await curve.screenshot({ path: '.artifacts/screenshots/coss-curve-editor.png' });
    }));

  it('names the row and column of a cell it cannot read, and keeps the curve', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      await chooseCurve(page);
      const curve = page.locator('.curve[data-path="parts.switch.outputCapacitance.points"]');
      await curve.getByText('Paste two columns').click();
      await curve.locator('textarea').fill('0\t1.2n\n5\tabc\n15\t330p');
      await curve.getByRole('button', { name: 'Replace the points with these' }).click();
      await curve.getByText(/Row 2, Coss: "abc"/).waitFor();
      await expect(curve.locator('tbody tr').count()).resolves.toBe(4); // unchanged
    }));

  it('shows the sentence of a curve whose Coss rises with VDS', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      await chooseCurve(page);
      const cell = field(page, 'parts.switch.outputCapacitance.points[2].cossF');
      await cell.fill('2n');
      await cell.press('Tab');
      const curve = page.locator('.curve[data-path="parts.switch.outputCapacitance.points"]');
      const note = curve.locator('.note.invalid').first();
      await note.waitFor();
      // The table rule's sentence names the table by its on-screen label, the point, the value and the bound (Coss falls with VDS: common practice).
      expect(await note.textContent()).toContain('Control switch — Coss(VDS) points, point 3');
      expect(await note.textContent()).toContain('Coss: 2 nF; must be at most 600 pF');
    }));
});
