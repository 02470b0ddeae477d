/**
 * The plain data the chart wrappers take: numbers in SI units with the unit named beside them, so a
 * chart only draws and formats (engineering prefixes at the edge, via formatEngineering). No Chart.js
 * types here: the results screens build these records without knowing the charting library.
 */

/**
 * A colour chosen from the theme: a series slot (0…11), a named role of the palette, or a part's own
 * hue (the same on every chart) with a shade, 0 (the hue itself) to 1 (the chart surface).
 */
export type Tone = number | 'accent' | 'danger' | 'caution' | 'muted' | 'text' | 'focus' | PartTone;

export interface PartTone {
  /** A part role of the design ("switch", "inductor"…). */
  part: string;
  shade?: number;
}

export interface AxisSpec {
  /** Axis title without the unit ("Load current"). */
  title: string;
  /** SI unit of the values ("A", "W", "°C", "%" for a fraction shown as a percentage, "" for a ratio). */
  unit: string;
  scale?: 'linear' | 'log';
  min?: number;
  max?: number;
  /** Values that always get a labelled tick on a log axis (the rated load). */
  marks?: readonly number[];
}

export interface LineSeries {
  key: string;
  label: string;
  /** One value per x value; null leaves a gap. */
  values: readonly (number | null)[];
  tone: Tone;
  dashed?: boolean;
  /** Thin line for reference curves (limits, neighbours in a family). */
  thin?: boolean;
}

/** A vertical (axis "x") or horizontal (axis "y") line across the plot, with a short label. */
export interface LineMarker {
  key: string;
  axis: 'x' | 'y';
  value: number;
  label: string;
  tone: Tone;
  dashed?: boolean;
}

/** A marked point (a landmark on a curve). */
export interface PointMarker {
  key: string;
  x: number;
  y: number;
  label: string;
  tone: Tone;
}

/** The data-table view of a chart: one row per x value (or category), cells as SI numbers or text. */
export interface ChartTableData {
  columns: { key: string; label: string; unit: string }[];
  rows: (number | string | null)[][];
  /** Extra lines under the table (the markers, in words). */
  notes?: string[];
}

export interface BarCategory {
  key: string;
  label: string;
}

export interface BarSeries {
  key: string;
  label: string;
  /** One value per category. */
  values: readonly number[];
  tone: Tone;
}

/** A grid of values over two axes; `values[r][c]` belongs to `y[r]` and `x[c]`; null marks a missing cell. */
export interface HeatGrid {
  x: readonly number[];
  y: readonly number[];
  values: readonly (readonly (number | null)[])[];
}
