/**
 * Chart.js configuration of an x–y line chart (or a stacked area chart) from plain data: shared x
 * values, series, line markers and point markers, all themed. Tooltips and ticks carry units.
 */
import type { ChartConfiguration, TooltipItem } from 'chart.js';
import type { AxisSpec, LineMarker, LineSeries, PointMarker } from './chart-data.ts';
import { axisTitle, formatValue } from './chart-format.ts';
import { baseOptions, numericScale, surfacePlugin } from './chart-kit.ts';
import { toneColour, withAlpha, type ChartPalette } from './chart-theme.svelte.ts';
import { along, edgeShift, labelRows } from './label-rows.ts';

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
  const xs = data.xValues;
  const lo = data.x.min ?? Math.min(...xs);
  const hi = data.x.max ?? Math.max(...xs);
  const vertical = (data.markers ?? []).filter((m) => m.axis === 'x');
  const spots = vertical.map((m) => along(m.value, lo, hi, data.x.scale === 'log'));
  const rows = labelRows(spots);
  // Horizontal markers close in value take turns along the line (left, middle, right).
  const horizontal = (data.markers ?? []).filter((m) => m.axis === 'y');
  const ys = [...data.series.flatMap((s) => s.values.filter((v): v is number => v !== null)), ...horizontal.map((m) => m.value)];
  const yLo = data.y.min ?? Math.min(...ys);
  const yHi = data.y.max ?? Math.max(...ys);
  const lanes = labelRows(horizontal.map((m) => along(m.value, yLo, yHi, data.y.scale === 'log')), 0.08);
  const LANE = ['start', 'center', 'end'] as const;
  (data.markers ?? []).forEach((m) => {
    const colour = toneColour(palette, m.tone);
    const row = m.axis === 'x' ? rows[vertical.indexOf(m)] : lanes[horizontal.indexOf(m)];
    const span = m.axis === 'x' ? { xMin: m.value, xMax: m.value } : { yMin: m.value, yMax: m.value };
    out[`line-${m.key}`] = {
      type: 'line',
      ...span,
      borderColor: colour,
      borderWidth: 1.4,
      borderDash: m.dashed ? [5, 4] : undefined,
      label: {
        display: m.label !== '',
        content: m.label,
        position: m.axis === 'x' ? 'end' : LANE[row % 3],
        backgroundColor: withAlpha(palette.surface, 0.85),
        color: colour,
        font: { size: 10, weight: 'bold' },
        padding: 2,
        yAdjust: m.axis === 'x' ? 2 + 15 * row : 0,
        // Near either end of the x axis the label sits beside its line instead of across the edge.
        xAdjust: m.axis === 'x' ? edgeShift(spots[vertical.indexOf(m)], m.label) : 0,
      },
    };
  });
  (data.points ?? []).forEach((p) => {
    const colour = toneColour(palette, p.tone);
    out[`point-${p.key}`] = { type: 'point', xValue: p.x, yValue: p.y, radius: 4.5, backgroundColor: colour, borderColor: palette.surface, borderWidth: 1.5 };
  });
  return out;
}

export function lineConfig(data: LineChartData, palette: ChartPalette): ChartConfiguration<'line'> {
  const datasets = data.series.map((s) => {
    const colour = toneColour(palette, s.tone);
    return {
      label: s.label,
      data: data.xValues.map((x, i) => ({ x, y: s.values[i] ?? null })) as { x: number; y: number }[],
      borderColor: colour,
      backgroundColor: data.stacked ? withAlpha(colour, 0.55) : colour,
      borderWidth: s.thin ? 1 : 2,
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
    plugins: [surfacePlugin],
    options: {
      ...base,
      parsing: false,
      scales: {
        x: numericScale(data.x, palette),
        y: numericScale(data.y, palette, data.stacked ? { stacked: true, beginAtZero: true } : { grace: '8%' }),
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
      },
    },
  } as ChartConfiguration<'line'>;
}
