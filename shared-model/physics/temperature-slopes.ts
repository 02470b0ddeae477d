/**
 * Temperature slopes: the exact derivative d/dT of each law of temperature-laws.ts, for the electro-thermal
 * Newton step (ledger/kernel-slopes.ts) instead of a finite-difference pass.
 *
 * Formulas (T in °C; each is the derivative of the law of the same name):
 * - RDS(on), linear:    dR/dT = R25 · α                       (0 where the law is clamped at 0)
 *            power law: dR/dT = R25 · k · r^(k−1) / 298.15 K, r = (T + 273.15)/298.15
 *            two-point: as linear or power law with the fitted α or k
 *            table:     R25 · (ratio_b − ratio_a)/(T_b − T_a) on the segment [T_a, T_b) that holds T
 *                       (the slope just above T at a corner point: the one the temperature rises into);
 *                       0 outside the table, where the end ratios are held
 * - Copper:             dR/dT = R20 · 0.00393/K
 * - Diode threshold:    dVF0/dT = dVF0/dT of the part             (0 where VF0 is clamped at 0)
 * - Reverse leakage:    dIR/dT = IR(T) · ln 2 / ΔTdouble          (0 where the exponent is capped)
 * - Resistor, ESR:      dR/dT = R25 · tc                          (0 where clamped at 0)
 *   ESR(T) table, core-loss factor table: the segment's slope as for the RDS(on) table
 * Assumptions and sources: those of temperature-laws.ts (docs/methods.md §5, §6, §8); the derivatives are
 * plain calculus of those laws.
 */
import type { Capacitor, CoreLossTemperaturePoint, Diode, EsrTemperaturePoint, Inductor, Mosfet, RdsPoint, Resistor } from '../design/parts.ts';
import { pointCurveSlopeAt, temperatureCurveSlopeAt } from '../curves/temperature-curves.ts';

const tjOf = (p: RdsPoint): number => p.tjC;
const rdsRatioOf = (p: RdsPoint): number => p.ratio;
import { COPPER_ALPHA20_PER_K, leakageAt, twoPointAlpha, twoPointExponent } from './temperature-laws.ts';

const KELVIN_OFFSET = 273.15;
const REFERENCE_C = 25;

function linearSlope(value25: number, coPerK: number, tC: number, referenceC = REFERENCE_C): number {
  return value25 * (1 + coPerK * (tC - referenceC)) > 0 ? value25 * coPerK : 0;
}

function powerSlope(value25: number, exponent: number, tC: number): number {
  const ratio = (tC + KELVIN_OFFSET) / (REFERENCE_C + KELVIN_OFFSET);
  return ratio > 0 ? (value25 * exponent * Math.pow(ratio, exponent - 1)) / (REFERENCE_C + KELVIN_OFFSET) : 0;
}

/** dRDS(on)/dT of a MOSFET at junction temperature tC, Ω/K. */
export function rdsOnSlopeAt(mosfet: Mosfet, tC: number): number {
  const r25 = mosfet.rdsOn25Ohm;
  const law = mosfet.rdsTemperatureLaw;
  switch (law.law) {
    case 'linear':
      return linearSlope(r25, law.alphaPerK, tC);
    case 'power':
      return powerSlope(r25, law.exponent, tC);
    case 'table':
      return r25 * rdsRatioSlopeAt(law.points, tC);
    case 'two-point':
      return law.shape === 'linear' ? linearSlope(r25, twoPointAlpha(law), tC) : powerSlope(r25, twoPointExponent(law), tC);
  }
}

/** d(ratio)/dT of a normalised curve (see header), 1/K. */
export function rdsRatioSlopeAt(points: readonly RdsPoint[], tC: number): number {
  return pointCurveSlopeAt(points, tjOf, rdsRatioOf, tC);
}

/** dR/dT of a copper winding of r20Ohm at 20 °C (IEC 60028), Ω/K. */
export function copperResistanceSlopeAt(r20Ohm: number, tC: number): number {
  return linearSlope(r20Ohm, COPPER_ALPHA20_PER_K, tC, 20);
}

/** dVF0/dT of a diode at tC, V/K. */
export function diodeVf0SlopeAt(diode: Diode, tC: number): number {
  return diode.vf0V + diode.vfTempCoVPerK * (tC - REFERENCE_C) > 0 ? diode.vfTempCoVPerK : 0;
}

/** dIR/dT of a diode's reverse leakage at tC, A/K. */
export function leakageSlopeAt(diode: Diode, tC: number): number {
  const doublings = (tC - diode.leakageAtC) / diode.leakageDoublingK;
  return doublings < 1000 ? (leakageAt(diode, tC) * Math.LN2) / diode.leakageDoublingK : 0;
}

/** dR/dT of a resistor (value stated at 25 °C), Ω/K. */
export function resistorSlopeAt(resistor: Resistor, tC: number): number {
  return linearSlope(resistor.resistanceOhm, resistor.tempCoPerK, tC);
}

/** dESR/dT of one capacitor at tC, Ω/K. */
export function esrSlopeAt(capacitor: Capacitor, tC: number): number {
  return capacitor.esrOhm * esrRatioSlopeAt(capacitor, tC);
}

const esrRatioOf = (p: EsrTemperaturePoint): number => p.ratio;

/** d(ESR(T)/ESR(25 °C))/dT of one capacitor, 1/K: its ESR(T) table's segment slope, or c where not clamped. */
export function esrRatioSlopeAt(capacitor: Capacitor, tC: number): number {
  const curve = capacitor.esrTemperatureCurve;
  if (curve) return temperatureCurveSlopeAt(curve.points, esrRatioOf, tC);
  return linearSlope(1, capacitor.esrTempCoPerK, tC);
}

const coreFactorOf = (p: CoreLossTemperaturePoint): number => p.factor;

/** d(core-loss factor)/dT of the inductor's core-loss-vs-temperature curve, 1/K (0 without one). */
export function coreLossFactorSlopeAt(inductor: Inductor, tC: number): number {
  const curve = inductor.coreLossTemperatureCurve;
  return curve ? temperatureCurveSlopeAt(curve.points, coreFactorOf, tC) : 0;
}
