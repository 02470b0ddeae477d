/**
 * Field paths into the design document ("parts.switch.rdsOn25Ohm", "thermal.heatsinks.0.name"):
 * read a value, and write one immutably (structural sharing, so undo snapshots stay cheap).
 */
export type PathSegment = string | number;
export type Path = readonly PathSegment[];

/**
 * The dotted form the validator uses in its problems ("thermal.heatsinks[0].id"), so a field finds
 * the problems that concern it.
 */
export function pathKey(path: Path | string): string {
  if (typeof path === 'string') return path;
  let out = '';
  for (const segment of path) {
    if (typeof segment === 'number') out += `[${segment}]`;
    else out += out === '' ? segment : `.${segment}`;
  }
  return out;
}

export function getAt(root: unknown, path: Path): unknown {
  let node = root;
  for (const segment of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PathSegment, unknown>)[segment];
  }
  return node;
}

/**
 * Returns a copy of `root` with `value` at `path`; objects and arrays along the path are copied, the
 * rest is shared. `undefined` removes an object key (optional fields left blank).
 */
export function setAt<T>(root: T, path: Path, value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path;
  const node = (root ?? (typeof head === 'number' ? [] : {})) as Record<PathSegment, unknown>;
  const child = setAt(node[head as PathSegment], rest, value);
  if (Array.isArray(node)) {
    const copy = node.slice();
    copy[head as number] = child;
    return copy as T;
  }
  const copy: Record<PathSegment, unknown> = { ...node };
  if (child === undefined && rest.length === 0) delete copy[head as PathSegment];
  else copy[head as PathSegment] = child;
  return copy as T;
}

/** Items that carry a path (validation problems), grouped by dotted path. */
export function groupByPath<T extends { path: string }>(items: readonly T[]): ReadonlyMap<string, T[]> {
  const map = new Map<string, T[]>();
  for (const item of items) map.set(item.path, [...(map.get(item.path) ?? []), item]);
  return map;
}
