/**
 * The parts library document: a list of part records that designs and comparisons can pick from.
 *   { "format": "wattledger.parts", "version": 1, "name": "...", "notes": "...", "parts": [Part, ...] }
 * Each part is a record of design/parts.ts (its `kind` says which); ids are unique within a library.
 * The library that ships in assets/parts/library.json holds invented parts only (`invented: true`).
 */
import { z } from 'zod';
import { partSchema } from './parts.ts';
import type { Part, PartKind } from './parts.ts';
import type { Problem } from './problems.ts';
import { describeValue, problem } from './problems.ts';
import { isObject, list } from './read.ts';
import { problemsFromZod } from './zod-problems.ts';

export const PARTS_LIBRARY_FORMAT = 'wattledger.parts';
export const PARTS_LIBRARY_VERSION = 1;

export const partsLibrarySchema = z.object({
  format: z.literal(PARTS_LIBRARY_FORMAT),
  version: z.literal(PARTS_LIBRARY_VERSION),
  name: z.string().min(1).max(120),
  notes: z.string().max(10000),
  parts: z.array(partSchema).max(10000),
});

export type PartsLibrary = z.infer<typeof partsLibrarySchema>;

/** Checks a parsed JSON value as a parts library; returns it typed, or every problem. Never throws. */
export function validatePartsLibrary(json: unknown): { ok: true; library: PartsLibrary } | { ok: false; problems: Problem[] } {
  if (!isObject(json))
    return { ok: false, problems: [problem('', json, 'a JSON object', `The parts library is ${describeValue(json)}; it must be a JSON object.`)] };
  if (typeof json.version === 'number' && json.version > PARTS_LIBRARY_VERSION)
    return {
      ok: false,
      problems: [problem('version', json.version, `1 to ${PARTS_LIBRARY_VERSION}`,
        `This parts library was made by a newer WattLedger: version ${json.version}, this build reads up to ${PARTS_LIBRARY_VERSION}.`)],
    };
  const parsed = partsLibrarySchema.safeParse(json);
  const problems = parsed.success ? [] : problemsFromZod(parsed.error.issues, partsLibrarySchema, json);
  const ids = new Set<string>();
  list(json, 'parts').forEach((part, i) => {
    const id = isObject(part) && typeof part.id === 'string' ? part.id : undefined;
    if (id !== undefined && ids.has(id))
      problems.push(problem(`parts[${i}].id`, id, 'an id used by no other part', `parts[${i}].id "${id}" is used by another part; ids must be unique.`));
    if (id !== undefined) ids.add(id);
  });
  if (problems.length > 0 || !parsed.success) return { ok: false, problems };
  return { ok: true, library: parsed.data };
}

/** The parts of one kind, in library order. */
export function partsOfKind<K extends PartKind>(library: PartsLibrary, kind: K): Extract<Part, { kind: K }>[] {
  return library.parts.filter((p): p is Extract<Part, { kind: K }> => p.kind === kind);
}
