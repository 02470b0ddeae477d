/**
 * Numbers on charts and in their tables: every value with its unit, in engineering notation
 * (shared-model formatEngineering). Pure, so the tick and tooltip text is testable without a canvas.
 */
import { formatEngineering, parseEngineering } from '../../shared-model/index.ts';
import type { AxisSpec } from './chart-data.ts';

/** A value with its unit, four significant digits (tooltips, tables). */
export function formatValue(value: number | null | undefined, unit: string, digits = 4): string {
  if (value === null || value === undefined) return '—';
  return formatEngineering(value, unit, digits);
}

/**
 * The one unit an axis shows: the title names it and the ticks are plain numbers in it, so "Loss (mW)"
 * never sits beside ticks in W. The prefix is the one formatEngineering gives the largest value on the
 * axis; a fraction shown as a percentage is "%"; units without prefixes (°C) keep their own.
 */
export interface AxisUnit {
  /** The unit with its prefix ("mW", "kHz", "%", "°C", "" for a ratio). */
  shown: string;
  /** SI value of one shown unit (1e-3 for mW, 0.01 for %). */
  factor: number;
}

export function axisUnit(axis: AxisSpec, largest: number): AxisUnit {
  if (axis.unit === '%') return { shown: '%', factor: 0.01 };
  if (axis.unit === '' || !(Number.isFinite(largest) && largest > 0)) return { shown: axis.unit, factor: 1 };
  const shown = formatEngineering(largest, axis.unit, 3).split(' ')[1] ?? axis.unit;
  const one = parseEngineering(`1 ${shown}`, axis.unit);
  return one.ok && one.value > 0 ? { shown, factor: one.value } : { shown: axis.unit, factor: 1 };
}

/** Axis title with its unit in brackets ("Loss (mW)"); a ratio has none. */
export function axisTitle(axis: AxisSpec, unit: AxisUnit = { shown: axis.unit, factor: 1 }): string {
  return unit.shown === '' ? axis.title : `${axis.title} (${unit.shown})`;
}

const MINUS = '\u2212';

/** A tick as a plain number in the axis unit, three significant digits ("0.25", "1200", "−5"). */
export function plainTick(value: number, unit: AxisUnit): string {
  const n = Number((value / unit.factor).toPrecision(3));
  if (n === 0) return '0';
  const text = String(Math.abs(n));
  return n < 0 ? `${MINUS}${text}` : text;
}

/**
 * Tick text. A log axis labels the 1, 2 and 5 of each decade and the axis's marks (the rated load),
 * and leaves out a 1-2-5 label within 0.12 decade of a mark so the two never print over each other.
 */
export function tickText(value: number, axis: AxisSpec, unit: AxisUnit = { shown: axis.unit, factor: 1 }): string {
  if (axis.scale === 'log') {
    const marks = axis.marks ?? [];
    if (marks.some((m) => Math.abs(m - value) <= 1e-9 * Math.abs(m))) return plainTick(value, unit);
    if (marks.some((m) => Math.abs(Math.log10(value / m)) < 0.12)) return '';
    const mantissa = value / 10 ** Math.floor(Math.log10(value) + 1e-9);
    const rounded = Math.round(mantissa * 1000) / 1000;
    if (rounded !== 1 && rounded !== 2 && rounded !== 5) return '';
  }
  return plainTick(value, unit);
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
