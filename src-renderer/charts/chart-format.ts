/**
 * Numbers on charts and in their tables: every value with its unit, in engineering notation
 * (shared-model formatEngineering). Pure, so the tick and tooltip text is testable without a canvas.
 */
import { formatEngineering } from '../../shared-model/index.ts';
import type { AxisSpec } from './chart-data.ts';

/** A value with its unit, four significant digits (tooltips, tables). */
export function formatValue(value: number | null | undefined, unit: string, digits = 4): string {
  if (value === null || value === undefined) return '—';
  return formatEngineering(value, unit, digits);
}

/** Axis title with its unit in brackets ("Load current (A)"); a fraction shown as a percentage says "%". */
export function axisTitle(axis: AxisSpec): string {
  return axis.unit === '' ? axis.title : `${axis.title} (${axis.unit})`;
}

/** Tick text: three significant digits with unit prefix; on a log axis only 1, 2 and 5 of each decade. */
export function tickText(value: number, axis: AxisSpec): string {
  if (axis.scale === 'log') {
    const mantissa = value / 10 ** Math.floor(Math.log10(value) + 1e-9);
    const rounded = Math.round(mantissa * 1000) / 1000;
    if (rounded !== 1 && rounded !== 2 && rounded !== 5) return '';
  }
  return formatEngineering(value, axis.unit, 3);
}

/** Text of one table cell: numbers formatted with the column unit, text as is. */
export function cellText(cell: number | string | null, unit: string): string {
  if (typeof cell === 'string') return cell;
  return formatValue(cell, unit);
}

/** A safe file name from a chart title ("Efficiency vs load" → "efficiency-vs-load"). */
export function fileNameOf(title: string): string {
  const slug = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return slug === '' ? 'chart' : slug;
}
