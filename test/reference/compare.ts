/**
 * Comparison of the analytic operating point with the time-domain reference (test-only).
 *
 * Quantities compared (relative error):
 * - mean and RMS current of the inductor, switch, rectifier and sense resistor; RMS of the input and
 *   output capacitors; when a branch current reverses (forced PWM), its mean is a small difference of
 *   large opposite areas and is compared relative to the branch's RMS instead;
 * - conduction loss of every resistive element: Irms²·R (switch, synchronous rectifier, DCR, sense,
 *   both capacitor banks' ESR) and VF0·Iavg + Rd·Irms² (diode), the engine's side computed here from
 *   its statistics;
 * - output ripple (capacitive and total peak to peak), output voltage, conduction mode.
 */
import type { ConductionParameters, Design, OperatingPoint } from '../../shared-model/index.ts';
import type { ReferenceResult } from './steady-state.ts';

export interface Discrepancy {
  quantity: string;
  engine: number;
  reference: number;
  /** Relative error (or error relative to the RMS for the mean of a reversing branch). */
  error: number;
}

/** Conduction losses from the engine's statistics, by element. */
export function engineConductionLosses(design: Design, op: OperatingPoint, cp: ConductionParameters): Record<string, number> {
  const sync = design.topology.rectifier === 'synchronous' && design.parts.rectifier.kind === 'mosfet';
  const rect = op.stats.rectifier;
  const outBank = design.parts.outputCapacitor;
  const inBank = design.parts.inputCapacitor;
  const esrOut = cp.outputCapacitorEsrOhm ?? outBank.part.esrOhm / outBank.count;
  return {
    switch: op.stats.switch.rmsA ** 2 * cp.switchOnOhm,
    rectifier: sync ? rect.rmsA ** 2 * cp.rectifierOnOhm : cp.diodeVf0V * rect.averageA + cp.diodeRdOhm * rect.rmsA ** 2,
    inductor: op.inductor.rmsA ** 2 * cp.inductorDcrOhm,
    outputCapacitor: op.stats.outputCapacitor.rmsA ** 2 * esrOut,
    inputCapacitor: op.stats.inputCapacitor.rmsA ** 2 * (inBank.part.esrOhm / inBank.count),
    sense: op.stats.sense.rmsA ** 2 * cp.senseOhm,
  };
}

export function compareWithReference(design: Design, op: OperatingPoint, cp: ConductionParameters, ref: ReferenceResult): Discrepancy[] {
  const out: Discrepancy[] = [];
  const rel = (quantity: string, engine: number, reference: number, scale = Math.abs(reference)) => {
    out.push({ quantity, engine, reference, error: Math.abs(engine - reference) / scale });
  };
  const reverses = op.inductor.valleyA < 0;
  const branches = [
    ['inductor', op.inductor],
    ['switch', op.stats.switch],
    ['rectifier', op.stats.rectifier],
    ['sense', op.stats.sense],
  ] as const;
  for (const [name, stats] of branches) {
    const r = ref.branches[name];
    if (r.rmsA === 0 && stats.rmsA === 0) continue;
    rel(`${name} RMS`, stats.rmsA, r.rmsA);
    rel(reverses ? `${name} mean (÷ RMS, reversing)` : `${name} mean`, stats.averageA, r.averageA, reverses ? r.rmsA : Math.abs(r.averageA));
  }
  rel('input capacitor RMS', op.stats.inputCapacitor.rmsA, ref.branches.inputCapacitor.rmsA);
  rel('output capacitor RMS', op.stats.outputCapacitor.rmsA, ref.branches.outputCapacitor.rmsA);
  const losses = engineConductionLosses(design, op, cp);
  for (const [name, watts] of Object.entries(losses)) {
    const r = ref.branches[name as keyof ReferenceResult['branches']].conductionLossW;
    if (r === 0 && watts === 0) continue;
    rel(`${name} conduction loss`, watts, r);
  }
  rel('output ripple (total)', op.outputRipple.totalV, ref.outputRipple.totalV);
  rel('output ripple (capacitive)', op.outputRipple.capacitiveV, ref.outputRipple.capacitiveV);
  rel('output voltage', op.voutV, ref.voutV);
  rel('input current', op.waveforms.inputA, ref.inputA);
  return out;
}
