/**
 * How each linked part of a design stands against its library entry (design/schema.ts `sources`):
 *   same            the design's copy equals the library's part (every value);
 *   differs         the library's part has other values: the fields that differ are listed by label,
 *                   with both values, so the app can say what an update would change;
 *   part-missing    the library is open but has no part with that id (deleted or renamed);
 *   library-missing no open library has that id (file moved, deleted or not opened).
 * The design always evaluates from its own copy; this only reports. Records in, records out.
 */
import type { Part } from '../design/parts.ts';
import type { PartsLibrary } from '../design/parts-library.ts';
import type { Design, PartSource, Role } from '../design/schema.ts';
import { partInRole } from '../compare/substitute-part.ts';
import { PART_FIELDS } from '../part-import/fields.ts';

export type LinkState = 'same' | 'differs' | 'part-missing' | 'library-missing';

export interface FieldDifference {
  /** Dotted path inside the part ("rdsOn25Ohm", "rdsTemperatureLaw.alphaPerK"). */
  path: string;
  label: string;
  design: unknown;
  library: unknown;
}

export interface PartLink {
  role: Role;
  source: PartSource;
  state: LinkState;
  differences: FieldDifference[];
  /** One sentence for the user. */
  message: string;
}

function leaves(value: unknown, prefix: string, out: Map<string, unknown>): Map<string, unknown> {
  if (value !== null && typeof value === 'object' && !Array.isArray(value))
    for (const [k, v] of Object.entries(value)) leaves(v, prefix === '' ? k : `${prefix}.${k}`, out);
  else out.set(prefix, value);
  return out;
}

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a) === JSON.stringify(b);

/** Every field whose value differs between two part records, in catalogue order, unknown paths last. */
export function partDifferences(design: Part, library: Part): FieldDifference[] {
  const a = leaves(design, '', new Map());
  const b = leaves(library, '', new Map());
  const paths = [...new Set([...a.keys(), ...b.keys()])].filter((p) => !same(a.get(p), b.get(p)));
  const order = (p: string): number => {
    const i = PART_FIELDS.findIndex((f) => f.path === p);
    return i < 0 ? PART_FIELDS.length : i;
  };
  return paths
    .sort((x, y) => order(x) - order(y))
    .map((path) => ({ path, label: PART_FIELDS.find((f) => f.path === path)?.label ?? path, design: a.get(path), library: b.get(path) }));
}

/** The state of every linked role of `design` against the open `libraries`. */
export function linkStatus(design: Design, libraries: readonly PartsLibrary[]): PartLink[] {
  const out: PartLink[] = [];
  for (const [role, source] of Object.entries(design.sources ?? {}) as [Role, PartSource][]) {
    const library = libraries.find((l) => l.id === source.libraryId);
    const own = partInRole(design, role);
    if (!library) {
      out.push({ role, source, state: 'library-missing', differences: [], message: `The library "${source.libraryName}" is not open; the design uses its own copy of ${source.partId}.` });
      continue;
    }
    const entry = library.parts.find((p) => p.id === source.partId);
    if (!entry || !own) {
      out.push({ role, source, state: 'part-missing', differences: [], message: `"${library.name}" has no part ${source.partId} any more; the design uses its own copy.` });
      continue;
    }
    const differences = partDifferences(own, entry);
    out.push(differences.length === 0
      ? { role, source, state: 'same', differences, message: `Same as ${entry.name} in "${library.name}".` }
      : { role, source, state: 'differs', differences, message: `${entry.name} in "${library.name}" differs in ${differences.map((d) => d.label).join(', ')}.` });
  }
  return out;
}
