/**
 * Helpers for design-document tests: fresh mutable copies of the shipped demos and a path setter.
 */
import { DEMO_DESIGNS } from '../../../shared-model/index.ts';

export type Json = Record<string, unknown>;

/** A deep copy of a shipped demo design (by id) as plain JSON that a test may change. */
export function demo(id: 'synchronous-buck' | 'diode-boost' | 'hot-fin-buck'): Json {
  const found = DEMO_DESIGNS.find((d) => d.id === id);
  if (!found) throw new Error(`no demo ${id}`);
  return structuredClone(found.json) as Json;
}

/** Sets (or, with `undefined`, deletes) the value at a dotted path such as "spec.vinMaxV". */
export function setPath(doc: Json, path: string, value: unknown): Json {
  const keys = path.split('.');
  let here: Record<string, unknown> = doc;
  for (const key of keys.slice(0, -1)) here = here[key] as Record<string, unknown>;
  const last = keys[keys.length - 1] as string;
  if (value === undefined) delete here[last];
  else here[last] = value;
  return doc;
}

/** A demo with some paths changed. */
export function demoWith(id: Parameters<typeof demo>[0], changes: Record<string, unknown>): Json {
  const doc = demo(id);
  for (const [path, value] of Object.entries(changes)) setPath(doc, path, value);
  return doc;
}
