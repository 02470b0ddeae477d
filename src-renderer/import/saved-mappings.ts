/**
 * Mappings the user saved for reuse, by name, in this app's storage (browser and Electron alike).
 * Each is the engine's saved mapping document (part-import/mapping.ts), checked when read back.
 */
import { partMappingSchema, type PartMapping } from '../../shared-model/index.ts';

export const MAPPINGS_KEY = 'wattledger.part-mappings.v1';

export type SavedMappings = Record<string, PartMapping>;

export function loadMappings(): SavedMappings {
  try {
    const raw = JSON.parse(localStorage.getItem(MAPPINGS_KEY) ?? '{}') as Record<string, unknown>;
    const out: SavedMappings = {};
    for (const [name, value] of Object.entries(raw)) {
      const parsed = partMappingSchema.safeParse(value);
      if (parsed.success) out[name] = parsed.data;
    }
    return out;
  } catch {
    return {};
  }
}

/** Stores `mapping` under `name`; returns the updated list, or an error sentence. */
export function saveMapping(name: string, mapping: PartMapping): SavedMappings | string {
  const all = { ...loadMappings(), [name]: mapping };
  try {
    localStorage.setItem(MAPPINGS_KEY, JSON.stringify(all));
    return all;
  } catch (error) {
    return `The mapping could not be stored (${(error as Error).message}).`;
  }
}
