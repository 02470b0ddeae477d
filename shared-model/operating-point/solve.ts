/**
 * The operating-point solver: duty cycle, conduction mode and every branch current of a buck or boost.
 *
 * 1. Reduce the design to loop resistances and drops (circuit.ts) at the given conduction parameters.
 * 2. Duty from volt-second balance with the drops (duty.ts); the mode (CCM/DCM) follows from the
 *    rectifier: a diode or diode emulation enters DCM when the CCM valley would be below 0, forced PWM
 *    stays in CCM with reverse current.
 * 3. With options.lossOf, the duty is re-solved so that Vin · Iin = Pout + lossOf(op) (power-balance.ts).
 * 4. The record: waveforms, exact statistics, edges, stress, output ripple, small signal (assemble.ts)
 *    and warnings (checks.ts).
 * Never throws for physics (limits become warnings); throws a RangeError for impossible conditions
 * (a programmer error: the document validator and the sweep code keep them out).
 * Source: docs/methods.md §1–3, §13; Erickson & Maksimović 2nd ed. ch. 2–3, 5 [memory for chapters].
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters, OperatingPoint, SolveOptions } from './types.ts';
import { circuitOf } from './circuit.ts';
import { newShape, shapeAt, type Shape } from './shape.ts';
import { solveVoltSecond } from './duty.ts';
import { solvePowerBalance } from './power-balance.ts';
import { buildOperatingPoint } from './assemble.ts';
import { addWarnings } from './checks.ts';

function requireFinite(value: number, name: string, min: number, inclusive: boolean): void {
  const ok = Number.isFinite(value) && (inclusive ? value >= min : value > min);
  if (!ok) throw new RangeError(`${name} = ${value}: must be a finite number ${inclusive ? '≥' : '>'} ${min}`);
}

function checkInputs(conditions: Conditions, conduction: ConductionParameters): void {
  requireFinite(conditions.vinV, 'conditions.vinV', 0, false);
  requireFinite(conditions.loadA, 'conditions.loadA', 0, true);
  requireFinite(conditions.switchingFrequencyHz, 'conditions.switchingFrequencyHz', 0, false);
  requireFinite(conditions.ambientC, 'conditions.ambientC', -273.15, true);
  for (const key of ['switchOnOhm', 'rectifierOnOhm', 'diodeVf0V', 'diodeRdOhm', 'inductorDcrOhm', 'senseOhm'] as const) {
    requireFinite(conduction[key], `conduction.${key}`, 0, true);
  }
  if (conduction.outputCapacitorEsrOhm !== undefined) {
    requireFinite(conduction.outputCapacitorEsrOhm, 'conduction.outputCapacitorEsrOhm', 0, true);
  }
}

/** Solves the operating point of `design` at `conditions` with the given conduction parameters. */
export function solveOperatingPoint(
  design: Design,
  conditions: Conditions,
  conduction: ConductionParameters,
  options?: SolveOptions,
): OperatingPoint {
  checkInputs(conditions, conduction);
  const c = circuitOf(design, conditions, conduction);
  const dMax = design.spec.maxDuty;
  const s = newShape();
  const vs = solveVoltSecond(c, dMax, s);
  const regulated = vs.limit === 'none';
  let d = vs.d;
  let method: OperatingPoint['dutyMethod'] = 'volt-second';
  let extraInputA = 0;
  let fallback = false;
  const lossOf = options?.lossOf;
  if (lossOf && regulated) {
    const trialMeta = { regulated: true, dutyMethod: 'power-balance' as const, extraInputA: 0, warnings: [] };
    const lossAt = (shape: Shape) => lossOf(buildOperatingPoint(c, shape, conditions, trialMeta));
    const pb = solvePowerBalance(c, dMax, s, d, vs.vo, lossAt);
    if (pb.feasible) {
      d = pb.d;
      method = 'power-balance';
    } else {
      fallback = true;
      shapeAt(c, d, vs.vo, s);
      const loss = lossAt(s);
      extraInputA = Math.max((vs.vo * c.loadA + loss) / c.vinV - s.iin, 0);
    }
  }
  shapeAt(c, d, vs.vo, s);
  const op = buildOperatingPoint(c, s, conditions, { regulated, dutyMethod: method, extraInputA, warnings: [] });
  addWarnings({ design, circuit: c, limit: vs.limit, powerBalanceFallback: fallback }, op);
  const sourceLossOf = options?.sourceLossOf;
  if (sourceLossOf) {
    const extra = sourceLossOf(op);
    if (!Number.isFinite(extra)) throw new Error(`sourceLossOf returned ${extra}; it must return a finite number of watts`);
    op.waveforms.inputA += Math.max(extra, 0) / c.vinV;
  }
  return op;
}
