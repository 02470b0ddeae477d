/**
 * What the report charts share beyond the one Chart.js set-up (../chart-kit.ts registers every piece they
 * use): the common options (fixed size, no animation, print-friendly colours and fonts), and a small plugin that
 * draws vertical marker lines and labelled points with their text.
 */
import type { Plugin } from 'chart.js';
import type { PointMark, XMark } from './chart-spec.ts';

export const INK = '#1a1a1a';
export const GRID = '#d4d4d4';
export const FONT_FAMILY = "'DejaVu Sans', 'Liberation Sans', Arial, sans-serif";

export interface MarksOptions {
  xMarks: XMark[];
  pointMarks: PointMark[];
}

/** Draws the marker lines (dashed, labelled at the top) and labelled points after the data. */
export const marksPlugin: Plugin = {
  id: 'wattledgerReportMarks',
  afterDatasetsDraw(chart, _args, options) {
    const { xMarks = [], pointMarks = [] } = options as Partial<MarksOptions>;
    const { ctx, chartArea: area, scales } = chart;
    const x = scales.x;
    const y = scales.y;
    if (!x || !y) return;
    ctx.save();
    ctx.font = `10px ${FONT_FAMILY}`;
    ctx.textBaseline = 'top';
    ctx.lineJoin = 'round';
    // Labels get a white halo so they stay legible where they cross a curve or a grid line.
    const label = (text: string, x0: number, y0: number, color: string): void => {
      ctx.strokeStyle = '#ffffff';
      ctx.lineWidth = 3;
      ctx.strokeText(text, x0, y0);
      ctx.fillStyle = color;
      ctx.fillText(text, x0, y0);
    };
    let row = 0;
    for (const mark of xMarks) {
      const px = x.getPixelForValue(mark.x);
      if (!(px >= area.left && px <= area.right)) continue;
      ctx.strokeStyle = mark.color;
      ctx.lineWidth = 1;
      ctx.setLineDash([4, 3]);
      ctx.beginPath();
      ctx.moveTo(px, area.top);
      ctx.lineTo(px, area.bottom);
      ctx.stroke();
      ctx.setLineDash([]);
      const width = ctx.measureText(mark.label).width;
      const left = px + 3 + width > area.right ? px - 3 - width : px + 3;
      label(mark.label, left, area.top + 2 + 12 * (row % 3), mark.color);
      row++;
    }
    for (const mark of pointMarks) {
      const px = x.getPixelForValue(mark.x);
      const py = y.getPixelForValue(mark.y);
      if (!(px >= area.left && px <= area.right && py >= area.top && py <= area.bottom)) continue;
      ctx.fillStyle = mark.color;
      ctx.strokeStyle = '#ffffff';
      ctx.lineWidth = 1.5;
      ctx.beginPath();
      ctx.arc(px, py, 4, 0, 2 * Math.PI);
      ctx.fill();
      ctx.stroke();
      const width = ctx.measureText(mark.label).width;
      const left = px + 6 + width > area.right ? px - 6 - width : px + 6;
      label(mark.label, left, py + 5, mark.color);
    }
    ctx.restore();
  },
};

/** Paints the canvas white first, so a saved PNG has the printed page's background. */
export const paperPlugin: Plugin = {
  id: 'wattledgerReportPaper',
  beforeDraw(chart) {
    const { ctx, width, height } = chart;
    ctx.save();
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, width, height);
    ctx.restore();
  },
};

export function titleOptions(text: string) {
  return { display: true, text, color: INK, font: { family: FONT_FAMILY, size: 12, weight: 'bold' as const }, padding: { top: 2, bottom: 6 } };
}

export function axisTitle(text: string) {
  return { display: true, text, color: INK, font: { family: FONT_FAMILY, size: 11 } };
}

export const TICKS = { color: INK, font: { family: FONT_FAMILY, size: 10 } };
