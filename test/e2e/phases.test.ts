/**
 * Issue 13 §1 on screen: the interleaving fields of the editor (phases, current-sharing mismatch, phase
 * shedding) with messages naming the on-screen label, the value and the allowed range; a valid phase count
 * changes the whole-converter results; the results' Phases section shows the per-phase ledger and
 * temperatures of the engine's record and the phase-shedding chart, whose labels never overlap (the
 * pattern of chart-labels.test.ts). Screenshot: .artifacts/screenshots/phases-shedding-*.png.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { evaluateDesign } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { demoDesign, demoText } from '../helpers/demo.ts';
import { field, fieldNote, openThroughChooser, pasteInto, readSummary } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const PATH_WORDS = /\b(spec|parts|topology|thermal|margins)\.[A-Za-z]/;

async function labelOf(page: Page, path: string): Promise<string> {
  const id = await field(page, path).getAttribute('id');
  return ((await page.locator(`label[for="${id}"]`).first().innerText()) ?? '').replace(/\s*\(optional\)$/, '').trim();
}

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

describe('interleaving fields in the editor', () => {
  it('name a phase count, mismatch or hysteresis out of range by its label, value and range', () =>
    suite.run(async ({ page }) => {
      const cases = [
        { path: 'topology.phases', text: '9', label: 'Interleaved phases', shows: '9' },
        { path: 'topology.phaseMismatch', text: '0.7', label: 'Current-sharing mismatch', shows: '0.7' },
      ];
      for (const c of cases) {
        await pasteInto(page, c.path, c.text);
        const note = await fieldNote(page, c.path);
        expect(await labelOf(page, c.path)).toBe(c.label);
        expect(note.startsWith(c.label), `note of ${c.path}: ${note}`).toBe(true);
        expect(note).toContain(c.shows);
        expect(note).toMatch(/must be (at least|above) .+ and (at most|below) /);
        expect(note).not.toMatch(PATH_WORDS);
        await expect(field(page, c.path).getAttribute('aria-invalid')).resolves.toBe('true');
      }
      // A fraction of a phase is refused by the field itself, naming the field.
      await pasteInto(page, 'topology.phases', '2.5');
      expect(await fieldNote(page, 'topology.phases')).toMatch(/whole number|integer/i);

      // Phase shedding: the box adds the hysteresis field with its default; out of range is named.
      await page.getByLabel('Shed phases at light load').check();
      const hysteresis = 'topology.phaseShedding.hysteresisFraction';
      await field(page, hysteresis).waitFor();
      expect(Number(await field(page, hysteresis).inputValue())).toBeGreaterThan(0);
      await pasteInto(page, hysteresis, '0.9');
      const note = await fieldNote(page, hysteresis);
      expect(note.startsWith('Shedding hysteresis'), note).toBe(true);
      expect(note).toContain('0.9');
      expect(note).toMatch(/and (at most|below) /);
      expect(note).not.toMatch(PATH_WORDS);
    }));

  it('evaluate the whole converter when the phase count changes', () =>
    suite.run(async ({ page }) => {
      await settled(page);
      const one = await readSummary(page);
      await pasteInto(page, 'topology.phases', '2');
      await page.waitForFunction(
        (before) => {
          const dd = document.querySelector('[data-testid="evaluation-summary"] [data-key="totalLoss"] dd') as HTMLElement | null;
          return dd !== null && Number(dd.dataset.value) !== before;
        },
        one.get('totalLoss'),
        { timeout: 60_000 },
      );
      await settled(page);
      const two = await readSummary(page);
      // Two stages at half the load each: conduction loss (∝ I²) halves per stage, so the whole converter
      // loses differently; the output power (Vout · I) stays the same (common practice: P = V · I).
      expect(two.get('totalLoss')).not.toBeCloseTo(one.get('totalLoss')!, 6);
      await expect(field(page, 'topology.phases').getAttribute('aria-invalid')).resolves.toBe('false');
    }));
});

interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}
const overlap = (a: Box, b: Box) =>
  Math.min(a.left + a.width, b.left + b.width) - Math.max(a.left, b.left) > 0.5 && Math.min(a.top + a.height, b.top + b.height) - Math.max(a.top, b.top) > 0.5;
const frames = (page: Page) => page.evaluate(() => new Promise<void>((r) => requestAnimationFrame(() => requestAnimationFrame(() => r()))));

async function sheddingLabels(page: Page): Promise<{ labels: (Box & { text: string })[]; points: Box[] }> {
  const canvas = page.getByTestId('shedding-chart').locator('canvas');
  await canvas.waitFor({ timeout: 60_000 });
  await canvas.scrollIntoViewIfNeeded();
  await frames(page);
  await frames(page);
  await page.waitForFunction(() => document.querySelector('[data-testid="shedding-chart"] canvas')?.getAttribute('data-label-boxes') !== null, null, { timeout: 60_000 });
  return JSON.parse((await canvas.getAttribute('data-label-boxes')) ?? '{}');
}

describe('the Phases section of the results', () => {
  for (const size of [
    { width: 1024, height: 700 },
    { width: 1440, height: 900 },
  ])
    it(`shows the engine's per-phase ledger and temperatures, and a shedding chart whose labels never overlap (${size.width}×${size.height})`, () =>
      suite.run(
        async (app) => {
          const { page } = app;
          await settled(page);
          await openThroughChooser(page, 'multiphase-buck.json', demoText('multiphase-buck'));
          await settled(page);
          await page.locator('#results-phases').scrollIntoViewIfNeeded();
          const phased = evaluateDesign(demoDesign('multiphase-buck')).phased!; // the engine in Node, an independent run
          const heads = page.getByTestId('phase-losses').locator('thead th');
          // The section fills in once it is on screen (results render lazily): wait for the headings.
          await expect
            .poll(async () => (await heads.allInnerTexts()).map((h) => h.split('\n')[0]), { timeout: 30_000 })
            .toEqual(['Part', 'Phase 1 (worst, +5 %)', 'Phase 2', 'Phase 3', 'Phase 4', 'Shared', 'Total']);
          const total = Number(await page.getByTestId('phase-losses').locator('tfoot td').last().getAttribute('data-value'));
          closeTo(total, phased.totalLoss, 1e-9, 0); // engine evaluatePhases in Node
          const hot = page.getByTestId('phase-temperatures').locator('tr[data-part="switch"]');
          expect(await hot.count()).toBe(4); // a thermal row per switch per phase
          const t1 = Number(await hot.nth(0).locator('td').nth(1).getAttribute('data-value'));
          const t2 = Number(await hot.nth(1).locator('td').nth(1).getAttribute('data-value'));
          expect(t1).toBeGreaterThan(t2); // the worst phase (more current) runs hotter
          for (const scale of ['linear', 'log']) {
            await page.locator('#curve-scale').selectOption(scale);
            await settled(page);
            const drawn = await sheddingLabels(page);
            expect(drawn.labels.map((l) => l.text)).toEqual(expect.arrayContaining(['4 → 3', '3 → 2', '2 → 1']));
            const clashes: string[] = [];
            drawn.labels.forEach((a, i) => {
              drawn.labels.slice(i + 1).forEach((b) => overlap(a, b) && clashes.push(`"${a.text}" overlaps "${b.text}"`));
              drawn.points.forEach((p) => overlap(a, p) && clashes.push(`"${a.text}" covers a marked point`));
            });
            expect(clashes, `${scale} axis`).toEqual([]); // issue 16 §4: no two labels overlap
          }
          expect(await page.getByTestId('shedding-landmarks').locator('li').count()).toBe(3);
          expect(await page.getByTestId('shedding-landmarks').innerText()).toMatch(/shed below .+ A, add back above .+ A \(10 % hysteresis, from the design\)/);
          await app.screenshot(`phases-shedding-${size.width}`, { fullPage: false });
          // Axis titles with units: the chart's data table names each column with its unit.
          const chart = page.getByTestId('shedding-chart');
          await chart.getByRole('button', { name: 'Table' }).click();
          const columns = await chart.locator('th[scope="col"]').allInnerTexts();
          expect(columns[0]).toMatch(/Load current.*\(A\)/);
          expect(columns.some((c) => /1 phase.*\(%\)/.test(c))).toBe(true);
        },
        { viewport: size },
      ));
});
