import { describe, expect, it } from 'vitest';
import { parseDesignText, serializeDesign, validateDesign } from '../../../shared-model/index.ts';
import { findJsonSyntaxError } from '../../../shared-model/design/json-position.ts';
import { demo, setPath } from './fixtures.ts';

const demoText = (): string => `${JSON.stringify(demo('synchronous-buck'), null, 2)}\n`;

describe('parseDesignText reads a design file', () => {
  it('reads a demo and equals validateDesign of the same JSON', () => {
    const r = parseDesignText(demoText());
    expect(r).toEqual(validateDesign(demo('synchronous-buck')));
    expect(r.ok).toBe(true);
  });

  it('skips a UTF-8 byte order mark', () => {
    expect(parseDesignText(`\uFEFF${demoText()}`).ok).toBe(true); // RFC 8259 §8.1: parsers MAY ignore a BOM
  });

  it('refuses an empty file with one sentence', () => {
    const r = parseDesignText('  \n');
    expect(r.ok ? '' : r.problems[0]?.message).toBe('The design file is empty; it must hold a JSON object.');
  });

  it('refuses an overflowing number such as 1e999 instead of reading Infinity', () => {
    const text = demoText().replace('"vinMaxV": 16.8', '"vinMaxV": 1e999');
    const r = parseDesignText(text);
    const p = r.ok ? undefined : r.problems.find((x) => x.path === 'spec.vinMaxV');
    expect(p?.value).toBe(Number.POSITIVE_INFINITY); // ECMA-262 JSON.parse rounds 1e999 to +Infinity (IEEE 754 overflow)
    expect(p?.message).toContain('Infinity (not a finite number)');
  });

  it('gives line and column of a syntax error', () => {
    const text = demoText().replace('"vinNomV": 14.4,', '"vinNomV": 14.4,,');
    const r = parseDesignText(text);
    const p = r.ok ? undefined : r.problems[0];
    const line = text.split('\n').findIndex((l) => l.includes('14.4,,')) + 1;
    expect(p?.line).toBe(line);
    expect(p?.column).toBe((text.split('\n')[line - 1] ?? '').indexOf(',,') + 2); // the second comma (1-based column)
    expect(p?.message).toContain(`line ${line}, column`);
  });
});

describe('findJsonSyntaxError follows the JSON grammar (RFC 8259)', () => {
  it.each([
    ['{"a": 1}', null], // RFC 8259 §4 object
    ['[1, 2.5e-3, -0, true, false, null, "x\\u00e9"]', null], // RFC 8259 §5–§7 values, numbers, strings
    ['{"a": 1,}', /comma before "}"/], // RFC 8259 §4: no trailing comma
    ['[1, 2,]', /comma before "]"/], // RFC 8259 §5: no trailing comma
    ["{'a': 1}", /key in double quotes/], // RFC 8259 §7: strings use quotation marks
    ['{a: 1}', /key in double quotes/], // RFC 8259 §4: member names are strings
    ['{"a" 1}', /":" was expected/], // RFC 8259 §4: name-separator
    ['{"a": 01}', /"," or "}" was expected/], // RFC 8259 §6: no leading zeros
    ['{"a": NaN}', /a value was expected/], // RFC 8259 §6: NaN is not permitted
    ['{"a": "line\nbreak"}', /control character/], // RFC 8259 §7: control characters must be escaped
    ['{"a": "\\x"}', /not a JSON escape/], // RFC 8259 §7: the escapes are \" \\ \/ \b \f \n \r \t \uXXXX
    ['{"a": 1} x', /more text/], // RFC 8259 §2: one value per text
    ['{"a": "open', /not closed/], // RFC 8259 §7
  ])('%j → %s', (text, expected) => {
    const found = findJsonSyntaxError(text);
    if (expected === null) {
      expect(found).toBeNull();
      expect(() => JSON.parse(text)).not.toThrow(); // agrees with the engine's own JSON.parse (ECMA-262 §25.5.1)
    } else {
      expect(found?.reason).toMatch(expected);
      expect(() => JSON.parse(text)).toThrow(); // agrees with JSON.parse (ECMA-262 §25.5.1)
    }
  });

  it('counts lines and columns from 1', () => {
    expect(findJsonSyntaxError('{\n  "a": 1,\n  ]\n}')).toMatchObject({ line: 3, column: 3 });
  });
});

describe('serializeDesign writes JSON that reads back the same, and refuses what JSON cannot hold', () => {
  it('round-trips a demo exactly', () => {
    const design = validateDesign(demo('diode-boost'));
    if (!design.ok) throw new Error('demo invalid');
    const text = serializeDesign(design.design);
    const back = text.ok ? parseDesignText(text.text) : undefined;
    expect(back?.ok && back.design).toEqual(design.design);
  });

  it.each([
    ['spec.vinMaxV', Number.NaN],
    ['spec.vinMaxV', Number.POSITIVE_INFINITY],
    ['parts.switch.qgC', Number.NEGATIVE_INFINITY],
  ])('refuses %s = %s (JSON.stringify would write null and lose the value, ECMA-262 §25.5.2)', (path, bad) => {
    const r = serializeDesign(setPath(demo('synchronous-buck'), path, bad));
    expect(r.ok ? [] : r.problems.map((p) => [p.path, p.allowed])).toEqual([[path, 'a finite number']]);
  });

  it('refuses bigints, functions, undefined list items and cycles, and never throws', () => {
    const cyclic: Record<string, unknown> = { a: 1 };
    cyclic.self = cyclic;
    for (const value of [{ n: 10n }, { f: () => 1 }, { list: [1, undefined] }, cyclic]) {
      const r = serializeDesign(value);
      expect(r.ok).toBe(false);
    }
  });

  it('saves a half-finished design (a lost file is worse than an invalid one)', () => {
    const r = serializeDesign({ format: 'wattledger.design', version: 1, name: '' });
    expect(r.ok).toBe(true);
  });
});

describe('notices and problems never carry a huge or deep value (issue 15 §3)', () => {
  const base = demoText().trimEnd().slice(0, -1);

  it('an unknown key holding a 10 MB text: named, and the text summarised to 40 characters and its length', () => {
    const r = parseDesignText(`${base}, "huge": "${'x'.repeat(10_000_000)}"}`);
    expect(r.ok).toBe(true);
    const n = r.ok ? r.warnings?.find((w) => w.path === 'huge') : undefined;
    expect(n?.message).toBe('huge is not a WattLedger key and was ignored (misspelt?).');
    expect(n?.value).toBe(`${'x'.repeat(40)}… (10,000,000 characters; not shown)`);
  });

  it('an unknown key nested 5 000 levels deep: named, summarised with its depth, and the result still serialises', () => {
    const r = parseDesignText(`${base}, "extraKey": ${'{"k":'.repeat(5000)}1${'}'.repeat(5000)}}`);
    expect(r.ok).toBe(true);
    const n = r.ok ? r.warnings?.find((w) => w.path === 'extraKey') : undefined;
    expect(n?.value).toBe('(an object with 1 key, nested 5,000 levels deep; not shown)');
    expect(() => JSON.stringify(r)).not.toThrow(); // the CLI's --json output of the same record
  });

  it('a known field given a deep object is refused with a problem whose value is summarised', () => {
    const r = parseDesignText(demoText().replace('"vinMaxV": 16.8', `"vinMaxV": ${'['.repeat(3000)}${']'.repeat(3000)}`));
    expect(r.ok).toBe(false);
    const p = r.ok ? undefined : r.problems.find((x) => x.path === 'spec.vinMaxV');
    expect(p?.value).toBe('(a list of 1 item, nested 3,000 levels deep; not shown)');
    expect(() => JSON.stringify(r)).not.toThrow();
  });
});
