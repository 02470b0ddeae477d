/**
 * Test-only stand-in for the ledger: an evaluator whose efficiency, temperatures, mode and warnings follow
 * closed forms, so landmark finders can be checked against answers known by hand.
 *
 * Loss (docs/methods.md §12): P(Io) = P0 + a·Io + b(T)·Io² with b(T) = b0·(1 + alpha·(T − 25 °C)); one part
 * ("inductor") carries the I² term and sits at T = Ta + thetaKPerW·b(T)·Io² (docs/methods.md §10 fixed point,
 * solved in closed form: T = (Ta + θ·b0·Io²·(1 − 25·alpha))/(1 − θ·b0·alpha·Io²)).
 * Mode: DCM below `boundaryA`. Duty: dutyPerA·Io, with a duty-limit warning above maxDuty.
 */
import type { Design, Evaluation, Warning } from '../../../shared-model/index.ts';

export interface SyntheticCurve {
  voutV: number;
  p0W: number;
  aV: number;
  b0Ohm: number;
  /** Temperature coefficient of the I² term, per K (0: none). */
  alphaPerK?: number;
  thetaKPerW?: number;
  limitC?: number;
  marginK?: number;
  boundaryA?: number;
  dutyPerA?: number;
  maxDuty?: number;
}

export function syntheticDesign(ratedLoadA: number, ambientC = 25): Design {
  return {
    name: 'synthetic curve',
    spec: { vinMinV: 10, vinNomV: 12, vinMaxV: 14, voutV: 5, ratedLoadA, switchingFrequencyHz: 500e3, ambientC, maxDuty: 0.9 },
  } as unknown as Design;
}

export function syntheticEvaluator(c: SyntheticCurve) {
  const alpha = c.alphaPerK ?? 0;
  const theta = c.thetaKPerW ?? 0;
  const limit = c.limitC ?? 150;
  const margin = c.marginK ?? 0;
  return (_design: Design, conditions: Evaluation['conditions']): Evaluation => {
    const io = conditions.loadA;
    const ta = conditions.ambientC;
    const gain = theta * c.b0Ohm * alpha * io * io;
    const runaway = gain >= 1;
    const t = runaway ? limit + 100 : (ta + theta * c.b0Ohm * io * io * (1 - 25 * alpha)) / (1 - gain);
    const b = c.b0Ohm * (1 + alpha * (t - 25));
    const i2r = b * io * io;
    const totalLoss = c.p0W + c.aV * io + i2r;
    const outputPower = c.voutV * io;
    const duty = (c.dutyPerA ?? 0) * io;
    const warnings: Warning[] = [];
    const limited = c.maxDuty !== undefined && duty > c.maxDuty;
    if (limited) warnings.push({ code: 'duty-limit', severity: 'danger', message: 'duty limit' });
    if (runaway) warnings.push({ code: 'thermal-runaway', severity: 'danger', message: 'runaway' });
    const mode = c.boundaryA !== undefined && io < c.boundaryA ? 'DCM' : 'CCM';
    const ripple = c.boundaryA !== undefined ? 2 * c.boundaryA : 0.1;
    return {
      conditions,
      regulated: !limited,
      converged: !runaway,
      iterations: 1,
      efficiency: outputPower / (outputPower + totalLoss),
      inputPower: outputPower + totalLoss,
      outputPower,
      totalLoss,
      dutyCycle: duty,
      conductionMode: mode,
      losses: [
        { part: 'controller', partName: 'fixed', mechanism: 'quiescent', watts: c.p0W, formula: 'P0', inputs: [] },
        { part: 'rectifier', partName: 'drop', mechanism: 'forward drop', watts: c.aV * io, formula: 'a·Io', inputs: [] },
        { part: 'inductor', partName: 'winding', mechanism: 'winding DC', watts: i2r, formula: 'b·Io²', inputs: [] },
      ],
      temperatures: [
        { part: 'inductor', partName: 'winding', kind: 'hot-spot', celsius: t, limit, marginK: limit - margin - t, surfaceC: t, dissipationW: i2r, path: 'direct' },
      ],
      hazards: [],
      checks: [],
      warnings,
      operatingPoint: {
        // Past the duty limit the output falls in proportion to the duty it lacks (a buck's D·Vin).
        voutV: limited ? (c.voutV * (c.maxDuty ?? 0)) / duty : c.voutV,
        // The stand-in switches at the design rate at every load (no pulse skipping).
        conditions: { switchingFrequencyHz: conditions.switchingFrequencyHz },
        inductor: { peakA: io + ripple / 2, rippleA: ripple, minA: io - ripple / 2, valleyA: io - ripple / 2, rmsA: io, averageA: io, acRmsA: 0 },
      } as unknown as Evaluation['operatingPoint'],
      heatsinks: [],
    };
  };
}

/** Efficiency of the synthetic curve without temperature dependence (alpha = 0). */
export function efficiencyOf(c: SyntheticCurve, io: number): number {
  return (c.voutV * io) / (c.voutV * io + c.p0W + c.aV * io + c.b0Ohm * io * io);
}
