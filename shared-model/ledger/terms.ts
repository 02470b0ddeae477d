/**
 * Builds the ledger's LossTerm records from the slots of the last kernel fill (once per evaluation).
 */
import type { LossTerm } from './types.ts';
import { lossTerm } from '../losses/model.ts';
import type { LedgerContext } from './kernel.ts';

export function lossTerms(ctx: LedgerContext): LossTerm[] {
  const names = ctx.net.nodes;
  const index = ctx.net.index;
  return ctx.slots.all.map((slot) => {
    const term = lossTerm(slot.model, slot.role, names[index[slot.role]]!.partName, slot.inputs);
    // The kernel's own sum is authoritative (same model, same inputs): keep the records identical to it.
    term.watts = slot.watts;
    return term;
  });
}
