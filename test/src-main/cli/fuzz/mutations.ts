/**
 * Seeded mutations of a design file for the command-line fuzz test (test-only). Each takes the demo's
 * canonical text and returns the bytes of a damaged file and a label saying what was done. Kinds:
 * deleted keys, wrong types, extreme numbers, deep nesting, huge strings, duplicated keys, truncated text,
 * binary noise (issue 15 "Done when").
 */
import { pick } from '../../../reference/prng.ts';

type Rand = () => number;
type Json = unknown;
export type MutationKind = 'delete-key' | 'wrong-type' | 'extreme-number' | 'deep-nesting' | 'huge-string' | 'duplicate-key' | 'truncate' | 'binary-noise';
export const MUTATION_KINDS: readonly MutationKind[] = ['delete-key', 'wrong-type', 'extreme-number', 'deep-nesting', 'huge-string', 'duplicate-key', 'truncate', 'binary-noise'];

export interface Mutant {
  kind: MutationKind;
  label: string;
  bytes: Uint8Array;
}

type Path = (string | number)[];

/** Every path to a value in the tree (the root excluded). */
function paths(value: Json, at: Path = []): Path[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => [[...at, i], ...paths(v, [...at, i])]);
  if (value !== null && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => [[...at, k], ...paths(v, [...at, k])]);
  return [];
}

function parentOf(root: Json, path: Path): { parent: Record<string | number, Json>; key: string | number } {
  let here = root as Record<string | number, Json>;
  for (const key of path.slice(0, -1)) here = here[key] as Record<string | number, Json>;
  return { parent: here, key: path[path.length - 1] as string | number };
}

const EXTREMES: readonly string[] = ['0', '-0', '1e308', '-1e308', '5e-324', '-5e-324', '1e999', '-1e999', '9007199254740993', '-1', '1e-300', '123456789012345678901234567890'];
const WRONG: readonly Json[] = ['12', '', 'NaN', true, false, null, [], {}, [1, 2], { value: 1 }];

function nested(depth: number, arrays: boolean): string {
  return arrays ? `${'['.repeat(depth)}1${']'.repeat(depth)}` : `${'{"k":'.repeat(depth)}1${'}'.repeat(depth)}`;
}

const encode = (text: string): Uint8Array => new TextEncoder().encode(text);

/** One mutant of `text` (a design's JSON text) of the given kind. */
export function mutate(text: string, kind: MutationKind, rand: Rand): Mutant {
  const doc = JSON.parse(text) as Json;
  const all = paths(doc);
  const leaves = all.filter((p) => {
    const { parent, key } = parentOf(doc, p);
    const v = parent[key];
    return v === null || typeof v !== 'object';
  });
  const numbers = leaves.filter((p) => {
    const { parent, key } = parentOf(doc, p);
    return typeof parent[key] === 'number';
  });
  const where = (p: Path): string => p.join('.');
  switch (kind) {
    case 'delete-key': {
      const victims = [pick(rand, all), ...(rand() < 0.3 ? [pick(rand, all)] : [])];
      for (const p of victims) {
        try {
          const { parent, key } = parentOf(doc, p);
          if (Array.isArray(parent)) parent.splice(Number(key), 1);
          else delete parent[key];
        } catch {
          // the second path was inside the first: already gone
        }
      }
      return { kind, label: `deleted ${victims.map(where).join(', ')}`, bytes: encode(JSON.stringify(doc, null, 2)) };
    }
    case 'wrong-type': {
      const p = pick(rand, leaves);
      const { parent, key } = parentOf(doc, p);
      const value = pick(rand, WRONG);
      parent[key] = value;
      return { kind, label: `${where(p)} = ${JSON.stringify(value)}`, bytes: encode(JSON.stringify(doc, null, 2)) };
    }
    case 'extreme-number': {
      const p = pick(rand, numbers);
      const { parent, key } = parentOf(doc, p);
      const literal = pick(rand, EXTREMES);
      parent[key] = '@@EXTREME@@';
      return { kind, label: `${where(p)} = ${literal}`, bytes: encode(JSON.stringify(doc, null, 2).replace('"@@EXTREME@@"', literal)) };
    }
    case 'deep-nesting': {
      const depth = pick(rand, [600, 2_000, 5_000, 20_000]);
      const arrays = rand() < 0.5;
      const unknown = rand() < 0.5;
      const p = unknown ? ['unknownKey'] : pick(rand, all);
      const { parent, key } = unknown ? { parent: doc as Record<string, Json>, key: 'unknownKey' } : parentOf(doc, p);
      parent[key] = '@@DEEP@@';
      return { kind, label: `${where(p)} nested ${depth} deep (${arrays ? 'lists' : 'objects'})`, bytes: encode(JSON.stringify(doc, null, 2).replace('"@@DEEP@@"', nested(depth, arrays))) };
    }
    case 'huge-string': {
      const length = pick(rand, [1_000, 100_000, 1_000_000]);
      const unknown = rand() < 0.5;
      const p = unknown ? ['notes2'] : pick(rand, leaves);
      const { parent, key } = unknown ? { parent: doc as Record<string, Json>, key: 'notes2' } : parentOf(doc, p);
      parent[key] = pick(rand, ['x', '=', 'é', '\u0000', '"']).repeat(length);
      return { kind, label: `${where(p)} = a text of ${length} characters`, bytes: encode(JSON.stringify(doc, null, 2)) };
    }
    case 'duplicate-key': {
      // A copy of a "key": value line with another value, just above it: still JSON, the key now twice.
      const lines = JSON.stringify(doc, null, 2).split('\n');
      const candidates = lines.map((l, i) => [l, i] as const).filter(([l]) => /^\s+"[^"]+": /.test(l));
      const [line, index] = pick(rand, candidates);
      const key = line.slice(0, line.indexOf('": ') + 3);
      lines.splice(index, 0, `${key}${pick(rand, ['0', '"x"', '1e6', 'true', 'null', '{}'])},`);
      return { kind, label: `repeated ${key.trim()} at line ${index + 1}`, bytes: encode(lines.join('\n')) };
    }
    case 'truncate': {
      const cut = Math.floor(rand() * text.length);
      return { kind, label: `cut at character ${cut} of ${text.length}`, bytes: encode(text.slice(0, cut)) };
    }
    case 'binary-noise': {
      const bytes = encode(text);
      const count = 1 + Math.floor(rand() * 8);
      const at: number[] = [];
      for (let i = 0; i < count; i += 1) {
        const offset = Math.floor(rand() * bytes.length);
        bytes[offset] = Math.floor(rand() * 256);
        at.push(offset);
      }
      return { kind, label: `${count} random byte(s) at ${at.join(', ')}`, bytes };
    }
  }
}
