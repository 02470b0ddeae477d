/**
 * Chart.js configuration of a heat map: a scatter chart whose points (one per cell centre, invisible)
 * carry the tooltips, and a plugin that paints each cell between its edges in the ramp colour.
 */
import type { Chart, ChartConfiguration, Plugin, TooltipItem } from 'chart.js';
import type { AxisSpec, HeatGrid } from './chart-data.ts';
import { formatValue } from './chart-format.ts';
import { baseOptions, largestOf, numericScale, surfacePlugin } from './chart-kit.ts';
import type { ChartPalette } from './chart-theme.svelte.ts';
import { cellEdges, rampColour, valueRange } from './heat-scale.ts';

export interface HeatMapData {
  x: AxisSpec;
  y: AxisSpec;
  /** What the colour shows (efficiency, loss, margin) and its unit. */
  value: AxisSpec;
  grid: HeatGrid;
}

interface CellOptions {
  grid?: HeatGrid;
  logX?: boolean;
  logY?: boolean;
  colours?: ChartPalette['heat'];
}

const cellsPlugin: Plugin<'scatter', CellOptions> = {
  id: 'wattledgerCells',
  beforeDatasetsDraw(chart: Chart, _args, options: CellOptions) {
    const { grid, colours } = options;
    if (!grid || !colours) return;
    const range = valueRange(grid);
    const xs = cellEdges(grid.x, options.logX).map((v) => chart.scales.x.getPixelForValue(v));
    const ys = cellEdges(grid.y, options.logY).map((v) => chart.scales.y.getPixelForValue(v));
    const ctx = chart.ctx;
    const area = chart.chartArea;
    ctx.save();
    ctx.beginPath();
    ctx.rect(area.left, area.top, area.width, area.height);
    ctx.clip();
    grid.values.forEach((row, r) =>
      row.forEach((v, c) => {
        const f = v === null || !range ? NaN : range.max === range.min ? 0.5 : Math.min(1, Math.max(0, (v - range.min) / (range.max - range.min)));
        ctx.fillStyle = Number.isNaN(f) ? colours.missing : rampColour(f, colours.low, colours.mid, colours.high);
        const left = Math.min(xs[c], xs[c + 1]);
        const top = Math.min(ys[r], ys[r + 1]);
        ctx.fillRect(left, top, Math.abs(xs[c + 1] - xs[c]) + 0.5, Math.abs(ys[r + 1] - ys[r]) + 0.5);
      }),
    );
    ctx.restore();
  },
};

export function heatConfig(data: HeatMapData, palette: ChartPalette): ChartConfiguration<'scatter'> {
  const { grid } = data;
  const points = grid.y.flatMap((yv, r) => grid.x.map((xv, c) => ({ x: xv, y: yv, v: grid.values[r][c] })));
  const xEdges = cellEdges(grid.x, data.x.scale === 'log');
  const yEdges = cellEdges(grid.y, data.y.scale === 'log');
  const base = baseOptions(palette);
  return {
    type: 'scatter',
    data: { datasets: [{ label: data.value.title, data: points, pointRadius: 0, pointHitRadius: 6, pointHoverRadius: 3 }] },
    plugins: [surfacePlugin, cellsPlugin as unknown as Plugin<'scatter'>],
    options: {
      ...base,
      parsing: false,
      interaction: { mode: 'nearest', intersect: false },
      scales: {
        x: numericScale({ ...data.x, min: xEdges[0], max: xEdges[xEdges.length - 1] }, palette, largestOf(xEdges), { grid: { display: false } }, false),
        y: numericScale({ ...data.y, min: yEdges[0], max: yEdges[yEdges.length - 1] }, palette, largestOf(yEdges), { grid: { display: false } }, false),
      },
      plugins: {
        ...base.plugins,
        legend: { display: false },
        wattledgerCells: { grid, logX: data.x.scale === 'log', logY: data.y.scale === 'log', colours: palette.heat },
        tooltip: {
          ...base.plugins.tooltip,
          callbacks: {
            title: () => '',
            label: (item: TooltipItem<'scatter'>) => {
              const raw = item.raw as { x: number; y: number; v: number | null };
              return [
                `${data.value.title}: ${formatValue(raw.v, data.value.unit)}`,
                `${data.x.title}: ${formatValue(raw.x, data.x.unit)}`,
                `${data.y.title}: ${formatValue(raw.y, data.y.unit)}`,
              ];
            },
          },
        },
      },
    },
  } as unknown as ChartConfiguration<'scatter'>;
}
