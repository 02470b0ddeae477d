/**
 * The parts library as text: read (JSON → migrated, validated library; syntax errors with line and
 * column) and write (the canonical text: keys in schema order, two-space indent, shortest round-trip
 * numbers, final LF — the same rules as the design's canonical text, design/canonical.ts).
 */
import { canonicalOrder } from './canonical.ts';
import { findJsonSyntaxError } from './json-position.ts';
import type { PartsLibrary, PartsLibraryValidation } from './parts-library.ts';
import { partsLibrarySchema, validatePartsLibrary } from './parts-library.ts';
import { problem } from './problems.ts';
import { unrepresentable } from './document-text.ts';
import type { Problem } from './problems.ts';

/** Reads a parts library from JSON text. Never throws. */
export function parsePartsLibraryText(text: string): PartsLibraryValidation {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, problems: [{ ...problem('', '', 'a JSON object', 'The parts library file is empty; it must hold a JSON object.'), line: 1, column: 1 }] };
  let json: unknown;
  try {
    json = JSON.parse(body);
  } catch {
    const where = findJsonSyntaxError(body);
    if (!where) return { ok: false, problems: [problem('', undefined, 'JSON text (RFC 8259)', 'The parts library file is not valid JSON.')] };
    const excerpt = (body.split('\n')[where.line - 1] ?? '').trim().slice(0, 60);
    return { ok: false, problems: [{ ...problem('', excerpt, 'JSON text (RFC 8259)', `The parts library file is not valid JSON at line ${where.line}, column ${where.column}: ${where.reason} (line reads: ${excerpt}).`), line: where.line, column: where.column }] };
  }
  return validatePartsLibrary(json);
}

/** The canonical text of a library, or why JSON cannot hold it. Never throws. */
export function serializePartsLibrary(library: PartsLibrary): { ok: true; text: string } | { ok: false; problems: Problem[] } {
  const problems = unrepresentable(library);
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, text: `${JSON.stringify(canonicalOrder(library, partsLibrarySchema), null, 2)}\n` };
}
