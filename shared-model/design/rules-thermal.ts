/**
 * Cross-field rules of the thermal description.
 *   Heatsink ids are unique and every heatsink path names one that exists.
 *   A heatsink path runs junction → case (θJC) → interface (θCS) → sink (θSA) (JEDEC JESD51-14 defines
 *   θJC), so only parts that carry a θJC — MOSFETs and diodes — may use it; other parts use a direct θ or a
 *   stated rise.
 *   ΨJT is a characterisation parameter much smaller than θJA (JESD51-2 [memory]): require ΨJT < θJA.
 *   Custom touch-limit rows have unique ids, and when the table is replaced it must hold a row for every
 *   touchable part's surface material at the chosen contact, so no touchable part goes unchecked.
 */
import { ROLES } from './schema.ts';
import type { Problem } from './problems.ts';
import { inUnit, problem } from './problems.ts';
import { at, isObject, list, num, str } from './read.ts';

/** The heatsink ids, or null when the list itself or an id was refused (then existence cannot be judged). */
function heatsinks(doc: unknown, out: Problem[]): Set<string> | null {
  const ids = new Set<string>();
  const all = at(doc, 'thermal.heatsinks');
  if (!Array.isArray(all)) return null;
  let complete = true;
  list(doc, 'thermal.heatsinks').forEach((sink, i) => {
    const id = isObject(sink) && typeof sink.id === 'string' ? sink.id : undefined;
    if (id === undefined) {
      complete = false;
      return;
    }
    if (ids.has(id))
      out.push(problem(`thermal.heatsinks[${i}].id`, id, 'an id not used by another heatsink',
        `thermal.heatsinks[${i}].id "${id}" is used by another heatsink; heatsink ids must be unique.`));
    ids.add(id);
  });
  return complete ? ids : null;
}

function paths(doc: unknown, ids: Set<string> | null, out: Problem[]): void {
  for (const role of ROLES) {
    const base = `thermal.paths.${role}`;
    if (str(doc, `${base}.kind`) === 'heatsink') {
      const id = str(doc, `${base}.heatsinkId`);
      if (ids !== null && id !== undefined && !ids.has(id)) {
        const known = ids.size === 0 ? 'none defined' : [...ids].map((x) => JSON.stringify(x)).join(', ');
        out.push(problem(`${base}.heatsinkId`, id, `an id from thermal.heatsinks (${known})`,
          `${base}.heatsinkId "${id}" names no heatsink in thermal.heatsinks (${known}).`));
      }
      const kind = role === 'inputCapacitor' || role === 'outputCapacitor' ? 'capacitor' : str(doc, `parts.${role}.kind`);
      if (kind !== undefined && kind !== 'mosfet' && kind !== 'diode')
        out.push(problem(`${base}.kind`, 'heatsink', '"direct" or "rise" for this part',
          `${base}.kind is "heatsink" for a ${kind}, but only MOSFETs and diodes carry the junction-to-case θJC that path needs; use "direct" or "rise".`));
    }
    const psi = num(doc, `${base}.psiJtKPerW`);
    const theta = num(doc, `${base}.thetaJaKPerW`);
    if (psi !== undefined && theta !== undefined && psi >= theta)
      out.push(problem(`${base}.psiJtKPerW`, psi, `psiJtKPerW < thetaJaKPerW (${inUnit(theta, 'thetaJaKPerW')})`,
        `${base}.psiJtKPerW (${inUnit(psi, 'psiJtKPerW')}) must be smaller than thetaJaKPerW (${inUnit(theta, 'thetaJaKPerW')}).`));
  }
}

function touchLimits(doc: unknown, out: Problem[]): void {
  const rows = list(doc, 'thermal.customTouchLimits');
  const ids = new Set<string>();
  rows.forEach((row, i) => {
    const id = isObject(row) && typeof row.id === 'string' ? row.id : undefined;
    if (id !== undefined && ids.has(id))
      out.push(problem(`thermal.customTouchLimits[${i}].id`, id, 'an id not used by another row',
        `thermal.customTouchLimits[${i}].id "${id}" is used by another row; row ids must be unique.`));
    if (id !== undefined) ids.add(id);
  });
  const contact = str(doc, 'thermal.contact');
  if (rows.length === 0 || contact === undefined) return;
  for (const role of ROLES) {
    const touch = at(doc, `thermal.touch.${role}`);
    if (!isObject(touch) || touch.touchable !== true || typeof touch.surface !== 'string') continue;
    const covered = rows.some((r) => isObject(r) && r.material === touch.surface && r.contact === contact);
    if (!covered)
      out.push(problem('thermal.customTouchLimits', rows, `a row for material "${touch.surface}" and contact "${contact}"`,
        `thermal.customTouchLimits replaces the shipped table but has no row for ${touch.surface} touched with contact "${contact}", which thermal.touch.${role} needs.`));
  }
}

/** Problems between fields of the thermal description. */
export function thermalRules(doc: unknown): Problem[] {
  const out: Problem[] = [];
  const ids = heatsinks(doc, out);
  paths(doc, ids, out);
  touchLimits(doc, out);
  return out;
}
