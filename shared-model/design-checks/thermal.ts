/**
 * Thermal limits at the regulated corners, and whether every corner reaches a steady state.
 *
 * - Temperature, per part: the junction or hot-spot temperature (the ledger's Ta + θ·P, docs/methods.md
 *   §10) at the corner where it is highest, against its limit less the design's temperature margin
 *   (margins.temperatureMarginK). Inside the margin it warns; past the limit itself it fails.
 * - Steady state: every corner, regulated or not, must reach an electro-thermal fixed point; a corner in
 *   thermal runaway (loop gain θ·dP/dT reaching 1, docs/methods.md §10) fails the check and is named with
 *   the part the engine blames.
 * Estimates only: temperatures must be measured on hardware.
 * Source: docs/methods.md §10, §24.
 */
import type { Design } from '../design/schema.ts';
import { ROLE_LABELS } from '../report/labels.ts';
import type { SolvedCorner } from '../sizing/corners.ts';
import type { DesignCheck, DesignCheckId } from './types.ts';
import { designCheck, worstOf } from './verdict.ts';
import { eng, plain } from './words.ts';


export function temperatureChecks(design: Design, usable: readonly SolvedCorner[]): DesignCheck[] {
  const first = usable[0];
  if (!first) return [];
  const margin = design.margins.temperatureMarginK;
  const out: DesignCheck[] = [];
  for (const t0 of first.evaluation.temperatures) {
    const role = t0.part;
    const tOf = (c: SolvedCorner) => c.evaluation.temperatures.find((t) => t.part === role);
    const at = worstOf(usable, (c) => tOf(c)?.celsius ?? -Infinity)!;
    const t = tOf(at)!;
    const kind = t.kind === 'junction' ? 'junction' : 'hot spot';
    out.push(designCheck({
      id: `temperature-${role}` as DesignCheckId, label: `${ROLE_LABELS[role]} temperature`, part: role,
      value: t.celsius, limit: t.limit - margin, unit: '°C', bound: 'max', failAt: t.limit, at,
      source: 'docs/methods.md §10, §24 (estimate: measure on hardware)',
      message: (s) => `The ${ROLE_LABELS[role].toLowerCase()} ${kind} reaches about ${eng(t.celsius, '°C')} at ${at.corner.label}` +
        (s === 'pass'
          ? `, at least ${plain(margin)} K below its ${eng(t.limit, '°C')} limit (estimate: measure on hardware).`
          : s === 'warn'
            ? `, inside the ${plain(margin)} K margin below its ${eng(t.limit, '°C')} limit (estimate: measure on hardware).`
            : `, above its ${eng(t.limit, '°C')} limit: lower the loss or the thermal resistance (estimate: measure on hardware).`),
    }));
  }
  return out;
}

export function steadyStateCheck(corners: readonly SolvedCorner[]): DesignCheck {
  const bad = corners.filter((c) => !c.evaluation.converged);
  const first = bad[0];
  const blame = first?.evaluation.warnings.find((w) => w.code === 'thermal-runaway' || w.code === 'not-converged');
  return designCheck({
    id: 'steady-state', label: 'Thermal steady state at every corner',
    value: bad.length, limit: 0, unit: 'corners', bound: 'max', ...(first ? { at: first } : {}),
    source: 'docs/methods.md §10 (electro-thermal fixed point), §24',
    message: (s) => s === 'pass'
      ? `Every corner (${corners.length}) reaches an electro-thermal steady state.`
      : `No steady state at ${bad.map((c) => c.corner.label).join('; ')}${blame ? `: ${blame.message}` : ''} The checks read only the corners that reach one.`,
  });
}
