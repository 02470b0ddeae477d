/**
 * The ripple and efficiency targets of the specification against the solved corners.
 *
 * - Inductor ripple ratio: ΔI/IL,rated at each regulated corner with the design's inductor, against
 *   spec.targets.inductorRippleRatio (default 0.3; common practice: 20–40 %); when it does not pass, the
 *   inductance the sizing found for the target (sizing/inductor.ts) is named.
 * - Output ripple: the engine's peak-to-peak ripple (capacitive and ESR parts added in time,
 *   waveform/voltage-ripple.ts; ESL not included) against spec.targets.outputRippleV; when it does not
 *   pass, the capacitance or ESR the sizing found is named.
 * - Efficiency at rated load: the evaluation at nominal Vin and rated load against
 *   spec.targets.efficiencyAtRated.
 * Targets have no warn band: above the target fails.
 * Source: docs/methods.md §1 (ripple), §23 (sizing), §24 (checks).
 */
import type { Design } from '../design/schema.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import type { SolvedCorner } from '../sizing/corners.ts';
import type { Sizing } from '../sizing/types.ts';
import type { DesignCheck } from './types.ts';
import { designCheck, worstOf } from './verdict.ts';
import { eng, pct } from './words.ts';

const op = (c: SolvedCorner) => c.evaluation.operatingPoint;

export function inductorRippleCheck(design: Design, sizing: Sizing, usable: readonly SolvedCorner[]): DesignCheck | null {
  const ind = sizing.inductor;
  const rated = ind.ratedCurrentA.value;
  const at = worstOf(usable, (c) => op(c).inductor.rippleA);
  if (!at || !(rated > 0)) return null;
  const value = op(at).inductor.rippleA / rated;
  const yours = eng(design.parts.inductor.inductanceH, 'H');
  const needs = eng(ind.requiredInductanceH.value, 'H');
  const where = at.corner.label;
  return designCheck({
    id: 'inductor-ripple-ratio', label: 'Inductor ripple ratio', part: 'inductor',
    value, limit: ind.targetRippleRatio, unit: '', bound: 'max', at,
    source: 'common practice (20–40 %); docs/methods.md §23, §24',
    message: (s) => s === 'pass'
      ? `Your ${yours} gives ${pct(value)} ripple at ${where}, within the ${pct(ind.targetRippleRatio)} target (${needs} would reach it exactly).`
      : `Your ${yours} gives ${pct(value)} ripple at ${where}; the target ${pct(ind.targetRippleRatio)} needs ${needs}.`,
  });
}

export function outputRippleCheck(design: Design, sizing: Sizing, usable: readonly SolvedCorner[]): DesignCheck | null {
  const target = design.spec.targets?.outputRippleV;
  const at = worstOf(usable, (c) => op(c).outputRipple.totalV);
  if (target === undefined || !at) return null;
  const r = op(at).outputRipple;
  const cap = sizing.outputCapacitor;
  const need = cap.capacitanceWithBankEsrF
    ? `with the bank's ESR the target needs about ${eng(cap.capacitanceWithBankEsrF.value, 'F')} (you have ${eng(cap.bank.capacitanceF, 'F')}; the sizing adds the two parts as magnitudes, which is conservative)`
    : `the bank's ESR (${eng(cap.bank.esrOhm, 'Ω')}) alone uses the whole target: the ESR must come below ${cap.maxEsrOhm ? eng(cap.maxEsrOhm.value, 'Ω') : 'the target over the current swing'}`;
  return designCheck({
    id: 'output-ripple', label: 'Output ripple (peak to peak)', part: 'outputCapacitor',
    value: r.totalV, limit: target, unit: 'V', bound: 'max', at,
    source: 'docs/methods.md §1, §23, §24 (charge method with ESR, added in time; ESL not included)',
    message: (s) => `The output ripple is ${eng(r.totalV, 'V')} at ${at.corner.label} (capacitive ${eng(r.capacitiveV, 'V')}, ESR ${eng(r.esrV, 'V')}, ESL not included)` +
      (s === 'pass' ? `, within the ${eng(target, 'V')} target.` : `, above the ${eng(target, 'V')} target; ${need}.`),
  });
}

export function efficiencyCheck(design: Design, corners: readonly SolvedCorner[]): DesignCheck | null {
  const target = design.spec.targets?.efficiencyAtRated;
  const at = corners.find((c) => c.corner.vinV === design.spec.vinNomV);
  if (target === undefined || !at) return null;
  const usable = isUsablePoint(at.evaluation);
  const eta = at.evaluation.efficiency;
  return designCheck({
    id: 'efficiency-at-rated', label: 'Efficiency at rated load',
    value: eta, limit: target, unit: '', bound: 'min', at,
    ...(usable ? {} : { status: 'fail' as const }),
    source: 'specification target; docs/methods.md §1–§10 (the ledger), §24',
    message: (s) => !usable
      ? `At ${at.corner.label} the design does not reach a regulated steady state, so the ${pct(target)} target is not met.`
      : `The efficiency at ${at.corner.label} is ${pct(eta)}, ${s === 'pass' ? 'meeting' : 'below'} the ${pct(target)} target.`,
  });
}
