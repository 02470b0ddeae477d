/**
 * Electro-thermal fixed point: losses depend on temperatures, temperatures on losses; solve all nodes at once.
 *
 * Method: T ← Ta + Θ·P(T) solved by a Newton iteration whose Jacobian uses the network's exact structure
 * and each node's own sensitivity g_i = ∂P_i/∂T_i: the tangent when the caller supplies it (evaluate does,
 * by a small temperature step of each part with the electrical point held), else the secant between
 * successive iterates (the first step is then a plain substitution). With d_i = 1 − θown,i·g_i and, per heatsink,
 * D_s = 1 − θSA,s·Σ g_j/d_j, the step is ΔT_i = (F_i + θSA,s·S_s)/d_i with S_s = (Σ g_j·F_j/d_j)/D_s and
 * F = Ta + Θ·P(T) − T. For a P linear in T, one Newton step lands on the fixed point.
 * Loop gain: a node alone, θ·dP/dT; a heatsink group, 1 − Π d_i · D_s (= 1 − det(I − Θ·G) of the group;
 * (θJC + θCS + θSA)·dP/dT for one part). The fixed point is stable while the loop gain is below 1.
 * Runaway (docs/methods.md §10): (a) the loop gain reaches 1 while the node is still warming (F > 0): there is no
 * fixed point above (with secant slopes, which can carry cross-effects, it must be seen twice in a row); (b) an iterate passes the node's ceiling (its limit + RUNAWAY_BAND_K): no fixed point
 * within the range where the models mean anything; (c) iterations run out with growing steps.
 * The part blamed for a runaway is the one that drives it: within the runaway node's heatsink group (or the
 * node alone), the node with the largest contribution to the loop gain, θpath·dP/dT with θpath its whole
 * path to ambient (θJC + θCS + θSA on a heatsink) — not the first node of the group, which may merely be
 * heated by its neighbour (a leaking Schottky warms the MOSFET on the same sink).
 * The solver never returns NaN. On runaway the result says converged: false and names the node; its
 * numbers describe no steady state: the losses are evaluated with the runaway node at its ceiling and
 * the other nodes at the last iterate, and every temperature is Ta + Θ·P of those losses, capped at the
 * node's ceiling (so the runaway node shows its ceiling).
 * Check: P = 2 W·(1 + 0.005/K·(T − 25 °C)), θ 40 K/W, Ta 25 °C → 158.3333 °C, gain 0.4; θ 100 K/W → runaway.
 */
import { networkTemperatures, type ThermalNetwork } from './network.ts';
import { ThermalWork } from './work.ts';

export { ThermalWork } from './work.ts';

/** Temperatures above a part's limit by more than this are outside every model: runaway. */
export const RUNAWAY_BAND_K = 100;

export interface ElectroThermalOptions {
  /** Converged when every node satisfies |Ta + Θ·P(T) − T| ≤ toleranceK. Default 1e-6 K. */
  toleranceK?: number;
  /** Default 60. */
  maxIterations?: number;
}

export type RunawayReason = 'loop-gain' | 'ceiling' | 'diverging';

export interface ElectroThermalSolution {
  converged: boolean;
  /** Loss evaluations made (each is one call of lossAt). */
  iterations: number;
  /** Temperatures the final losses were evaluated at, °C. */
  evaluatedC: Float64Array;
  /** Node dissipations at evaluatedC, W. */
  powersW: Float64Array;
  /** Ta + Θ·P: the temperatures those losses produce, °C (on runaway: capped at each ceiling). */
  temperaturesC: Float64Array;
  sinkTemperaturesC: Float64Array;
  /** Largest |F| at the last evaluation, K. */
  residualK: number;
  /** Loop gain of each node at the last evaluation (see header). */
  loopGain: Float64Array;
  /** Node that runs away, or −1. */
  runawayNode: number;
  runawayReason: RunawayReason | null;
  /** The ambient the solve was made at, °C. */
  ambientC: number;
}

/**
 * Fills powers (W) for node temperatures temps (°C); may fill slopes[i] = ∂P_i/∂T_i (W/K, left NaN
 * otherwise). Returns false while an inner problem solved along with the temperatures (the duty cycle)
 * has not converged yet, so the solver keeps iterating. `residualK` is the largest temperature residual
 * of the previous evaluation (Infinity at the first): an inner problem may be solved loosely while it is
 * large.
 */
export type LossAt = (temps: Float64Array, powers: Float64Array, slopes: Float64Array, residualK: number) => boolean | void;

/**
 * Solves T = Ta + Θ·P(T); `ceilingC[i]` is node i's runaway ceiling (its limit + RUNAWAY_BAND_K). With a
 * reused `work` (work.ts), the solution and its arrays are the workspace's, valid until its next solve.
 */
export function solveElectroThermal(
  net: ThermalNetwork,
  ambientC: number,
  ceilingC: Float64Array,
  lossAt: LossAt,
  options: ElectroThermalOptions = {},
  work: ThermalWork = new ThermalWork(net.size, net.sinkKPerW.length),
): ElectroThermalSolution {
  const n = net.size;
  const m = net.sinkKPerW.length;
  const tol = options.toleranceK ?? 1e-6;
  const maxIterations = Math.max(2, options.maxIterations ?? 60);
  const { T, P, image, sinkT, F, g, d, prevT, prevP, gain, groupSum, groupF, groupDet, slopes, tangent } = work;
  // A fresh workspace is all zeros; a reused one is reset to exactly that state.
  T.fill(ambientC);
  P.fill(0);
  g.fill(0);
  prevT.fill(0);
  prevP.fill(0);
  let suspect = -1;
  let innerOk = true;
  let iterations = 0;
  let residual = Infinity;
  let previousResidual = Infinity;
  let growing = 0;
  let runawayNode = -1;
  let runawayReason: RunawayReason | null = null;
  let converged = false;

  for (;;) {
    slopes.fill(NaN);
    innerOk = lossAt(T, P, slopes, residual) !== false;
    iterations++;
    for (let i = 0; i < n; i++) if (!(P[i]! >= 0 && P[i]! < Infinity)) P[i] = P[i]! > 0 ? Number.MAX_VALUE / 1e10 : 0;
    networkTemperatures(net, ambientC, P, image, sinkT);
    residual = 0;
    for (let i = 0; i < n; i++) {
      F[i] = image[i]! - T[i]!;
      if (Math.abs(F[i]!) > residual) residual = Math.abs(F[i]!);
      tangent[i] = Number.isFinite(slopes[i]!) ? 1 : 0;
      if (tangent[i]) g[i] = slopes[i]!;
      else if (iterations > 1) {
        const dT = T[i]! - prevT[i]!;
        if (Math.abs(dT) > 1e-6) g[i] = (P[i]! - prevP[i]!) / dT;
      }
      d[i] = 1 - net.ownKPerW[i]! * g[i]!;
    }
    // Heatsink groups: Σ g/d, Σ g·F/d and the determinant factor Π d.
    groupSum.fill(0);
    groupF.fill(0);
    groupDet.fill(1);
    for (let i = 0; i < n; i++) {
      const s = net.sinkOf[i]!;
      if (s < 0) continue;
      groupSum[s] = groupSum[s]! + g[i]! / d[i]!;
      groupF[s] = groupF[s]! + (g[i]! * F[i]!) / d[i]!;
      groupDet[s] = groupDet[s]! * d[i]!;
    }
    for (let i = 0; i < n; i++) {
      const s = net.sinkOf[i]!;
      gain[i] = s < 0 ? 1 - d[i]! : 1 - groupDet[s]! * (1 - net.sinkKPerW[s]! * groupSum[s]!);
    }
    if (residual <= tol && innerOk) {
      converged = true;
      break;
    }
    if (iterations >= maxIterations) {
      if (growing >= 3) {
        runawayReason = 'diverging';
        runawayNode = argMaxAbs(F);
      }
      break;
    }
    growing = residual > previousResidual ? growing + 1 : 0;
    previousResidual = residual;
    // Runaway by loop gain: unstable linearisation while the node is still warming.
    let unstable = false;
    let worst = -1;
    for (let i = 0; i < n; i++) {
      const s = net.sinkOf[i]!;
      const groupUnstable = s >= 0 && (d[i]! <= 1e-12 || 1 - net.sinkKPerW[s]! * groupSum[s]! <= 1e-12);
      if (d[i]! <= 1e-12 || groupUnstable) {
        unstable = true;
        if (F[i]! > 0 && (worst < 0 || gain[i]! > gain[worst]!)) worst = i;
      }
    }
    if (worst >= 0 && (tangent[worst] === 1 || worst === suspect)) {
      runawayNode = worst;
      runawayReason = 'loop-gain';
      break;
    }
    suspect = worst;
    prevT.set(T);
    prevP.set(P);
    for (let i = 0; i < n; i++) {
      let step: number;
      if (unstable) step = F[i]!;
      else {
        const s = net.sinkOf[i]!;
        const shared = s >= 0 ? (net.sinkKPerW[s]! * groupF[s]!) / (1 - net.sinkKPerW[s]! * groupSum[s]!) : 0;
        step = (F[i]! + (s >= 0 ? shared : 0)) / d[i]!;
      }
      if (!Number.isFinite(step)) step = F[i]!;
      let next = T[i]! + step;
      if (next < ambientC) next = ambientC;
      if (next > ceilingC[i]!) {
        next = ceilingC[i]!;
        if (runawayNode < 0 || image[i]! - ceilingC[i]! > image[runawayNode]! - ceilingC[runawayNode]!) runawayNode = i;
      }
      T[i] = next;
    }
    if (runawayNode >= 0) {
      runawayReason = 'ceiling';
      break;
    }
  }

  if (runawayNode >= 0) runawayNode = driverOf(net, g, runawayNode);
  if (runawayNode >= 0) {
    // The record of a point without a steady state: the runaway node at its ceiling, the others at the
    // last iterate; losses evaluated there once more so every number is finite and consistent.
    T[runawayNode] = ceilingC[runawayNode]!;
    slopes.fill(NaN);
    lossAt(T, P, slopes, 0); // 0: the record is final, balance any inner problem fully
    iterations++;
  }

  const temperatures = work.temperatures;
  if (runawayNode >= 0) {
    networkTemperatures(net, ambientC, P, temperatures, sinkT);
    for (let i = 0; i < n; i++) temperatures[i] = Math.min(temperatures[i]!, ceilingC[i]!);
    for (let s = 0; s < m; s++) sinkT[s] = Math.min(sinkT[s]!, sinkCeiling(net, ceilingC, s));
  } else {
    networkTemperatures(net, ambientC, P, temperatures, sinkT);
  }
  const sol = work.solution;
  sol.converged = converged && runawayNode < 0;
  sol.iterations = iterations;
  sol.residualK = residual;
  sol.runawayNode = runawayNode;
  sol.runawayReason = runawayReason;
  sol.ambientC = ambientC;
  return sol;
}

function argMaxAbs(x: Float64Array): number {
  let k = 0;
  for (let i = 1; i < x.length; i++) if (Math.abs(x[i]!) > Math.abs(x[k]!)) k = i;
  return x.length > 0 ? k : -1;
}

/**
 * The highest ceiling among the nodes on heatsink s (a sink is never reported hotter than its parts);
 * a heatsink that carries no node is not capped (it sits at ambient: no power reaches it).
 */
function sinkCeiling(net: ThermalNetwork, ceilingC: Float64Array, s: number): number {
  let v = -Infinity;
  for (let i = 0; i < net.size; i++) if (net.sinkOf[i] === s && ceilingC[i]! > v) v = ceilingC[i]!;
  return v === -Infinity ? Infinity : v;
}

/**
 * The node that drives a runaway found at `node`: the largest θpath·dP/dT in its heatsink group (see
 * header). A node without a heatsink drives its own runaway. `g` holds each node's dP/dT, W/K.
 */
function driverOf(net: ThermalNetwork, g: Float64Array, node: number): number {
  const s = net.sinkOf[node]!;
  if (s < 0) return node;
  let best = node;
  let bestGain = -Infinity;
  for (let i = 0; i < net.size; i++) {
    if (net.sinkOf[i] !== s) continue;
    const contribution = (net.ownKPerW[i]! + net.sinkKPerW[s]!) * g[i]!;
    if (contribution > bestGain) {
      bestGain = contribution;
      best = i;
    }
  }
  return best;
}
