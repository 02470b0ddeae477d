/**
 * The conditions the results are computed at: the design's nominal conditions (nominal Vin, rated
 * load, its fs and ambient) with the load and Vin the user picked in the results area.
 */
import { nominalConditions } from '../../shared-model/index.ts';
import type { Conditions, Design } from '../../shared-model/index.ts';

export interface ResultsSelection {
  loadA: number | null;
  vinV: number | null;
}

export function conditionsFor(design: Design, selection: ResultsSelection): Conditions {
  const overrides: Partial<Conditions> = {};
  if (selection.loadA !== null) overrides.loadA = selection.loadA;
  if (selection.vinV !== null) overrides.vinV = selection.vinV;
  return nominalConditions(design, overrides);
}
