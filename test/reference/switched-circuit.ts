/**
 * The switched circuit of a buck or boost as linear systems, one per conduction interval (test-only).
 *
 * States x = [iL, vC] (inductor current, output-capacitor voltage). The output node is
 * vn = α·vC + β·inode with α = Rl/(Rl + ESR), β = Rl·ESR/(Rl + ESR), Rl = R + Rsense(output), where
 * inode is the current the converter feeds into the node (buck: iL while the switch or rectifier
 * conducts; boost: iL while the rectifier conducts). Kirchhoff's laws give, per interval,
 *   buck on:   L·iL' = Vin' − (Ron,loop + β)·iL − α·vC
 *   buck off:  L·iL' = −VF0 − (Roff,loop + β)·iL − α·vC
 *   boost on:  L·iL' = Vin' − Ron,loop·iL
 *   boost off: L·iL' = Vin' − VF0 − (Roff,loop + β)·iL − α·vC
 *   idle:      iL ≡ 0 (rectifier blocking, DCM)
 *   always:    C·vC' = inode − vn/Rl
 * with Ron,loop = RDS,sw + DCR + Rsense(switch|inductor), Roff,loop = Rrect + DCR + Rsense(inductor) and
 * the load a resistor R = Vo/Io. A load of another kind is given in Norton form seen from the node,
 * iload = J + vn/Rl (Rl may be infinite or negative): then, from the current law at the node,
 *   vn = α·vC + β·inode − β·J,  α = 1/(1 + ESR/Rl), β = ESR·α,  C·vC' = inode − iload. Stiff input: Vin' = Vin − Rsense(input)·Iin with Iin the DC source
 * current (the input capacitor supplies all AC), the same assumption the analytic engine states.
 * Source: Kirchhoff's voltage and current laws on the circuit diagram; nothing from the engine.
 */

/** Coefficients on [iL, vC] and an optional constant term. */
export type Row = [number, number] | [number, number, number];

export interface IntervalSystem {
  /** x' = A·x + b, A row-major 2×2. */
  a: [number, number, number, number];
  b: [number, number];
  /** Coefficients on [iL, vC] of the branch quantities in this interval. */
  switchA: Row;
  rectifierA: Row;
  nodeA: Row;
  outputNodeV: Row;
  capacitorA: Row;
  loadA: Row;
}

export interface CircuitValues {
  boost: boolean;
  inductanceH: number;
  capacitanceF: number;
  esrOhm: number;
  /** Load resistance plus an output sense resistor (Infinity for no load or a pure current sink; negative
   *  for the incremental resistance of a constant-power load). */
  loadLoopOhm: number;
  /** Constant current of the load's Norton form (0 for a resistor), A. */
  loadSinkA?: number;
  onLoopOhm: number;
  offLoopOhm: number;
  vf0V: number;
}

export type IntervalKind = 'on' | 'off' | 'idle';

export function intervalSystem(v: CircuitValues, kind: IntervalKind, vin1: number): IntervalSystem {
  const g = Number.isFinite(v.loadLoopOhm) ? 1 / v.loadLoopOhm : 0;
  const alpha = g !== 0 ? v.loadLoopOhm / (v.loadLoopOhm + v.esrOhm) : 1;
  const beta = g !== 0 ? (v.loadLoopOhm * v.esrOhm) / (v.loadLoopOhm + v.esrOhm) : v.esrOhm;
  const sink = v.loadSinkA ?? 0;
  const gamma = -beta * sink;
  const L = v.inductanceH;
  const C = v.capacitanceF;
  const feeds = kind === 'off' || (kind === 'on' && !v.boost);
  const node: Row = feeds ? [1, 0] : [0, 0];
  const vn: [number, number, number] = [beta * node[0], alpha, gamma];
  const cap: [number, number, number] = [node[0] - g * vn[0], -g * vn[1], -sink - g * gamma];
  let a0: number;
  let a1: number;
  let b0: number;
  if (kind === 'idle') {
    a0 = 0;
    a1 = 0;
    b0 = 0;
  } else if (kind === 'on') {
    a0 = v.boost ? -v.onLoopOhm / L : -(v.onLoopOhm + beta) / L;
    a1 = v.boost ? 0 : -alpha / L;
    b0 = (vin1 - (v.boost ? 0 : gamma)) / L;
  } else {
    a0 = -(v.offLoopOhm + beta) / L;
    a1 = -alpha / L;
    b0 = ((v.boost ? vin1 : 0) - v.vf0V - gamma) / L;
  }
  return {
    a: [a0, a1, cap[0] / C, cap[1] / C],
    b: [b0, cap[2] / C],
    switchA: kind === 'on' ? [1, 0] : [0, 0],
    rectifierA: kind === 'off' ? [1, 0] : [0, 0],
    nodeA: node,
    outputNodeV: vn,
    capacitorA: cap,
    loadA: [g * vn[0], g * vn[1], sink + g * gamma],
  };
}

/** The 3×3 augmented matrix [[A, b], [0, 0]] acting on [iL, vC, 1]. */
export function augmented3(s: IntervalSystem): Float64Array {
  return Float64Array.from([s.a[0], s.a[1], s.b[0], s.a[2], s.a[3], s.b[1], 0, 0, 0]);
}

/**
 * The 12×12 matrix propagating the monomials m = [1, iL, vC, iL², iL·vC, vC²] and their integrals
 * divided by `period` (exact quadratic moments: products of states of a linear system obey a linear
 * system themselves).
 */
export function monomialSystem(s: IntervalSystem, period: number): Float64Array {
  const [a00, a01, a10, a11] = s.a;
  const [b0, b1] = s.b;
  const k = [
    [0, 0, 0, 0, 0, 0],
    [b0, a00, a01, 0, 0, 0],
    [b1, a10, a11, 0, 0, 0],
    [0, 2 * b0, 0, 2 * a00, 2 * a01, 0],
    [0, b1, b0, a10, a00 + a11, a01],
    [0, 0, 2 * b1, 0, 2 * a10, 2 * a11],
  ];
  const m = new Float64Array(144);
  for (let i = 0; i < 6; i++) {
    for (let j = 0; j < 6; j++) m[i * 12 + j] = k[i][j];
    m[(6 + i) * 12 + i] = 1 / period;
  }
  return m;
}
