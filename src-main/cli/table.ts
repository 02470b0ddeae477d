/**
 * Plain-text tables with aligned columns for the terminal: left-aligned text, right-aligned numbers
 * (a column is right-aligned when told so). No colours, no box drawing, so output pastes anywhere.
 */

export interface Column {
  title: string;
  align?: 'left' | 'right';
}

/** Width of a string in terminal cells (every code point counts one; enough for Latin text and units). */
const width = (s: string): number => [...s].length;
const pad = (s: string, n: number, align: 'left' | 'right'): string =>
  align === 'right' ? ' '.repeat(Math.max(0, n - width(s))) + s : s + ' '.repeat(Math.max(0, n - width(s)));

/** Renders rows under column titles, two spaces between columns, trailing spaces trimmed. */
export function renderTable(columns: readonly Column[], rows: readonly (readonly string[])[]): string {
  const widths = columns.map((c, i) => Math.max(width(c.title), ...rows.map((r) => width(r[i] ?? ''))));
  const line = (cells: readonly string[]): string =>
    columns
      .map((c, i) => pad(cells[i] ?? '', widths[i] ?? 0, c.align ?? 'left'))
      .join('  ')
      .trimEnd();
  return [line(columns.map((c) => c.title)), ...rows.map(line)].join('\n');
}

/** A titled section: the title, an underline, the body, and a blank line. */
export function section(title: string, body: string): string {
  return `${title}\n${'-'.repeat(width(title))}\n${body}\n`;
}
