/**
 * The part library as data: reading an imported JSON file (every part checked with the engine's part
 * schema; bad entries are reported by index, field, value and reason and left out), writing the
 * export file, and naming copies.
 */
import { freeId, PARTS_LIBRARY_FORMAT, PARTS_LIBRARY_VERSION, partSchema, validatePartsLibrary } from '../../shared-model/index.ts';
import type { Part, PartKind, PartsLibrary, Problem } from '../../shared-model/index.ts';
import { groupByPath } from './paths.ts';

export const LIBRARY_FORMAT = PARTS_LIBRARY_FORMAT;
export const LIBRARY_VERSION = PARTS_LIBRARY_VERSION;

export type LibraryRead =
  | { ok: true; parts: Part[]; skipped: string[] }
  | { ok: false; message: string; details: string[] };

/** Accepts a parts-library document ({ format, version, name, notes, parts }) or a bare array of parts. */
export function readLibraryText(text: string, fileName: string): LibraryRead {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { ok: false, message: `${fileName} is not valid JSON, so nothing was imported.`, details: [String((error as Error).message)] };
  }
  let list: unknown;
  if (Array.isArray(json)) list = json;
  else if (json !== null && typeof json === 'object' && Array.isArray((json as { parts?: unknown }).parts)) {
    const file = json as { format?: unknown; version?: unknown; parts: unknown[] };
    if (file.format !== undefined && file.format !== LIBRARY_FORMAT) {
      return { ok: false, message: `${fileName} is not a WattLedger part library (format "${String(file.format)}"), so nothing was imported.`, details: [] };
    }
    if (typeof file.version === 'number' && file.version > LIBRARY_VERSION) {
      return {
        ok: false,
        message: `${fileName} is a part library of version ${file.version}; this WattLedger reads version ${LIBRARY_VERSION} or older, so nothing was imported.`,
        details: [],
      };
    }
    list = file.parts;
  } else {
    return { ok: false, message: `${fileName} holds no list of parts, so nothing was imported.`, details: [] };
  }
  const parts: Part[] = [];
  const skipped: string[] = [];
  (list as unknown[]).forEach((entry, index) => {
    const result = partSchema.safeParse(entry);
    if (result.success) parts.push(result.data);
    else for (const list of partProblems(entry).values()) skipped.push(...list.map((p) => `part ${index + 1}: ${p.message}`));
  });
  if (parts.length === 0) {
    return { ok: false, message: `${fileName} holds no valid part, so nothing was imported.`, details: skipped };
  }
  return { ok: true, parts, skipped };
}

/** The app's own library (kept in this app's storage): its id, name and notes; designs link to it by this id. */
export const APP_LIBRARY: PartsLibrary = {
  format: LIBRARY_FORMAT,
  version: LIBRARY_VERSION,
  id: 'my-wattledger-parts',
  name: 'My WattLedger parts',
  notes: 'Exported from the WattLedger part library. Parts marked invented describe no real product.',
  parts: [],
};

/** The parts as a parts-library document (shared-model/design/parts-library.ts), under the app library's id and name unless `header` gives others. */
export function libraryFileText(parts: readonly Part[], header: Pick<PartsLibrary, 'id' | 'name' | 'notes'> = APP_LIBRARY): string {
  const file: PartsLibrary = { ...APP_LIBRARY, id: header.id, name: header.name, notes: header.notes, parts: [...parts] };
  return `${JSON.stringify(file, null, 2)}\n`;
}

/** The ids of `items` (parts or libraries). */
export function idsOf(items: readonly { id: string }[]): ReadonlySet<string> {
  return new Set(items.map((p) => p.id));
}

/** An id not yet used in `taken`: base, base-2, base-3, ... (the engine's freeId, shared with the import). */
export const uniqueId = freeId;

/** Merges imported parts: an id already present gets a fresh id so nothing is overwritten. */
export function mergeParts(existing: readonly Part[], incoming: readonly Part[]): Part[] {
  const taken = new Set(existing.map((p) => p.id));
  const merged = [...existing];
  for (const part of incoming) {
    const id = uniqueId(part.id, taken);
    taken.add(id);
    merged.push(id === part.id ? part : { ...part, id });
  }
  return merged;
}

export function duplicatePart(part: Part, existing: readonly Part[]): Part {
  const id = uniqueId(`${part.id}-copy`, new Set(existing.map((p) => p.id)));
  return { ...structuredClone(part), id, name: `${part.name} (copy)` };
}

export function partsOfKind<K extends PartKind>(parts: readonly Part[], kind: K): Extract<Part, { kind: K }>[] {
  return parts.filter((p): p is Extract<Part, { kind: K }> => p.kind === kind);
}

/**
 * Every problem of a part record, by dotted path, in the engine's own sentences (field, value found,
 * allowed range): the part is checked as a one-part library and the "parts[0]." prefix removed.
 */
export function partProblems(part: unknown): ReadonlyMap<string, Problem[]> {
  const check = validatePartsLibrary({ format: PARTS_LIBRARY_FORMAT, version: PARTS_LIBRARY_VERSION, id: 'draft', name: 'draft', notes: '', parts: [part] });
  if (check.ok) return groupByPath([]);
  return groupByPath(
    check.problems.map((problem) => ({
      ...problem,
      path: problem.path.replace(/^parts\[0\]\.?/, ''),
      message: problem.message.replaceAll('parts[0].', ''),
    })),
  );
}

