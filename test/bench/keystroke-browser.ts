/**
 * Browser figures of issue 14, run as a child of the benchmark (`node --import tsx`, it needs vite and
 * playwright-core): the production renderer served locally, Debian Chromium headless, no GPU.
 *   keystroke-all-charts-ms  1440 px wide and tall enough that every result chart is on screen
 *   keystroke-one-chart-ms   1440×900 with the page scrolled so one chart (efficiency) is on screen
 * A keystroke's time: from its keydown event's timeStamp to the last visible chart's draw stamp
 * (charts stamp their canvas with performance.now() when they draw: data-drawn-at) plus the next frame
 * (a requestAnimationFrame after the draw: the paint that shows it). The browser's Event Timing entry
 * for the keydown (input → next paint after its handlers) is printed beside it.
 * Prints one `figure:{json}` line per figure; anything else on stdout is ignored.
 */
import type { Page } from 'playwright-core';
import { buildRenderer } from '../e2e/helpers/build.ts';
import { launchBrowser, openApp, startServer } from '../e2e/helpers/browser.ts';
import { figureOf } from './figures.ts';

const quick = process.argv.includes('--quick');

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

interface Key {
  ms: number;
  eventTimingMs: number;
  charts: number;
}

async function typeAndMeasure(page: Page, keys: string[]): Promise<Key[]> {
  await page.evaluate(() => {
    const w = window as unknown as { __keydowns: number[]; __eventMs: number[] };
    w.__keydowns = [];
    w.__eventMs = [];
    document.addEventListener('keydown', (e) => w.__keydowns.push(e.timeStamp), { capture: true });
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) if (e.name === 'keydown') w.__eventMs.push(e.duration);
    }).observe({ type: 'event', buffered: false, durationThreshold: 16 } as PerformanceObserverInit);
  });
  const input = page.locator('[data-path="spec.ambientC"]').first();
  await input.click();
  const out: Key[] = [];
  for (const key of keys) {
    if (key === '^') {
      await input.press('Control+A');
      continue;
    }
    const revision = Number(await page.getByTestId('results').getAttribute('data-revision'));
    await input.press(key);
    await settledAt(page, revision + 1);
    const m = await page.evaluate(
      () =>
        new Promise<{ down: number; drawn: number; painted: number; charts: number; eventMs: number }>((resolve) => {
          setTimeout(() => {
            const w = window as unknown as { __keydowns: number[]; __eventMs: number[] };
            const stamps = Array.from(document.querySelectorAll<HTMLCanvasElement>('[data-testid="results"] figure.chart canvas'))
              .filter((c) => {
                const r = c.getBoundingClientRect();
                return r.height > 0 && r.bottom > 0 && r.top < window.innerHeight;
              })
              .map((c) => Number(c.dataset.drawnAt ?? NaN));
            const drawn = Math.max(...stamps);
            requestAnimationFrame(() =>
              resolve({ down: w.__keydowns.at(-1) ?? NaN, drawn, painted: performance.now(), charts: stamps.length, eventMs: w.__eventMs.at(-1) ?? 0 }),
            );
          }, 50);
        }),
    );
    // The next frame after the last draw: at most one frame (16.7 ms) after it; counted as that frame.
    const frame = Math.min(m.painted - m.drawn, 1000 / 60);
    out.push({ ms: m.drawn - m.down + frame, eventTimingMs: m.eventMs, charts: m.charts });
  }
  return out;
}

const AMBIENTS = ['^', '2', '5', '^', '3', '0', '^', '4', '5', '^', '2', '8', '^', '3', '5', '^', '4', '0'];

await buildRenderer();
const server = await startServer();
const browser = await launchBrowser();
try {
  for (const view of [
    { name: 'keystroke-all-charts-ms', viewport: { width: 1440, height: 4000 }, scrollTo: null, what: 'every result chart on screen (1440 px wide, 4000 px tall viewport)' },
    { name: 'keystroke-one-chart-ms', viewport: { width: 1440, height: 900 }, scrollTo: 'efficiency-chart', what: 'one chart on screen (1440×900, efficiency chart in view)' },
  ]) {
    const app = await openApp(server, { browser, viewport: view.viewport });
    try {
      await settledAt(app.page, 0);
      if (view.scrollTo) await app.page.getByTestId(view.scrollTo).scrollIntoViewIfNeeded();
      const keys = await typeAndMeasure(app.page, quick ? AMBIENTS.slice(0, 6) : AMBIENTS);
      const charts = Math.max(...keys.map((k) => k.charts));
      const eventMs = keys.map((k) => k.eventTimingMs).sort((a, b) => a - b);
      const f = figureOf({
        name: view.name,
        unit: 'ms',
        goal: 16,
        samples: keys.map((k) => k.ms),
        what: `keystroke (ambient temperature typed digit by digit) → the last visible chart drawn + its frame, ${view.what}, ${charts} chart(s), headless Chromium without GPU`,
        detail: [`Event Timing keydown → next paint: median ${eventMs[eventMs.length >> 1]?.toFixed(0)} ms (entries under 16 ms read as 0); worst keystroke ${Math.max(...keys.map((k) => k.ms)).toFixed(1)} ms`],
      });
      console.log(`figure:${JSON.stringify(f)}`);
    } finally {
      await app.close();
    }
  }
} finally {
  await browser.close();
  await server.close();
}
