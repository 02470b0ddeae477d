/**
 * Chart.js configuration of a bar chart over named categories (a loss breakdown, a histogram):
 * horizontal or vertical, grouped or stacked, themed, tooltips with units.
 */
import type { ChartConfiguration, TooltipItem } from 'chart.js';
import type { AxisSpec, BarCategory, BarSeries } from './chart-data.ts';
import { formatValue } from './chart-format.ts';
import { baseOptions, largestOf, numericScale, surfacePlugin } from './chart-kit.ts';
import { toneColour, type ChartPalette } from './chart-theme.svelte.ts';

export interface BarChartData {
  categories: readonly BarCategory[];
  series: readonly BarSeries[];
  /** The value axis (the category axis has no unit). */
  value: AxisSpec;
  horizontal?: boolean;
  stacked?: boolean;
  /** Title of the category axis (the Monte Carlo histogram's bins); none when the labels say it. */
  categoryTitle?: string;
}

export function barConfig(data: BarChartData, palette: ChartPalette): ChartConfiguration<'bar'> {
  const base = baseOptions(palette);
  const valueKey = data.horizontal ? 'x' : 'y';
  const categoryKey = data.horizontal ? 'y' : 'x';
  const categoryScale = {
    type: 'category',
    stacked: data.stacked,
    title: { display: data.categoryTitle !== undefined, text: data.categoryTitle ?? '', color: palette.text },
    ticks: { color: palette.text, autoSkip: !data.horizontal, maxRotation: 0 },
    grid: { display: false },
    border: { color: palette.grid },
  };
  return {
    type: 'bar',
    data: {
      labels: data.categories.map((c) => c.label),
      datasets: data.series.map((s) => ({
        label: s.label,
        data: [...s.values],
        backgroundColor: toneColour(palette, s.tone),
        borderWidth: 0,
        barPercentage: 0.85,
        categoryPercentage: 0.85,
      })),
    },
    plugins: [surfacePlugin],
    options: {
      ...base,
      indexAxis: data.horizontal ? 'y' : 'x',
      interaction: { mode: 'index', intersect: false, axis: categoryKey },
      scales: {
        [valueKey]: numericScale(data.value, palette, largestOf(data.stacked ? data.categories.map((_, i) => data.series.reduce((s, x) => s + (x.values[i] ?? 0), 0)) : data.series.flatMap((x) => x.values)), { stacked: data.stacked, beginAtZero: true }),
        [categoryKey]: categoryScale,
      },
      plugins: {
        ...base.plugins,
        legend: { ...base.plugins.legend, display: data.series.length > 1, labels: { ...base.plugins.legend.labels, boxHeight: 10 } },
        tooltip: {
          ...base.plugins.tooltip,
          callbacks: {
            label: (item: TooltipItem<'bar'>) => `${item.dataset.label}: ${formatValue(Number(item.raw), data.value.unit)}`,
          },
        },
      },
    },
  } as ChartConfiguration<'bar'>;
}
