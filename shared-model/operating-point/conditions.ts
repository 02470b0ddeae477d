/**
 * Evaluation conditions and the temperature-dependent conduction parameters of one design.
 *
 * nominalConditions: nominal Vin, rated load, the specified fs and ambient, with optional overrides.
 * conductionParameters: RDS(on) of the switch and a synchronous rectifier at their junction
 * temperatures, a diode's VF0(T) and Rd, the winding's DCR(T) (IEC 60028 copper law) and the sense
 * resistor at its temperature (temperature-laws.ts). For a synchronous rectifier the diode fields carry
 * its body diode (VSD, no Rd) for the dead-time models; for a diode rectifier rectifierOnOhm is 0.
 * Source: METHODS.md §5, §6, §8.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters, PartTemps } from './types.ts';
import { copperResistanceAt, diodeVf0At, rdsOnAt, resistorAt } from '../physics/temperature-laws.ts';
import { isSynchronous } from './circuit.ts';

/** The design's nominal conditions (Vin nominal, rated load, spec fs and ambient), with overrides. */
export function nominalConditions(design: Design, overrides?: Partial<Conditions>): Conditions {
  const { spec } = design;
  const base: Conditions = {
    vinV: spec.vinNomV,
    loadA: spec.ratedLoadA,
    switchingFrequencyHz: spec.switchingFrequencyHz,
    ambientC: spec.ambientC,
  };
  if (overrides) {
    if (overrides.vinV !== undefined) base.vinV = overrides.vinV;
    if (overrides.loadA !== undefined) base.loadA = overrides.loadA;
    if (overrides.switchingFrequencyHz !== undefined) base.switchingFrequencyHz = overrides.switchingFrequencyHz;
    if (overrides.ambientC !== undefined) base.ambientC = overrides.ambientC;
  }
  return base;
}

/** Resistive drops and forward voltages of the design's parts at the given part temperatures. */
export function conductionParameters(design: Design, temps: PartTemps): ConductionParameters {
  const { parts } = design;
  const rect = parts.rectifier;
  const sync = isSynchronous(design);
  let rectifierOnOhm = 0;
  let diodeVf0V: number;
  let diodeRdOhm = 0;
  if (rect.kind === 'mosfet') {
    rectifierOnOhm = sync ? rdsOnAt(rect, temps.rectifierC) : 0;
    diodeVf0V = rect.bodyDiodeVsdV;
  } else {
    diodeVf0V = diodeVf0At(rect, temps.rectifierC);
    diodeRdOhm = rect.rdOhm;
  }
  return {
    switchOnOhm: rdsOnAt(parts.switch, temps.switchC),
    rectifierOnOhm,
    diodeVf0V,
    diodeRdOhm,
    inductorDcrOhm: copperResistanceAt(parts.inductor.dcr20Ohm, temps.inductorC),
    senseOhm: parts.senseResistor ? resistorAt(parts.senseResistor, temps.senseC) : 0,
  };
}

/** All part temperatures equal (for example the ambient, before any self-heating is known). */
export function uniformTemps(tC: number): PartTemps {
  return { switchC: tC, rectifierC: tC, inductorC: tC, senseC: tC };
}
