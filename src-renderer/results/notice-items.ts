/**
 * Warnings and hazards in one list, each with the design field it concerns (so a click can move the
 * focus there): the engine's warnings at the chosen load, the touchable surfaces against their touch
 * limits, and the sweep landmarks that mark a limit inside the swept range (thermal ceiling,
 * regulation limit). Messages are the engine's; the landmark sentences only restate its numbers.
 */
import { formatEngineering } from '../../shared-model/index.ts';
import type { Evaluation, Hazard, Landmarks, Role, Severity } from '../../shared-model/index.ts';

export interface Notice {
  key: string;
  severity: Severity;
  text: string;
  /** Design path of the field concerned ("parts.inductor.isatA"), or null. */
  path: string | null;
}

const RANK: Record<Severity, number> = { danger: 0, caution: 1, info: 2 };

export function noticesOf(evaluation: Evaluation, landmarks: Landmarks | null, labelOf: (role: Role) => string): Notice[] {
  const out: Notice[] = evaluation.warnings.map((w, i) => ({ key: `w${i}-${w.code}`, severity: w.severity, text: w.message, path: w.path ?? null }));
  const ceiling = landmarks?.thermalCeiling;
  if (ceiling && ceiling.load !== null && ceiling.part) {
    const what = ceiling.limitKind === 'touch' ? 'its surface reaches the touch limit' : 'it reaches its temperature limit less the design margin';
    out.push({
      key: 'ceiling',
      severity: 'caution',
      text: `Thermal ceiling at ${formatEngineering(ceiling.load, 'A', 3, 'table')}: above this load the ${labelOf(ceiling.part).toLowerCase()} (${ceiling.partName}) — ${what} (estimate).`,
      path: ceiling.limitKind === 'touch' ? `thermal.touch.${ceiling.part}` : `thermal.paths.${ceiling.part}`,
    });
  }
  const regulation = landmarks?.regulationLimit;
  if (regulation && regulation.load !== null) {
    out.push({
      key: 'regulation',
      severity: 'caution',
      text: `Beyond ${formatEngineering(regulation.load, 'A', 3, 'table')} the converter cannot regulate (${regulation.cause ?? 'limit'}${regulation.note ? `; ${regulation.note}` : ''}).`,
      path: 'spec.maxDuty',
    });
  }
  return out.sort((a, b) => RANK[a.severity] - RANK[b.severity]);
}

export interface SurfaceRow {
  key: string;
  part: Role;
  label: string;
  partName: string;
  surfaceC: number;
  limitC: number;
  marginK: number;
  exceeded: boolean;
  standard: string;
  recalled: boolean;
  caution: string;
  path: string;
}

/** The touchable surfaces at the chosen load against their touch limits, hottest margin first. */
export function surfaceRows(hazards: readonly Hazard[], labelOf: (role: Role) => string): SurfaceRow[] {
  return hazards
    .map((h) => ({
      key: h.part,
      part: h.part,
      label: labelOf(h.part),
      partName: h.partName,
      surfaceC: h.surfaceC,
      limitC: h.row.limitC,
      marginK: h.marginK,
      exceeded: h.exceeded,
      standard: `${h.row.standard}${h.row.clause ? ` ${h.row.clause}` : ''}`,
      recalled: h.row.recalled,
      caution: h.caution,
      path: `thermal.touch.${h.part}`,
    }))
    .sort((a, b) => a.marginK - b.marginK);
}
