/**
 * What a report chart shows, as plain data: the report sections describe their charts with these
 * records, and the chart components in this folder (the only report files that import Chart.js) draw
 * them at a fixed size with animation off, so the printed page is sharp and identical every time.
 */

export interface LineSeries {
  label: string;
  x: readonly number[];
  /** null leaves a gap (for instance a point that does not regulate). */
  y: readonly (number | null)[];
  color: string;
  /** Dash pattern in px (e.g. [6, 4]); solid when absent. */
  dash?: number[];
  width?: number;
  /** Leave the series out of the legend (e.g. a limit line explained by its colour). */
  hideInLegend?: boolean;
}

/** A vertical marker line across the plot (rated load, peak, knee, thermal ceiling, crossover). */
export interface XMark {
  x: number;
  label: string;
  color: string;
}

/** A labelled point (peak efficiency, knee). */
export interface PointMark {
  x: number;
  y: number;
  label: string;
  color: string;
}

export interface LineChartSpec {
  title: string;
  xTitle: string;
  yTitle: string;
  xLog: boolean;
  /** Axis range of x; set it, or Chart.js leaves out points whose y lies outside a fixed y range. */
  xMin?: number;
  xMax?: number;
  yMin?: number;
  yMax?: number;
  /** Multiplies y values for the tick labels only (e.g. 100 to show a fraction as %). */
  yTickScale?: number;
  series: LineSeries[];
  xMarks: XMark[];
  pointMarks: PointMark[];
}

export interface BarChartSpec {
  title: string;
  /** One label per bar (horizontal bars, top to bottom). */
  labels: string[];
  values: number[];
  colors: string[];
  xTitle: string;
}

/** Fixed drawing size of a report chart, CSS px (fits the printed width of A4 and Letter). */
export const REPORT_CHART_SIZE = { width: 640, height: 270 } as const;

/** Canvas pixels per CSS pixel: 3 gives about 290 dpi on paper at this size. */
export const REPORT_CHART_PIXEL_RATIO = 3;
