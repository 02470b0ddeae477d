/**
 * Browser mode's recent list (issue 16 §5): the names of the files opened or downloaded in this browser,
 * newest first, kept in localStorage. A browser cannot reopen a file by its name or path, so the list is
 * a reminder of what was used, not a way to open it; the desktop app keeps real recent files instead.
 */
export type RecentAction = 'opened' | 'downloaded';

export interface RecentName {
  name: string;
  action: RecentAction;
  /** What the file held: a design or a part library. */
  kind: 'design' | 'library';
  /** ISO 8601 time of the action. */
  at: string;
}

export const RECENT_NAMES_KEY = 'wattledger.recent-names.v1';
export const RECENT_NAMES_MAX = 8;

/** The list with `entry` put first; an older entry of the same name, action and kind is dropped. */
export function withRecent(list: readonly RecentName[], entry: RecentName, max = RECENT_NAMES_MAX): RecentName[] {
  const rest = list.filter((e) => !(e.name === entry.name && e.action === entry.action && e.kind === entry.kind));
  return [entry, ...rest].slice(0, max);
}

const isEntry = (e: unknown): e is RecentName => {
  const r = e as Partial<RecentName> | null;
  return (
    typeof r === 'object' && r !== null && typeof r.name === 'string' && typeof r.at === 'string' &&
    (r.action === 'opened' || r.action === 'downloaded') && (r.kind === 'design' || r.kind === 'library')
  );
};

/** Reads the stored list; anything damaged reads as an empty list. */
export function readRecentNames(storage: Pick<Storage, 'getItem'> | null): RecentName[] {
  try {
    const parsed: unknown = JSON.parse(storage?.getItem(RECENT_NAMES_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter(isEntry).slice(0, RECENT_NAMES_MAX) : [];
  } catch {
    return [];
  }
}

/** Records one action; storage that refuses (private mode, quota) leaves the list as it was. */
export function recordRecentName(storage: Pick<Storage, 'getItem' | 'setItem'> | null, entry: RecentName): RecentName[] {
  const next = withRecent(readRecentNames(storage), entry);
  try {
    storage?.setItem(RECENT_NAMES_KEY, JSON.stringify(next));
  } catch {
    // Nothing to do: the list is a convenience.
  }
  return next;
}
