/**
 * Reading CSV text, or cells pasted from a spreadsheet, into rows of text cells.
 *
 * Format: RFC 4180 (quoted fields may hold the separator, doubled quotes and line breaks; CRLF, LF or CR
 * line ends). The separator is found from the first line outside quotes: a tab when it holds a tab (what
 * a spreadsheet puts on the clipboard), else a semicolon when it holds semicolons and no comma, else a
 * comma. A byte-order mark is dropped; blank lines are skipped. A cell that was written with the
 * formula-injection prefix (csvText in write.ts: a leading single quote before `=`, `+`, `-`, `@`, tab or
 * carriage return) is read back without the quote, so a file the tool wrote reads as it was written.
 * Never throws: an unterminated quote is reported as a problem naming the line where the field began.
 */

export interface CsvRow {
  /** 1-based line number where the row starts in the text. */
  line: number;
  cells: string[];
}

export interface CsvReadProblem {
  line: number;
  message: string;
}

export interface CsvTable {
  separator: ',' | ';' | '\t';
  rows: CsvRow[];
  problems: CsvReadProblem[];
}

const UNPREFIX = /^'[=+\-@\t\r]/;

function separatorOf(text: string): CsvTable['separator'] {
  let inQuotes = false;
  let sawSemicolon = false;
  let sawComma = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === '"') inQuotes = !inQuotes;
    else if (!inQuotes && (ch === '\n' || ch === '\r')) break;
    else if (!inQuotes && ch === '\t') return '\t';
    else if (!inQuotes && ch === ';') sawSemicolon = true;
    else if (!inQuotes && ch === ',') sawComma = true;
  }
  return sawSemicolon && !sawComma ? ';' : ',';
}

/** Parses `text` (see header). */
export function readCsv(text: string): CsvTable {
  const src = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const separator = separatorOf(src);
  const rows: CsvRow[] = [];
  const problems: CsvReadProblem[] = [];
  let line = 1;
  let rowLine = 1;
  let cells: string[] = [];
  let field = '';
  let quoted = false;
  let inQuotes = false;
  let quoteLine = 1;
  const endField = () => {
    cells.push(quoted && UNPREFIX.test(field) ? field.slice(1) : field);
    field = '';
    quoted = false;
  };
  const endRow = () => {
    endField();
    if (cells.length > 1 || cells[0] !== '') rows.push({ line: rowLine, cells });
    cells = [];
  };
  for (let i = 0; i < src.length; i++) {
    const ch = src[i]!;
    if (inQuotes) {
      if (ch === '"') {
        if (src[i + 1] === '"') {
          field += '"';
          i++;
        } else inQuotes = false;
      } else {
        if (ch === '\n' || (ch === '\r' && src[i + 1] !== '\n')) line++;
        field += ch;
      }
      continue;
    }
    if (ch === '"' && field === '' && !quoted) {
      inQuotes = true;
      quoted = true;
      quoteLine = line;
    } else if (ch === separator) endField();
    else if (ch === '\r' || ch === '\n') {
      if (ch === '\r' && src[i + 1] === '\n') i++;
      endRow();
      line++;
      rowLine = line;
    } else field += ch;
  }
  if (inQuotes) problems.push({ line: quoteLine, message: `Line ${quoteLine}: a quoted field is never closed (a " is missing).` });
  if (field !== '' || cells.length > 0 || quoted) endRow();
  return { separator, rows, problems };
}
