/**
 * The parts library document: a list of part records that designs and comparisons can pick from, kept
 * in a file of its own (several may be open at once; a design links to a part by library id and part id).
 *   { "format": "wattledger.parts", "version": 2, "id": "...", "name": "...", "notes": "...", "parts": [Part, ...] }
 * `id` names the library for the links of designs (design/schema.ts `sources`); it stays when the file
 * is renamed or moved. Each part is a record of design/parts.ts (its `kind` says which); ids are unique
 * within a library. Version 1 had no `id` (design/parts-library-migrate.ts makes one from the name).
 * The library that ships in assets/parts/library.json holds invented parts only (`invented: true`).
 */
import { z } from 'zod';
import { partSchema } from './parts.ts';
import type { Part, PartKind } from './parts.ts';
import { migratePartsLibrary } from './parts-library-migrate.ts';
import type { DesignNotice, Problem } from './problems.ts';
import { problem } from './problems.ts';
import { list } from './read.ts';
import { problemsFromZod } from './zod-problems.ts';
import { PARTS_LIBRARY_FORMAT, PARTS_LIBRARY_VERSION } from './parts-library-version.ts';

export { PARTS_LIBRARY_FORMAT, PARTS_LIBRARY_VERSION };

export const partsLibrarySchema = z.object({
  format: z.literal(PARTS_LIBRARY_FORMAT),
  version: z.literal(PARTS_LIBRARY_VERSION),
  /** Stable identifier of the library, for the links of designs: letters, digits, "-", "_", ".". */
  id: z.string().min(1).max(80).regex(/^[A-Za-z0-9._-]+$/),
  name: z.string().min(1).max(120),
  notes: z.string().max(10000),
  parts: z.array(partSchema).max(10000),
});

export type PartsLibrary = z.infer<typeof partsLibrarySchema>;

export type PartsLibraryValidation =
  | { ok: true; library: PartsLibrary; notices: DesignNotice[] }
  | { ok: false; problems: Problem[] };

/** Checks a parsed JSON value as a parts library (migrating older versions); the library typed, or every problem. Never throws. */
export function validatePartsLibrary(json: unknown): PartsLibraryValidation {
  const migrated = migratePartsLibrary(json);
  if (!migrated.ok) return migrated;
  const doc = migrated.json;
  const parsed = partsLibrarySchema.safeParse(doc);
  const problems = parsed.success ? [] : problemsFromZod(parsed.error.issues, partsLibrarySchema, doc);
  const ids = new Set<string>();
  list(doc, 'parts').forEach((part, i) => {
    const id = part !== null && typeof part === 'object' && typeof (part as { id?: unknown }).id === 'string' ? (part as { id: string }).id : undefined;
    if (id !== undefined && ids.has(id))
      problems.push(problem(`parts[${i}].id`, id, 'an id used by no other part', `parts[${i}].id "${id}" is used by another part; ids must be unique.`));
    if (id !== undefined) ids.add(id);
  });
  if (problems.length > 0 || !parsed.success) return { ok: false, problems };
  return { ok: true, library: parsed.data, notices: migrated.notes };
}

/** The parts of one kind, in library order. */
export function partsOfKind<K extends PartKind>(library: PartsLibrary, kind: K): Extract<Part, { kind: K }>[] {
  return library.parts.filter((p): p is Extract<Part, { kind: K }> => p.kind === kind);
}
