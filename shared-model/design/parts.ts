/**
 * Part records of the design document (zod schemas are the single source of truth).
 *
 * Units: every numeric key carries its SI unit as a suffix (V, A, Ohm, H, F, Hz, W, S for seconds,
 * C for coulombs, J, M2/M3 for area/volume, KPerW for thermal resistance). Temperatures are degrees
 * Celsius and carry the suffix `C` on keys named `...TempC`, `...AtC`, `...MaxC`; temperature
 * coefficients are per kelvin (`PerK`). Prefixes (m, µ, n) never appear inside the engine.
 * Every number has a named range (design/numbers.ts: a lower and an upper sanity limit and the reason);
 * relations between fields are checked in design/rules-*.ts.
 */
import { z } from 'zod';
import { quantity as q } from './numbers.ts';

const partIdentity = {
  id: z.string().min(1).max(80),
  name: z.string().min(1).max(120),
  /** True for the invented demo parts that ship with WattLedger (no real part is described). */
  invented: z.boolean().optional(),
  notes: z.string().max(2000).optional(),
};

/** One point of a normalised RDS(on)(Tj) curve: RDS(on)(tjC) / RDS(on)(25 °C). */
export const rdsPointSchema = z.object({ tjC: q('statedC'), ratio: q('rdsRatio') });
export type RdsPoint = z.infer<typeof rdsPointSchema>;

/** How RDS(on) grows with junction temperature. */
export const rdsTemperatureLawSchema = z.discriminatedUnion('law', [
  /** R(T) = R25 · (1 + alphaPerK · (T − 25 °C)) */
  z.object({ law: z.literal('linear'), alphaPerK: q('rdsAlphaPerK') }),
  /** R(T) = R25 · ((T + 273.15) / 298.15) ^ exponent */
  z.object({ law: z.literal('power'), exponent: q('rdsExponent') }),
  /** Two datasheet points: R(hotC) / R(25 °C) = hotRatio; fitted as `shape`. */
  z.object({
    law: z.literal('two-point'),
    shape: z.enum(['linear', 'power']),
    hotC: q('statedC'),
    hotRatio: q('hotRatio'),
  }),
  /** The datasheet's normalised curve RDS(on)(Tj)/RDS(on)(25 °C) as a table (curves/table.ts). */
  z.object({
    law: z.literal('table'),
    points: z
      .array(rdsPointSchema)
      .min(3)
      .max(200)
      .describe(
        'Normalised RDS(on)(Tj) curve digitised from the datasheet, 3 to 200 points: Tj strictly rising, the ratio RDS(on)(Tj)/RDS(on)(25 °C) never falling; straight lines between points, the end ratios held outside the table (a design notice says when the table ends below the part\'s Tj max).',
      ),
  }),
]);

/** One point of a Coss(VDS) curve digitised from a datasheet. */
export const cossPointSchema = z.object({ vdsV: q('curveV'), cossF: q('parasiticF') });
export type CossPoint = z.infer<typeof cossPointSchema>;

/** Fewest and most points of a digitised curve. */
export const CURVE_POINTS = { min: 3, max: 200 } as const;

/**
 * Output capacitance: a small-signal Coss at a voltage, charge and energy at a voltage, or the Coss(VDS)
 * curve as a table (VDS rising, Coss never rising: checked in rules-parts.ts; Qoss and Eoss by
 * integration, curves/coss-table.ts).
 */
export const outputCapacitanceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('capacitance'), cossF: q('parasiticF'), atV: q('ratingV') }),
  z.object({
    kind: z.literal('charge-energy'),
    qossC: q('outputChargeC'),
    eossJ: q('energyJ'),
    atV: q('ratingV'),
  }),
  z.object({
    kind: z.literal('table'),
    points: z
      .array(cossPointSchema)
      .min(CURVE_POINTS.min)
      .max(CURVE_POINTS.max)
      .describe(
        'Coss(VDS) curve digitised from the datasheet, 3 to 200 points: VDS strictly rising, Coss never rising with VDS; straight lines between points, the first Coss held below the first point and the last held above the last point (a design notice says when the switched voltage lies above the table). Qoss = ∫C dv and Eoss = ∫v·C dv are integrated from it.',
      ),
  }),
]);

export const mosfetSchema = z.object({
  kind: z.literal('mosfet'),
  ...partIdentity,
  vdsRatingV: q('ratingV'),
  idRatingA: q('ratingA'),
  rdsOn25Ohm: q('conductionOhm'),
  rdsTemperatureLaw: rdsTemperatureLawSchema,
  /** Total gate charge at the driver's voltage. */
  qgC: q('gateChargeC'),
  /** Gate-source charge after threshold (Qgs2). Estimated from qgsC when absent. */
  qgs2C: q('gateSubChargeC').optional(),
  /** Whole gate-source charge up to the plateau. Used only when qgs2C is absent. */
  qgsC: q('gateSubChargeC').optional(),
  qgdC: q('gateSubChargeC'),
  vthV: q('gateV'),
  plateauV: q('gateV'),
  rgInternalOhm: q('driveOhm'),
  outputCapacitance: outputCapacitanceSchema,
  bodyDiodeVsdV: q('forwardV'),
  bodyDiodeQrrC: q('recoveryChargeC'),
  /** Forward current at which bodyDiodeQrrC is stated; Qrr is scaled by IF / this. Rated load current when absent. */
  bodyDiodeQrrTestA: q('ratingA').optional(),
  tjMaxC: q('partLimitC'),
  thetaJcKPerW: q('thetaPartKPerW'),
});

/** One point of a diode's forward curve at one junction temperature: VF at IF and Tj. */
export const vfPointSchema = z.object({ tjC: q('statedC'), ifA: q('curveA'), vfV: q('curveForwardV') });
export type VfPoint = z.infer<typeof vfPointSchema>;

export const diodeSchema = z.object({
  kind: z.literal('diode'),
  ...partIdentity,
  technology: z.enum(['schottky', 'pn']),
  vf0V: q('forwardV'),
  rdOhm: q('seriesOhm'),
  /** dVF0/dT, usually negative (about −1 to −2 mV/K). */
  vfTempCoVPerK: q('vfTempCoVPerK'),
  /** The datasheet's VF(IF) curves at two or more junction temperatures (curves/forward-table.ts). */
  vfCurves: z
    .object({
      points: z.array(vfPointSchema).min(4).max(CURVE_POINTS.max),
    })
    .optional()
    .describe(
      'Forward curves VF(IF) digitised from the datasheet at two or more junction temperatures, 4 to 200 points: rows grouped by Tj (Tj never falling), each curve with at least 2 points, IF strictly rising and VF never falling within a curve. When given, the forward-drop loss is (1/T)·∫VF(i, Tj)·i dt over the rectifier current, straight lines in IF and in Tj between the curves; vf0V, rdOhm and vfTempCoVPerK are then not used for that loss. Beyond the last point of a curve VF follows its last segment; outside the temperatures the nearest curve is held (the result warns).',
    ),
  /** Reverse-recovery charge (PN diodes). */
  qrrC: q('recoveryChargeC'),
  /** Forward current at which qrrC is stated; Qrr is scaled by IF / this. Rated load current when absent. */
  qrrTestA: q('ratingA').optional(),
  /** Junction capacitance (Schottky), treated as linear. */
  cjF: q('parasiticF'),
  leakageA: q('leakageA'),
  leakageAtC: q('statedC'),
  /** Leakage doubles every this many kelvin. */
  leakageDoublingK: q('leakageDoublingK'),
  vrRatingV: q('ratingV'),
  ifRatingA: q('ratingA'),
  tjMaxC: q('partLimitC'),
  thetaJcKPerW: q('thetaPartKPerW'),
});

/** One point of an inductor's L(I) roll-off curve: the incremental inductance at a DC current. */
export const inductancePointSchema = z.object({ currentA: q('curveA'), inductanceH: q('inductanceH') });
export type InductancePoint = z.infer<typeof inductancePointSchema>;

/** One point of a core-loss-against-temperature curve: Pcore(tC) / Pcore from the Steinmetz coefficients. */
export const coreLossTemperaturePointSchema = z.object({ tC: q('statedC'), factor: q('coreLossFactor') });
export type CoreLossTemperaturePoint = z.infer<typeof coreLossTemperaturePointSchema>;

export const coreLossSchema = z.discriminatedUnion('kind', [
  /** Steinmetz Pv = k · f^alpha · Bpk^beta in W/m³ with f in Hz and B in T (sine excitation). */
  z.object({ kind: z.literal('steinmetz'), k: q('steinmetzK'), alpha: q('steinmetzAlpha'), beta: q('steinmetzBeta') }),
  /** One datasheet point (sine, peak flux) plus exponents; k is derived from it. */
  z.object({
    kind: z.literal('point'),
    lossWPerM3: q('lossDensityWPerM3'),
    atHz: q('statedHz'),
    atPeakT: q('fluxT'),
    alpha: q('steinmetzAlpha'),
    beta: q('steinmetzBeta'),
  }),
]);

export const acWindingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  /** Rac / Rdc of the winding at the switching frequency, applied to the ripple (AC) current. */
  z.object({ kind: z.literal('factor'), racOverRdc: q('racOverRdc') }),
  /** Dowell's layered-winding model (Proc. IEE 113(8), 1966). */
  z.object({
    kind: z.literal('dowell'),
    layers: q('layers'),
    conductorThicknessM: q('conductorM'),
    porosity: q('porosity'),
  }),
]);

export const inductorSchema = z.object({
  kind: z.literal('inductor'),
  ...partIdentity,
  inductanceH: q('inductanceH'),
  /** Optional roll-off: inductance at a stated current (linear between 0 A and this point). */
  rolloff: z.object({ currentA: q('ratingA'), inductanceH: q('inductanceH') }).optional(),
  /** The datasheet's L(I) curve (curves/inductance-table.ts); replaces inductanceH and rolloff for the operating point. */
  inductanceCurve: z
    .object({ points: z.array(inductancePointSchema).min(CURVE_POINTS.min).max(CURVE_POINTS.max) })
    .optional()
    .describe(
      'Inductance against DC current digitised from the datasheet, 3 to 200 points: current strictly rising from 0 A or more, inductance never rising. When given, the ripple and peak follow the flux linkage λ(i) = ∫L di (λ(peak) − λ(valley) = v·t over each interval) instead of inductanceH and rolloff; straight lines between points, the first inductance held below the first point and the last held above the last point (the result warns when the peak passes the table or L at the peak falls below 70 % of its first value).',
    ),
  dcr20Ohm: q('conductionOhm'),
  isatA: q('ratingA'),
  isatAtC: q('statedC'),
  /** Fractional change of Isat per kelvin (ferrite: negative). */
  isatTempCoPerK: q('partTempCoPerK'),
  irmsRatingA: q('ratingA'),
  turns: q('turns'),
  aeM2: q('coreAreaM2'),
  veM3: q('coreVolumeM3'),
  coreLoss: coreLossSchema,
  /** Core loss against temperature as a multiplier of the Steinmetz loss (curves/core-temperature.ts). */
  coreLossTemperatureCurve: z
    .object({ points: z.array(coreLossTemperaturePointSchema).min(CURVE_POINTS.min).max(CURVE_POINTS.max) })
    .optional()
    .describe(
      'Core loss against core temperature as a multiplier of the loss the Steinmetz coefficients give, digitised from the material datasheet (loss density at a temperature over the loss density at the coefficients\' own temperature), 3 to 200 points: temperature strictly rising, factor above 0 (ferrites: a minimum near 80–100 °C). When given the core loss is iGSE · factor(T) at the inductor temperature, inside the electro-thermal solve; straight lines between points, the end factors held outside the table (the result warns).',
    ),
  acWinding: acWindingSchema,
  tMaxC: q('partLimitC'),
});

/** One point of a capacitor's ESR(f) curve at 25 °C. */
export const esrFrequencyPointSchema = z.object({ frequencyHz: q('statedHz'), esrOhm: q('seriesOhm') });
export type EsrFrequencyPoint = z.infer<typeof esrFrequencyPointSchema>;
/** One point of a capacitor's normalised ESR(T) curve: ESR(tC) / ESR(25 °C). */
export const esrTemperaturePointSchema = z.object({ tC: q('statedC'), ratio: q('esrRatio') });
export type EsrTemperaturePoint = z.infer<typeof esrTemperaturePointSchema>;

export const capacitorSchema = z.object({
  kind: z.literal('capacitor'),
  ...partIdentity,
  dielectric: z.enum(['ceramic', 'electrolytic', 'polymer', 'film']),
  capacitanceF: q('capacitanceF'),
  /** ESR at the switching frequency. */
  esrOhm: q('seriesOhm'),
  /** Fractional ESR change per kelvin from 25 °C (electrolytics fall as they warm). 0 if unknown. */
  esrTempCoPerK: q('partTempCoPerK'),
  /** The datasheet's ESR(f) curve at 25 °C (curves/esr-spectrum.ts); replaces esrOhm for the ESR loss. */
  esrFrequencyCurve: z
    .object({ points: z.array(esrFrequencyPointSchema).min(CURVE_POINTS.min).max(CURVE_POINTS.max) })
    .optional()
    .describe(
      'ESR against frequency at 25 °C digitised from the datasheet, 3 to 200 points: frequency strictly rising, ESR above 0 Ω. When given, the ESR loss is Σ Ih²·ESR(h·fs) over the harmonics h of the bank current (the Fourier series of its straight-line segments, exact); esrOhm is then not used for that loss. Straight lines between points, the first ESR held below the first point and the last held above the last point (the result warns when the switching frequency lies outside the table).',
    ),
  /** The datasheet's normalised ESR(T) curve; replaces esrTempCoPerK. */
  esrTemperatureCurve: z
    .object({ points: z.array(esrTemperaturePointSchema).min(CURVE_POINTS.min).max(CURVE_POINTS.max) })
    .optional()
    .describe(
      'ESR at a temperature over ESR at 25 °C, digitised from the datasheet, 3 to 200 points: temperature strictly rising, ratio above 0. When given it replaces esrTempCoPerK: ESR(f, T) = ESR(f) · ratio(T). Straight lines between points, the end ratios held outside the table (the result warns when the capacitor temperature lies outside it).',
    ),
  rippleRatingA: q('ratingA'),
  voltageRatingV: q('ratingV'),
  tMaxC: q('partLimitC'),
  /** Rated life at rated temperature (electrolytic and polymer). */
  life: z.object({ ratedHours: q('lifeHours'), ratedC: q('statedC') }).optional(),
});

export const resistorSchema = z.object({
  kind: z.literal('resistor'),
  ...partIdentity,
  resistanceOhm: q('conductionOhm'),
  tempCoPerK: q('resistorTempCoPerK'),
  powerRatingW: q('powerW'),
  /** Full rated power up to this temperature, then linear derating to zero at zeroPowerC. */
  deratingStartC: q('statedC'),
  zeroPowerC: q('partLimitC'),
});

export const controllerSchema = z.object({
  kind: z.literal('controller'),
  ...partIdentity,
  quiescentA: q('quiescentA'),
  driveV: q('driveV'),
  pullUpOhm: q('driveOhm'),
  pullDownOhm: q('driveOhm'),
  /** True when the drive rail is made from Vin by a linear regulator (the input pays Vin · Qg · fs). */
  driveFromVinLinear: z.boolean(),
  tjMaxC: q('partLimitC'),
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
