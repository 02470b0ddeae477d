/**
 * Heat-map geometry and colour, pure: cell edges halfway between neighbouring axis values (in log
 * space on a log axis), the value range, and a three-stop colour ramp between theme colours.
 */
import type { HeatGrid } from './chart-data.ts';

/** Edges of the cells around each axis value (length n + 1). */
export function cellEdges(values: readonly number[], log = false): number[] {
  const t = (v: number) => (log ? Math.log(v) : v);
  const back = (u: number) => (log ? Math.exp(u) : u);
  const n = values.length;
  if (n === 0) return [];
  if (n === 1) return log ? [values[0] / 1.1, values[0] * 1.1] : [values[0] - 0.5, values[0] + 0.5];
  const edges = [back(t(values[0]) - (t(values[1]) - t(values[0])) / 2)];
  for (let i = 1; i < n; i++) edges.push(back((t(values[i - 1]) + t(values[i])) / 2));
  edges.push(back(t(values[n - 1]) + (t(values[n - 1]) - t(values[n - 2])) / 2));
  return edges;
}

export interface HeatRange {
  min: number;
  max: number;
  /** True where values beyond that end exist and share its colour (the key says "≤" or "≥"). */
  clippedLow: boolean;
  clippedHigh: boolean;
}

/**
 * The colour range of the grid: from the `clip` quantile to the 1 − `clip` quantile of its finite values
 * (nearest rank), so a few extreme cells (very light load) do not wash out the rest of the map.
 */
export function valueRange(grid: HeatGrid, clip = 0.02): HeatRange | null {
  const values: number[] = [];
  for (const row of grid.values) for (const v of row) if (v !== null && Number.isFinite(v)) values.push(v);
  if (values.length === 0) return null;
  values.sort((a, b) => a - b);
  const at = (p: number) => values[Math.min(values.length - 1, Math.max(0, Math.round(p * (values.length - 1))))];
  const min = at(clip);
  const max = at(1 - clip);
  return { min, max, clippedLow: values[0] < min, clippedHigh: values[values.length - 1] > max };
}

function rgb(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{6})$/i.exec(hex.trim());
  const n = m ? parseInt(m[1], 16) : 0x808080;
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** Colour at fraction f (0…1) of the ramp low → mid → high. */
export function rampColour(f: number, low: string, mid: string, high: string): string {
  const x = Math.min(1, Math.max(0, Number.isFinite(f) ? f : 0));
  const [a, b, u] = x < 0.5 ? [rgb(low), rgb(mid), x * 2] : [rgb(mid), rgb(high), (x - 0.5) * 2];
  const mix = a.map((c, i) => Math.round(c + (b[i] - c) * u));
  return `rgb(${mix[0]}, ${mix[1]}, ${mix[2]})`;
}
