import { describe, expect, it } from 'vitest';
import { axisTitle, axisUnit, fileNameOf, tickText } from '../../../src-renderer/charts/chart-format.ts';
import { cellEdges, rampColour, valueRange } from '../../../src-renderer/charts/heat-scale.ts';
import { lineTable } from '../../../src-renderer/charts/chart-tables.ts';
import { overlapArea, placeLabels, type Box } from '../../../src-renderer/charts/label-place.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('chart text', () => {
  it('shows one unit per axis: the title carries the prefix of the largest value and the ticks are plain numbers in it', () => {
    const loss = { title: 'Loss', unit: 'W' };
    const unit = axisUnit(loss, 0.8);
    expect(axisTitle(loss, unit)).toBe('Loss (mW)'); // SI prefix milli = 1e-3 (BIPM SI Brochure, 9th ed., Table 7); issue 16 §4: one unit per axis
    expect(tickText(0.25, loss, unit)).toBe('250'); // 0.25 W = 250 mW (BIPM SI Brochure, 9th ed., Table 7)
    expect(tickText(-0.005, loss, unit)).toBe('\u22125'); // minus sign U+2212 (ISO 80000-1, signs for numbers)
    const efficiency = { title: 'Efficiency', unit: '%' };
    expect(axisTitle(efficiency, axisUnit(efficiency, 0.95))).toBe('Efficiency (%)'); // a fraction shown as a percentage
    expect(tickText(0.9, efficiency, axisUnit(efficiency, 0.95))).toBe('90'); // 0.9 = 90 %
    const temperature = { title: 'Temperature', unit: '°C' };
    expect(axisTitle(temperature, axisUnit(temperature, 1500))).toBe('Temperature (°C)'); // degree Celsius takes no prefix in practice (common practice)
  });

  it('labels 1, 2 and 5 of each decade and the marks on a log axis', () => {
    const axis = { title: 'f', unit: 'Hz', scale: 'log' as const };
    const unit = axisUnit(axis, 2e6);
    expect(axisTitle(axis, unit)).toBe('f (MHz)'); // SI prefix mega = 1e6 (BIPM SI Brochure, 9th ed.)
    expect(tickText(2e5, axis, unit)).toBe('0.2'); // 200 kHz = 0.2 MHz
    expect(tickText(3e5, axis, unit)).toBe(''); // 1-2-5 tick rule for log axes (common practice)
    const load = { title: 'Load current', unit: 'A', scale: 'log' as const, marks: [4] };
    expect(tickText(4, load)).toBe('4'); // issue 16 §4: the rated load is labelled on the log axis
    expect(tickText(5, load)).toBe(''); // 5 A lies 0.097 decade from the 4 A mark: left out so the two do not print over each other (our rule)
    expect(tickText(1, load)).toBe('1'); // decades stay labelled (issue 16 §4)
  });

  it('makes a plain file name from a title', () => {
    expect(fileNameOf('Efficiency against load at 14.4 V in')).toBe('efficiency-against-load-at-14-4-v-in'); // portable file names: [a-z0-9-] (POSIX portable filename character set)
  });
});

describe('heat-map geometry', () => {
  it('puts cell edges halfway between values on a linear axis', () => {
    expect(cellEdges([1, 2, 4])).toEqual([0.5, 1.5, 3, 5]); // arithmetic midpoints; the ends mirror the first and last gap
  });

  it('puts cell edges at geometric means on a log axis', () => {
    const edges = cellEdges([1e5, 1e6], true);
    closeTo(edges[1], Math.sqrt(1e5 * 1e6), 1e-12); // the midpoint in log space is the geometric mean (common practice for log bins)
  });

  it('clips the colour range to the 2nd–98th percentile and says so', () => {
    const values = [Array.from({ length: 100 }, (_, i) => (i === 0 ? -1000 : i))];
    const range = valueRange({ x: values[0], y: [0], values });
    expect(range?.clippedLow).toBe(true); // the outlier −1000 lies below the 2nd percentile (nearest rank)
    expect(range?.min).toBe(values[0][Math.round(0.02 * 99)]); // nearest-rank quantile of the sorted values
  });

  it('mixes the ramp ends exactly at 0 and 1', () => {
    expect(rampColour(0, '#000000', '#808080', '#ffffff')).toBe('rgb(0, 0, 0)'); // linear interpolation at its end points
    expect(rampColour(1, '#000000', '#808080', '#ffffff')).toBe('rgb(255, 255, 255)'); // linear interpolation at its end points
  });
});

describe('marker labels', () => {
  const area: Box = { left: 40, top: 10, width: 400, height: 200 };
  const within = (b: Box) => b.left >= area.left && b.top >= area.top && b.left + b.width <= area.left + area.width && b.top + b.height <= area.top + area.height;

  it('measures the overlap of two boxes as the area of their intersection', () => {
    expect(overlapArea({ left: 0, top: 0, width: 10, height: 10 }, { left: 5, top: 5, width: 10, height: 10 })).toBe(25); // axis-aligned rectangle intersection (common practice)
    expect(overlapArea({ left: 0, top: 0, width: 10, height: 10 }, { left: 10, top: 0, width: 10, height: 10 })).toBe(0); // boxes that only touch do not overlap (common practice)
  });

  it('gives labels of lines at the same load boxes that do not overlap, all inside the plot', () => {
    const labels = ['rated', 'knee', 'peak', 'thermal ceiling', 'regulation limit'].map((t) => ({ axis: 'x' as const, at: 200, width: 6 * t.length + 4, height: 15 }));
    const boxes = placeLabels(labels, area);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlapArea(boxes[i], boxes[j]), `${i} and ${j}`).toBe(0); // issue 16 §4: no two labels overlap
    expect(boxes.every(within)).toBe(true); // issue 16 §4: labels stay inside the plot
  });

  it('puts the label of a line near the right edge on the line\'s left', () => {
    const [box] = placeLabels([{ axis: 'x', at: 435, width: 60, height: 15 }], area);
    expect(box.left + box.width).toBeLessThanOrEqual(435); // the label ends before its line (the right side would leave the plot)
  });

  it('keeps labels clear of a marked point', () => {
    const point: Box = { left: 200, top: 10, width: 12, height: 12 };
    const [box] = placeLabels([{ axis: 'x', at: 198, width: 40, height: 15 }], area, [point]);
    expect(overlapArea(box, point)).toBe(0); // issue 16 §4: labels do not cover the markers
  });

  it('spreads labels of horizontal lines at close values along the line', () => {
    const boxes = placeLabels(
      [125, 126, 127].map((c) => ({ axis: 'y' as const, at: 100 + (c - 125) * 2, width: 90, height: 15 })),
      area,
    );
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlapArea(boxes[i], boxes[j])).toBe(0); // issue 16 §4: limit labels stay apart
  });
});

describe('data-table view', () => {
  it('has one row per x value and one column per series, with the markers as notes', () => {
    const table = lineTable(
      { title: 'Load', unit: 'A' },
      { title: 'Efficiency', unit: '%' },
      [1, 2],
      [{ key: 'e', label: 'Efficiency', values: [0.9, 0.95], tone: 0 }],
      [{ key: 'k', axis: 'x', value: 1.5, label: 'knee', tone: 'focus' }],
    );
    expect(table.rows).toEqual([
      [1, 0.9],
      [2, 0.95],
    ]); // the plotted numbers, unchanged
    expect(table.notes).toEqual(['knee: 1.5 A']); // marker with its unit (formatEngineering)
  });
});
