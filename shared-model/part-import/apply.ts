/**
 * Adding the good rows of an import to a library: all of them or none (the caller passes the preview's
 * good parts only when the user chose to import them). Ids stay unique: an id already in the library, or
 * taken by an earlier imported row, gets the first free "-2", "-3"... suffix, and every such change is
 * listed, so nothing is overwritten and nothing is renamed silently.
 */
import { freeId } from '../design/ids.ts';
import type { Part } from '../design/parts.ts';

export interface ImportApplied {
  /** The library's parts followed by the imported ones. */
  parts: Part[];
  added: Part[];
  renamed: { from: string; to: string; name: string }[];
}

/** The library with `incoming` appended (see the file header). */
export function applyImport(existing: readonly Part[], incoming: readonly Part[]): ImportApplied {
  const taken = new Set(existing.map((p) => p.id));
  const added: Part[] = [];
  const renamed: ImportApplied['renamed'] = [];
  for (const part of incoming) {
    const id = freeId(part.id, taken);
    taken.add(id);
    if (id !== part.id) renamed.push({ from: part.id, to: id, name: part.name });
    added.push(id === part.id ? part : { ...part, id });
  }
  return { parts: [...existing, ...added], added, renamed };
}
