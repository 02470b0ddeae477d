/**
 * The life of one Chart.js chart inside a Svelte component: created when its canvas first comes on
 * screen, then updated in place (`chart.update('none')`, never re-created) on every change of its
 * inputs while on screen; a chart scrolled out of view keeps only its newest configuration and draws
 * it when it comes back (or when the page prints). Recoloured when the theme changes; destroyed with
 * the component. An `eager` chart (the one at the top of the first screen) draws its first configuration
 * at once instead of waiting a frame for the visibility check, which puts it on screen sooner at start-up.
 */
import { onDestroy } from 'svelte';
import type { Chart as ChartJs, ChartConfiguration } from 'chart.js';
import { chartDrawn } from './chart-clock.ts';
import { chartPng, createChart, PRINT_SIZE, releaseChart } from './chart-kit.ts';
import { currentPalette, themeClock, type ChartPalette } from './chart-theme.svelte.ts';

export interface ChartHandle {
  /** A PNG of the chart, or null before it exists. */
  png(): Promise<Blob> | null;
}

export function useChart(
  canvas: () => HTMLCanvasElement | undefined,
  build: (palette: ChartPalette) => ChartConfiguration,
  eager = false,
): ChartHandle {
  let chart: ChartJs | null = null;
  let pending: ChartConfiguration | null = null;
  let onScreen = false;
  let observer: IntersectionObserver | null = null;
  themeClock.watch();

  const draw = (target: HTMLCanvasElement, config: ChartConfiguration) => {
    if (!chart) chart = createChart(target, config) as unknown as ChartJs;
    else {
      chart.data = config.data;
      chart.options = config.options ?? {};
      chart.update('none');
    }
    // When this chart last drew (performance.now()), read by the end-to-end speed figures.
    const now = String(performance.now());
    target.dataset.drawnAt = now;
    target.dataset.firstDrawnAt ??= now;
    chartDrawn();
  };

  $effect(() => {
    const config = build(currentPalette(themeClock.version));
    const target = canvas();
    if (!target) return;
    if (!observer && typeof IntersectionObserver !== 'undefined') {
      observer = new IntersectionObserver((entries) => {
        onScreen = entries.some((e) => e.isIntersecting);
        if (onScreen && pending) {
          const next = pending;
          pending = null;
          draw(target, next);
        }
      });
      observer.observe(target);
    }
    if (onScreen || !observer || (eager && !chart)) {
      pending = null;
      draw(target, config);
    } else pending = config;
  });

  // A chart never scrolled into view still prints: draw its newest configuration at paper size.
  const onPrint = () => {
    const target = canvas();
    if (!pending || !target) return;
    const next = pending;
    pending = null;
    draw(target, next);
    chart?.resize(PRINT_SIZE.width, PRINT_SIZE.height);
  };
  window.addEventListener('beforeprint', onPrint);

  onDestroy(() => {
    window.removeEventListener('beforeprint', onPrint);
    observer?.disconnect();
    if (chart) releaseChart(chart);
    chart = null;
  });

  return { png: () => (chart ? chartPng(chart) : null) };
}
