/**
 * The data-table view of each chart kind, built from the same plain data the chart draws, so the
 * table and the chart can never disagree.
 */
import type { AxisSpec, BarCategory, BarSeries, ChartTableData, HeatGrid, LineMarker, LineSeries, PointMarker } from './chart-data.ts';
import { formatValue } from './chart-format.ts';

export function lineTable(
  x: AxisSpec,
  y: AxisSpec,
  xValues: readonly number[],
  series: readonly LineSeries[],
  markers: readonly LineMarker[] = [],
  points: readonly PointMarker[] = [],
): ChartTableData {
  return {
    columns: [{ key: 'x', label: x.title, unit: x.unit }, ...series.map((s) => ({ key: s.key, label: s.label, unit: y.unit }))],
    rows: xValues.map((xv, i) => [xv, ...series.map((s) => s.values[i] ?? null)]),
    notes: [
      ...markers.map((m) => `${m.label}: ${formatValue(m.value, m.axis === 'x' ? x.unit : y.unit)}`),
      ...points.map((p) => `${p.label}: ${formatValue(p.y, y.unit)} at ${formatValue(p.x, x.unit)}`),
    ],
  };
}

export function barTable(categoryTitle: string, unit: string, categories: readonly BarCategory[], series: readonly BarSeries[]): ChartTableData {
  return {
    columns: [{ key: 'category', label: categoryTitle, unit: '' }, ...series.map((s) => ({ key: s.key, label: s.label, unit }))],
    rows: categories.map((c, i) => [c.label, ...series.map((s) => s.values[i] ?? null)]),
  };
}

export function heatTable(x: AxisSpec, y: AxisSpec, value: AxisSpec, grid: HeatGrid): ChartTableData {
  return {
    columns: [
      { key: 'y', label: `${y.title} \\ ${x.title}`, unit: y.unit },
      ...grid.x.map((xv, c) => ({ key: `x${c}`, label: formatValue(xv, x.unit, 3), unit: value.unit })),
    ],
    rows: grid.y.map((yv, r) => [yv, ...grid.values[r].map((v) => v)]),
  };
}
