/**
 * The switched buck or boost as ordinary differential equations, for the brute-force cycle-by-cycle
 * reference (test-only code, independent of the analytic engine and of the shooting reference's matrices).
 *
 * Element models (the same as switched-circuit.ts, written here node by node from the circuit diagram):
 * switch = resistor Rsw while on; rectifier = resistor Rrect (synchronous FET, both directions) or a
 * diode VF0 + Rd·i that conducts only forward; inductor L with DCR; output bank C with ESR in series;
 * load a resistor R = Vo/Io (plus an output sense resistor in its loop), or — when the design says
 * spec.loadKind "constant-current" or leaves it out — a sink drawing Io whatever its voltage
 * (vn = vC + ESR·(inode − Io), iR = Io); a constant-power load is not simulated here (its negative
 * incremental resistance makes a fixed-duty transient drift; the shooting reference solves it directly); a sense resistor Rs in the
 * switch, inductor or output loop, or at the input (stiff input: Vin' = Vin − Rs·Iin, Iin the DC source
 * current, since the input capacitor carries all AC — the same assumption as the engine and the shooting
 * reference). States iL, vC; the output node voltage follows from Kirchhoff's current law at the node:
 *   vn = (vC + ESR·inode)·Rl/(Rl + ESR),  iR = vn/Rl,  iC = inode − iR,  C·vC' = iC
 * with inode the current the converter feeds into the node and Rl = R + Rs(output). Inductor voltage:
 *   buck on:   Vin' − iL·(Rsw + Rs(switch)) − iL·(DCR + Rs(inductor)) − vn      inode = iL
 *   buck off:  −VF0 − iL·Rrect − iL·(DCR + Rs(inductor)) − vn                   inode = iL
 *   boost on:  Vin' − iL·(DCR + Rs(inductor)) − iL·(Rsw + Rs(switch))           inode = 0
 *   boost off: Vin' − iL·(DCR + Rs(inductor)) − VF0 − iL·Rrect − vn             inode = iL
 *   idle:      iL ≡ 0 (a blocking rectifier has stopped: DCM)                   inode = 0
 * Time is normalised by the switching period (τ = t·fs), so the quadrature states below accumulate
 * period means directly: ∫iL, ∫iL², ∫iC, ∫iC², ∫iR, ∫iR², ∫vn over the interval.
 * Source: Kirchhoff's voltage and current laws on the circuit diagram; the diode's piecewise-linear
 * forward model VF0 + Rd·i (docs/methods.md §6).
 */
import type { Conditions, ConductionParameters, Design } from '../../shared-model/index.ts';
import type { Derivative } from './odex.ts';

export type Interval = 'on' | 'off' | 'idle';
export type SenseAt = 'none' | 'input' | 'switch' | 'inductor' | 'output';

export interface Elements {
  boost: boolean;
  inductanceH: number;
  capacitanceF: number;
  outputEsrOhm: number;
  inputEsrOhm: number;
  /** Vo/Io (Infinity without load). */
  loadOhm: number;
  /** The load is a constant-current sink of Io (the design's loadKind, absent: constant current). */
  sinkA: number | null;
  switchOhm: number;
  /** Synchronous rectifier RDS(on), or the diode's Rd. */
  rectifierOhm: number;
  /** Diode VF0 (0 for a synchronous rectifier). */
  vf0V: number;
  dcrOhm: number;
  senseOhm: number;
  senseAt: SenseAt;
  /** The rectifier stops at zero current (a diode, or a synchronous rectifier emulating one). */
  blocks: boolean;
  periodS: number;
}

/** Indices of the ODE state vector. */
export const IL = 0;
export const VC = 1;
export const INT_IL = 2;
export const INT_IL2 = 3;
export const INT_IC = 4;
export const INT_IC2 = 5;
export const INT_IR = 6;
export const INT_IR2 = 7;
export const INT_VN = 8;
export const STATES = 9;

export function elementsOf(design: Design, conditions: Conditions, conduction: ConductionParameters): Elements {
  const { parts, topology, spec } = design;
  const synchronous = topology.rectifier === 'synchronous' && parts.rectifier.kind === 'mosfet';
  const outBank = parts.outputCapacitor;
  const inBank = parts.inputCapacitor;
  return {
    boost: topology.kind === 'boost',
    inductanceH: parts.inductor.inductanceH,
    capacitanceF: outBank.part.capacitanceF * outBank.count,
    outputEsrOhm: conduction.outputCapacitorEsrOhm ?? outBank.part.esrOhm / outBank.count,
    inputEsrOhm: inBank.part.esrOhm / inBank.count,
    loadOhm: conditions.loadA > 0 ? spec.voutV / conditions.loadA : Infinity,
    sinkA: sinkOf(spec.loadKind, conditions.loadA),
    switchOhm: conduction.switchOnOhm,
    rectifierOhm: synchronous ? conduction.rectifierOnOhm : conduction.diodeRdOhm,
    vf0V: synchronous ? 0 : conduction.diodeVf0V,
    dcrOhm: conduction.inductorDcrOhm,
    senseOhm: parts.senseResistor ? conduction.senseOhm : 0,
    senseAt: parts.senseResistor ? topology.senseLocation : 'none',
    blocks: !synchronous || topology.lightLoad !== 'forced-pwm',
    periodS: 1 / conditions.switchingFrequencyHz,
  };
}

function sinkOf(kind: string | undefined, loadA: number): number | null {
  if (kind === 'constant-power') throw new Error('cycle-by-cycle reference: a constant-power load is not simulated (see the header)');
  return kind === 'resistive' ? null : loadA;
}

/** Sense resistance in the given loop (0 elsewhere). */
export function senseIn(e: Elements, where: SenseAt): number {
  return e.senseAt === where ? e.senseOhm : 0;
}

/** dy/dτ (τ = t/T) in one conduction interval, with the source at vin1 = Vin − Rs(input)·Iin. */
export function derivative(e: Elements, kind: Interval, vin1: number): Derivative {
  const T = e.periodS;
  const rl = e.loadOhm + senseIn(e, 'output');
  const finite = Number.isFinite(rl);
  const esr = e.outputEsrOhm;
  const rInductor = e.dcrOhm + senseIn(e, 'inductor');
  const rSwitch = e.switchOhm + senseIn(e, 'switch');
  const feeds = kind === 'off' || (kind === 'on' && !e.boost);
  const kL = T / e.inductanceH;
  const kC = T / e.capacitanceF;
  return (_tau, y) => {
    const iL = kind === 'idle' ? 0 : y[IL];
    const vC = y[VC];
    const inode = feeds ? iL : 0;
    const sink = e.sinkA;
    const vn = sink !== null ? vC + esr * (inode - sink) : finite ? ((vC + esr * inode) * rl) / (rl + esr) : vC + esr * inode;
    const iR = sink !== null ? sink : finite ? vn / rl : 0;
    const iC = inode - iR;
    let vL = 0;
    if (kind === 'on') vL = e.boost ? vin1 - iL * (rInductor + rSwitch) : vin1 - iL * (rSwitch + rInductor) - vn;
    else if (kind === 'off') vL = (e.boost ? vin1 : 0) - e.vf0V - iL * (e.rectifierOhm + rInductor) - vn;
    return [kL * vL, kC * iC, iL, iL * iL, iC, iC * iC, iR, iR * iR, vn];
  };
}
