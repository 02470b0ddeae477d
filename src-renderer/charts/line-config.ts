/**
 * Chart.js configuration of an x–y line chart (or a stacked area chart) from plain data: shared x
 * values, series, line markers and point markers, all themed. Tooltips and ticks carry units.
 */
import type { ChartConfiguration, TooltipItem } from 'chart.js';
import type { AxisSpec, LineMarker, LineSeries, PointMarker } from './chart-data.ts';
import { axisTitle, formatValue } from './chart-format.ts';
import { baseOptions, largestOf, numericScale, surfacePlugin } from './chart-kit.ts';
import { toneColour, withAlpha, type ChartPalette } from './chart-theme.svelte.ts';
import { markerLabelsPlugin, type MarkerLabelOptions } from './marker-labels.ts';

export interface LineChartData {
  x: AxisSpec;
  y: AxisSpec;
  xValues: readonly number[];
  series: readonly LineSeries[];
  markers?: readonly LineMarker[];
  points?: readonly PointMarker[];
  /** Stack the series as filled areas (loss by mechanism). */
  stacked?: boolean;
}

function annotations(data: LineChartData, palette: ChartPalette): Record<string, object> {
  const out: Record<string, object> = {};
  (data.markers ?? []).forEach((m) => {
    const span = m.axis === 'x' ? { xMin: m.value, xMax: m.value } : { yMin: m.value, yMax: m.value };
    out[`line-${m.key}`] = { type: 'line', ...span, borderColor: toneColour(palette, m.tone), borderWidth: 1.4, borderDash: m.dashed ? [5, 4] : undefined };
  });
  (data.points ?? []).forEach((p) => {
    const colour = toneColour(palette, p.tone);
    out[`point-${p.key}`] = { type: 'point', xValue: p.x, yValue: p.y, radius: 4.5, backgroundColor: colour, borderColor: palette.surface, borderWidth: 1.5 };
  });
  return out;
}

/** The marker labels, placed clear of each other and of the points after layout (marker-labels.ts). */
function markerLabels(data: LineChartData, palette: ChartPalette): MarkerLabelOptions {
  return {
    labels: (data.markers ?? []).filter((m) => m.label !== '').map((m) => ({ axis: m.axis, value: m.value, text: m.label, colour: toneColour(palette, m.tone) })),
    points: (data.points ?? []).map((p) => ({ x: p.x, y: p.y })),
    halo: withAlpha(palette.surface, 0.85),
  };
}

/** The largest magnitude the y axis shows: the top of the stack, or every series and horizontal marker. */
function yLargest(data: LineChartData): number {
  const marks = (data.markers ?? []).filter((m) => m.axis === 'y').map((m) => m.value);
  if (!data.stacked) return largestOf(marks, ...data.series.map((s) => s.values));
  const tops = data.xValues.map((_, i) => data.series.reduce((sum, s) => sum + (s.values[i] ?? 0), 0));
  return largestOf(tops, marks);
}

export function lineConfig(data: LineChartData, palette: ChartPalette): ChartConfiguration<'line'> {
  const datasets = data.series.map((s) => {
    const colour = toneColour(palette, s.tone);
    // A stacked band of a part is outlined in the part's own hue, so shades of one part stay apart.
    const edge = data.stacked && typeof s.tone === 'object' ? toneColour(palette, { part: s.tone.part }) : colour;
    return {
      label: s.label,
      data: data.xValues.map((x, i) => ({ x, y: s.values[i] ?? null })) as { x: number; y: number }[],
      borderColor: edge,
      backgroundColor: data.stacked ? withAlpha(colour, 0.8) : colour,
      borderWidth: s.thin || data.stacked ? 1 : 2,
      borderDash: s.dashed ? [6, 4] : [],
      pointRadius: 0,
      pointHoverRadius: 3,
      fill: data.stacked ? (data.series.indexOf(s) === 0 ? 'origin' : '-1') : false,
      spanGaps: false,
      tension: 0,
    };
  });
  const base = baseOptions(palette);
  return {
    type: 'line',
    data: { datasets },
    plugins: [surfacePlugin, markerLabelsPlugin],
    options: {
      ...base,
      parsing: false,
      scales: {
        x: numericScale(data.x, palette, largestOf(data.xValues)),
        y: numericScale(data.y, palette, yLargest(data), data.stacked ? { stacked: true, beginAtZero: true } : { grace: '8%' }),
      },
      plugins: {
        ...base.plugins,
        legend: { ...base.plugins.legend, display: data.series.length > 1 },
        tooltip: {
          ...base.plugins.tooltip,
          callbacks: {
            title: (items: TooltipItem<'line'>[]) => (items[0] ? `${axisTitle({ ...data.x, unit: '' })} ${formatValue(items[0].parsed.x, data.x.unit)}` : ''),
            label: (item: TooltipItem<'line'>) => `${item.dataset.label}: ${formatValue(item.parsed.y, data.y.unit)}`,
          },
        },
        annotation: { annotations: annotations(data, palette) },
        wattledgerMarkerLabels: markerLabels(data, palette),
      },
    },
  } as ChartConfiguration<'line'>;
}
