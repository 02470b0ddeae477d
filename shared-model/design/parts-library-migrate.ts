/**
 * Version handling of the parts library document: checks the format tag, refuses libraries from a newer
 * WattLedger, and brings older versions up to the current one (design/parts-library.ts).
 *   Version 1 → 2: the library gains `id`, made from its name (design/ids.ts idFromName), so designs can
 *   link to it; a notice says so, and saving writes version 2.
 * A bare list of parts (what early builds exported) reads as a version 1 library named "Imported parts".
 * Migration does not validate: validatePartsLibrary checks the result. It never modifies its input.
 */
import { idFromName } from './ids.ts';
import { PARTS_LIBRARY_FORMAT, PARTS_LIBRARY_VERSION } from './parts-library-version.ts';
import type { DesignNotice, Problem } from './problems.ts';
import { describeValue, problem } from './problems.ts';
import { isObject } from './read.ts';

export type LibraryMigration = { ok: true; json: Record<string, unknown>; fromVersion: number; notes: DesignNotice[] } | { ok: false; problems: Problem[] };

function from1(doc: Record<string, unknown>, notes: DesignNotice[]): Record<string, unknown> {
  const { format, version: _version, ...rest } = doc;
  const id = typeof doc.id === 'string' ? doc.id : idFromName(typeof doc.name === 'string' ? doc.name : 'library');
  if (typeof doc.id !== 'string') notes.push({ path: 'id', value: id, message: `The library had no id (version 1); it is now "${id}", made from its name. Designs link to parts by this id.` });
  return { format, version: 2, id, ...rest };
}

/** Checks `format` and `version` and brings an older library up to the current version. */
export function migratePartsLibrary(json: unknown): LibraryMigration {
  const doc: unknown = Array.isArray(json) ? { format: PARTS_LIBRARY_FORMAT, version: 1, name: 'Imported parts', notes: '', parts: json } : json;
  if (!isObject(doc))
    return { ok: false, problems: [problem('', json, 'a JSON object', `The parts library is ${describeValue(json)}; it must be a JSON object.`)] };
  if (doc.format !== PARTS_LIBRARY_FORMAT)
    return { ok: false, problems: [problem('format', doc.format, JSON.stringify(PARTS_LIBRARY_FORMAT), `format is ${describeValue(doc.format)}; a WattLedger parts library says "format": "${PARTS_LIBRARY_FORMAT}" (is this a parts library?).`)] };
  const version = doc.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1)
    return { ok: false, problems: [problem('version', version, `a whole number from 1 to ${PARTS_LIBRARY_VERSION}`)] };
  if (version > PARTS_LIBRARY_VERSION)
    return { ok: false, problems: [problem('version', version, `1 to ${PARTS_LIBRARY_VERSION}`, `This parts library was made by a newer WattLedger: version ${version}, this build reads up to ${PARTS_LIBRARY_VERSION}.`)] };
  const notes: DesignNotice[] = [];
  const migrated = version === 1 ? from1(doc, notes) : { ...doc };
  if (version < PARTS_LIBRARY_VERSION)
    notes.unshift({ path: 'version', value: version, message: `Migrated from version ${version} to ${PARTS_LIBRARY_VERSION}; saving writes version ${PARTS_LIBRARY_VERSION}.` });
  return { ok: true, json: migrated, fromVersion: version, notes };
}
