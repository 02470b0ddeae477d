/**
 * A Chart.js plugin that writes the marker lines' labels (rated, knee, peak, DCM | CCM, limits…) where
 * none overlaps another or a marked point: the boxes are measured in pixels after the chart's layout
 * and placed by `placeLabels` (label-place.ts). The placed boxes are left on the canvas as
 * `data-label-boxes` (CSS pixels), so the browser tests can check them.
 */
import type { Chart, Plugin } from 'chart.js';
import { placeLabels, type Box } from './label-place.ts';

export interface MarkerLabel {
  axis: 'x' | 'y';
  value: number;
  text: string;
  colour: string;
}

export interface MarkerLabelOptions {
  labels: MarkerLabel[];
  /** Marked points (data coordinates): labels keep clear of them. */
  points: { x: number; y: number }[];
  /** Behind each label, so it stays legible across a curve or a grid line. */
  halo: string;
}

const FONT_PX = 10;
const PAD = 2;
const POINT_CLEARANCE = 6;
const EMPTY = '{"labels":[],"points":[]}';

function plotBox(chart: Chart): Box {
  const a = chart.chartArea;
  return { left: a.left, top: a.top, width: a.right - a.left, height: a.bottom - a.top };
}

export const markerLabelsPlugin: Plugin = {
  id: 'wattledgerMarkerLabels',
  afterDraw(chart, _args, raw) {
    const options = raw as Partial<MarkerLabelOptions>;
    const labels = options.labels ?? [];
    const canvas = chart.canvas;
    const { x: xScale, y: yScale } = chart.scales;
    if (!xScale || !yScale || labels.length === 0) {
      if (canvas.dataset.labelBoxes !== EMPTY) canvas.dataset.labelBoxes = EMPTY;
      return;
    }
    const area = plotBox(chart);
    const ctx = chart.ctx;
    ctx.save();
    ctx.font = `bold ${FONT_PX}px ${String(chart.options.font?.family ?? 'sans-serif')}`;
    const shown = labels
      .map((label) => ({ label, at: (label.axis === 'x' ? xScale : yScale).getPixelForValue(label.value) }))
      .filter(({ at, label }) => Number.isFinite(at) && (label.axis === 'x' ? at >= area.left && at <= area.left + area.width : at >= area.top && at <= area.top + area.height));
    const obstacles: Box[] = (options.points ?? []).map((p) => {
      const px = xScale.getPixelForValue(p.x);
      const py = yScale.getPixelForValue(p.y);
      return { left: px - POINT_CLEARANCE, top: py - POINT_CLEARANCE, width: 2 * POINT_CLEARANCE, height: 2 * POINT_CLEARANCE };
    });
    const boxes = placeLabels(
      shown.map(({ label, at }) => ({ axis: label.axis, at, width: Math.ceil(ctx.measureText(label.text).width) + 2 * PAD, height: FONT_PX + 2 * PAD + 1 })),
      area,
      obstacles,
    );
    ctx.textBaseline = 'top';
    shown.forEach(({ label, at }, i) => {
      const box = boxes[i];
      // A label moved off its line (crowded horizontal lines) keeps a thin leader to it.
      if (label.axis === 'y' && (box.top > at + 2 || box.top + box.height < at - 2)) {
        const x = box.left + box.width / 2;
        ctx.strokeStyle = label.colour;
        ctx.lineWidth = 1;
        ctx.beginPath();
        ctx.moveTo(x, box.top > at ? box.top : box.top + box.height);
        ctx.lineTo(x, at);
        ctx.stroke();
      }
      ctx.fillStyle = options.halo ?? '#ffffff';
      ctx.fillRect(box.left, box.top, box.width, box.height);
      ctx.fillStyle = label.colour;
      ctx.fillText(label.text, box.left + PAD, box.top + PAD + 0.5);
    });
    ctx.restore();
    const record = JSON.stringify({
      labels: shown.map(({ label }, i) => ({ text: label.text, ...roundBox(boxes[i]) })),
      points: obstacles.map(roundBox),
    });
    if (canvas.dataset.labelBoxes !== record) canvas.dataset.labelBoxes = record;
  },
};

function roundBox(b: Box): Box {
  const r = (v: number) => Math.round(v * 10) / 10;
  return { left: r(b.left), top: r(b.top), width: r(b.width), height: r(b.height) };
}
