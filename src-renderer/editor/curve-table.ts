/**
 * A datasheet curve typed or pasted into the editor as rows of two numbers (e.g. VDS and Coss). Pasted
 * text may come from a spreadsheet (tab-separated), a CSV file (comma or semicolon) or plain columns
 * (spaces); each cell takes engineering notation in the column's unit ("4.7n", "470 pF", "12 V").
 * A header row of words is skipped. Every cell that does not parse gets a sentence naming the row, the
 * column's label, the text and what is allowed. Also: the points of a small preview plot.
 */
import { parseEngineering } from '../../shared-model/index.ts';

export interface CurveColumn {
  key: string;
  label: string;
  unit: string;
}

export type CurveRow = Record<string, number>;

export type PastedTable = { ok: true; rows: CurveRow[]; skippedHeader: boolean } | { ok: false; messages: string[] };

const splitCells = (line: string): string[] => {
  const byTab = line.split('\t');
  if (byTab.length > 1) return byTab.map((c) => c.trim());
  const bySemi = line.split(';');
  if (bySemi.length > 1) return bySemi.map((c) => c.trim());
  // A comma separates cells unless it is a decimal comma inside a single number ("0,5").
  const byComma = line.split(',');
  if (byComma.length > 1 && !/^\s*-?\d+,\d+\s*$/.test(line)) return byComma.map((c) => c.trim());
  return line.trim().split(/\s{1,}(?=[-+.\d])/).map((c) => c.trim());
};

const looksLikeHeader = (cells: string[]): boolean => cells.every((c) => !/\d/.test(c) || /^[A-Za-z(]/.test(c));

/** Reads pasted rows; at most `maxRows` rows are taken (more is a message). */
export function parsePastedTable(text: string, columns: readonly CurveColumn[], maxRows: number): PastedTable {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== '');
  if (lines.length === 0) return { ok: false, messages: ['Nothing to read: paste two columns, one point per line.'] };
  let skippedHeader = false;
  if (looksLikeHeader(splitCells(lines[0]!))) {
    lines.shift();
    skippedHeader = true;
  }
  const messages: string[] = [];
  if (lines.length > maxRows) messages.push(`${lines.length} rows were pasted; a curve takes at most ${maxRows} points.`);
  const rows: CurveRow[] = [];
  lines.slice(0, maxRows).forEach((line, i) => {
    const n = i + 1 + (skippedHeader ? 1 : 0);
    const cells = splitCells(line);
    if (cells.length !== columns.length) {
      messages.push(`Row ${n} ("${line.trim()}") has ${cells.length} cell${cells.length === 1 ? '' : 's'}; each row needs ${columns.length}: ${columns.map((c) => c.label).join(' then ')}.`);
      return;
    }
    const row: CurveRow = {};
    columns.forEach((col, k) => {
      // A decimal comma ("1,5n" from a semicolon CSV) reads as a decimal point.
      const cell = cells[k]!.includes('.') ? cells[k]! : cells[k]!.replace(/^(-?\d+),(\d)/, '$1.$2');
      const parsed = parseEngineering(cell, col.unit);
      if (parsed.ok) row[col.key] = parsed.value;
      else messages.push(`Row ${n}, ${col.label}: "${cells[k]}" is not a value in ${col.unit || 'plain numbers'} (${parsed.message})`);
    });
    if (Object.keys(row).length === columns.length) rows.push(row);
  });
  return messages.length > 0 ? { ok: false, messages } : { ok: true, rows, skippedHeader };
}

/** Tab-separated text of the rows (copy back to a spreadsheet), values in plain SI numbers. */
export function tableText(rows: readonly CurveRow[], columns: readonly CurveColumn[]): string {
  const head = columns.map((c) => `${c.label} (${c.unit})`).join('\t');
  return [head, ...rows.map((r) => columns.map((c) => String(r[c.key])).join('\t'))].join('\n');
}

/** SVG polyline points of the rows in a width × height box (y on a log scale when asked and positive). */
export function plotPoints(rows: readonly CurveRow[], x: string, y: string, width: number, height: number, logY: boolean): string {
  return plotSeries(rows, x, y, undefined, width, height, logY)[0]?.points ?? '';
}

/**
 * One SVG polyline per curve of a family (rows grouped by consecutive values of `series`; all rows one
 * curve without it), on axes shared by every curve. Curves of fewer than two plottable points are left out.
 */
export function plotSeries(
  rows: readonly CurveRow[],
  x: string,
  y: string,
  series: string | undefined,
  width: number,
  height: number,
  logY: boolean,
  logX = false,
): { name: number | undefined; points: string }[] {
  const ty = (v: number) => (logY ? Math.log10(v) : v);
  const tx = (v: number) => (logX ? Math.log10(v) : v);
  const usable = rows.filter((r) => Number.isFinite(r[x]) && Number.isFinite(r[y]) && (!logY || r[y]! > 0) && (!logX || r[x]! > 0));
  const groups: CurveRow[][] = [];
  for (const r of usable) {
    const last = groups.at(-1);
    if (last && series !== undefined && last[0]![series] !== r[series]) groups.push([r]);
    else if (last) last.push(r);
    else groups.push([r]);
  }
  const xs = usable.map((r) => tx(r[x]!));
  const ys = usable.map((r) => ty(r[y]!));
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const [y0, y1] = [Math.min(...ys), Math.max(...ys)];
  const sx = (v: number) => (x1 > x0 ? ((v - x0) / (x1 - x0)) * width : width / 2);
  const sy = (v: number) => (y1 > y0 ? height - ((v - y0) / (y1 - y0)) * height : height / 2);
  return groups
    .filter((g) => g.length >= 2)
    .map((g) => ({
      name: series === undefined ? undefined : g[0]![series],
      points: g.map((r) => `${sx(tx(r[x]!)).toFixed(1)},${sy(ty(r[y]!)).toFixed(1)}`).join(' '),
    }));
}
