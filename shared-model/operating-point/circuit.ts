/**
 * The converter reduced to the numbers the operating-point equations need (built once per solve).
 *
 * Each conduction interval sees an inductor voltage that is affine in the interval's mean current ī:
 *   on interval (control switch conducts):   vL = +(Eon − Ron · ī)
 *   off interval (rectifier conducts):       vL = −(Eoff + Roff · ī)
 * Buck:  Eon = Vin' − Vo' + ESR·Io,  Ron = RDS,sw + DCR + Rsense(switch|inductor) + ESR
 *        Eoff = Vo' + VF0 − ESR·Io,  Roff = Rrect + DCR + Rsense(inductor) + ESR
 * Boost: Eon = Vin',                 Ron = RDS,sw + DCR + Rsense(switch|inductor)
 *        Eoff = Vo' + VF0 − Vin' − ESR·Io, Roff = Rrect + DCR + Rsense(inductor) + ESR
 * with Vin' = Vin − Rsense(input) · Iin, Vo' = Vo + Rsense(output) · Io, Rrect = Rd (diode) or RDS
 * (synchronous), VF0 = 0 for a synchronous rectifier. The ESR terms are the output capacitor current
 * (i − Io) flowing through the bank's ESR while the inductor feeds the output node; in buck CCM they
 * cancel, so the METHODS.md §1 duty formulas are reproduced exactly.
 * Assumptions: stiff input (the input capacitor holds Vin; the source supplies DC), constant output
 * voltage over the period for the drops, dead times and switching transitions ignored here (the loss
 * ledger prices them). Source: Erickson & Maksimović 2nd ed. ch. 2–3 (volt-second balance with
 * resistive and diode drops) [memory for chapter]; METHODS.md §1.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters } from './types.ts';

export type SenseLocation = Design['topology']['senseLocation'];

export interface Circuit {
  boost: boolean;
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
  outputCapacitanceF: number;
}

/** Whether the design's rectifier is a synchronous MOSFET (topology and part agree). */
export function isSynchronous(design: Design): boolean {
  return design.topology.rectifier === 'synchronous' && design.parts.rectifier.kind === 'mosfet';
}

export function circuitOf(design: Design, conditions: Conditions, conduction: ConductionParameters): Circuit {
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
  return {
    boost: topology.kind === 'boost',
    blocksReverse: !synchronous || topology.lightLoad === 'diode-emulation',
    synchronous,
    senseAt: where,
    vinV: conditions.vinV,
    targetVoutV: spec.voutV,
    loadA: conditions.loadA,
    periodS: 1 / conditions.switchingFrequencyHz,
    rOnOhm: conduction.switchOnOhm + conduction.inductorDcrOhm + rSenseSwitch + rSenseInductor,
    rOffOhm: rRect + conduction.inductorDcrOhm + rSenseInductor,
    esrOhm: esr,
    vf0V: synchronous ? 0 : conduction.diodeVf0V,
    rRectOhm: rRect,
    rInputSenseOhm: where === 'input' ? rs : 0,
    rOutputSenseOhm: where === 'output' ? rs : 0,
    inductanceH: parts.inductor.inductanceH,
    rolloffA: rolloff ? rolloff.currentA : 0,
    rolloffH: rolloff ? rolloff.inductanceH : 0,
    outputCapacitanceF: bank.part.capacitanceF * bank.count,
  };
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
