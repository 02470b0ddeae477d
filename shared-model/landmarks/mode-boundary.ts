/**
 * The CCM/DCM boundary: the load below which the inductor current falls to zero for part of each period.
 *
 * In an ideal converter it lies where the mean inductor current equals half the ripple, K = Kcrit
 * (Erickson & Maksimović, 2nd ed., ch. 5 [memory for numbering]; docs/methods.md §2): for a buck
 * Io,crit = ΔI/2. The engine reports the mode of every point; the boundary is the first change of mode
 * between neighbouring points, placed by bisection on the engine or at the midpoint of the two points.
 * A synchronous converter in forced PWM never enters DCM: its inductor current reverses instead, and the
 * load where the valley current crosses zero is given in the note.
 */
import type { SweepPoint } from '../sweep/types.ts';
import { findEdge, interpolateAt, interpolateCrossing } from './search.ts';
import type { Landmark } from './types.ts';

export function findModeBoundary(points: readonly SweepPoint[], probe?: (load: number) => SweepPoint): Landmark {
  const base = { unit: '' };
  if (points.length === 0) {
    return { ...base, load: null, value: null, reason: 'The sweep has no points.', note: null, method: 'none' };
  }
  let change = -1;
  for (let i = 1; i < points.length; i++) {
    if (points[i].mode !== points[i - 1].mode) {
      change = i;
      break;
    }
  }
  if (change < 0) {
    const mode = points[0].mode;
    const first = points[0].loadA;
    const last = points[points.length - 1].loadA;
    if (mode === 'DCM') {
      return { ...base, load: null, value: null, reason: `The converter stays in DCM up to the heaviest swept load (${last} A).`, note: null, method: 'none' };
    }
    return { ...base, load: null, value: null, reason: `The converter stays in CCM down to the lightest swept load (${first} A).${reversalNote(points)}`, note: null, method: 'none' };
  }
  const a = points[change - 1];
  const b = points[change];
  const startMode = a.mode;
  let load: number;
  let method: Landmark['method'];
  if (probe) {
    load = findEdge((x) => probe(x).mode !== startMode, a.loadA, b.loadA);
    method = 'refined';
  } else {
    load = (a.loadA + b.loadA) / 2;
    method = 'interpolated';
  }
  const value = probe ? probe(load).efficiency : interpolateAt(a.loadA, a.efficiency, b.loadA, b.efficiency, load);
  const more = points.slice(change + 1).some((p, i) => p.mode !== points[change + i].mode);
  return {
    ...base,
    load,
    value,
    reason: null,
    note: more ? 'The mode changes more than once over the swept range; this is the lightest change.' : null,
    method,
  };
}

/** For forced PWM: the load below which the inductor valley current is negative, as a sentence. */
function reversalNote(points: readonly SweepPoint[]): string {
  for (let i = 1; i < points.length; i++) {
    const v0 = points[i - 1].inductorPeakA - points[i - 1].inductorRippleA;
    const v1 = points[i].inductorPeakA - points[i].inductorRippleA;
    if (v0 < 0 && v1 >= 0) {
      const load = interpolateCrossing(points[i - 1].loadA, v0, points[i].loadA, v1, 0);
      return ` Below about ${load.toPrecision(3)} A the inductor current reverses for part of each period.`;
    }
  }
  return '';
}
