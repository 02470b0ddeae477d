/**
 * The shipped table of touch-temperature limits (data the user can see, pick from and replace).
 *
 * Every value below is RECALLED, not confirmed against the printed standards (docs/methods.md §11, "numbers
 * with low confidence"): each row says so (`recalled: true`) and names its standard and clause. Users
 * must confirm the limit against the current edition of the standard that applies to their product.
 * Contact assumptions (design.thermal.contact):
 *   'brief'         — a handle held or touched for short periods, or an external surface;
 *   'held'          — held continuously in normal use;
 *   'surface-1min'  — skin contact with the surface for up to 1 minute;
 *   'surface-10min' — up to 10 minutes;
 *   'surface-8h'    — up to 8 hours.
 * Sources: ISO 13732-1:2006 (burn thresholds for contact of 0.5 s and longer); IEC 60950-1 Table 4C
 * (withdrawn, superseded by IEC 62368-1); IEC 62368-1 Table 38 (TS1 touch-temperature limits, from IEC
 * Guide 117). Values from docs/methods.md §11 [memory] unless the row's note says otherwise.
 */
import type { Contact, SurfaceMaterial, TouchLimitRow } from '../design/schema.ts';

const ISO = 'ISO 13732-1:2006';
const ISO_CLAUSE = 'burn thresholds, contact periods of 1 min and longer';
const IEC60950 = 'IEC 60950-1 (withdrawn)';
const T4C = 'Table 4C';
const IEC62368 = 'IEC 62368-1';
const T38 = 'Table 38 (TS1)';
const FROM_METHODS = 'Recalled value (WattLedger methods §11, from memory); confirm against the current edition.';
const FROM_MEMORY =
  'Recalled by the WattLedger team, not listed in the WattLedger methods (docs/methods.md): low confidence; confirm against the current edition.';

function row(
  id: string,
  standard: string,
  clause: string,
  material: SurfaceMaterial,
  contact: Contact,
  limitC: number,
  note: string,
): TouchLimitRow {
  return { id, standard, clause, material, contact, limitC, recalled: true, note };
}

export const TOUCH_LIMITS: readonly TouchLimitRow[] = Object.freeze([
  // ISO 13732-1 long contact (docs/methods.md §11).
  row('iso13732-metal-1min', ISO, ISO_CLAUSE, 'metal', 'surface-1min', 51, FROM_METHODS),
  row('iso13732-metal-10min', ISO, ISO_CLAUSE, 'metal', 'surface-10min', 48, FROM_METHODS),
  row('iso13732-metal-8h', ISO, ISO_CLAUSE, 'metal', 'surface-8h', 43, FROM_METHODS),
  row('iso13732-plastic-1min', ISO, ISO_CLAUSE, 'plastic', 'surface-1min', 60, FROM_METHODS),
  // ISO 13732-1: from 10 min on, one threshold for all materials (team memory).
  row('iso13732-plastic-10min', ISO, ISO_CLAUSE, 'plastic', 'surface-10min', 48, FROM_MEMORY),
  row('iso13732-plastic-8h', ISO, ISO_CLAUSE, 'plastic', 'surface-8h', 43, FROM_MEMORY),
  row('iso13732-glass-10min', ISO, ISO_CLAUSE, 'glass', 'surface-10min', 48, FROM_MEMORY),
  row('iso13732-glass-8h', ISO, ISO_CLAUSE, 'glass', 'surface-8h', 43, FROM_MEMORY),
  // IEC 60950-1 Table 4C (docs/methods.md §11): handles held briefly, held continuously, external surfaces.
  row('iec60950-metal-handle-brief', IEC60950, `${T4C}, handles held or touched for short periods`, 'metal', 'brief', 60, FROM_METHODS),
  row('iec60950-glass-handle-brief', IEC60950, `${T4C}, handles held or touched for short periods`, 'glass', 'brief', 70, FROM_METHODS),
  row('iec60950-plastic-handle-brief', IEC60950, `${T4C}, handles held or touched for short periods`, 'plastic', 'brief', 85, FROM_METHODS),
  row('iec60950-metal-held', IEC60950, `${T4C}, handles held continuously`, 'metal', 'held', 55, FROM_METHODS),
  row('iec60950-glass-held', IEC60950, `${T4C}, handles held continuously`, 'glass', 'held', 65, FROM_METHODS),
  row('iec60950-plastic-held', IEC60950, `${T4C}, handles held continuously`, 'plastic', 'held', 75, FROM_METHODS),
  row('iec60950-metal-surface', IEC60950, `${T4C}, external surfaces that may be touched`, 'metal', 'brief', 70, FROM_METHODS),
  row('iec60950-glass-surface', IEC60950, `${T4C}, external surfaces that may be touched`, 'glass', 'brief', 80, FROM_METHODS),
  row('iec60950-plastic-surface', IEC60950, `${T4C}, external surfaces that may be touched`, 'plastic', 'brief', 95, FROM_METHODS),
  // IEC 62368-1 Table 38: long-contact rows follow IEC Guide 117 / ISO 13732-1 (team memory).
  row('iec62368-metal-8h', IEC62368, T38, 'metal', 'surface-8h', 43, FROM_MEMORY),
  row('iec62368-glass-8h', IEC62368, T38, 'glass', 'surface-8h', 43, FROM_MEMORY),
  row('iec62368-plastic-8h', IEC62368, T38, 'plastic', 'surface-8h', 43, FROM_MEMORY),
  row('iec62368-metal-10min', IEC62368, T38, 'metal', 'surface-10min', 48, FROM_MEMORY),
  row('iec62368-glass-10min', IEC62368, T38, 'glass', 'surface-10min', 48, FROM_MEMORY),
  row('iec62368-plastic-10min', IEC62368, T38, 'plastic', 'surface-10min', 48, FROM_MEMORY),
  row('iec62368-metal-1min', IEC62368, T38, 'metal', 'surface-1min', 51, FROM_MEMORY),
  row('iec62368-plastic-1min', IEC62368, T38, 'plastic', 'surface-1min', 60, FROM_MEMORY),
].map((r) => Object.freeze(r)));
