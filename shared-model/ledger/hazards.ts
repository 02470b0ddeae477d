/**
 * Burn-hazard records of the touchable parts (design.thermal.touch) and their warnings.
 * The surface is the heatsink for heatsink paths (its material), else the part's case top or hot spot
 * (the material stated in thermal.touch). Table: design.thermal.customTouchLimits when not empty, else
 * the shipped table (hazards/touch-limits.ts).
 * Which row applies to which part depends on the design only (`touchPicks`, made once per context); the
 * margins and warnings follow each point's surface temperatures. At a point in thermal runaway every
 * touchable surface reads "runaway" (unknown, counted as too hot), never "within". A sweep keeps only the margins
 * (keep.ts keepMargins): same rows, same comparisons, same warnings.
 */
import type { Contact, Design, Role, SurfaceMaterial, TouchLimitRow } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { DesignNetwork } from '../thermal/from-design.ts';
import { TOUCH_LIMITS } from '../hazards/touch-limits.ts';
import { hazardCaution, touchLimitFor, touchMarginK, type RowFit } from '../hazards/touch-check.ts';
import type { PartTemperature } from './types.ts';
import type { Keeper } from './keep.ts';

const f1 = (x: number) => (Math.round(x * 10) / 10).toString();

/** The touch-limit row of one touchable part (node order). */
export interface TouchPick {
  /** Node index of the part (and of its PartTemperature record). */
  node: number;
  part: Role;
  material: SurfaceMaterial;
  contact: Contact;
  row: TouchLimitRow;
  fit: RowFit;
  /** The hazard's caution sentence (hazardCaution of this row). */
  caution: string;
}

/** The touchable parts of a design that have a touch-limit row, in node order. */
export function touchPicks(design: Design, net: DesignNetwork): TouchPick[] {
  const custom = design.thermal.customTouchLimits;
  const rows = custom.length > 0 ? custom : TOUCH_LIMITS;
  const contact = design.thermal.contact;
  const out: TouchPick[] = [];
  for (let i = 0; i < net.nodes.length; i++) {
    const node = net.nodes[i]!;
    const touch = design.thermal.touch[node.role];
    if (!touch || !touch.touchable) continue;
    const material = node.sinkSurface ?? touch.surface;
    const pick = touchLimitFor(rows, material, contact);
    if (!pick) continue;
    out.push({ node: i, part: node.role, material, contact, row: pick.row, fit: pick.fit, caution: hazardCaution(pick.row, pick.fit, material, contact) });
  }
  return out;
}

/**
 * For each pick (its part's record in `temps`, node order): the hazard to the keeper (keep.ts: the Hazard
 * record, or only its margin); a burn-hazard warning for each surface over its limit.
 */
export function burnHazards(picks: readonly TouchPick[], temps: readonly PartTemperature[], warnings: Warning[], keeper: Keeper, runaway = false): void {
  for (let k = 0; k < picks.length; k++) {
    const p = picks[k]!;
    const t = temps[p.node]!;
    const marginK = touchMarginK(p.row, t.surfaceC);
    keeper.hazard(k, p, t, marginK, runaway);
    if (runaway) {
      warnings.push({
        code: 'burn-hazard', severity: 'danger', part: t.part, path: `thermal.touch.${t.part}`,
        message: `Burn hazard unknown: the design runs away thermally at this point, so the ${t.part} surface has no steady temperature and may pass the ${p.row.limitC} °C touch limit (${p.row.standard}). ${p.caution}`,
      });
    } else if (marginK < 0) {
      warnings.push({
        code: 'burn-hazard', severity: 'danger', part: t.part, path: `thermal.touch.${t.part}`,
        message: `Burn hazard (estimate): the ${t.part} surface reaches about ${f1(t.surfaceC)} °C, above the ${p.row.limitC} °C touch limit (${p.row.standard}, ${p.material}, contact '${p.contact}'). ${p.caution}`,
      });
    }
  }
}
