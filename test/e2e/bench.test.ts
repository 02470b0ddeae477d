/**
 * Issue 12 in the app: the bench calibration screen reads a pasted measurement (every bad cell named by
 * line and column), overlays it on the model with per-point residuals, fits the chosen parameters and
 * adopts the fitted values as one undoable edit; the report then carries the calibration section.
 * The measurement is synthetic — the demo buck with its switching charge ×1.3, evaluated by the engine in
 * Node, plus seeded noise — so the truth the fit must bracket is known.
 */
import { demoDesign } from '../helpers/demo.ts';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { calibrate } from '../../shared-model/index.ts';
import { benchPoints, syntheticMeasurement } from '../shared-model/fit/synthetic.ts';

import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const design = demoDesign();
const measured = syntheticMeasurement(design, { truth: { switchCharge: 1.3 }, points: benchPoints(design, 12), seed: 5, lossNoiseW: 0.005 });
const csv = ['vinV,loadA,inputPowerW', ...measured.points.map((p) => `${p.vinV},${p.loadA},${p.inputPowerW}`)].join('\n');

async function openBench(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Bench calibration', exact: true }).click();
  await page.getByRole('heading', { name: 'Bench calibration', level: 1 }).waitFor();
}

describe('bench calibration screen', () => {
  it('names the line, column and value of every bad cell and reads nothing', () =>
    suite.run(async ({ page }) => {
      await openBench(page);
      await page.getByLabel('Measured points (CSV, or cells pasted from a spreadsheet)').fill('vinV,loadA,efficiency\n12,1,1.2\n12,two,0.9\n');
      await page.getByRole('button', { name: 'Read measurement' }).click();
      const alert = page.getByRole('alert');
      await expect(alert.textContent()).resolves.toContain('Line 2, column efficiency: 1.2 is outside 0 < efficiency < 1');
      await expect(alert.textContent()).resolves.toContain('Line 3, column loadA: "two" is not a number');
      expect(await page.getByTestId('bench-overlay').count()).toBe(0); // nothing half-imports (issue 12 §1)
    }));

  it('overlays, fits, adopts as one undoable edit, and the report shows the calibration', () =>
    suite.run(async (app) => {
      const { page } = app;
      await openBench(page);
      await page.getByLabel('Measured points (CSV, or cells pasted from a spreadsheet)').fill(csv);
      await page.getByRole('button', { name: 'Read measurement' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Read 12 measured points' }).count()).resolves.toBe(1);
      await page.getByTestId('bench-overlay').waitFor();
      expect(await page.locator('[data-testid="bench-residuals"] tbody tr').count()).toBe(12); // one residual row per measured point
      // Fit the switching charge only.
      for (const label of ['RDS(on) of the switch', 'RDS(on) of the rectifier', 'Core loss', 'Controller quiescent current'])
        await page.getByLabel(label, { exact: true }).uncheck();
      await page.getByRole('button', { name: 'Fit to the measurement' }).click();
      const fit = page.getByTestId('bench-fit');
      await fit.waitFor();
      const row = fit.locator('tbody tr').first();
      const cells = await row.locator('td').allTextContents();
      const [lo, hi] = cells[2].split('…').map((s) => Number.parseFloat(s));
      expect(lo).toBeLessThanOrEqual(1.3); // the truth set by the synthetic measurement lies inside the shown interval
      expect(hi).toBeGreaterThanOrEqual(1.3);
      const engine = calibrate(design, measured, { parameters: ['switchCharge'] });
      if (!engine.ok) throw new Error('engine refused the fit');
      expect(Number.parseFloat(cells[1])).toBeCloseTo(engine.calibration.parameters[0].fitted, 2); // the page shows the engine's fit (independent run in Node)
      await expect(fit.textContent()).resolves.toContain('only as good as the measurements');
      await app.screenshot('bench-fitted', { fullPage: true });
      await page.getByRole('button', { name: 'Adopt the fitted values into the design' }).click();
      // The report carries the calibration section with the adopted value.
      await page.getByRole('button', { name: 'Report', exact: true }).click();
      const section = page.locator('[data-section="calibration"]');
      await section.waitFor({ timeout: 60_000 });
      await expect(section.textContent()).resolves.toContain('fitted to exactly this measurement');
      // Undo takes the whole adoption back in one step: the report loses its calibration section.
      await page.getByRole('button', { name: 'Design and results', exact: true }).click();
      await page.keyboard.press('Control+z');
      await page.getByRole('button', { name: 'Report', exact: true }).click();
      await page.locator('[data-section="summary"], [data-report-ready]').first().waitFor({ timeout: 60_000 });
      await expect.poll(() => section.count(), { timeout: 60_000 }).toBe(0);
    }, { allowErrors: /Failed to load resource/ }));
});
