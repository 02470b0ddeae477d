/**
 * Issue 5, speed, measured in the browser and printed: from a keystroke in a design field to every
 * chart on screen redrawn (target ≤ 50 ms), and from page load to the first chart (target ≤ 1.5 s).
 * Each chart stamps its canvas with performance.now() when it draws (data-drawn-at, data-first-drawn-at);
 * a keystroke's time is its keydown event's timeStamp, on the same clock. Figures are printed, not
 * asserted against the targets (a timed assertion on a shared 2-core machine is a flaky test); the test
 * asserts only that every chart on screen did redraw after each keystroke.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();

async function settledAt(page: Page, revision: number): Promise<void> {
  await page.waitForFunction(
    (r) => {
      const results = document.querySelector('[data-testid="results"]');
      return results?.getAttribute('data-settled') === 'true' && Number(results.getAttribute('data-revision')) >= r;
    },
    revision,
    { timeout: 60_000 },
  );
}

/** Canvases of charts visible inside the results column (its own scroll box and the window). */
async function visibleChartStamps(page: Page): Promise<{ chart: string; drawnAt: number }[]> {
  return page.evaluate(() => {
    const column = document.querySelector('[data-testid="results"]')?.parentElement?.getBoundingClientRect();
    const view = { top: Math.max(0, column?.top ?? 0), bottom: Math.min(window.innerHeight, column?.bottom ?? window.innerHeight) };
    return Array.from(document.querySelectorAll<HTMLCanvasElement>('[data-testid="results"] figure.chart canvas'))
      .filter((c) => {
        const r = c.getBoundingClientRect();
        return r.height > 0 && r.bottom > view.top && r.top < view.bottom;
      })
      .map((c) => ({ chart: c.closest('figure')?.getAttribute('data-chart') ?? '?', drawnAt: Number(c.dataset.drawnAt ?? NaN) }));
  });
}

/**
 * Types into a field one key at a time; "^" selects the field's text first (not measured). Returns, per
 * measured key, keydown → last visible chart drawn (ms).
 */
async function keystrokeToCharts(page: Page, path: string, keys: string[]): Promise<{ ms: number; charts: string[] }[]> {
  await page.evaluate(() => {
    const w = window as unknown as { __keydowns: number[] };
    w.__keydowns = [];
    document.addEventListener('keydown', (e) => w.__keydowns.push(e.timeStamp), { capture: true });
  });
  const input = field(page, path);
  await input.click();
  const out: { ms: number; charts: string[] }[] = [];
  for (const key of keys) {
    if (key === '^') {
      await input.press('Control+A');
      continue;
    }
    const revision = Number(await page.getByTestId('results').getAttribute('data-revision'));
    await input.press(key);
    await settledAt(page, revision + 1);
    await page.waitForTimeout(50); // let any chart effect still queued after the settle flag run
    const down = await page.evaluate(() => (window as unknown as { __keydowns: number[] }).__keydowns.at(-1) ?? NaN);
    const stamps = await visibleChartStamps(page);
    expect(stamps.length, 'charts on screen').toBeGreaterThan(0);
    for (const s of stamps) expect(s.drawnAt, `${s.chart} redrawn after the keystroke`).toBeGreaterThan(down); // issue 5: every visible chart follows the keystroke
    out.push({ ms: Math.max(...stamps.map((s) => s.drawnAt)) - down, charts: stamps.map((s) => s.chart) });
  }
  return out;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

describe('speed, measured in the browser', () => {
  it('prints page load to first chart and keystroke to every visible chart', () =>
    suite.run(async ({ page }) => {
      await settledAt(page, 0);
      await page.locator('[data-testid="efficiency-chart"] canvas[data-first-drawn-at]').waitFor({ state: 'attached', timeout: 60_000 });
      const load = await page.evaluate(() => {
        const first = performance.getEntriesByName('wattledger:first-chart')[0]?.startTime ?? NaN;
        const efficiency = Number(document.querySelector<HTMLCanvasElement>('[data-testid="efficiency-chart"] canvas')?.dataset.firstDrawnAt ?? NaN);
        const results = document.querySelector('[data-testid="results"]');
        const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
        return { first, efficiency, sweepMs: Number(results?.getAttribute('data-first-sweep-ms')), domReady: nav?.domContentLoadedEventEnd ?? NaN };
      });
      expect(load.first).toBeGreaterThan(0); // a chart was drawn after navigation (mark exists)

      // Ambient temperature typed key by key ("2" → 2 °C, "25" → 25 °C, …): every key leaves a valid
      // design with a new value, and every chart depends on it.
      const AMBIENTS = ['^', '2', '5', '^', '3', '0', '^', '4', '5', '^', '2', '8'];
      const top = await keystrokeToCharts(page, 'spec.ambientC', AMBIENTS);
      // The loss ledger and its breakdown on screen instead: the evaluation runs on the main thread.
      await page.locator('#results-ledger').scrollIntoViewIfNeeded();
      await page.getByTestId('loss-breakdown').scrollIntoViewIfNeeded();
      const ledger = await keystrokeToCharts(page, 'spec.ambientC', AMBIENTS);
      const mode = await page.getByTestId('results').getAttribute('data-sweep-mode');
      const lastSweepMs = Number(await page.getByTestId('results').getAttribute('data-sweep-ms'));
      const evaluationMs = Number(await page.getByTestId('results').getAttribute('data-evaluation-ms'));
      const line = (name: string, xs: { ms: number; charts: string[] }[]) =>
        `${name}: keystroke → every visible chart (${[...new Set(xs.flatMap((x) => x.charts))].join(', ')}): median ${median(xs.map((x) => x.ms)).toFixed(1)} ms, max ${Math.max(...xs.map((x) => x.ms)).toFixed(1)} ms over ${xs.length} keys (target ≤ 50 ms)`;
      console.log(
        [
          `[speed] page load → first chart: ${load.first.toFixed(0)} ms; → efficiency chart: ${load.efficiency.toFixed(0)} ms (target ≤ 1500 ms); of which DOM ready ${load.domReady.toFixed(0)} ms, first sweep + landmarks ${load.sweepMs.toFixed(0)} ms (cold: it compiles the engine)`,
          `[speed] ${line('efficiency view', top)}`,
          `[speed] ${line('ledger view', ledger)}`,
          `[speed] last load sweep + landmarks: ${lastSweepMs.toFixed(1)} ms ${mode === 'here' ? 'on the main thread (fast enough)' : 'in the worker'}; one evaluation at the chosen load: ${evaluationMs.toFixed(2)} ms`,
        ].join('\n'),
      );
    }));
});
