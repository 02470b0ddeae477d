/**
 * Safe readers for cross-field rules, which run on the raw (possibly invalid) document so that every
 * problem is found in one pass. A reader returns undefined for anything missing or of the wrong type;
 * the schema has already reported those, so a rule simply skips what it cannot read.
 */

export const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/** The value at a dotted path ("parts.switch.qgC"), or undefined. */
export function at(doc: unknown, path: string): unknown {
  let here: unknown = doc;
  for (const key of path.split('.')) {
    if (!isObject(here) || !Object.hasOwn(here, key)) return undefined;
    here = here[key];
  }
  return here;
}

/** A finite number at a path, or undefined. */
export function num(doc: unknown, path: string): number | undefined {
  const v = at(doc, path);
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

/** A string at a path, or undefined. */
export function str(doc: unknown, path: string): string | undefined {
  const v = at(doc, path);
  return typeof v === 'string' ? v : undefined;
}

/** An array at a path, or an empty array. */
export function list(doc: unknown, path: string): unknown[] {
  const v = at(doc, path);
  return Array.isArray(v) ? v : [];
}
