/**
 * Time-domain reference for interleaved converters (test-only code, independent of the analytic engine and
 * of its phase-shifted segment sums): N identical buck or boost stages switched Ts/N apart, each with its own
 * inductor, feeding one shared output capacitor bank, integrated exactly to periodic steady state.
 *
 * Circuit (written node by node from the diagram, the element models of switched-circuit.ts): stage k has
 * an inductor L with DCR, a switch Rsw while on, a rectifier Rrect (synchronous FET) or a diode VF0 + Rd·i
 * while off (CCM only: the reference refuses a point where a diode's current would reverse). The output bank
 * C with ESR sits at the output node with a constant-current sink Io. State x = [iL1 … iLN, vC, 1];
 *   inode = Σ of the inductor currents delivered to the node (buck: every iLk; boost: those of stages off),
 *   vn = vC + ESR·(inode − Io),  C·vC' = inode − Io,
 *   buck  on:  L·iLk' = Vin − iLk·(Rsw + DCR) − vn;        off: L·iLk' = −VF0 − iLk·(Rrect + DCR) − vn
 *   boost on:  L·iLk' = Vin − iLk·(Rsw + DCR);              off: L·iLk' = Vin − VF0 − iLk·(Rrect + DCR) − vn
 * Stage k (k = 0 … N − 1) is on over [k·Ts/N, k·Ts/N + D·Ts) modulo Ts. Between two consecutive switching
 * edges the system is linear, x(t) = e^(M·t)·x0; the period map is affine, so the periodic state is
 * x0 = (I − Φ)⁻¹·c (Gaussian elimination with partial pivoting). The input source current is Σ of the
 * switch currents (buck) or Σ iLk (boost); with a stiff input its AC part is the input bank's current (the
 * same assumption as the one-phase references). Means and RMS over the period by composite Simpson on each
 * smooth stretch (between edges), 64 panels each; peaks from the same samples.
 * Sources: Kirchhoff's laws on the circuit diagram; Moler & Van Loan 2003 (matrix exponential) [memory];
 * shooting for periodic steady state, Aprille & Trick, Proc. IEEE 60(1), 1972 [memory]; Simpson's rule —
 * textbook numerical integration.
 */
import { applyTo, expm, multiply, type Matrix } from './matrix.ts';

export interface InterleavedCircuit {
  boost: boolean;
  phases: number;
  dutyCycle: number;
  periodS: number;
  vinV: number;
  loadA: number;
  inductanceH: number;
  dcrOhm: number;
  switchOhm: number;
  /** Synchronous rectifier RDS(on), or the diode's Rd. */
  rectifierOhm: number;
  /** Diode VF0 (0 for a synchronous rectifier). */
  vf0V: number;
  /** Whole output bank. */
  capacitanceF: number;
  esrOhm: number;
}

export interface InterleavedResult {
  /** Peak to peak of Σ iLk over the period (a buck's output ripple current), A. */
  inductorSumPeakToPeakA: number;
  /** One stage's inductor current peak to peak, A. */
  inductorPeakToPeakA: number;
  /** RMS of the output bank's current (inode − Io), A. */
  outputCapacitorRmsA: number;
  /** RMS of the AC part of the input source current (the input bank's current), A. */
  inputCapacitorRmsA: number;
  /** Mean input source current, A. */
  inputA: number;
  /** Mean output node voltage, V. */
  voutV: number;
  /** Smallest inductor current of any stage, A (must stay > 0 with a diode: CCM). */
  minInductorA: number;
}

const PANELS = 64; // Simpson panels per smooth stretch (even)

/** Solves a·x = b (n×n, row-major), Gaussian elimination with partial pivoting. */
function solve(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r * n + c]!) > Math.abs(m[p * n + c]!)) p = r;
    if (p !== c) {
      for (let j = 0; j < n; j++) [m[c * n + j], m[p * n + j]] = [m[p * n + j]!, m[c * n + j]!];
      [x[c], x[p]] = [x[p]!, x[c]!];
    }
    for (let r = c + 1; r < n; r++) {
      const f = m[r * n + c]! / m[c * n + c]!;
      if (f === 0) continue;
      for (let j = c; j < n; j++) m[r * n + j]! -= f * m[c * n + j]!;
      x[r]! -= f * x[c]!;
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r]!;
    for (let j = r + 1; j < n; j++) s -= m[r * n + j]! * x[j]!;
    x[r] = s / m[r * n + r]!;
  }
  return x;
}

/** Which stages conduct through their switch at time t (the middle of a stretch). */
function onSet(c: InterleavedCircuit, t: number): boolean[] {
  const T = c.periodS;
  return Array.from({ length: c.phases }, (_, k) => {
    const since = (((t - (k * T) / c.phases) % T) + T) % T;
    return since < c.dutyCycle * T;
  });
}

/** The stretch's system matrix M (size n = N + 2: N inductors, vC, the constant 1). */
function system(c: InterleavedCircuit, on: boolean[]): Matrix {
  const N = c.phases;
  const n = N + 2;
  const V = N; // index of vC
  const ONE = N + 1;
  const m = new Float64Array(n * n);
  // vn = vC + ESR·(Σ delivered iLk − Io): as a row over the state.
  const vn = new Float64Array(n);
  vn[V] = 1;
  vn[ONE] = -c.esrOhm * c.loadA;
  const delivered = (k: number) => !c.boost || !on[k];
  for (let k = 0; k < N; k++) if (delivered(k)) vn[k] = c.esrOhm;
  for (let k = 0; k < N; k++) {
    const row = k * n;
    const r = on[k] ? c.switchOhm + c.dcrOhm : c.rectifierOhm + c.dcrOhm;
    m[row + k] -= r / c.inductanceH;
    if (on[k]) m[row + ONE] += c.vinV / c.inductanceH;
    else m[row + ONE] += ((c.boost ? c.vinV : 0) - c.vf0V) / c.inductanceH;
    if (!(c.boost && on[k])) for (let j = 0; j < n; j++) m[row + j] -= vn[j]! / c.inductanceH;
  }
  for (let k = 0; k < N; k++) if (delivered(k)) m[V * n + k] += 1 / c.capacitanceF;
  m[V * n + ONE] -= c.loadA / c.capacitanceF;
  return m;
}

/** Periodic steady state of the interleaved circuit at the given duty, and its shared-node currents. */
export function interleavedSteadyState(c: InterleavedCircuit): InterleavedResult {
  const N = c.phases;
  const n = N + 2;
  const T = c.periodS;
  const edges = new Set<number>([0, T]);
  for (let k = 0; k < N; k++) {
    const on = (k * T) / N;
    const off = (((on + c.dutyCycle * T) % T) + T) % T;
    edges.add(on);
    edges.add(off);
  }
  const times = [...edges].sort((a, b) => a - b);
  const stretches = times.slice(1).map((t1, i) => {
    const t0 = times[i]!;
    const on = onSet(c, 0.5 * (t0 + t1));
    return { duration: t1 - t0, on, m: system(c, on) };
  }).filter((s) => s.duration > 1e-15 * T);
  let phi: Matrix = new Float64Array(n * n);
  for (let i = 0; i < n; i++) phi[i * n + i] = 1;
  for (const s of stretches) phi = multiply(expm(s.m, n, s.duration), phi, n);
  // x0 = Φ·x0 with x0[ONE] = 1: (I − Φ₁₁)·y = Φ₁₂ over the first n − 1 coordinates.
  const k1 = n - 1;
  const a = new Float64Array(k1 * k1);
  const b = new Float64Array(k1);
  for (let i = 0; i < k1; i++) {
    for (let j = 0; j < k1; j++) a[i * k1 + j] = (i === j ? 1 : 0) - phi[i * n + j]!;
    b[i] = phi[i * n + k1]!;
  }
  const y = solve(a, b, k1);
  let x: Float64Array = new Float64Array(n);
  x.set(y);
  x[k1] = 1;

  let sumMin = Infinity;
  let sumMax = -Infinity;
  let oneMin = Infinity;
  let oneMax = -Infinity;
  let minIl = Infinity;
  let inMean = 0;
  let inSq = 0;
  let capSq = 0;
  let vnMean = 0;
  for (const s of stretches) {
    const h = s.duration / PANELS;
    const step = expm(s.m, n, h);
    let z = x;
    for (let p = 0; p <= PANELS; p++) {
      const w = (p === 0 || p === PANELS ? 1 : p % 2 === 1 ? 4 : 2) * (h / 3);
      let sum = 0;
      let delivered = 0;
      let input = 0;
      for (let k = 0; k < N; k++) {
        const i = z[k]!;
        sum += i;
        if (!c.boost || !s.on[k]) delivered += i;
        if (c.boost || s.on[k]) input += i;
        minIl = Math.min(minIl, i);
      }
      const cap = delivered - c.loadA;
      sumMin = Math.min(sumMin, sum);
      sumMax = Math.max(sumMax, sum);
      oneMin = Math.min(oneMin, z[0]!);
      oneMax = Math.max(oneMax, z[0]!);
      inMean += w * input;
      inSq += w * input * input;
      capSq += w * cap * cap;
      vnMean += w * (z[N]! + c.esrOhm * cap);
      if (p < PANELS) z = applyTo(step, z, n);
    }
    x = z;
  }
  const iin = inMean / T;
  return {
    inductorSumPeakToPeakA: sumMax - sumMin,
    inductorPeakToPeakA: oneMax - oneMin,
    outputCapacitorRmsA: Math.sqrt(Math.max(capSq / T, 0)),
    inputCapacitorRmsA: Math.sqrt(Math.max(inSq / T - iin * iin, 0)),
    inputA: iin,
    voutV: vnMean / T,
    minInductorA: minIl,
  };
}
