/**
 * The controller's limits: maximum duty, slope compensation and room for the loop's crossover.
 *
 * - Maximum duty: the solved duty (power balance with the design's losses) at every corner against
 *   spec.maxDuty; a corner that does not regulate (duty limit, or a boost past its conversion-ratio
 *   limit, docs/methods.md §3) fails the check.
 * - Slope compensation (peak current mode): above D = 0.5 the current loop needs a compensating ramp of
 *   at least half the inductor down-slope (Ridley 1991, from memory; docs/methods.md §17). The design
 *   does not say what ramp its controller has, so a duty above 0.5 warns and names the minimum ramp.
 * - Crossover: the sizing's recommended crossover, min(fs/10, fz/5) (common practice, docs/methods.md
 *   §13, §23), must lie above the output pole to leave the loop any room; below it the check warns.
 * Source: docs/methods.md §3, §13, §17, §23, §24.
 */
import type { Design } from '../design/schema.ts';
import type { SolvedCorner } from '../sizing/corners.ts';
import type { Sizing } from '../sizing/types.ts';
import type { DesignCheck } from './types.ts';
import { designCheck, worstOf } from './verdict.ts';
import { eng, plain } from './words.ts';

const duty = (c: SolvedCorner) => c.evaluation.operatingPoint.dutyCycle;

export function maximumDutyCheck(design: Design, corners: readonly SolvedCorner[]): DesignCheck | null {
  const unregulated = corners.filter((c) => !c.evaluation.operatingPoint.regulated);
  const at = unregulated[0] ?? worstOf(corners, duty);
  if (!at) return null;
  const limit = design.spec.maxDuty;
  const d = duty(at);
  return designCheck({
    id: 'maximum-duty', label: 'Maximum duty', value: d, limit, unit: '', bound: 'max', at,
    ...(unregulated.length > 0 ? { status: 'fail' as const } : {}),
    source: 'solved duty; docs/methods.md §1, §3, §23, §24',
    message: () => unregulated.length > 0
      ? `The output does not regulate at ${unregulated.map((c) => c.corner.label).join('; ')}: the duty reaches ${plain(d)} against the controller's ${plain(limit)} limit or the conversion ratio cannot reach Vout.`
      : `The largest duty ${plain(d)} (${at.corner.label}) stays within the controller's ${plain(limit)} limit.`,
  });
}

export function slopeCheck(sizing: Sizing, usable: readonly SolvedCorner[]): DesignCheck | null {
  const at = worstOf(usable, duty);
  if (!at) return null;
  const d = duty(at);
  const slope = sizing.slope;
  const onSense = slope.minSlopeVPerS !== undefined && slope.senseOhm !== undefined
    ? ` (${eng(slope.minSlopeVPerS, 'V/s')} on the ${eng(slope.senseOhm, 'Ω')} sense resistor)`
    : '';
  return designCheck({
    id: 'slope-compensation', label: 'Slope compensation (duty vs 0.5)', value: d, limit: 0.5, unit: '', bound: 'max', failAt: Infinity, at,
    source: 'Ridley, IEEE Trans. Power Electronics 6(2), 1991 (from memory); docs/methods.md §17, §24',
    message: (s) => s === 'pass'
      ? `The duty stays at or below 0.5 (largest ${plain(d)}): a peak-current-mode loop needs no compensating ramp.`
      : `The duty reaches ${plain(d)} at ${at.corner.label}: with peak current mode the controller needs a compensating ramp of at least ${eng(slope.minSlopeAPerS, 'A/s')} of inductor current${onSense}.`,
  });
}

export function crossoverCheck(sizing: Sizing): DesignCheck {
  const loop = sizing.loop;
  const pole = loop.outputPoleHz.value;
  return designCheck({
    id: 'crossover', label: 'Crossover room above the output pole', value: loop.crossoverHz, limit: pole, unit: 'Hz', bound: 'min', failAt: -Infinity,
    source: 'common practice (fs/10, fz/5); docs/methods.md §13, §23, §24',
    message: (s) => `${loop.crossoverReason} The output pole (${eng(pole, 'Hz')}) lies ${s === 'pass' ? 'below it' : 'above it: the loop has no room to cross over above the pole; raise fs, or for a boost lower L or the duty to move the RHP zero up'}.`,
  });
}
