/**
 * Brute-force time-domain reference: the switched circuit integrated cycle after cycle until it settles
 * (test-only code, independent of the analytic engine and of the shooting reference's linear algebra).
 *
 * Method: the circuit ODEs of cycle-by-cycle-circuit.ts are integrated by ODEX (Hairer & Wanner's
 * Gragg–Bulirsch–Stoer extrapolation code, the `odex` package) one conduction interval at a time,
 * restarting the integrator at every switching edge (the right-hand side jumps there). With a blocking
 * rectifier the integrator is stopped at the first accepted step whose inductor current is ≤ 0, the zero
 * crossing is located by Newton iteration with bisection (each trial re-integrates from the step's
 * start), and the rest of the period is the idle interval (iL ≡ 0, DCM). The inductor starts at its
 * ideal valley current (docs/methods.md §1, at the driven duty) and the output at its target, which avoids a
 * long LC start-up transient (common practice). Cycles run until the state at the start of a cycle and at its
 * end (iL relative to the cycle's inductor RMS, vC relative to itself, and the input-sense-corrected
 * source voltage) differ by less than `relativeChange` on `settleCycles` consecutive cycles, or
 * `maxCycles` is reached (then `converged` is false). Element means, RMS and
 * conduction losses are measured over that last cycle from quadrature states integrated with the circuit.
 * Sources: Hairer, Nørsett & Wanner, Solving Ordinary Differential Equations I, 2nd ed., §II.9 (GBS
 * extrapolation, ODEX) [memory]; periodic steady state reached by brute-force transient simulation —
 * common practice.
 */
import type { Conditions, ConductionParameters, Design } from '../../shared-model/index.ts';
import { odexSolver, type Derivative, type OdexSolution, type OdexSolver } from './odex.ts';
import type { ReferenceBranch, ReferenceResult } from './steady-state.ts';
import * as K from './cycle-by-cycle-circuit.ts';

/** The odex members used here beyond test/reference/odex.ts's declaration (the step observer). */
interface SteppingSolver extends OdexSolver {
  initialStepSize: number;
  solve(f: Derivative, x: number, y0: number[], xEnd: number, observe?: (n: number, xOld: number, x: number, y: number[]) => boolean | void): OdexSolution;
}

export interface CycleOptions {
  /** Stop when a cycle changes the state by less than this, relative (default 1e-9). */
  relativeChange?: number;
  /** ...on this many consecutive cycles (default 3: one small change at a turning point of a slow
   *  oscillation is not enough). */
  settleCycles?: number;
  /** Cycle cap (default 20 000). */
  maxCycles?: number;
  /** ODEX relative tolerance (default 1e-12; absolute tolerances scale with it). */
  relativeTolerance?: number;
  /** Start values (defaults: ideal valley current, target output voltage). */
  startInductorA?: number;
  startOutputV?: number;
}

export interface CycleResult {
  mode: 'CCM' | 'DCM';
  dutyCycle: number;
  rectifierFraction: number;
  /** Mean voltage across the load resistor over the last cycle. */
  voutV: number;
  inputA: number;
  inductorPeakA: number;
  inductorValleyA: number;
  branches: ReferenceResult['branches'];
  cycles: number;
  converged: boolean;
  /** The last cycle's relative change of the state. */
  lastChange: number;
  /** Right-hand-side evaluations and integrator restarts over the whole run. */
  evaluations: number;
  solves: number;
}

interface Sums {
  inductor: [number, number];
  switch: [number, number];
  rectifier: [number, number];
  capacitor: [number, number];
  load: [number, number];
  vn: number;
}

const MOMENTS = { inductor: [K.INT_IL, K.INT_IL2], capacitor: [K.INT_IC, K.INT_IC2], load: [K.INT_IR, K.INT_IR2] } as const;

/**
 * Periodic steady state of `design` at `conditions`, driven at `dutyCycle`, by cycle-by-cycle
 * simulation; the load is a resistor R = Vout/Io or a constant-current sink (cycle-by-cycle-circuit.ts).
 */
export function simulateCycles(
  design: Design,
  conditions: Conditions,
  dutyCycle: number,
  conduction: ConductionParameters,
  options: CycleOptions = {},
): CycleResult {
  const e = K.elementsOf(design, conditions, conduction);
  const vin = conditions.vinV;
  const vo = design.spec.voutV;
  const io = conditions.loadA;
  const T = e.periodS;
  // Ideal start (docs/methods.md §1): mean inductor current and ripple at the driven duty.
  const meanL = e.boost ? io / (1 - dutyCycle) : io;
  const ripple = ((e.boost ? vin : vin - vo) * dutyCycle * T) / e.inductanceH;
  const valley = meanL - ripple / 2;
  let iL = options.startInductorA ?? (e.blocks ? Math.max(valley, 0) : valley);
  let vC = options.startOutputV ?? vo;
  const rIn = K.senseIn(e, 'input');
  let vin1 = vin - rIn * ((vo * io) / vin);

  const rtol = options.relativeTolerance ?? 1e-12;
  const iS = Math.max(Math.abs(meanL) + ripple / 2, 1e-9);
  const vS = Math.max(vo, 1e-9);
  const solver = odexSolver(K.STATES) as SteppingSolver;
  solver.relativeTolerance = rtol;
  solver.absoluteTolerance = [iS, vS, iS, iS * iS, iS, iS * iS, iS, iS * iS, vS].map((s) => rtol * s);
  solver.initialStepSize = 1; // odex starts at min(this, span/2): periods are the time unit here
  let evaluations = 0;
  let solves = 0;
  const solve = (f: Derivative, y0: number[], span: number, observe?: Parameters<SteppingSolver['solve']>[4]) => {
    const r = solver.solve(f, 0, y0, span, observe);
    evaluations += r.nEval;
    solves++;
    if (r.outcome === 1) throw new Error(`cycle-by-cycle: odex exceeded ${solver.maxSteps} steps`);
    return r;
  };
  const withZeroIntegrals = (y: number[]) => [y[K.IL], y[K.VC], 0, 0, 0, 0, 0, 0, 0];

  /** The off interval with a blocking rectifier: y at the end, and where iL reached 0 (or span). */
  const offBlocking = (f: Derivative, y0: number[], span: number): { y: number[]; stop: number } => {
    let prev = y0;
    const found: { hit?: { a: number; ya: number[]; b: number; yb: number[] } } = {};
    const r = solve(f, y0, span, (_n, xOld, x, y) => {
      if (y[K.IL] <= 0) {
        found.hit = { a: xOld, ya: prev, b: x, yb: y };
        return false;
      }
      prev = y;
    });
    const h = found.hit;
    if (!h) return { y: r.y, stop: span };
    if (h.b <= h.a) return { y: [0, ...h.yb.slice(1)], stop: h.b };
    // Zero of iL in (a, b]: Newton on re-integrations from a, kept inside the bracket.
    let lo = h.a;
    let hi = h.b;
    let t = h.a + ((h.b - h.a) * h.ya[K.IL]) / (h.ya[K.IL] - h.yb[K.IL]);
    let y = h.yb;
    for (let k = 0; k < 60; k++) {
      y = solve(f, h.ya, t - h.a).y;
      const g = y[K.IL];
      if (Math.abs(g) <= 1e-14 * iS || hi - lo <= 1e-15) break;
      if (g > 0) lo = t;
      else hi = t;
      const slope = f(t, y)[K.IL];
      let next = slope < 0 ? t - g / slope : 0.5 * (lo + hi);
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      t = next;
    }
    return { y: [0, ...y.slice(1)], stop: t };
  };

  const maxCycles = options.maxCycles ?? 20000;
  const tol = options.relativeChange ?? 1e-9;
  const settle = options.settleCycles ?? 3;
  let cycles = 0;
  let quiet = 0;
  let change = Infinity;
  let sums: Sums | null = null;
  let peak = 0;
  let valleyNow = iL;
  let offTime = 0;
  let idle = false;
  while (cycles < maxCycles) {
    cycles++;
    const s: Sums = { inductor: [0, 0], switch: [0, 0], rectifier: [0, 0], capacitor: [0, 0], load: [0, 0], vn: 0 };
    const add = (y: number[], branch: 'switch' | 'rectifier' | null) => {
      for (const key of ['inductor', 'capacitor', 'load'] as const) {
        s[key][0] += y[MOMENTS[key][0]];
        s[key][1] += y[MOMENTS[key][1]];
      }
      if (branch) {
        s[branch][0] += y[K.INT_IL];
        s[branch][1] += y[K.INT_IL2];
      }
      s.vn += y[K.INT_VN];
    };
    const start = [iL, vC];
    const onEnd = solve(K.derivative(e, 'on', vin1), withZeroIntegrals(start), dutyCycle).y;
    add(onEnd, 'switch');
    const offSpan = 1 - dutyCycle;
    const fOff = K.derivative(e, 'off', vin1);
    const off = e.blocks ? offBlocking(fOff, withZeroIntegrals(onEnd), offSpan) : { y: solve(fOff, withZeroIntegrals(onEnd), offSpan).y, stop: offSpan };
    add(off.y, 'rectifier');
    let end = off.y;
    idle = off.stop < offSpan;
    if (idle) {
      end = solve(K.derivative(e, 'idle', vin1), withZeroIntegrals(off.y), offSpan - off.stop).y;
      add(end, null);
    }
    const sourceMean = e.boost ? s.inductor[0] : s.switch[0];
    const vinNext = vin - rIn * sourceMean;
    const rmsL = Math.sqrt(Math.max(s.inductor[1], 0));
    change = Math.max(
      Math.abs(end[K.IL] - iL) / Math.max(rmsL, 1e-300),
      Math.abs(end[K.VC] - vC) / Math.max(Math.abs(vC), 1e-300),
      Math.abs(vinNext - vin1) / vin,
    );
    sums = s;
    peak = onEnd[K.IL];
    valleyNow = iL;
    offTime = off.stop;
    iL = end[K.IL];
    vC = end[K.VC];
    vin1 = vinNext;
    quiet = change < tol ? quiet + 1 : 0;
    if (quiet >= settle) break;
  }
  if (!sums) throw new Error('cycle-by-cycle: maxCycles must be at least 1');
  return {
    mode: idle ? 'DCM' : 'CCM',
    dutyCycle,
    rectifierFraction: offTime,
    voutV: e.sinkA !== null ? sums.vn - K.senseIn(e, 'output') * e.sinkA : Number.isFinite(e.loadOhm) ? sums.load[0] * e.loadOhm : sums.vn,
    inputA: e.boost ? sums.inductor[0] : sums.switch[0],
    inductorPeakA: peak,
    inductorValleyA: valleyNow,
    branches: branchesOf(e, sums),
    cycles,
    converged: quiet >= settle,
    lastChange: change,
    evaluations,
    solves,
  };
}

/** Means, RMS and conduction losses of every element from one cycle's period means. */
function branchesOf(e: K.Elements, s: Sums): CycleResult['branches'] {
  const branch = ([mean, ms]: [number, number], ohm: number, vf = 0): ReferenceBranch => ({
    averageA: mean,
    rmsA: Math.sqrt(Math.max(ms, 0)),
    conductionLossW: vf * mean + ohm * Math.max(ms, 0),
  });
  const source = e.boost ? s.inductor : s.switch;
  const cinMs = Math.max(source[1] - source[0] ** 2, 0);
  const rs = e.senseOhm;
  let sense: ReferenceBranch = { averageA: 0, rmsA: 0, conductionLossW: 0 };
  if (e.senseAt === 'input') sense = { averageA: source[0], rmsA: Math.abs(source[0]), conductionLossW: rs * source[0] ** 2 };
  else if (e.senseAt === 'switch') sense = branch(s.switch, rs);
  else if (e.senseAt === 'inductor') sense = branch(s.inductor, rs);
  else if (e.senseAt === 'output') sense = branch(s.load, rs);
  return {
    inductor: branch(s.inductor, e.dcrOhm),
    switch: branch(s.switch, e.switchOhm),
    rectifier: branch(s.rectifier, e.rectifierOhm, e.vf0V),
    inputCapacitor: { averageA: 0, rmsA: Math.sqrt(cinMs), conductionLossW: e.inputEsrOhm * cinMs },
    outputCapacitor: branch(s.capacitor, e.outputEsrOhm),
    sense,
  };
}
