/**
 * The WattLedger design document, version 1: one JSON document per converter design.
 * The zod schema here is the single source of truth; the JSON Schema in assets/ is generated from it
 * (`npm run schema`). Units follow design/parts.ts: SI suffixes on keys, temperatures in °C. Every number
 * has a named sanity range with its reason (design/numbers.ts), shown in the JSON Schema.
 */
import { z } from 'zod';
import { capacitorSchema, controllerSchema, diodeSchema, inductorSchema, mosfetSchema, resistorSchema } from './parts.ts';
import { quantity as q } from './numbers.ts';
import { calibrationSchema, measurementSchema } from '../measurement/schema.ts';
import { missionProfileSchema } from '../mission/schema.ts';

export const DESIGN_FORMAT = 'wattledger.design';
export const DESIGN_VERSION = 1;

export const specificationSchema = z.object({
  vinMinV: q('railV'),
  vinNomV: q('railV'),
  vinMaxV: q('railV'),
  voutV: q('railV'),
  ratedLoadA: q('loadA'),
  /**
   * What the load is: a constant-current sink (absent: the default), a resistor R = Vout/I at each
   * evaluated load I, or a constant-power load Vout·I. It sets how the output ripple current divides
   * between the output capacitor bank and the load (operating-point/load.ts).
   */
  loadKind: z.enum(['constant-current', 'resistive', 'constant-power']).optional(),
  switchingFrequencyHz: q('switchingHz'),
  ambientC: q('ambientC'),
  /** Largest duty cycle the controller can command (0.05 ≤ maxDuty < 1). */
  maxDuty: q('maxDuty'),
  /**
   * Optional targets. The report's summary says whether the rated point meets `efficiencyAtRated` and the
   * Monte Carlo counts the samples that do; the design checks (design-checks/, `reviewDesign`) hold all
   * three against the solved corners, and the sizing (sizing/) uses the two ripple targets.
   */
  targets: z
    .object({
      efficiencyAtRated: q('efficiency').optional(),
      /**
       * Efficiency at the light-load point: the lightest loaded row of the mission profile, else 10 % of
       * the rated load at nominal Vin (design-checks/light-load.ts).
       */
      efficiencyAtLightLoad: q('efficiency').optional(),
      outputRippleV: q('rippleTargetV').optional(),
      /** Inductor ripple as a fraction of the rated inductor current (peak to peak). */
      inductorRippleRatio: q('rippleRatio').optional(),
    })
    .optional(),
});

export const topologySchema = z.object({
  kind: z.enum(['buck', 'boost']),
  rectifier: z.enum(['diode', 'synchronous']),
  /**
   * Light-load behaviour. Synchronous designs: forced PWM keeps CCM with negative current; diode emulation
   * enters DCM. Pulse skipping (PFM, diode or synchronous designs): below the load at which the inductor
   * peak would fall under `pulseSkipping.minPeakCurrentA`, pulses at that peak with idle time between them.
   */
  lightLoad: z.enum(['forced-pwm', 'diode-emulation', 'pulse-skipping']),
  /** Pulse skipping's design parameters (needed when lightLoad is "pulse-skipping"). */
  pulseSkipping: z
    .object({
      /** The inductor peak current of every pulse; the converter skips pulses below the load that needs it. */
      minPeakCurrentA: q('ratingA'),
      /** The controller's supply current while it sleeps between pulses. */
      sleepCurrentA: q('quiescentA'),
    })
    .optional(),
  /** Dead time after the rectifier FET turns off, before the control switch turns on. */
  deadTimeBeforeOnS: q('deadTimeS'),
  /** Dead time after the control switch turns off, before the rectifier FET turns on. */
  deadTimeAfterOffS: q('deadTimeS'),
  /** Where the current-sense resistor sits, if present. */
  senseLocation: z.enum(['none', 'input', 'switch', 'inductor', 'output']),
  /**
   * Interleaved power stages (absent: 1): N identical stages — switch, rectifier, inductor (and a sense
   * resistor in the switch or inductor) — switched 360°/N apart, sharing the input and output capacitor
   * banks, the controller and the heatsinks (shared-model/interleave/).
   */
  phases: q('phaseCount').optional(),
  /** Current-sharing mismatch m (absent: 0): the worst phase carries (1 + m)·I/N, the others share the rest. */
  phaseMismatch: q('sharingMismatch').optional(),
  /**
   * Phase shedding (absent: every phase always runs): below the load where fewer phases lose less, the
   * controller turns phases off; the hysteresis band is centred on that crossover load.
   */
  phaseShedding: z.object({ hysteresisFraction: q('sheddingHysteresis') }).optional(),
});

const capacitorSlot = z.object({ part: capacitorSchema, count: q('bankCount') });

export const partsSchema = z.object({
  /** The control switch: high side in a buck, low side in a boost. */
  switch: mosfetSchema,
  /** A diode (rectifier "diode") or a MOSFET (rectifier "synchronous"). */
  rectifier: z.discriminatedUnion('kind', [diodeSchema, mosfetSchema]),
  inductor: inductorSchema,
  inputCapacitor: capacitorSlot,
  outputCapacitor: capacitorSlot,
  senseResistor: resistorSchema.optional(),
  controller: controllerSchema,
});

/**
 * Where a part of the design came from: a part of a parts library (design/parts-library.ts), by the
 * library's id and the part's id. The design keeps its own copy of the values (parts), so it opens and
 * evaluates when the library is missing or has changed; library-links/ says which copies differ.
 * `libraryName` is the library's name when the link was made, to name it when it is not open.
 */
export const partSourceSchema = z.object({
  libraryId: z.string().min(1).max(80),
  libraryName: z.string().min(1).max(120),
  partId: z.string().min(1).max(80),
});

export const ROLES = [
  'switch',
  'rectifier',
  'inductor',
  'inputCapacitor',
  'outputCapacitor',
  'senseResistor',
  'controller',
] as const;
export type Role = (typeof ROLES)[number];

export const surfaceMaterialSchema = z.enum(['metal', 'glass', 'plastic']);

export const thermalPathSchema = z.discriminatedUnion('kind', [
  /** Junction (or hot spot) to ambient through the board: Tj = Ta + P · thetaJa. */
  z.object({
    kind: z.literal('direct'),
    thetaJaKPerW: q('thetaJaKPerW'),
    /** Optional junction-to-top characterisation parameter (JESD51): case top = Tj − psiJt · P. */
    psiJtKPerW: q('thetaPartKPerW').optional(),
  }),
  /** Hot-spot rise stated by the maker at a dissipation: theta = riseK / atW. */
  z.object({ kind: z.literal('rise'), riseK: q('riseK'), atW: q('powerW') }),
  /** Through the part's thetaJc and an interface thetaCs to a heatsink shared by its parts. */
  z.object({
    kind: z.literal('heatsink'),
    heatsinkId: z.string().min(1).max(80),
    thetaCsKPerW: q('thetaInterfaceKPerW'),
  }),
]);

export const heatsinkSchema = z.object({
  id: z.string().min(1).max(80),
  name: z.string().min(1).max(120),
  thetaSaKPerW: q('thetaSinkKPerW'),
  surface: surfaceMaterialSchema,
});

export const touchSchema = z.object({
  /** Can a person touch this part's surface (case top, or its heatsink) in normal use? */
  touchable: z.boolean(),
  surface: surfaceMaterialSchema,
});

export const contactSchema = z.enum(['brief', 'held', 'surface-1min', 'surface-10min', 'surface-8h']);

export const touchLimitRowSchema = z.object({
  id: z.string().min(1),
  standard: z.string().min(1),
  clause: z.string(),
  material: surfaceMaterialSchema,
  contact: contactSchema,
  limitC: q('touchLimitC'),
  /** True where the value was recalled rather than confirmed against the printed standard. */
  recalled: z.boolean(),
  note: z.string(),
});

export const thermalSchema = z.object({
  heatsinks: z.array(heatsinkSchema).max(20),
  paths: z.object({
    switch: thermalPathSchema,
    rectifier: thermalPathSchema,
    inductor: thermalPathSchema,
    inputCapacitor: thermalPathSchema,
    outputCapacitor: thermalPathSchema,
    senseResistor: thermalPathSchema.optional(),
    controller: thermalPathSchema,
  }),
  touch: z.partialRecord(z.enum(ROLES), touchSchema),
  /** The contact a person may make with touchable surfaces; the strictest fitting row is used. */
  contact: contactSchema,
  /** Replacement rows for the shipped touch-limit table (empty: the shipped table is used). */
  customTouchLimits: z.array(touchLimitRowSchema).max(100),
});

export const marginsSchema = z.object({
  /** Every part must stay this many kelvin below its temperature limit. */
  temperatureMarginK: q('marginK'),
  /** Fraction of the capacitor ripple-current rating that may be used (0..1]. */
  rippleCurrentDerating: q('derating'),
  /** Fraction of the derated resistor power rating that may be used (0..1]. */
  resistorPowerDerating: q('derating'),
  /** Fraction of a switch or diode voltage rating that may be used (0..1]. */
  voltageDerating: q('derating'),
  /**
   * Fraction of a switch, rectifier or inductor current rating that may be used (0.1..1]; absent: 0.8
   * (DEFAULT_CURRENT_DERATING, common practice). Isat is never derated: past it the inductance collapses.
   */
  currentDerating: q('derating').optional(),
  /** Required electrolytic life in hours at the design's ambient. */
  requiredLifeHours: q('lifeHours').optional(),
});

export const designSchema = z.object({
  format: z.literal(DESIGN_FORMAT),
  version: z.literal(DESIGN_VERSION),
  name: z.string().min(1).max(120),
  /** The project the design belongs to (shown in the report's title block); optional. */
  project: z.string().max(120).optional(),
  revision: z.string().max(40),
  author: z.string().max(120),
  notes: z.string().max(10000),
  spec: specificationSchema,
  topology: topologySchema,
  parts: partsSchema,
  /** The library entry each part was taken from (roles without an entry were typed in or are the demo's). */
  sources: z.partialRecord(z.enum(ROLES), partSourceSchema).optional(),
  thermal: thermalSchema,
  margins: marginsSchema,
  /** A bench measurement saved with the design (optional; shared-model/measurement). */
  measurements: measurementSchema.optional(),
  /** Set when fitted values were adopted: the measurement's hash and the values (shared-model/fit). */
  calibration: calibrationSchema.optional(),
  /** How the product is used: rows of (Vin, load, ambient, fraction of time) (optional; shared-model/mission). */
  missionProfile: missionProfileSchema.optional(),
});

export type Specification = z.infer<typeof specificationSchema>;
export type Topology = z.infer<typeof topologySchema>;
export type Parts = z.infer<typeof partsSchema>;
export type PartSource = z.infer<typeof partSourceSchema>;
export type ThermalPath = z.infer<typeof thermalPathSchema>;
export type Heatsink = z.infer<typeof heatsinkSchema>;
export type SurfaceMaterial = z.infer<typeof surfaceMaterialSchema>;
export type Contact = z.infer<typeof contactSchema>;
export type TouchLimitRow = z.infer<typeof touchLimitRowSchema>;
export type Thermal = z.infer<typeof thermalSchema>;
export type Margins = z.infer<typeof marginsSchema>;
export type Design = z.infer<typeof designSchema>;
