/**
 * The bench overlay: measured efficiency as marked points over the model's efficiency curves (before
 * and, after a fit, with the fitted values) at the measured input voltages (the three most measured),
 * each curve evaluated by the engine at every measured load. Records in, chart data out.
 */
import { formatVolts, modelPoints, type Design, type Measurement } from '../../shared-model/index.ts';
import { measuredBalance } from '../../shared-model/index.ts';
import type { LineSeries, PointMarker } from '../charts/chart-data.ts';

export interface Overlay {
  xValues: number[];
  series: LineSeries[];
  points: PointMarker[];
}

const MAX_CURVES = 3;

/** The input voltages with the most points, at most three, in rising order. */
export function overlayVoltages(m: Measurement): number[] {
  const count = new Map<number, number>();
  for (const p of m.points) count.set(p.vinV, (count.get(p.vinV) ?? 0) + 1);
  return [...count.entries()].sort((a, b) => b[1] - a[1]).slice(0, MAX_CURVES).map(([v]) => v).sort((a, b) => a - b);
}

export function overlayData(design: Design, m: Measurement, fitted: Design | null): Overlay {
  const xValues = [...new Set(m.points.map((p) => p.loadA))].sort((a, b) => a - b);
  const vins = overlayVoltages(m);
  const series: LineSeries[] = [];
  vins.forEach((vinV, k) => {
    const grid = xValues.map((loadA) => ({ vinV, loadA }));
    const none = grid.map(() => []);
    series.push({ key: `model-${vinV}`, label: `Model at ${formatVolts(vinV)}`, values: modelPoints(design, grid, none).map((q) => q.efficiency), tone: k, dashed: fitted !== null });
    if (fitted)
      series.push({ key: `fitted-${vinV}`, label: `Fitted model at ${formatVolts(vinV)}`, values: modelPoints(fitted, grid, none).map((q) => q.efficiency), tone: k });
  });
  const points: PointMarker[] = m.points
    .filter((p) => vins.includes(p.vinV))
    .map((p, i) => ({
      key: `measured-${i}`,
      x: p.loadA,
      y: measuredBalance(p, design.spec.voutV).efficiency,
      label: `Measured at ${formatVolts(p.vinV)}`,
      tone: vins.indexOf(p.vinV),
    }));
  return { xValues, series, points };
}
