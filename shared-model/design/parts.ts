/**
 * Part records of the design document (zod schemas are the single source of truth).
 *
 * Units: every numeric key carries its SI unit as a suffix (V, A, Ohm, H, F, Hz, W, S for seconds,
 * C for coulombs, J, M2/M3 for area/volume, KPerW for thermal resistance). Temperatures are degrees
 * Celsius and carry the suffix `C` on keys named `...TempC`, `...AtC`, `...MaxC`; temperature
 * coefficients are per kelvin (`PerK`). Prefixes (m, µ, n) never appear inside the engine.
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, { message: 'must be a finite number' });
export const positive = () => finite().refine((v) => v > 0, { message: 'must be greater than 0' });
export const nonNegative = () => finite().refine((v) => v >= 0, { message: 'must be 0 or more' });
export const temperatureC = () =>
  finite().refine((v) => v >= -273.15 && v <= 1000, { message: 'must lie between -273.15 °C and 1000 °C' });

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
  z.object({ law: z.literal('linear'), alphaPerK: nonNegative() }),
  /** R(T) = R25 · ((T + 273.15) / 298.15) ^ exponent */
  z.object({ law: z.literal('power'), exponent: nonNegative() }),
  /** Two datasheet points: R(hotC) / R(25 °C) = hotRatio; fitted as `shape`. */
  z.object({
    law: z.literal('two-point'),
    shape: z.enum(['linear', 'power']),
    hotC: temperatureC(),
    hotRatio: positive(),
  }),
]);

/** Output capacitance: a small-signal Coss at a voltage, or charge and energy at a voltage. */
export const outputCapacitanceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('capacitance'), cossF: nonNegative(), atV: positive() }),
  z.object({ kind: z.literal('charge-energy'), qossC: nonNegative(), eossJ: nonNegative(), atV: positive() }),
]);

export const mosfetSchema = z.object({
  kind: z.literal('mosfet'),
  ...partIdentity,
  vdsRatingV: positive(),
  idRatingA: positive(),
  rdsOn25Ohm: positive(),
  rdsTemperatureLaw: rdsTemperatureLawSchema,
  /** Total gate charge at the driver's voltage. */
  qgC: positive(),
  /** Gate-source charge after threshold (Qgs2). Estimated from qgsC when absent. */
  qgs2C: positive().optional(),
  /** Whole gate-source charge up to the plateau. Used only when qgs2C is absent. */
  qgsC: positive().optional(),
  qgdC: positive(),
  vthV: positive(),
  plateauV: positive(),
  rgInternalOhm: nonNegative(),
  outputCapacitance: outputCapacitanceSchema,
  bodyDiodeVsdV: positive(),
  bodyDiodeQrrC: nonNegative(),
  tjMaxC: temperatureC(),
  thetaJcKPerW: nonNegative(),
});

export const diodeSchema = z.object({
  kind: z.literal('diode'),
  ...partIdentity,
  technology: z.enum(['schottky', 'pn']),
  vf0V: positive(),
  rdOhm: nonNegative(),
  /** dVF0/dT, usually negative (about −1 to −2 mV/K). */
  vfTempCoVPerK: finite(),
  /** Reverse-recovery charge (PN diodes). */
  qrrC: nonNegative(),
  /** Junction capacitance (Schottky), treated as linear. */
  cjF: nonNegative(),
  leakageA: nonNegative(),
  leakageAtC: temperatureC(),
  /** Leakage doubles every this many kelvin. */
  leakageDoublingK: positive(),
  vrRatingV: positive(),
  ifRatingA: positive(),
  tjMaxC: temperatureC(),
  thetaJcKPerW: nonNegative(),
});

export const coreLossSchema = z.discriminatedUnion('kind', [
  /** Steinmetz Pv = k · f^alpha · Bpk^beta in W/m³ with f in Hz and B in T (sine excitation). */
  z.object({ kind: z.literal('steinmetz'), k: positive(), alpha: positive(), beta: positive() }),
  /** One datasheet point (sine, peak flux) plus exponents; k is derived from it. */
  z.object({
    kind: z.literal('point'),
    lossWPerM3: positive(),
    atHz: positive(),
    atPeakT: positive(),
    alpha: positive(),
    beta: positive(),
  }),
]);

export const acWindingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  /** Rac / Rdc of the winding at the switching frequency, applied to the ripple (AC) current. */
  z.object({ kind: z.literal('factor'), racOverRdc: positive() }),
  /** Dowell's layered-winding model (Proc. IEE 113(8), 1966). */
  z.object({
    kind: z.literal('dowell'),
    layers: positive(),
    conductorThicknessM: positive(),
    porosity: positive(),
  }),
]);

export const inductorSchema = z.object({
  kind: z.literal('inductor'),
  ...partIdentity,
  inductanceH: positive(),
  /** Optional roll-off: inductance at a stated current (linear between 0 A and this point). */
  rolloff: z.object({ currentA: positive(), inductanceH: positive() }).optional(),
  dcr20Ohm: positive(),
  isatA: positive(),
  isatAtC: temperatureC(),
  /** Fractional change of Isat per kelvin (ferrite: negative). */
  isatTempCoPerK: finite(),
  irmsRatingA: positive(),
  turns: positive(),
  aeM2: positive(),
  veM3: positive(),
  coreLoss: coreLossSchema,
  acWinding: acWindingSchema,
  tMaxC: temperatureC(),
});

export const capacitorSchema = z.object({
  kind: z.literal('capacitor'),
  ...partIdentity,
  dielectric: z.enum(['ceramic', 'electrolytic', 'polymer', 'film']),
  capacitanceF: positive(),
  /** ESR at the switching frequency. */
  esrOhm: nonNegative(),
  /** Fractional ESR change per kelvin from 25 °C (electrolytics fall as they warm). 0 if unknown. */
  esrTempCoPerK: finite(),
  rippleRatingA: positive(),
  voltageRatingV: positive(),
  tMaxC: temperatureC(),
  /** Rated life at rated temperature (electrolytic and polymer). */
  life: z.object({ ratedHours: positive(), ratedC: temperatureC() }).optional(),
});

export const resistorSchema = z.object({
  kind: z.literal('resistor'),
  ...partIdentity,
  resistanceOhm: positive(),
  tempCoPerK: finite(),
  powerRatingW: positive(),
  /** Full rated power up to this temperature, then linear derating to zero at zeroPowerC. */
  deratingStartC: temperatureC(),
  zeroPowerC: temperatureC(),
});

export const controllerSchema = z.object({
  kind: z.literal('controller'),
  ...partIdentity,
  quiescentA: nonNegative(),
  driveV: positive(),
  pullUpOhm: nonNegative(),
  pullDownOhm: nonNegative(),
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
