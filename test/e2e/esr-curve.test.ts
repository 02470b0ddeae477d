/**
 * Issue 13 §2 in the editor and the report: the output capacitor's ESR(f) table pasted from spreadsheet
 * columns, previewed beside the fields and used by the results (each harmonic meets its own ESR); a table
 * that does not reach the switching frequency gets the extrapolation caution beside it; a point that
 * breaks the table's rules gets the validator's sentence naming the on-screen label and the value; the
 * report lists what each curve gave at the operating point.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { curveReadings, formatEngineering } from '../../shared-model/index.ts';
import type { Design, EsrFrequencyPoint } from '../../shared-model/index.ts';
import { demoDesign } from '../helpers/demo.ts';
import { closeTo } from '../helpers/close-to.ts';
import { field, readSummary } from './helpers/app-page.ts';
import { expectedEvaluation } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const PATH = 'parts.outputCapacitor.part.esrFrequencyCurve.points';

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

/** Opens the output capacitor's card and ticks its ESR(f) table; returns the table's block. */
async function addEsrTable(page: Page) {
  const card = page.locator('details.part', { has: page.locator('[data-path="parts.outputCapacitor.part.name"]') });
  if (!(await card.getAttribute('open').then((v) => v !== null))) await card.locator('summary').click();
  await card.getByLabel('ESR against frequency from the datasheet').check();
  const curve = page.locator(`.curve[data-path="${PATH}"]`);
  await curve.waitFor();
  return curve;
}

async function paste(curve: ReturnType<Page['locator']>, text: string): Promise<void> {
  await curve.getByText('Paste two columns').click();
  await curve.locator('textarea').fill(text);
  await curve.getByRole('button', { name: 'Replace the points with these' }).click();
}

const withEsr = (points: EsrFrequencyPoint[]): Design => {
  const d = demoDesign();
  return { ...d, parts: { ...d.parts, outputCapacitor: { ...d.parts.outputCapacitor, part: { ...d.parts.outputCapacitor.part, esrFrequencyCurve: { points } } } } };
};

const PASTED = 'Frequency (Hz)\tESR (Ω)\n10k\t30m\n100k\t14m\n1M\t9m\n10M\t11m';
const POINTS: EsrFrequencyPoint[] = [
  { frequencyHz: 10e3, esrOhm: 0.03 },
  { frequencyHz: 100e3, esrOhm: 0.014 },
  { frequencyHz: 1e6, esrOhm: 0.009 },
  { frequencyHz: 10e6, esrOhm: 0.011 },
];

describe('an ESR(f) table in the editor and the report', () => {
  it('takes two pasted columns, plots them, evaluates with them and the report lists the curve values used', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      const curve = await addEsrTable(page);
      await expect(curve.locator('tbody tr').count()).resolves.toBe(5); // the starting curve of the group
      await paste(curve, PASTED);
      await curve.getByText('Read 4 points (the header row was skipped).').waitFor();
      await expect(curve.locator('tbody tr').count()).resolves.toBe(4);
      await expect(field(page, `${PATH}[1].esrOhm`).inputValue()).resolves.toBe('14 mΩ');
      const line = await curve.locator('polyline').getAttribute('points');
      expect(line?.split(' ').length).toBe(4); // one vertex per point beside the fields
      await settled(page);
      const design = withEsr(POINTS);
      const expected = expectedEvaluation(design);
      const summary = await readSummary(page);
      closeTo(summary.get('totalLoss') ?? NaN, expected.totalLoss, 1e-9); // engine evaluate in Node on the same design
      await curve.screenshot({ path: '.artifacts/screenshots/esr-curve-editor.png' });

      await page.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: 'Report', exact: true }).click();
      const table = page.locator('.wl-report table[data-table="curve-readings"]');
      await table.waitFor({ timeout: 120_000 });
      const text = (await table.textContent()) ?? '';
      const readings = curveReadings(design, expected);
      expect(readings.length).toBe(2); // ESR at fs and the spectrum-weighted ESR
      for (const r of readings) {
        expect(text).toContain(r.gives);
        expect(text).toContain(formatEngineering(r.value, r.unit, 4)); // the value the engine read at the operating point
      }
      console.log(`curve values at the operating point: ${readings.map((r) => `${r.gives} = ${formatEngineering(r.value, r.unit, 4)} at ${r.at.quantity} ${formatEngineering(r.at.value, r.at.unit, 4)}`).join('; ')}`);
    }));

  it('flags a table that ends below the switching frequency as extrapolation, beside the table', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      const curve = await addEsrTable(page);
      await paste(curve, '1k\t60m\n10k\t30m\n100k\t14m');
      const caution = curve.locator('.note.caution');
      await caution.first().waitFor({ timeout: 60_000 });
      const text = (await caution.first().textContent()) ?? '';
      expect(text).toContain("lies outside the output capacitor's ESR(f) table (1000 … 100000 Hz)");
      expect(text).toContain('extrapolation');
    }));

  it('names the on-screen label and the value of a point that breaks the table', () =>
    suite.run(async (app) => {
      const { page } = app;
      await settled(page);
      const curve = await addEsrTable(page);
      await paste(curve, '10k\t30m\n1k\t20m\n1M\t9m');
      const note = curve.locator('.note.invalid').first();
      await note.waitFor();
      const text = (await note.textContent()) ?? '';
      expect(text).toContain('ESR(f) at 25 °C'); // the table's on-screen label
      expect(text).toContain('Point 2'); // the point, as numbered on screen
      expect(text).toMatch(/1 kHz|1000 Hz/); // its value
      expect(text).toContain('higher frequency'); // what is allowed
    }));
});
