/**
 * Landmarks as the command line's JSON writes them: never a null. A landmark that was found carries
 * `found: true`, its `load` and `value`; one that was not carries `found: false` and its `reason`, and no
 * `load` or `value` keys at all. Keys whose value is null in the engine's record (a note, a part, a limit
 * kind that does not apply) are left out.
 */
import type { Landmark, Landmarks } from '../../../shared-model/index.ts';

type Json = Record<string, unknown>;

/** The record without its null-valued keys, with `found` first. */
export function landmarkJson(l: Landmark): Json {
  const out: Json = { found: l.load !== null && l.value !== null };
  for (const [k, v] of Object.entries(l)) {
    if (v === null) continue;
    out[k] = k === 'perPart' && Array.isArray(v) ? v.map((x: Landmark) => landmarkJson(x)) : v;
  }
  if (out.found === false) {
    delete out.load;
    delete out.value;
  }
  return out;
}

export function landmarksJson(m: Landmarks): Json {
  return Object.fromEntries(Object.entries(m).map(([k, l]) => [k, landmarkJson(l as Landmark)]));
}
