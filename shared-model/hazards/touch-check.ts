/**
 * Burn-hazard check of one touchable surface against the touch-limit table.
 *
 * Method: pick the strictest (lowest) row whose material and contact match the surface and the design's
 * contact assumption; if the table has no row for that material, the strictest row for that contact of
 * any material (conservative, and the caution says so); if it has none for that contact, the strictest
 * row of the whole table. Margin = limit − surface temperature (negative: too hot to touch).
 * The table is the user's `design.thermal.customTouchLimits` when it is not empty, else the shipped one.
 * Source: docs/methods.md §11 (default to the strictest row that fits the chosen contact).
 */
import type { Contact, Role, SurfaceMaterial, TouchLimitRow } from '../design/schema.ts';
import type { Hazard } from '../ledger/types.ts';

export type RowFit = 'exact' | 'other-material' | 'other-contact';

function strictest(rows: readonly TouchLimitRow[], keep: (r: TouchLimitRow) => boolean): TouchLimitRow | undefined {
  let best: TouchLimitRow | undefined;
  for (const r of rows) if (keep(r) && (best === undefined || r.limitC < best.limitC)) best = r;
  return best;
}

/** The strictest row fitting a surface material and contact, and how well it fits; undefined for an empty table. */
export function touchLimitFor(
  rows: readonly TouchLimitRow[],
  material: SurfaceMaterial,
  contact: Contact,
): { row: TouchLimitRow; fit: RowFit } | undefined {
  const exact = strictest(rows, (r) => r.material === material && r.contact === contact);
  if (exact) return { row: exact, fit: 'exact' };
  const sameContact = strictest(rows, (r) => r.contact === contact);
  if (sameContact) return { row: sameContact, fit: 'other-material' };
  const any = strictest(rows, () => true);
  return any ? { row: any, fit: 'other-contact' } : undefined;
}

/** The caution carried by every hazard record. */
export function hazardCaution(row: TouchLimitRow, fit: RowFit, material: SurfaceMaterial, contact: Contact): string {
  const fitNote =
    fit === 'exact'
      ? ''
      : fit === 'other-material'
        ? ` The table has no row for ${material} with this contact; the strictest row for this contact is used.`
        : ` The table has no row for the contact '${contact}'; its strictest row is used.`;
  const recalled = row.recalled ? ' This value is recalled, not confirmed against the printed standard.' : '';
  return (
    `Estimate only: the surface temperature comes from the thermal resistances in the design, not from a ` +
    `measurement. Limit ${row.limitC} °C from ${row.standard}, ${row.clause} (${row.material}, contact ` +
    `'${row.contact}').${recalled}${fitNote} Confirm the limit against the current edition of the standard, ` +
    `measure the surface on hardware, and defer to local codes, the applicable standards and licensed practice.`
  );
}

/** K below the row's touch limit (negative: too hot to touch; exceeded when below 0). */
export function touchMarginK(row: TouchLimitRow, surfaceC: number): number {
  return row.limitC - surfaceC;
}

export function touchHazard(
  part: Role,
  partName: string,
  surfaceC: number,
  row: TouchLimitRow,
  fit: RowFit,
  material: SurfaceMaterial,
  contact: Contact,
): Hazard {
  const marginK = touchMarginK(row, surfaceC);
  return {
    part,
    partName,
    surfaceC,
    // A copy: the record never aliases the shipped (frozen) table or the design's own rows.
    row: {
      id: row.id,
      standard: row.standard,
      clause: row.clause,
      material: row.material,
      contact: row.contact,
      limitC: row.limitC,
      recalled: row.recalled,
      note: row.note,
    },
    marginK,
    exceeded: marginK < 0,
    status: marginK < 0 ? 'too-hot' : 'within',
    caution: hazardCaution(row, fit, material, contact),
  };
}
