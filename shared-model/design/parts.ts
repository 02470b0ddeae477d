/**
 * Part records of the design document (zod schemas are the single source of truth).
 *
 * Units: every numeric key carries its SI unit as a suffix (V, A, Ohm, H, F, Hz, W, S for seconds,
 * C for coulombs, J, M2/M3 for area/volume, KPerW for thermal resistance). Temperatures are degrees
 * Celsius and carry the suffix `C` on keys named `...TempC`, `...AtC`, `...MaxC`; temperature
 * coefficients are per kelvin (`PerK`). Prefixes (m, µ, n) never appear inside the engine.
 * Ranges (design/numbers.ts) are sanity limits; relations between fields are checked in design/rules-*.ts.
 */
import { z } from 'zod';
import { LIMITS as L, between, fractionUpToOne, nonNegative, positive, temperatureC } from './numbers.ts';

export { nonNegative, positive, temperatureC } from './numbers.ts';

const partIdentity = {
  id: z.string().min(1).max(80),
  name: z.string().min(1).max(120),
  /** True for the invented demo parts that ship with WattLedger (no real part is described). */
  invented: z.boolean().optional(),
  notes: z.string().max(2000).optional(),
};

/** How RDS(on) grows with junction temperature. */
export const rdsTemperatureLawSchema = z.discriminatedUnion('law', [
  /** R(T) = R25 · (1 + alphaPerK · (T − 25 °C)) */
  z.object({ law: z.literal('linear'), alphaPerK: nonNegative(L.tempCoPerK) }),
  /** R(T) = R25 · ((T + 273.15) / 298.15) ^ exponent */
  z.object({ law: z.literal('power'), exponent: nonNegative(5) }),
  /** Two datasheet points: R(hotC) / R(25 °C) = hotRatio; fitted as `shape`. */
  z.object({
    law: z.literal('two-point'),
    shape: z.enum(['linear', 'power']),
    hotC: temperatureC(),
    hotRatio: between(0.1, 10),
  }),
]);

/** Output capacitance: a small-signal Coss at a voltage, or charge and energy at a voltage. */
export const outputCapacitanceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('capacitance'), cossF: nonNegative(L.parasiticCapacitanceF), atV: positive(L.voltageV) }),
  z.object({
    kind: z.literal('charge-energy'),
    qossC: nonNegative(L.gateChargeC),
    eossJ: nonNegative(L.energyJ),
    atV: positive(L.voltageV),
  }),
]);

export const mosfetSchema = z.object({
  kind: z.literal('mosfet'),
  ...partIdentity,
  vdsRatingV: positive(L.voltageV),
  idRatingA: positive(L.currentA),
  rdsOn25Ohm: positive(L.resistanceOhm),
  rdsTemperatureLaw: rdsTemperatureLawSchema,
  /** Total gate charge at the driver's voltage. */
  qgC: positive(L.gateChargeC),
  /** Gate-source charge after threshold (Qgs2). Estimated from qgsC when absent. */
  qgs2C: positive(L.gateChargeC).optional(),
  /** Whole gate-source charge up to the plateau. Used only when qgs2C is absent. */
  qgsC: positive(L.gateChargeC).optional(),
  qgdC: positive(L.gateChargeC),
  vthV: positive(L.gateVoltageV),
  plateauV: positive(L.gateVoltageV),
  rgInternalOhm: nonNegative(L.driveResistanceOhm),
  outputCapacitance: outputCapacitanceSchema,
  bodyDiodeVsdV: positive(L.forwardVoltageV),
  bodyDiodeQrrC: nonNegative(L.recoveryChargeC),
  /** Forward current at which bodyDiodeQrrC is stated; Qrr is scaled by IF / this. Rated load current when absent. */
  bodyDiodeQrrTestA: positive(L.currentA).optional(),
  tjMaxC: temperatureC(),
  thetaJcKPerW: nonNegative(L.thetaKPerW),
});

export const diodeSchema = z.object({
  kind: z.literal('diode'),
  ...partIdentity,
  technology: z.enum(['schottky', 'pn']),
  vf0V: positive(L.forwardVoltageV),
  rdOhm: nonNegative(L.resistanceOhm),
  /** dVF0/dT, usually negative (about −1 to −2 mV/K). */
  vfTempCoVPerK: between(-0.1, 0.1),
  /** Reverse-recovery charge (PN diodes). */
  qrrC: nonNegative(L.recoveryChargeC),
  /** Forward current at which qrrC is stated; Qrr is scaled by IF / this. Rated load current when absent. */
  qrrTestA: positive(L.currentA).optional(),
  /** Junction capacitance (Schottky), treated as linear. */
  cjF: nonNegative(L.parasiticCapacitanceF),
  leakageA: nonNegative(L.leakageA),
  leakageAtC: temperatureC(),
  /** Leakage doubles every this many kelvin. */
  leakageDoublingK: between(1, 100),
  vrRatingV: positive(L.voltageV),
  ifRatingA: positive(L.currentA),
  tjMaxC: temperatureC(),
  thetaJcKPerW: nonNegative(L.thetaKPerW),
});

export const coreLossSchema = z.discriminatedUnion('kind', [
  /** Steinmetz Pv = k · f^alpha · Bpk^beta in W/m³ with f in Hz and B in T (sine excitation). */
  z.object({ kind: z.literal('steinmetz'), k: positive(), alpha: positive(3), beta: positive(4) }),
  /** One datasheet point (sine, peak flux) plus exponents; k is derived from it. */
  z.object({
    kind: z.literal('point'),
    lossWPerM3: positive(1e9),
    atHz: positive(L.frequencyMaxHz),
    atPeakT: positive(2),
    alpha: positive(3),
    beta: positive(4),
  }),
]);

export const acWindingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  /** Rac / Rdc of the winding at the switching frequency, applied to the ripple (AC) current. */
  z.object({ kind: z.literal('factor'), racOverRdc: between(1, 1000) }),
  /** Dowell's layered-winding model (Proc. IEE 113(8), 1966). */
  z.object({
    kind: z.literal('dowell'),
    layers: positive(100),
    conductorThicknessM: positive(L.lengthM),
    porosity: fractionUpToOne(),
  }),
]);

export const inductorSchema = z.object({
  kind: z.literal('inductor'),
  ...partIdentity,
  inductanceH: positive(L.inductanceH),
  /** Optional roll-off: inductance at a stated current (linear between 0 A and this point). */
  rolloff: z.object({ currentA: positive(L.currentA), inductanceH: positive(L.inductanceH) }).optional(),
  dcr20Ohm: positive(L.resistanceOhm),
  isatA: positive(L.currentA),
  isatAtC: temperatureC(),
  /** Fractional change of Isat per kelvin (ferrite: negative). */
  isatTempCoPerK: between(-L.tempCoPerK, L.tempCoPerK),
  irmsRatingA: positive(L.currentA),
  turns: positive(10_000),
  aeM2: positive(L.areaM2),
  veM3: positive(L.volumeM3),
  coreLoss: coreLossSchema,
  acWinding: acWindingSchema,
  tMaxC: temperatureC(),
});

export const capacitorSchema = z.object({
  kind: z.literal('capacitor'),
  ...partIdentity,
  dielectric: z.enum(['ceramic', 'electrolytic', 'polymer', 'film']),
  capacitanceF: positive(L.capacitanceF),
  /** ESR at the switching frequency. */
  esrOhm: nonNegative(L.resistanceOhm),
  /** Fractional ESR change per kelvin from 25 °C (electrolytics fall as they warm). 0 if unknown. */
  esrTempCoPerK: between(-L.tempCoPerK, L.tempCoPerK),
  rippleRatingA: positive(L.currentA),
  voltageRatingV: positive(L.voltageV),
  tMaxC: temperatureC(),
  /** Rated life at rated temperature (electrolytic and polymer). */
  life: z.object({ ratedHours: positive(L.hours), ratedC: temperatureC() }).optional(),
});

export const resistorSchema = z.object({
  kind: z.literal('resistor'),
  ...partIdentity,
  resistanceOhm: positive(L.resistanceOhm),
  tempCoPerK: between(-0.01, 0.01),
  powerRatingW: positive(L.powerW),
  /** Full rated power up to this temperature, then linear derating to zero at zeroPowerC. */
  deratingStartC: temperatureC(),
  zeroPowerC: temperatureC(),
});

export const controllerSchema = z.object({
  kind: z.literal('controller'),
  ...partIdentity,
  quiescentA: nonNegative(1),
  driveV: positive(L.gateVoltageV),
  pullUpOhm: nonNegative(L.driveResistanceOhm),
  pullDownOhm: nonNegative(L.driveResistanceOhm),
  /** True when the drive rail is made from Vin by a linear regulator (the input pays Vin · Qg · fs). */
  driveFromVinLinear: z.boolean(),
  tjMaxC: temperatureC(),
});

export const partSchema = z.discriminatedUnion('kind', [
  mosfetSchema,
  diodeSchema,
  inductorSchema,
  capacitorSchema,
  resistorSchema,
  controllerSchema,
]);

export type RdsTemperatureLaw = z.infer<typeof rdsTemperatureLawSchema>;
export type OutputCapacitance = z.infer<typeof outputCapacitanceSchema>;
export type Mosfet = z.infer<typeof mosfetSchema>;
export type Diode = z.infer<typeof diodeSchema>;
export type CoreLossSpec = z.infer<typeof coreLossSchema>;
export type AcWindingSpec = z.infer<typeof acWindingSchema>;
export type Inductor = z.infer<typeof inductorSchema>;
export type Capacitor = z.infer<typeof capacitorSchema>;
export type Resistor = z.infer<typeof resistorSchema>;
export type Controller = z.infer<typeof controllerSchema>;
export type Part = z.infer<typeof partSchema>;
export type PartKind = Part['kind'];
