/**
 * Temperature laws: how the resistive and forward-drop parameters of the parts move with temperature.
 *
 * Formulas (T in °C unless stated):
 * - MOSFET RDS(on), linear:    R(T) = R25 · (1 + α · (T − 25))
 *                   power law: R(T) = R25 · ((T + 273.15) / 298.15)^k          (kelvin ratio)
 *                   two-point: α = (ratio − 1)/(Thot − 25) or k = ln(ratio)/ln((Thot + 273.15)/298.15),
 *                              fitted so the law passes through R(Thot) = ratio · R25.
 *                   table:     R(T) = R25 · ratio(T), the datasheet's normalised curve, straight lines
 *                              between its points and its end ratios held outside it.
 * - Copper (IEC 60028):        R(T) = R20 · (1 + 0.00393 · (T − 20))
 * - Diode threshold:           VF0(T) = VF0(25 °C) + dVF0/dT · (T − 25)
 * - Reverse leakage:           IR(T) = IR(T0) · 2^((T − T0)/ΔTdouble)
 * - Resistor, capacitor ESR:   R(T) = R25 · (1 + tc · (T − 25)); with an ESR(T) table ESR(T) = ESR25 · ratio(T)
 * - Core loss (with a curve):  Pcore(T) = Pcore(Steinmetz) · factor(T)   (curves/temperature-curves.ts)
 * Assumptions: part parameters without a stated reference temperature are taken at 25 °C; the linear
 * laws are clamped at 0 so a resistance or forward drop never turns negative far outside their range.
 * Sources: docs/methods.md §5 (RDS(on) laws, common practice; physics in Sze & Ng, Baliga [memory]), §8 (IEC
 * 60028 copper, α20 0.00393/K [memory for α]), §6 (VF0 drift and leakage doubling, common practice).
 */
import type { Capacitor, CoreLossTemperaturePoint, Diode, EsrTemperaturePoint, Inductor, Mosfet, RdsPoint, RdsTemperatureLaw, Resistor } from '../design/parts.ts';
import { pointCurveAt, temperatureCurveAt } from '../curves/temperature-curves.ts';

const tjOf = (p: RdsPoint): number => p.tjC;
const rdsRatioOf = (p: RdsPoint): number => p.ratio;

const KELVIN_OFFSET = 273.15;
const REFERENCE_C = 25;
/** IEC 60028 temperature coefficient of annealed copper at 20 °C, 1/K. */
export const COPPER_ALPHA20_PER_K = 0.00393;

function linearClamped(value25: number, coPerK: number, tC: number, referenceC = REFERENCE_C): number {
  const v = value25 * (1 + coPerK * (tC - referenceC));
  return v > 0 ? v : 0;
}

function powerLaw(value25: number, exponent: number, tC: number): number {
  const ratio = (tC + KELVIN_OFFSET) / (REFERENCE_C + KELVIN_OFFSET);
  return ratio > 0 ? value25 * Math.pow(ratio, exponent) : 0;
}

/** RDS(on) of a MOSFET at junction temperature tC, Ω. */
export function rdsOnAt(mosfet: Mosfet, tC: number): number {
  const r25 = mosfet.rdsOn25Ohm;
  const law = mosfet.rdsTemperatureLaw;
  switch (law.law) {
    case 'linear':
      return linearClamped(r25, law.alphaPerK, tC);
    case 'power':
      return powerLaw(r25, law.exponent, tC);
    case 'table':
      return r25 * rdsRatioAt(law.points, tC);
    case 'two-point':
      return law.shape === 'linear' ? linearClamped(r25, twoPointAlpha(law), tC) : powerLaw(r25, twoPointExponent(law), tC);
  }
}

type TwoPointLaw = Extract<RdsTemperatureLaw, { law: 'two-point' }>;

/** α of the linear law through R(hotC) = hotRatio · R25, 1/K (0 for a degenerate point). */
export function twoPointAlpha(law: TwoPointLaw): number {
  const span = law.hotC - REFERENCE_C;
  return span !== 0 ? (law.hotRatio - 1) / span : 0;
}

/** k of the power law through R(hotC) = hotRatio · R25 (0 for a degenerate point). */
export function twoPointExponent(law: TwoPointLaw): number {
  const logT = Math.log((law.hotC + KELVIN_OFFSET) / (REFERENCE_C + KELVIN_OFFSET));
  return logT !== 0 && Number.isFinite(logT) ? Math.log(law.hotRatio) / logT : 0;
}

/** RDS(on)(T)/RDS(on)(25 °C) from a normalised curve: straight lines between points, ends held. */
export function rdsRatioAt(points: readonly RdsPoint[], tC: number): number {
  return pointCurveAt(points, tjOf, rdsRatioOf, tC);
}

/** Copper winding resistance at tC from its value at 20 °C (IEC 60028), Ω. */
export function copperResistanceAt(r20Ohm: number, tC: number): number {
  return linearClamped(r20Ohm, COPPER_ALPHA20_PER_K, tC, 20);
}

/** Diode threshold voltage VF0 at junction temperature tC (VF0 stated at 25 °C), V. */
export function diodeVf0At(diode: Diode, tC: number): number {
  const v = diode.vf0V + diode.vfTempCoVPerK * (tC - REFERENCE_C);
  return v > 0 ? v : 0;
}

/** Diode reverse leakage at tC: doubles every `leakageDoublingK` kelvin from its reference point, A. */
export function leakageAt(diode: Diode, tC: number): number {
  // Exponent capped so the result stays finite (2^1000 ≈ 1e301) for any input the schema admits.
  const doublings = Math.min((tC - diode.leakageAtC) / diode.leakageDoublingK, 1000);
  return diode.leakageA * Math.pow(2, doublings);
}

/** Resistor value at tC (value stated at 25 °C), Ω. */
export function resistorAt(resistor: Resistor, tC: number): number {
  return linearClamped(resistor.resistanceOhm, resistor.tempCoPerK, tC);
}

/** ESR of one capacitor at tC (ESR stated at 25 °C and fs), Ω. */
export function esrAt(capacitor: Capacitor, tC: number): number {
  return capacitor.esrOhm * esrRatioAt(capacitor, tC);
}

const esrRatioOf = (p: EsrTemperaturePoint): number => p.ratio;

/** ESR(tC)/ESR(25 °C) of one capacitor: its ESR(T) table when given, else 1 + c·(T − 25 °C) floored at 0. */
export function esrRatioAt(capacitor: Capacitor, tC: number): number {
  const curve = capacitor.esrTemperatureCurve;
  if (curve) return temperatureCurveAt(curve.points, esrRatioOf, tC);
  return linearClamped(1, capacitor.esrTempCoPerK, tC);
}

const coreFactorOf = (p: CoreLossTemperaturePoint): number => p.factor;

/** Core loss at tC over the Steinmetz loss: the inductor's core-loss-vs-temperature curve, 1 without one. */
export function coreLossFactorAt(inductor: Inductor, tC: number): number {
  const curve = inductor.coreLossTemperatureCurve;
  return curve ? temperatureCurveAt(curve.points, coreFactorOf, tC) : 1;
}
