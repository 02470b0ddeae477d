import { describe, expect, it } from 'vitest';
import { getAt, pathKey, setAt } from '../../../src-renderer/state/paths.ts';

describe('document paths', () => {
  it('pathKey writes array indexes the way the validator names fields', () => {
    expect(pathKey(['thermal', 'heatsinks', 0, 'id'])).toBe('thermal.heatsinks[0].id'); // shared-model/design/problems.ts pathToString format
    expect(pathKey(['spec', 'vinMaxV'])).toBe('spec.vinMaxV');
  });

  it('setAt copies only the objects along the path', () => {
    const doc = { a: { b: 1, c: { d: 2 } }, e: [1, 2] };
    const next = setAt(doc, ['a', 'b'], 5);
    expect(next.a.b).toBe(5);
    expect(doc.a.b).toBe(1); // the original is untouched (undo keeps it)
    expect(next.a.c).toBe(doc.a.c); // structural sharing
    expect(next.e).toBe(doc.e);
  });

  it('setAt writes into arrays and removes a key given undefined', () => {
    const doc = { list: [{ x: 1 }, { x: 2 }], opt: 3 as number | undefined };
    expect(setAt(doc, ['list', 1, 'x'], 9).list[1]).toEqual({ x: 9 });
    expect('opt' in setAt(doc, ['opt'], undefined)).toBe(false);
  });

  it('setAt creates missing objects along the path', () => {
    expect(setAt({} as Record<string, unknown>, ['targets', 'outputRippleV'], 0.05)).toEqual({ targets: { outputRippleV: 0.05 } });
  });

  it('getAt reads nested values and gives undefined for missing ones', () => {
    const doc = { a: [{ b: 'x' }] };
    expect(getAt(doc, ['a', 0, 'b'])).toBe('x');
    expect(getAt(doc, ['a', 3, 'b'])).toBeUndefined();
  });
});
