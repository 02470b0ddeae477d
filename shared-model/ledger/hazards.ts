/**
 * Burn-hazard records of the touchable parts (design.thermal.touch) and their warnings.
 * The surface is the heatsink for heatsink paths (its material), else the part's case top or hot spot
 * (the material stated in thermal.touch). Table: design.thermal.customTouchLimits when not empty, else
 * the shipped table (hazards/touch-limits.ts).
 */
import type { Design } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { DesignNetwork } from '../thermal/from-design.ts';
import { TOUCH_LIMITS } from '../hazards/touch-limits.ts';
import { touchHazard, touchLimitFor } from '../hazards/touch-check.ts';
import type { Hazard, PartTemperature } from './types.ts';

const f1 = (x: number) => (Math.round(x * 10) / 10).toString();

export function burnHazards(design: Design, net: DesignNetwork, temps: PartTemperature[], warnings: Warning[]): Hazard[] {
  const custom = design.thermal.customTouchLimits;
  const rows = custom.length > 0 ? custom : TOUCH_LIMITS;
  const contact = design.thermal.contact;
  const out: Hazard[] = [];
  for (const t of temps) {
    const touch = design.thermal.touch[t.part];
    if (!touch || !touch.touchable) continue;
    const node = net.nodes[net.index[t.part]]!;
    const material = node.sinkSurface ?? touch.surface;
    const pick = touchLimitFor(rows, material, contact);
    if (!pick) continue;
    const h = touchHazard(t.part, t.partName, t.surfaceC, pick.row, pick.fit, material, contact);
    out.push(h);
    if (h.exceeded) {
      warnings.push({
        code: 'burn-hazard', severity: 'danger', part: t.part, path: `thermal.touch.${t.part}`,
        message: `Burn hazard (estimate): the ${t.part} surface reaches about ${f1(t.surfaceC)} °C, above the ${pick.row.limitC} °C touch limit (${pick.row.standard}, ${material}, contact '${contact}'). ${h.caution}`,
      });
    }
  }
  return out;
}
