/**
 * Time-domain reference: the periodic steady state of the switched circuit, found by shooting
 * (test-only code, independent of the analytic engine).
 *
 * Each interval is integrated exactly: x(t) = e^(M·t)·[x0; 1] with M = [[A, b], [0, 0]]; means and RMS
 * come from exact integrals of the state monomials (switched-circuit.ts). Steady state:
 * - CCM (or forced PWM): the period map x0 → x(T) is affine, x(T) = Φ·x0 + c, so x0 = (I − Φ)⁻¹·c;
 *   with a blocking rectifier it is kept only if the current stays > 0 through the rectifier interval.
 * - DCM: iL(0) = 0; the rectifier stops where iL reaches 0 (root of iL(t), Newton with bisection);
 *   the unknown vC(0) is found by secant iteration on vC(T) − vC(0) = 0.
 * An input sense resistor's drop (Rs · DC source current) is iterated to a fixed point.
 * Ripple: peak to peak of vC and of the output node over 600 samples per interval plus the edges.
 * Sources: Moler & Van Loan 2003 (matrix exponential) [memory]; shooting for periodic steady state,
 * Aprille & Trick, Proc. IEEE 60(1), 1972 [memory].
 */
import type { Conditions, ConductionParameters, Design } from '../../shared-model/index.ts';
import { applyTo, expm } from './matrix.ts';
import { augmented3, monomialSystem, type CircuitValues, type Row } from './switched-circuit.ts';
import { ccmPieces, dcmPieces, type Piece, type Setup } from './shooting.ts';

export interface ReferenceBranch {
  averageA: number;
  rmsA: number;
  /** Irms²·R (VF0·Iavg + Rd·Irms² for a diode); 0 for a branch without resistance. */
  conductionLossW: number;
}

export interface ReferenceResult {
  mode: 'CCM' | 'DCM';
  dutyCycle: number;
  rectifierFraction: number;
  /** Mean voltage across the load resistor. */
  voutV: number;
  inputA: number;
  inductorPeakA: number;
  inductorValleyA: number;
  branches: Record<'inductor' | 'switch' | 'rectifier' | 'inputCapacitor' | 'outputCapacitor' | 'sense', ReferenceBranch>;
  outputRipple: { capacitiveV: number; totalV: number };
}

/** Exact period means of linear and quadratic state monomials, summed over the pieces. */
interface Moments {
  mean: (row: (p: Piece) => Row) => number;
  meanSquare: (row: (p: Piece) => Row) => number;
}

function moments(pieces: Piece[], period: number): Moments {
  const ints = pieces.map((p) => {
    if (p.duration <= 0) return new Float64Array(6);
    const e = expm(monomialSystem(p.sys, period), 12, p.duration);
    const [i, v] = p.x0;
    const m0 = Float64Array.from([1, i, v, i * i, i * v, v * v, 0, 0, 0, 0, 0, 0]);
    return applyTo(e, m0, 12).subarray(6);
  });
  return {
    mean: (row) =>
      pieces.reduce((acc, p, k) => {
        const [c0, c1, c2 = 0] = row(p);
        return acc + c0 * ints[k][1] + c1 * ints[k][2] + c2 * ints[k][0];
      }, 0),
    meanSquare: (row) =>
      pieces.reduce((acc, p, k) => {
        const [c0, c1, c2 = 0] = row(p);
        const i = ints[k];
        return acc + c0 * c0 * i[3] + 2 * c0 * c1 * i[4] + c1 * c1 * i[5] + 2 * c2 * (c0 * i[1] + c1 * i[2]) + c2 * c2 * i[0];
      }, 0),
  };
}

function rippleOf(pieces: Piece[]): { capacitiveV: number; totalV: number } {
  let cMin = Infinity;
  let cMax = -Infinity;
  let nMin = Infinity;
  let nMax = -Infinity;
  const samples = 600;
  for (const p of pieces) {
    if (p.duration <= 0) continue;
    const step = expm(augmented3(p.sys), 3, p.duration / samples);
    let x: Float64Array = Float64Array.from([p.x0[0], p.x0[1], 1]);
    for (let k = 0; k <= samples; k++) {
      const vn = p.sys.outputNodeV[0] * x[0] + p.sys.outputNodeV[1] * x[1] + (p.sys.outputNodeV[2] ?? 0);
      cMin = Math.min(cMin, x[1]);
      cMax = Math.max(cMax, x[1]);
      nMin = Math.min(nMin, vn);
      nMax = Math.max(nMax, vn);
      if (k < samples) x = applyTo(step, x, 3);
    }
  }
  return { capacitiveV: cMax - cMin, totalV: nMax - nMin };
}

/**
 * The load seen from the output node in Norton form, iload = sinkA + vn/loopOhm (switched-circuit.ts),
 * from what the load is (design `spec.loadKind`; absent: a constant-current sink), its operating point
 * (Vo, Io) and an output sense resistor Rs in series with it:
 * - constant current: a sink Io (loopOhm infinite);
 * - resistive: R = Vo/Io, loopOhm = R + Rs;
 * - constant power P = Vo·Io at the load's terminals, i = P/vt, vt = vn − Rs·i, linearised about (Vo, Io):
 *   i = 2·Io − vt/R, so i = (2·Io·R − vn)/(R − Rs): loopOhm = Rs − R, sinkA = 2·Io·R/(R − Rs). The
 *   neglected curvature is Io·(δv/Vo)² for a voltage excursion δv: below 1e-5 relative for ripples under
 *   0.3 % of Vo.
 * Source: Kirchhoff's laws; first-order Taylor expansion of i = P/v — written here from the circuit,
 * independently of the engine's load model.
 */
export function nortonLoad(kind: string, voutV: number, loadA: number, senseOhm: number): { loopOhm: number; sinkA: number } {
  if (!(loadA > 0)) return { loopOhm: Infinity, sinkA: 0 };
  const r = voutV / loadA;
  if (kind === 'resistive') return { loopOhm: r + senseOhm, sinkA: 0 };
  if (kind === 'constant-power') return { loopOhm: senseOhm - r, sinkA: (2 * loadA * r) / (r - senseOhm) };
  return { loopOhm: Infinity, sinkA: loadA };
}

/**
 * Periodic steady state of `design` at `conditions` for a given duty cycle, with the load of the design's
 * kind (nortonLoad; absent: a constant-current sink Io). Returns branch means, RMS and conduction losses,
 * and the output ripple.
 */
export function referenceSteadyState(
  design: Design,
  conditions: Conditions,
  dutyCycle: number,
  conduction: ConductionParameters,
): ReferenceResult {
  const { parts, topology, spec } = design;
  const boost = topology.kind === 'boost';
  const synchronous = topology.rectifier === 'synchronous' && parts.rectifier.kind === 'mosfet';
  const where = parts.senseResistor ? topology.senseLocation : 'none';
  const rs = conduction.senseOhm;
  const at = (w: string) => (where === w ? rs : 0);
  const rRect = synchronous ? conduction.rectifierOnOhm : conduction.diodeRdOhm;
  const vf0 = synchronous ? 0 : conduction.diodeVf0V;
  const outBank = parts.outputCapacitor;
  const inBank = parts.inputCapacitor;
  const esrOut = conduction.outputCapacitorEsrOhm ?? outBank.part.esrOhm / outBank.count;
  const esrIn = inBank.part.esrOhm / inBank.count;
  const loadOhm = conditions.loadA > 0 ? spec.voutV / conditions.loadA : Infinity;
  const load = nortonLoad(spec.loadKind ?? 'constant-current', spec.voutV, conditions.loadA, at('output'));
  const values: CircuitValues = {
    boost,
    inductanceH: parts.inductor.inductanceH,
    capacitanceF: outBank.part.capacitanceF * outBank.count,
    esrOhm: esrOut,
    loadLoopOhm: load.loopOhm,
    loadSinkA: load.sinkA,
    onLoopOhm: conduction.switchOnOhm + conduction.inductorDcrOhm + at('switch') + at('inductor'),
    offLoopOhm: rRect + conduction.inductorDcrOhm + at('inductor'),
    vf0V: vf0,
  };
  const period = 1 / conditions.switchingFrequencyHz;
  const setup: Setup = {
    values,
    period,
    tOn: dutyCycle * period,
    blocksReverse: !synchronous || topology.lightLoad !== 'forced-pwm',
  };
  const solveAt = (vin1: number): { pieces: Piece[]; mode: 'CCM' | 'DCM' } => {
    const ccm = ccmPieces(setup, vin1);
    if (!setup.blocksReverse || ccm[0].x0[0] > 0) return { pieces: ccm, mode: 'CCM' };
    const dcm = dcmPieces(setup, vin1, spec.voutV);
    if (!dcm) throw new Error('reference: no periodic steady state found in DCM');
    return { pieces: dcm, mode: 'DCM' };
  };
  const sourceMean = (pieces: Piece[]) =>
    moments(pieces, period).mean((p) => (boost ? [1, 0] : p.sys.switchA));
  let vin1 = conditions.vinV;
  let state = solveAt(vin1);
  const rIn = at('input');
  if (rIn > 0) {
    for (let k = 0; k < 100; k++) {
      const next = conditions.vinV - rIn * sourceMean(state.pieces);
      if (Math.abs(next - vin1) <= 1e-15 * conditions.vinV) break;
      vin1 = next;
      state = solveAt(vin1);
    }
  }
  const { pieces, mode } = state;
  const mo = moments(pieces, period);
  const branch = (row: (p: Piece) => Row, ohm: number, vf = 0): ReferenceBranch => {
    const mean = mo.mean(row);
    const ms = Math.max(mo.meanSquare(row), 0);
    return { averageA: mean, rmsA: Math.sqrt(ms), conductionLossW: vf * mean + ohm * ms };
  };
  const inductor = branch(() => [1, 0], conduction.inductorDcrOhm);
  const sw = branch((p) => p.sys.switchA, conduction.switchOnOhm);
  const rectifier = branch((p) => p.sys.rectifierA, rRect, vf0);
  const outputCapacitor = branch((p) => p.sys.capacitorA, esrOut);
  const source = boost ? inductor : sw;
  const cinMs = Math.max(source.rmsA ** 2 - source.averageA ** 2, 0);
  const inputCapacitor = { averageA: 0, rmsA: Math.sqrt(cinMs), conductionLossW: esrIn * cinMs };
  const senseRow: Record<string, (p: Piece) => Row> = {
    switch: (p) => p.sys.switchA,
    inductor: () => [1, 0],
    output: (p) => p.sys.loadA,
  };
  let sense: ReferenceBranch = { averageA: 0, rmsA: 0, conductionLossW: 0 };
  if (where === 'input') sense = { averageA: source.averageA, rmsA: Math.abs(source.averageA), conductionLossW: rs * source.averageA ** 2 };
  else if (senseRow[where]) sense = branch(senseRow[where], rs);
  const loadMean = mo.mean((p) => p.sys.loadA);
  const rectifierTime = pieces.find((p) => p.kind === 'off')?.duration ?? 0;
  return {
    mode,
    dutyCycle,
    rectifierFraction: rectifierTime / period,
    voutV: Number.isFinite(loadOhm) ? mo.mean((p) => p.sys.outputNodeV) - at('output') * loadMean : mo.mean((p) => p.sys.outputNodeV),
    inputA: source.averageA,
    inductorPeakA: pieces[1].x0[0],
    inductorValleyA: pieces[0].x0[0],
    branches: { inductor, switch: sw, rectifier, inputCapacitor, outputCapacitor, sense },
    outputRipple: rippleOf(pieces),
  };
}
