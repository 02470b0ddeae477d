/**
 * Issue 16 §4 (charts): on the load charts (efficiency, loss stack, temperatures) no two marker labels
 * overlap and none covers a marked point, for the three demo designs and a 60 A case, on a linear and
 * a logarithmic load axis, at 1024×700 and 1440×900 in both themes. The boxes are the ones the chart
 * drew (data-label-boxes on the canvas, CSS pixels). Screenshots: .artifacts/screenshots/chart-labels-*.png.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { Theme } from './helpers/browser.ts';
import { openThroughChooser } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const DEMOS = join(import.meta.dirname, '..', '..', 'assets', 'designs');
const demo = (name: string) => readFileSync(join(DEMOS, name), 'utf8');

/** The synchronous-buck demo at 60 A rated load: parts past their ratings, thermal ceiling and regulation limit inside the sweep. */
function sixtyAmp(): string {
  const design = JSON.parse(demo('synchronous-buck.json'));
  design.name = 'Sixty-ampere stress case';
  design.spec.ratedLoadA = 60;
  return JSON.stringify(design);
}

const DESIGNS: [string, () => string][] = [
  ['synchronous-buck.json', () => demo('synchronous-buck.json')],
  ['diode-boost.json', () => demo('diode-boost.json')],
  ['hot-fin-buck.json', () => demo('hot-fin-buck.json')],
  ['sixty-amp.json', sixtyAmp],
];
const CHARTS = ['efficiency-chart', 'loss-stack-chart', 'temperature-chart'];

interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}
interface Drawn {
  labels: (Box & { text: string })[];
  points: Box[];
}

const overlap = (a: Box, b: Box) =>
  Math.min(a.left + a.width, b.left + b.width) - Math.max(a.left, b.left) > 0.5 && Math.min(a.top + a.height, b.top + b.height) - Math.max(a.top, b.top) > 0.5;

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

const frames = (page: Page) => page.evaluate(() => new Promise<void>((r) => requestAnimationFrame(() => requestAnimationFrame(() => r()))));

async function drawnLabels(page: Page, testid: string): Promise<Drawn> {
  const canvas = page.getByTestId(testid).locator('canvas');
  await canvas.scrollIntoViewIfNeeded();
  await frames(page);
  await frames(page);
  await page.waitForFunction((id) => document.querySelector(`[data-testid="${id}"] canvas`)?.getAttribute('data-label-boxes') !== null, testid);
  return JSON.parse((await canvas.getAttribute('data-label-boxes')) ?? '{}') as Drawn;
}

function collisions(drawn: Drawn): string[] {
  const found: string[] = [];
  drawn.labels.forEach((a, i) => {
    drawn.labels.slice(i + 1).forEach((b) => overlap(a, b) && found.push(`"${a.text}" overlaps "${b.text}"`));
    drawn.points.forEach((p) => overlap(a, p) && found.push(`"${a.text}" covers a marked point`));
  });
  return found;
}

for (const size of [
  { width: 1024, height: 700 },
  { width: 1440, height: 900 },
]) {
  for (const theme of ['light', 'dark'] as Theme[]) {
    describe(`chart labels at ${size.width}×${size.height} (${theme})`, () => {
      it('never overlap each other or the marked points, on either load axis, for the demos and a 60 A case', () =>
        suite.run(
          async (app) => {
            const { page } = app;
            await settled(page);
            for (const [name, text] of DESIGNS) {
              await openThroughChooser(page, name, text());
              await settled(page);
              for (const scale of ['linear', 'log']) {
                await page.locator('#curve-scale').selectOption(scale);
                await settled(page);
                for (const chart of CHARTS) {
                  const drawn = await drawnLabels(page, chart);
                  if (chart === 'efficiency-chart') expect(drawn.labels.map((l) => l.text), `${name} ${scale}`).toContain('rated'); // the rated load is always marked (issue 16 §4)
                  expect(collisions(drawn), `${name}, ${scale} axis, ${chart}: ${JSON.stringify(drawn)}`).toEqual([]); // issue 16 §4: no two labels overlap
                }
              }
              if (size.width === 1024) await app.screenshot(`chart-labels-${name.replace('.json', '')}-${size.width}`, { fullPage: false });
            }
          },
          { theme, viewport: size },
        ));
    });
  }
}
