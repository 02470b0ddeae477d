/**
 * The converter reduced to the numbers the operating-point equations need (built once per solve).
 *
 * Each conduction interval sees an inductor voltage that is affine in the interval's mean current ī:
 *   on interval (control switch conducts):   vL = +(Eon − Ron · ī)
 *   off interval (rectifier conducts):       vL = −(Eoff + Roff · ī)
 * read from the topology record's intervals (topology/types.ts): the on interval draws from the input and,
 * when it also delivers to the output (`onToOutput`, buck), sees −Vo' and the ESR; the off interval
 * delivers to the output and, when it also draws from the input (`offFromInput`, boost), sees +Vin':
 * Buck:  Eon = Vin' − Vo' + ESR·Io,  Ron = RDS,sw + DCR + Rsense(switch|inductor) + ESR
 *        Eoff = Vo' + VF0 − ESR·Io,  Roff = Rrect + DCR + Rsense(inductor) + ESR
 * Boost: Eon = Vin',                 Ron = RDS,sw + DCR + Rsense(switch|inductor)
 *        Eoff = Vo' + VF0 − Vin' − ESR·Io, Roff = Rrect + DCR + Rsense(inductor) + ESR
 * with Vin' = Vin − Rsense(input) · Iin, Vo' = Vo + Rsense(output) · Io, Rrect = Rd (diode) or RDS
 * (synchronous), VF0 = 0 for a synchronous rectifier. The ESR terms are the output capacitor current
 * (i − Io) flowing through the bank's ESR while the inductor feeds the output node; in buck CCM they
 * cancel, so the docs/methods.md §1 duty formulas are reproduced exactly. A resistive or constant-power
 * load takes part of that ripple current: the node then sees ESR·k (load.ts), used in place of ESR.
 * Assumptions: stiff input (the input capacitor holds Vin; the source supplies DC), constant output
 * voltage over the period for the drops, dead times and switching transitions ignored here (the loss
 * ledger prices them). Source: Erickson & Maksimović 2nd ed. ch. 2–3 (volt-second balance with
 * resistive and diode drops) [memory for chapter]; docs/methods.md §1.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters } from './types.ts';
import { capacitorShare, loadConductanceS, loadKindOf } from './load.ts';
import { topologyOf } from '../topology/registry.ts';
import { buck } from '../topology/buck.ts';
import type { ConverterTopology } from '../topology/types.ts';
import type { InductancePoint } from '../design/parts.ts';

export type SenseLocation = Design['topology']['senseLocation'];

export interface Circuit {
  topology: ConverterTopology;
  /**
   * The record's interval flags and blocking-voltage coefficients, copied as plain fields for the hot
   * loop (topology/types.ts): the on interval delivers to the output; the off interval draws from the input.
   */
  onToOutput: boolean;
  offFromInput: boolean;
  /** Switch blocking voltage = switchIn·Vin + switchOut·Vo' (+ rectifier drop); rectifier: rectIn, rectOut. */
  switchIn: number;
  switchOut: number;
  rectIn: number;
  rectOut: number;
  /** Rectifier stops at zero current (diode, or synchronous with diode emulation): DCM possible. */
  blocksReverse: boolean;
  synchronous: boolean;
  /** Where the sense resistor's current is taken ('none' when the design has no sense resistor). */
  senseAt: SenseLocation;
  vinV: number;
  targetVoutV: number;
  loadA: number;
  periodS: number;
  /** Loop resistances without ESR (see header) and the output bank's total ESR. */
  rOnOhm: number;
  rOffOhm: number;
  esrOhm: number;
  vf0V: number;
  /** Rectifier forward resistance (Rd or RDS(on)), for the drop at an edge. */
  rRectOhm: number;
  rInputSenseOhm: number;
  rOutputSenseOhm: number;
  inductanceH: number;
  /** Roll-off point (0 when the inductance is constant). */
  rolloffA: number;
  rolloffH: number;
  /** The datasheet's L(I) curve when the part gives one (replaces inductanceH and the roll-off in shape.ts). */
  inductanceCurve: readonly InductancePoint[] | undefined;
  outputCapacitanceF: number;
  /** The load's incremental conductance seen from the output node, S (load.ts; 0: a current sink). */
  loadConductanceS: number;
  /** Fraction of the node's ripple current the output bank carries, 1/(1 + g·ESR) (load.ts). */
  capacitorShare: number;
}

/**
 * Whether the duty comes from volt-second balance on the real circuit alone (forced PWM: the rectifier
 * conducts both ways, the converter stays in CCM down to 0 A). Every loss that the volt-second equation's
 * drops do not carry is then paid by the source at that duty (ledger/slots.ts), so the duty is continuous
 * from 0 A to overload. Otherwise (diode or diode emulation) the duty is balanced against the losses that
 * take volt-seconds (power-balance.ts), which is well posed because the input current then grows with D.
 */
export function dutyByVoltSeconds(design: Design): boolean {
  return isSynchronous(design) && design.topology.lightLoad === 'forced-pwm';
}

/** Whether the design's rectifier is a synchronous MOSFET (topology and part agree). */
export function isSynchronous(design: Design): boolean {
  return design.topology.rectifier === 'synchronous' && design.parts.rectifier.kind === 'mosfet';
}

export function circuitOf(design: Design, conditions: Conditions, conduction: ConductionParameters): Circuit {
  return circuitInto(design, conditions, conduction, newCircuit());
}

/** An empty circuit record (all fields present) for circuitInto. */
export function newCircuit(): Circuit {
  return {
    topology: buck, onToOutput: true, offFromInput: false, switchIn: 1, switchOut: 0, rectIn: 1, rectOut: 0, blocksReverse: false, synchronous: false, senseAt: 'none', vinV: 0, targetVoutV: 0, loadA: 0,
    periodS: 0, rOnOhm: 0, rOffOhm: 0, esrOhm: 0, vf0V: 0, rRectOhm: 0, rInputSenseOhm: 0, rOutputSenseOhm: 0,
    inductanceH: 0, rolloffA: 0, rolloffH: 0, inductanceCurve: undefined, outputCapacitanceF: 0, loadConductanceS: 0, capacitorShare: 1,
  };
}

/** circuitOf written into `out` (a record reused by the electro-thermal loop); returns out. */
export function circuitInto(design: Design, conditions: Conditions, conduction: ConductionParameters, out: Circuit): Circuit {
  const { topology, parts, spec } = design;
  const synchronous = isSynchronous(design);
  const where: SenseLocation = parts.senseResistor ? topology.senseLocation : 'none';
  const rs = conduction.senseOhm;
  const rSenseSwitch = where === 'switch' ? rs : 0;
  const rSenseInductor = where === 'inductor' ? rs : 0;
  const rRect = synchronous ? conduction.rectifierOnOhm : conduction.diodeRdOhm;
  const bank = parts.outputCapacitor;
  const esr = conduction.outputCapacitorEsrOhm ?? bank.part.esrOhm / bank.count;
  const rolloff = parts.inductor.rolloff;
  const kind = topologyOf(design);
  if (out.topology !== kind) {
    out.topology = kind;
    out.onToOutput = kind.intervals.on.toOutput;
    out.offFromInput = kind.intervals.off.fromInput;
    out.switchIn = kind.switchBlocks.input;
    out.switchOut = kind.switchBlocks.output;
    out.rectIn = kind.rectifierBlocks.input;
    out.rectOut = kind.rectifierBlocks.output;
  }
  out.blocksReverse = !synchronous || topology.lightLoad !== 'forced-pwm';
  out.synchronous = synchronous;
  out.senseAt = where;
  out.vinV = conditions.vinV;
  out.targetVoutV = spec.voutV;
  out.loadA = conditions.loadA;
  out.periodS = 1 / conditions.switchingFrequencyHz;
  out.rOnOhm = conduction.switchOnOhm + conduction.inductorDcrOhm + rSenseSwitch + rSenseInductor;
  out.rOffOhm = rRect + conduction.inductorDcrOhm + rSenseInductor;
  out.esrOhm = esr;
  out.vf0V = synchronous ? 0 : conduction.diodeVf0V;
  out.rRectOhm = rRect;
  out.rInputSenseOhm = where === 'input' ? rs : 0;
  out.rOutputSenseOhm = where === 'output' ? rs : 0;
  out.inductanceH = parts.inductor.inductanceH;
  out.rolloffA = rolloff ? rolloff.currentA : 0;
  out.rolloffH = rolloff ? rolloff.inductanceH : 0;
  out.inductanceCurve = parts.inductor.inductanceCurve?.points;
  out.outputCapacitanceF = bank.part.capacitanceF * bank.count;
  out.loadConductanceS = loadConductanceS(loadKindOf(spec), spec.voutV, conditions.loadA, out.rOutputSenseOhm);
  out.capacitorShare = capacitorShare(out.loadConductanceS, esr);
  return out;
}

/**
 * Inductance at a mean current: linear between (0 A, L) and the roll-off point, held at the roll-off
 * value beyond it (the document states nothing past that point; solve reports it as a model limit).
 */
export function inductanceAt(c: Circuit, meanA: number): number {
  if (!(c.rolloffA > 0)) return c.inductanceH;
  const x = Math.abs(meanA);
  if (x >= c.rolloffA) return c.rolloffH;
  return c.inductanceH + ((c.rolloffH - c.inductanceH) * x) / c.rolloffA;
}
