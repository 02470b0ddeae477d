/**
 * Chart data of the switching-frequency sweep (loss by mechanism stacked against fs, the lowest-loss
 * frequency and the design's own fs marked) and of the two-axis grid as a heat map. Values come from
 * the engine's records; a grid cell that did not converge is left empty.
 */
import type { FrequencySweep, LoadGrid } from '../../shared-model/index.ts';
import type { AxisSpec, HeatGrid, LineMarker, LineSeries } from '../charts/chart-data.ts';
import type { CurveChart } from './load-curves.ts';

export function frequencyCurves(sweep: FrequencySweep, designHz: number): CurveChart {
  const xValues = sweep.points.map((p) => p.switchingFrequencyHz);
  const groups = new Map<string, number[]>();
  sweep.columns.losses.forEach((col, i) => groups.set(col.mechanism, [...(groups.get(col.mechanism) ?? []), i]));
  const series: LineSeries[] = [...groups.entries()]
    .map(([mechanism, columns]) => ({ mechanism, values: sweep.points.map((p) => columns.reduce((s, i) => s + (p.losses[i] ?? 0), 0)) }))
    .filter((g) => g.values.some((v) => v > 0))
    .sort((a, b) => Math.max(...b.values) - Math.max(...a.values))
    .map((g, k) => ({ key: g.mechanism, label: g.mechanism, values: g.values, tone: k }));
  const markers: LineMarker[] = [
    { key: 'optimum', axis: 'x', value: sweep.optimum.frequencyHz, label: 'lowest loss', tone: 'accent' },
    { key: 'design', axis: 'x', value: designHz, label: 'design fs', tone: 'muted', dashed: true },
  ];
  return { xValues, series, markers, points: [] };
}

export type GridQuantity = 'efficiency' | 'totalLoss' | 'worstMarginK';

export const GRID_QUANTITIES: Record<GridQuantity, AxisSpec> = {
  efficiency: { title: 'Efficiency', unit: '%' },
  totalLoss: { title: 'Total loss', unit: 'W' },
  worstMarginK: { title: 'Smallest temperature margin', unit: 'K' },
};

export function gridHeat(grid: LoadGrid, quantity: GridQuantity): HeatGrid {
  return {
    x: grid.loadsA,
    y: grid.secondValues,
    values: grid[quantity].map((row, r) => row.map((v, c) => (grid.converged[r][c] ? v : null))),
  };
}

export function gridSecondAxis(grid: LoadGrid): AxisSpec {
  return grid.axis === 'vin' ? { title: 'Input voltage', unit: 'V' } : { title: 'Switching frequency', unit: 'Hz', scale: 'log' };
}
