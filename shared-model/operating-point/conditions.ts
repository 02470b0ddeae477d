/**
 * Evaluation conditions and the temperature-dependent conduction parameters of one design.
 *
 * nominalConditions: nominal Vin, rated load, the specified fs and ambient, with optional overrides.
 * conductionParameters: RDS(on) of the switch and a synchronous rectifier at their junction
 * temperatures, a diode's VF0(T) and Rd, the winding's DCR(T) (IEC 60028 copper law) and the sense
 * resistor at its temperature (temperature-laws.ts). For a synchronous rectifier the diode fields carry
 * its body diode (VSD, no Rd) for the dead-time models; for a diode rectifier rectifierOnOhm is 0; a
 * diode with VF(IF, Tj) curves gives their tangent at the rated load current (curves/forward-table.ts).
 * Source: docs/methods.md §5, §6, §8.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters, PartTemps } from './types.ts';
import { copperResistanceAt, diodeVf0At, rdsOnAt, resistorAt } from '../physics/temperature-laws.ts';
import { isSynchronous } from './circuit.ts';
import { forwardTangentAt } from '../curves/forward-table.ts';

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
  const out: ConductionParameters = {
    switchOnOhm: 0, rectifierOnOhm: 0, diodeVf0V: 0, diodeRdOhm: 0, inductorDcrOhm: 0, senseOhm: 0,
  };
  const t = [temps.switchC, temps.rectifierC, temps.inductorC, temps.senseC];
  return conductionParametersInto(design, t, PART_TEMPS_ORDER, out);
}

/** Where each part's temperature sits in an array of temperatures (°C), for conductionParametersInto. */
export interface PartTempIndex {
  switch: number;
  rectifier: number;
  inductor: number;
  sense: number;
}

const PART_TEMPS_ORDER: PartTempIndex = { switch: 0, rectifier: 1, inductor: 2, sense: 3 };

/**
 * conductionParameters written into `out` (a record reused by the electro-thermal loop), with the part
 * temperatures read from `temps` at the positions `at` (numbers passed in an array rather than as
 * arguments, which a call that is not inlined would box on the heap). Leaves `out.outputCapacitorEsrOhm` alone.
 */
export function conductionParametersInto(
  design: Design,
  temps: ArrayLike<number>,
  at: PartTempIndex,
  out: ConductionParameters,
): ConductionParameters {
  const { parts } = design;
  const rect = parts.rectifier;
  const sync = isSynchronous(design);
  let rectifierOnOhm = 0;
  let diodeVf0V: number;
  let diodeRdOhm = 0;
  if (rect.kind === 'mosfet') {
    rectifierOnOhm = sync ? rdsOnAt(rect, temps[at.rectifier]!) : 0;
    diodeVf0V = rect.bodyDiodeVsdV;
  } else if (rect.vfCurves) {
    // Datasheet curves: the volt-second equation sees their tangent at the rated load current (the loss
    // itself integrates the curves over the waveform, losses/diode-forward-curve.ts).
    const tangent = forwardTangentAt(rect.vfCurves.points, design.spec.ratedLoadA, temps[at.rectifier]!);
    diodeVf0V = tangent.vf0V;
    diodeRdOhm = tangent.rdOhm;
  } else {
    diodeVf0V = diodeVf0At(rect, temps[at.rectifier]!);
    diodeRdOhm = rect.rdOhm;
  }
  out.switchOnOhm = rdsOnAt(parts.switch, temps[at.switch]!);
  out.rectifierOnOhm = rectifierOnOhm;
  out.diodeVf0V = diodeVf0V;
  out.diodeRdOhm = diodeRdOhm;
  out.inductorDcrOhm = copperResistanceAt(parts.inductor.dcr20Ohm, temps[at.inductor]!);
  out.senseOhm = parts.senseResistor ? resistorAt(parts.senseResistor, temps[at.sense]!) : 0;
  return out;
}

/** All part temperatures equal (for example the ambient, before any self-heating is known). */
export function uniformTemps(tC: number): PartTemps {
  return { switchC: tC, rectifierC: tC, inductorC: tC, senseC: tC };
}
