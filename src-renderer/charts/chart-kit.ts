/**
 * The one place Chart.js is set up, for the screen's charts and the report's alike: the pieces we use are
 * registered once (tree-shaken build), and every other file takes `Chart` from here (a lint rule refuses a
 * value import of Chart.js anywhere else; type imports are free). Every
 * chart draws without animation (charts follow each keystroke and update in place with
 * `chart.update('none')`), a plugin paints the theme's surface behind the plot so a copied PNG is
 * readable, and charts take a fixed size while the page prints.
 */
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Filler,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  Title,
  Tooltip,
} from 'chart.js';
import type { ChartConfiguration, ChartType, Plugin, ScaleOptionsByType } from 'chart.js';
import annotationPlugin from 'chartjs-plugin-annotation';
import type { AxisSpec } from './chart-data.ts';
import { axisTitle, axisUnit, tickText } from './chart-format.ts';
import type { ChartPalette } from './chart-theme.svelte.ts';

Chart.register(
  BarController,
  BarElement,
  CategoryScale,
  Filler,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  Title,
  Tooltip,
  annotationPlugin,
);
Chart.defaults.animation = false;
Chart.defaults.font.family = "system-ui, -apple-system, 'Segoe UI', Roboto, 'Noto Sans', sans-serif";
Chart.defaults.font.size = 11;

export { Chart };
export type { ChartConfiguration, ChartType };

/** Paints the chart surface colour behind everything (a PNG copy is otherwise transparent). */
export const surfacePlugin: Plugin = {
  id: 'wattledgerSurface',
  beforeDraw(chart, _args, options: { colour?: string }) {
    const ctx = chart.ctx;
    ctx.save();
    ctx.fillStyle = options.colour ?? '#ffffff';
    ctx.fillRect(0, 0, chart.width, chart.height);
    ctx.restore();
  },
};

/** Size of every chart on paper, CSS pixels (about 16 × 9 cm). */
export const PRINT_SIZE = { width: 600, height: 340 } as const;

const live = new Set<Chart>();
let printHooked = false;

function hookPrinting(): void {
  if (printHooked || typeof window === 'undefined') return;
  printHooked = true;
  const toPaper = () => live.forEach((c) => c.resize(PRINT_SIZE.width, PRINT_SIZE.height));
  const toScreen = () => live.forEach((c) => c.resize());
  window.addEventListener('beforeprint', toPaper);
  window.addEventListener('afterprint', toScreen);
  window.matchMedia?.('print').addEventListener('change', (e) => (e.matches ? toPaper() : toScreen()));
}

/** Creates a chart and keeps it in the print list until `release`. */
export function createChart<T extends ChartType>(canvas: HTMLCanvasElement, config: ChartConfiguration<T>): Chart<T> {
  hookPrinting();
  const chart = new Chart(canvas, config);
  live.add(chart as unknown as Chart);
  return chart;
}

export function releaseChart(chart: Chart | { destroy(): void }): void {
  live.delete(chart as Chart);
  chart.destroy();
}

/**
 * Scale options for a numeric axis in our style: the title names the quantity and the one unit the
 * ticks are in (prefix chosen from `largest`, the largest magnitude plotted on it), theme colours. A log
 * axis shows every tick it makes (1…9 of each decade, labelled 1, 2, 5 and the marks) plus a tick at
 * each mark.
 */
export function numericScale(axis: AxisSpec, palette: ChartPalette, largest: number, extra: Record<string, unknown> = {}, tickAtBounds = true): ScaleOptionsByType<'linear'> {
  const unit = axisUnit(axis, Math.max(Math.abs(axis.max ?? 0), Math.abs(axis.min ?? 0), largest));
  const log = axis.scale === 'log';
  return {
    type: log ? 'logarithmic' : 'linear',
    min: axis.min,
    max: axis.max,
    title: { display: true, text: axisTitle(axis, unit), color: palette.text },
    // sampleSize: label sizes are measured on 8 ticks, not all of them (a log axis has ~25); the labels
    // are short numbers of similar width, and measuring all of them was a third of each chart update.
    ticks: { color: palette.muted, maxRotation: 0, autoSkip: !log, autoSkipPadding: 8, sampleSize: 8, includeBounds: tickAtBounds, callback: (v: number | string) => tickText(Number(v), axis, unit) },
    afterBuildTicks: log && axis.marks?.length ? (scale: { ticks: { value: number }[]; min: number; max: number }) => addMarks(scale, axis.marks ?? []) : undefined,
    grid: { color: palette.grid, lineWidth: 0.6 },
    border: { color: palette.grid },
    ...extra,
  } as unknown as ScaleOptionsByType<'linear'>;
}

function addMarks(scale: { ticks: { value: number }[]; min: number; max: number }, marks: readonly number[]): void {
  const extra = marks.filter((m) => m >= scale.min && m <= scale.max && !scale.ticks.some((t) => Math.abs(t.value - m) <= 1e-9 * m));
  if (extra.length > 0) scale.ticks = [...scale.ticks, ...extra.map((value) => ({ value }))].sort((a, b) => a.value - b.value);
}

/** The largest magnitude among numbers (nulls and non-finite values left out); 0 when there is none. */
export function largestOf(...lists: readonly (readonly (number | null)[])[]): number {
  let max = 0;
  for (const list of lists) for (const v of list) if (v !== null && Number.isFinite(v) && Math.abs(v) > max) max = Math.abs(v);
  return max;
}

/** Options every chart shares: fill the box, no animation, themed legend and tooltip. */
export function baseOptions(palette: ChartPalette) {
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false as const,
    normalized: true,
    interaction: { mode: 'index' as const, intersect: false },
    plugins: {
      wattledgerSurface: { colour: palette.surface },
      legend: { labels: { color: palette.text, boxWidth: 14, boxHeight: 2, padding: 8 } },
      tooltip: {
        backgroundColor: palette.surface,
        titleColor: palette.text,
        bodyColor: palette.text,
        borderColor: palette.grid,
        borderWidth: 1,
      },
    },
  };
}

/** A PNG of the chart as drawn (with its surface colour). */
export function chartPng(chart: Chart): Promise<Blob> {
  return new Promise((resolve, reject) =>
    chart.canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The browser could not encode the chart as PNG.'))), 'image/png'),
  );
}
