/**
 * Identifiers of parts and libraries: one made from a name, and one not yet taken. Used by the part
 * import (a row without an id), the library migration (a library without an id) and the renderer's
 * library (copies, imports), so every route names things the same way.
 */

/** An id made from a name: lower case ASCII letters and digits, other runs as one hyphen, at most 80 characters. */
export function idFromName(name: string): string {
  return name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'part';
}

/** An id not in `taken`: base, base-2, base-3, ... */
export function freeId(base: string, taken: ReadonlySet<string>): string {
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
}
