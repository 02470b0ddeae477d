/**
 * Changing the part of a role together with its link: take a library part (the design's copy becomes
 * the library's values and the link names the entry), update from the linked entry (the one action
 * the app offers for a part that differs), or unlink (the copy stays, the link goes). Each returns a new
 * design record and leaves its input unchanged; the caller validates the result like any edit (a part
 * of another kind than the role takes is refused by validateDesign).
 */
import type { Part } from '../design/parts.ts';
import type { PartsLibrary } from '../design/parts-library.ts';
import type { Design, Role } from '../design/schema.ts';

function withPart(design: Design, role: Role, part: Part): Design {
  const slot = design.parts[role];
  const next = slot !== undefined && 'count' in slot && 'part' in slot ? { ...slot, part } : part;
  return { ...design, parts: { ...design.parts, [role]: next } as Design['parts'] };
}

/** The design with `role` holding a copy of `partId` from `library`, linked to it; undefined if no such part. */
export function takeLibraryPart(design: Design, role: Role, library: PartsLibrary, partId: string): Design | undefined {
  const part = library.parts.find((p) => p.id === partId);
  if (!part) return undefined;
  const linked = withPart(design, role, JSON.parse(JSON.stringify(part)) as Part); // part records are plain JSON
  return { ...linked, sources: { ...design.sources, [role]: { libraryId: library.id, libraryName: library.name, partId } } };
}

/** The design with the linked part of `role` replaced by its library entry's current values; undefined when not linked to `library` or the entry is gone. */
export function updateFromLibrary(design: Design, role: Role, library: PartsLibrary): Design | undefined {
  const source = design.sources?.[role];
  if (!source || source.libraryId !== library.id) return undefined;
  return takeLibraryPart(design, role, library, source.partId);
}

/** The design without the link of `role` (its values stay). */
export function unlinkPart(design: Design, role: Role): Design {
  if (!design.sources?.[role]) return design;
  const { [role]: _gone, ...rest } = design.sources;
  const { sources: _sources, ...without } = design;
  return Object.keys(rest).length > 0 ? { ...without, sources: rest } : without;
}
