/**
 * readCsv: RFC 4180 parsing, spreadsheet paste (tab separated), and reading back what csvLines wrote.
 */
import { describe, expect, it } from 'vitest';
import { csvLines, readCsv } from '../../../shared-model/index.ts';

const cells = (text: string) => readCsv(text).rows.map((r) => r.cells);

describe('readCsv', () => {
  it('reads the RFC 4180 examples', () => {
    expect(cells('aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n')).toEqual([['aaa', 'bbb', 'ccc'], ['zzz', 'yyy', 'xxx']]); // RFC 4180 §2.1
    expect(cells('aaa,bbb,ccc\r\nzzz,yyy,xxx')).toEqual([['aaa', 'bbb', 'ccc'], ['zzz', 'yyy', 'xxx']]); // RFC 4180 §2.2: last line break optional
    expect(cells('"aaa","b\r\nbb","ccc"\r\n')).toEqual([['aaa', 'b\r\nbb', 'ccc']]); // RFC 4180 §2.6
    expect(cells('"aaa","b""bb","ccc"')).toEqual([['aaa', 'b"bb', 'ccc']]); // RFC 4180 §2.7
  });

  it('takes tab-separated cells pasted from a spreadsheet', () => {
    const table = readCsv('vinV\tloadA\n12\t1,5\n');
    expect(table.separator).toBe('\t'); // common practice: spreadsheets copy cells as tab-separated text
    expect(table.rows.map((r) => r.cells)).toEqual([['vinV', 'loadA'], ['12', '1,5']]);
  });

  it('takes semicolon-separated files when the header has no comma', () => {
    expect(readCsv('a;b\n1;2\n').separator).toBe(';'); // common practice: locales with a decimal comma separate with ";"
  });

  it('drops a byte-order mark and skips blank lines, keeping each row\'s line number', () => {
    const table = readCsv('\uFEFFa,b\n\n1,2\r\n\r\n3,4\n');
    expect(table.rows.map((r) => r.line)).toEqual([1, 3, 5]);
    expect(table.rows[0]!.cells).toEqual(['a', 'b']);
  });

  it('counts the line breaks inside quoted fields in the line numbers', () => {
    expect(readCsv('"a\nb",c\nd,e\n').rows.map((r) => r.line)).toEqual([1, 3]);
  });

  it('reports an unterminated quote with the line where the field began', () => {
    const table = readCsv('a,b\n1,"two\n3,4\n');
    expect(table.problems).toHaveLength(1);
    expect(table.problems[0]!.line).toBe(2);
    expect(table.problems[0]!.message).toMatch(/Line 2/);
  });

  it('reads back exactly what csvLines wrote, formula-injection prefixes included', () => {
    const rows = [['name', 'value [W]'], ['=1+1', -2.5], ['@x', 1e-9], ['a,"b"', 0]] as const;
    const back = cells(csvLines(rows));
    expect(back).toEqual(rows.map((r) => r.map((c) => (typeof c === 'number' ? String(c) : c))));
  });
});
