/**
 * The electro-thermal solver's work arrays (fixed-point.ts) for a network of n nodes and m heatsinks.
 * One workspace serves every solve of a sweep (no allocation per point); each solve resets it, so a
 * reused workspace gives exactly the numbers of a fresh one.
 */
import type { ElectroThermalSolution } from './fixed-point.ts';

/** Work arrays and the solution record; the solution's arrays are the workspace's own. */
export class ThermalWork {
  readonly T: Float64Array;
  readonly P: Float64Array;
  readonly image: Float64Array;
  readonly sinkT: Float64Array;
  readonly F: Float64Array;
  readonly g: Float64Array;
  readonly d: Float64Array;
  readonly prevT: Float64Array;
  readonly prevP: Float64Array;
  readonly gain: Float64Array;
  readonly groupSum: Float64Array;
  readonly groupF: Float64Array;
  readonly groupDet: Float64Array;
  readonly slopes: Float64Array;
  readonly tangent: Uint8Array;
  readonly temperatures: Float64Array;
  /** The solution record handed out (its fields are refilled by each solve). */
  readonly solution: ElectroThermalSolution;

  constructor(n: number, m: number) {
    this.T = new Float64Array(n);
    this.P = new Float64Array(n);
    this.image = new Float64Array(n);
    this.sinkT = new Float64Array(m);
    this.F = new Float64Array(n);
    this.g = new Float64Array(n);
    this.d = new Float64Array(n);
    this.prevT = new Float64Array(n);
    this.prevP = new Float64Array(n);
    this.gain = new Float64Array(n);
    this.groupSum = new Float64Array(m);
    this.groupF = new Float64Array(m);
    this.groupDet = new Float64Array(m);
    this.slopes = new Float64Array(n);
    this.tangent = new Uint8Array(n);
    this.temperatures = new Float64Array(n);
    this.solution = {
      converged: false, iterations: 0, evaluatedC: this.T, powersW: this.P, temperaturesC: this.temperatures,
      sinkTemperaturesC: this.sinkT, residualK: Infinity, loopGain: this.gain, runawayNode: -1, runawayReason: null, ambientC: 0,
    };
  }
}
