import { describe, expect, it } from 'vitest';
import { readRecentNames, recordRecentName, RECENT_NAMES_KEY, RECENT_NAMES_MAX, type RecentName } from '../../../src-renderer/desktop/recent-names.ts';

function memory(): Storage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    get length() {
      return data.size;
    },
    clear: () => data.clear(),
    getItem: (k) => data.get(k) ?? null,
    key: (i) => [...data.keys()][i] ?? null,
    removeItem: (k) => void data.delete(k),
    setItem: (k, v) => void data.set(k, v),
  };
}

const at = (n: number) => `2026-12-05T10:${String(n).padStart(2, '0')}:00.000Z`;
const entry = (name: string, n: number, action: RecentName['action'] = 'opened'): RecentName => ({ name, action, kind: 'design', at: at(n) });

describe('browser recent names', () => {
  it('lists the newest first and moves a name used again to the top', () => {
    const s = memory();
    recordRecentName(s, entry('a.json', 1));
    recordRecentName(s, entry('b.json', 2));
    const list = recordRecentName(s, entry('a.json', 3));
    expect(list.map((e) => e.name)).toEqual(['a.json', 'b.json']);
    expect(readRecentNames(s)).toEqual(list);
    expect(readRecentNames(s)[0]!.at).toBe(at(3));
  });

  it('keeps an opened and a downloaded entry of the same name apart', () => {
    const s = memory();
    recordRecentName(s, entry('a.json', 1, 'opened'));
    const list = recordRecentName(s, entry('a.json', 2, 'downloaded'));
    expect(list.map((e) => e.action)).toEqual(['downloaded', 'opened']);
  });

  it(`keeps at most ${RECENT_NAMES_MAX} names`, () => {
    const s = memory();
    for (let i = 0; i < RECENT_NAMES_MAX + 3; i++) recordRecentName(s, entry(`f${i}.json`, i));
    const list = readRecentNames(s);
    expect(list).toHaveLength(RECENT_NAMES_MAX);
    expect(list[0]!.name).toBe(`f${RECENT_NAMES_MAX + 2}.json`);
  });

  it('reads damaged or foreign storage as an empty list and survives storage that refuses to write', () => {
    const s = memory();
    s.setItem(RECENT_NAMES_KEY, '{not json');
    expect(readRecentNames(s)).toEqual([]);
    s.setItem(RECENT_NAMES_KEY, JSON.stringify([{ name: 3 }, entry('ok.json', 1)]));
    expect(readRecentNames(s).map((e) => e.name)).toEqual(['ok.json']);
    const refusing = { getItem: () => null, setItem: () => { throw new Error('quota'); } };
    expect(recordRecentName(refusing, entry('x.json', 1)).map((e) => e.name)).toEqual(['x.json']);
    expect(readRecentNames(null)).toEqual([]);
  });
});
