/**
 * Periodic steady state by shooting (test-only; see steady-state.ts for the method and sources).
 * CCM: the affine period map solved directly. DCM: rectifier stop found as the root of iL(t), the
 * capacitor voltage at t = 0 by secant iteration.
 */
import { applyTo, expm, multiply, solve2 } from './matrix.ts';
import { augmented3, intervalSystem, type CircuitValues, type IntervalKind, type IntervalSystem } from './switched-circuit.ts';

export interface Piece {
  kind: IntervalKind;
  duration: number;
  sys: IntervalSystem;
  x0: [number, number];
}

export function propagate(sys: IntervalSystem, x: [number, number], t: number): [number, number] {
  if (t <= 0) return [x[0], x[1]];
  const e = expm(augmented3(sys), 3, t);
  const y = applyTo(e, Float64Array.from([x[0], x[1], 1]), 3);
  return [y[0], y[1]];
}

/** Grid steps over the rectifier interval when bracketing the first zero of iL. */
const SCAN = 256;

/** Time in (0, tMax] where iL first falls to 0 in the rectifier interval, or -1 when it does not. */
function zeroCrossing(sys: IntervalSystem, x: [number, number], tMax: number): number {
  // Bracket the first crossing on a grid of SCAN steps: over a long interval (pulse skipping at a low rate)
  // the linear off-interval system rings (L with the output bank), so iL can cross zero and come back.
  const step = expm(augmented3(sys), 3, tMax / SCAN);
  let y: Float64Array = Float64Array.from([x[0], x[1], 1]);
  let k = 0;
  while (k < SCAN && y[0] > 0) {
    y = applyTo(step, y, 3);
    k += 1;
  }
  if (y[0] > 0) return -1;
  let lo = ((k - 1) / SCAN) * tMax;
  let hi = (k / SCAN) * tMax;
  let t = 0.5 * (lo + hi);
  for (let n = 0; n < 200 && hi - lo > 1e-17 * tMax; n++) {
    const y = propagate(sys, x, t);
    if (y[0] > 0) lo = t;
    else hi = t;
    const slope = sys.a[0] * y[0] + sys.a[1] * y[1] + sys.b[0];
    let next = slope < 0 ? t - y[0] / slope : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) <= 1e-16 * tMax) return next;
    t = next;
  }
  return 0.5 * (lo + hi);
}

export interface Setup {
  values: CircuitValues;
  period: number;
  tOn: number;
  blocksReverse: boolean;
}

export function ccmPieces(s: Setup, vin1: number): Piece[] {
  const on = intervalSystem(s.values, 'on', vin1);
  const off = intervalSystem(s.values, 'off', vin1);
  const tOff = s.period - s.tOn;
  const p = multiply(expm(augmented3(off), 3, tOff), expm(augmented3(on), 3, s.tOn), 3);
  const x0 = solve2(1 - p[0], -p[1], -p[3], 1 - p[4], p[2], p[5]);
  const x1 = propagate(on, x0, s.tOn);
  return [
    { kind: 'on', duration: s.tOn, sys: on, x0 },
    { kind: 'off', duration: tOff, sys: off, x0: x1 },
  ];
}

export function dcmPieces(s: Setup, vin1: number, vGuess: number): Piece[] | null {
  const on = intervalSystem(s.values, 'on', vin1);
  const off = intervalSystem(s.values, 'off', vin1);
  const idle = intervalSystem(s.values, 'idle', vin1);
  const tRest = s.period - s.tOn;
  const run = (v: number) => {
    const x1 = propagate(on, [0, v], s.tOn);
    const t2 = zeroCrossing(off, x1, tRest);
    if (t2 < 0) return null;
    const x2 = propagate(off, x1, t2);
    const x3 = propagate(idle, [0, x2[1]], tRest - t2);
    return { x1, t2, x2: [0, x2[1]] as [number, number], residual: x3[1] - v };
  };
  let v0 = vGuess;
  let r0 = run(v0);
  if (!r0) return null;
  let v1 = vGuess * (1 + 1e-4);
  for (let k = 0; k < 60; k++) {
    const r1 = run(v1);
    if (!r1) return null;
    // 1e-14 of the voltage is the usual stop; a long idle interval (pulse skipping at a low rate) leaves a
    // rounding floor of its own, so a secant step that no longer moves v (1e-13 of it) also stops.
    const stalled = k > 0 && Math.abs(v1 - v0) <= 1e-13 * Math.abs(v1) && Math.abs(r1.residual) <= 1e-10 * Math.abs(v1);
    if (Math.abs(r1.residual) <= 1e-14 * Math.abs(v1) || r1.residual === r0.residual || stalled) {
      return [
        { kind: 'on', duration: s.tOn, sys: on, x0: [0, v1] },
        { kind: 'off', duration: r1.t2, sys: off, x0: r1.x1 },
        { kind: 'idle', duration: tRest - r1.t2, sys: idle, x0: r1.x2 },
      ];
    }
    const v2 = v1 - (r1.residual * (v1 - v0)) / (r1.residual - r0.residual);
    v0 = v1;
    r0 = r1;
    v1 = v2;
  }
  return null;
}
