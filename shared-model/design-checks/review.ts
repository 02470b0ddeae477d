/**
 * reviewDesign: the sizing (sizing/) and the design checks of one design on one set of solved corners
 * (each corner evaluated once). The checks read only corners that are regulated and converged
 * (ledger/regulated.ts, isUsablePoint); the maximum-duty and steady-state checks read every corner, so a
 * corner left out is always named by one of them.
 * Source: docs/methods.md §23 (sizing), §24 (checks).
 */
import { TARGET_LABELS } from '../design/field-labels.ts';
import type { Design } from '../design/schema.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import { solveCorners } from '../sizing/corners.ts';
import { sizeFromCorners, type SizingOptions } from '../sizing/size-design.ts';
import { crossoverCheck, maximumDutyCheck, slopeCheck } from './control.ts';
import { ratingChecks } from './ratings.ts';
import { lightLoadEfficiencyCheck } from './light-load.ts';
import { efficiencyCheck, inductorRippleCheck, outputRippleCheck } from './ripple.ts';
import { steadyStateCheck, temperatureChecks } from './thermal.ts';
import type { CheckStatus, DesignCheck, DesignReview } from './types.ts';

export function reviewDesign(design: Design, options?: SizingOptions): DesignReview {
  const corners = solveCorners(design);
  const sizing = sizeFromCorners(design, corners, options);
  const usable = corners.filter((c) => isUsablePoint(c.evaluation));
  const checks: DesignCheck[] = [];
  const add = (c: DesignCheck | null) => {
    if (c) checks.push(c);
  };
  add(inductorRippleCheck(design, sizing, usable));
  add(outputRippleCheck(design, sizing, usable));
  add(efficiencyCheck(design, corners));
  add(lightLoadEfficiencyCheck(design));
  checks.push(...ratingChecks(design, sizing, usable));
  checks.push(...temperatureChecks(design, usable));
  checks.push(steadyStateCheck(corners));
  add(maximumDutyCheck(design, corners));
  add(slopeCheck(sizing, usable));
  checks.push(crossoverCheck(sizing));

  const counts: Record<CheckStatus, number> = { pass: 0, warn: 0, fail: 0 };
  for (const c of checks) counts[c.status] += 1;
  const notes: string[] = [];
  const targets = design.spec.targets;
  if (targets?.outputRippleV === undefined) notes.push(`No output ripple target ("${TARGET_LABELS.outputRippleV}" is empty): the output ripple is not checked.`);
  if (targets?.efficiencyAtRated === undefined) notes.push(`No efficiency target ("${TARGET_LABELS.efficiencyAtRated}" is empty): the efficiency is not checked.`);
  if (targets?.efficiencyAtLightLoad === undefined) notes.push(`No light-load efficiency target ("${TARGET_LABELS.efficiencyAtLightLoad}" is empty): the efficiency at light load is not checked.`);
  if (targets?.inductorRippleRatio === undefined) notes.push(`No inductor ripple target ("${TARGET_LABELS.inductorRippleRatio}" is empty): the common-practice 30 % is used.`);
  const left = corners.filter((c) => !isUsablePoint(c.evaluation));
  if (left.length > 0) {
    notes.push(`Corners left out of the checks (not regulated or no steady state): ${left.map((c) => c.corner.label).join('; ')}.`);
  }
  if (usable.length === 0) notes.push('No corner is regulated with a steady state: only the duty, steady-state and crossover checks can be made.');
  for (const c of usable) {
    if (c.corner.mode === 'DCM') notes.push(`${c.corner.label}: discontinuous conduction at rated load; the ripple ratio is only indicative there.`);
  }
  return { sizing, checks, usableCorners: usable.map((c) => c.corner), counts, notes };
}
