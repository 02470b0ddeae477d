/**
 * Repeated keys in a design file (RFC 8259 §4: names SHOULD be unique; JSON.parse keeps the last) are
 * reported with the key's path and both lines (issue 15 §3).
 */
import { describe, expect, it } from 'vitest';
import { parseDesignText } from '../../../shared-model/index.ts';
import { duplicateKeys, MAX_DUPLICATES_REPORTED } from '../../../shared-model/design/json-keys.ts';
import { readFileSync } from 'node:fs';

const demo = readFileSync(new URL('../../../assets/designs/synchronous-buck.json', import.meta.url), 'utf8');

describe('duplicateKeys()', () => {
  it('finds nothing in a file without repeats', () => {
    expect(duplicateKeys(demo)).toEqual([]);
  });

  it('names the path and both lines, counting lines at LF', () => {
    const text = '{\n  "spec": {\n    "vinMaxV": 16.8,\n    "voutV": 3.3,\n    "vinMaxV": 20\n  }\n}';
    expect(duplicateKeys(text)).toEqual([{ path: 'spec.vinMaxV', key: 'vinMaxV', line: 5, firstLine: 3 }]);
  });

  it('compares decoded keys (an escaped spelling is the same name), and tells objects in a list apart', () => {
    expect(duplicateKeys('{"a\\u0062": 1, "ab": 2}')).toEqual([{ path: 'ab', key: 'ab', line: 1, firstLine: 1 }]); // RFC 8259 §7: \u0062 is "b"
    expect(duplicateKeys('{"l": [{"id": 1}, {"id": 2}], "m": [{"x": {"y": 1, "y": 2}}]}')).toEqual([{ path: 'm[0].x.y', key: 'y', line: 1, firstLine: 1 }]);
  });

  it('is not fooled by braces, quotes and commas inside text', () => {
    expect(duplicateKeys('{"a": "x\\"}, \\"a\\": {", "b": "{\\"a\\":1}"}')).toEqual([]);
  });

  it('handles nesting far deeper than a recursive reader could (iterative)', () => {
    const depth = 200_000;
    const text = `{"x":${'{"k":'.repeat(depth)}{"d":1,"d":2}${'}'.repeat(depth)}}`;
    const found = duplicateKeys(text);
    expect(found).toHaveLength(1);
    expect(found[0]?.path.startsWith('x.k.k')).toBe(true);
    expect(found[0]?.path.endsWith('….d')).toBe(true); // long paths shortened
  });

  it(`reports at most ${MAX_DUPLICATES_REPORTED}`, () => {
    const text = `{${Array.from({ length: 50 }, () => '"a": 1').join(',')}}`;
    expect(duplicateKeys(text)).toHaveLength(MAX_DUPLICATES_REPORTED);
  });
});

describe('parseDesignText and repeated keys', () => {
  it('accepts the design (the last value is used, as JSON.parse does) and adds a notice naming key and lines', () => {
    const text = demo.replace('"vinMaxV": 16.8,', '"vinMaxV": 16.8,\n    "vinMaxV": 18,');
    const read = parseDesignText(text);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.design.spec.vinMaxV).toBe(18); // ECMA-262 JSON.parse: the last of repeated names wins
    const line = text.split('\n').findIndex((l) => l.includes('"vinMaxV": 18')) + 1;
    expect(read.warnings?.[0]).toEqual({ path: 'spec.vinMaxV', value: 'vinMaxV', line, message: `spec.vinMaxV appears more than once in the file (line ${line - 1} and line ${line}); the last one (line ${line}) was used.` });
  });
});
