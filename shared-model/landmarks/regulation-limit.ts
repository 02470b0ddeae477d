/**
 * The regulation limit: the lightest load beyond which the converter cannot hold its output — the duty
 * cycle reaches the controller's maximum, the output cannot be reached at any duty (boost: the ratio
 * falls past its maximum, docs/methods.md §3), or the electro-thermal loop runs away. (A point whose iteration
 * merely stopped short of its fixed point is left out of the peak search but is no regulation limit.) Found as the first swept point carrying one of these warnings, then by bisection on the
 * engine (or at the midpoint of the two points). Value: the duty cycle at the last regulating point.
 */
import type { SweepPoint } from '../sweep/types.ts';
import type { WarningCode } from '../warnings.ts';
import { formatEngineering } from '../units/engineering.ts';
import { findEdge } from './search.ts';
import type { RegulationLandmark } from './types.ts';

export const REGULATION_WARNINGS: readonly WarningCode[] = ['duty-limit', 'cannot-regulate', 'thermal-runaway'];

/** The warning that stops regulation at this point, or null. */
export function regulationCause(p: SweepPoint): WarningCode | null {
  // Plain loops, no callbacks: this runs for every swept point.
  for (let k = 0; k < REGULATION_WARNINGS.length; k++) {
    const code = REGULATION_WARNINGS[k]!;
    for (let i = 0; i < p.warnings.length; i++) if (p.warnings[i]!.code === code) return code;
  }
  return p.regulated ? null : 'cannot-regulate';
}

export function findRegulationLimit(points: readonly SweepPoint[], probe?: (load: number) => SweepPoint): RegulationLandmark {
  const base = { unit: '' };
  const i = points.findIndex((p) => regulationCause(p) !== null);
  if (i < 0) {
    const last = points[points.length - 1];
    return {
      ...base,
      load: null,
      value: null,
      reason: last
        ? `The converter regulates up to the heaviest swept load (${last.loadA.toPrecision(4)} A, duty cycle ${formatEngineering(last.dutyCycle, '%', 4, 'table')}).`
        : 'The sweep has no points.',
      note: null,
      method: 'none',
      cause: null,
    };
  }
  const cause = regulationCause(points[i]);
  if (i === 0) {
    return {
      ...base,
      load: null,
      value: null,
      reason: `The converter cannot regulate even at the lightest swept load (${points[0].loadA.toPrecision(4)} A): ${cause}.`,
      note: null,
      method: 'none',
      cause,
    };
  }
  const a = points[i - 1];
  const b = points[i];
  if (probe) {
    const load = findEdge((x) => regulationCause(probe(x)) !== null, a.loadA, b.loadA);
    const below = probe(load * (1 - 1e-9));
    return { ...base, load, value: below.dutyCycle, reason: null, note: null, method: 'refined', cause };
  }
  return { ...base, load: (a.loadA + b.loadA) / 2, value: a.dutyCycle, reason: null, note: null, method: 'interpolated', cause };
}
