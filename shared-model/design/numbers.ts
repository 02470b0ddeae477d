/**
 * Number fields of the design and part-library documents: every physical quantity has a named range
 * here, with a lower and an upper bound and the reason for both. `quantity(RANGES.x)` builds the zod
 * check, so the generated JSON Schema carries the same bounds (minimum, exclusiveMinimum, maximum...)
 * and the reason as the field's description, and validation messages quote the range (zod-problems.ts).
 *
 * The ranges are sanity limits, not physics and not design advice: wide enough for any discrete buck or
 * boost of a few W to a few hundred W (multiphase rails up to a few hundred A), tight enough that a typo
 * (a missing prefix: 4.7 H for 4.7 µH) or a value from another universe (1e-300 H, 1e300 V) is refused
 * with a message naming the field, the value and the range, instead of reaching the models. Each reason
 * says whether the bound is common practice (a trade fact) or our own rule (a margin we chose).
 * Relations between fields (a ripple far beyond the rated current, a period shorter than the switching
 * edges...) are checked by the rules in design/rules-*.ts, not here.
 *
 * Every number must also be finite (zod 4 refuses NaN and ±Infinity).
 * This is the first module that builds zod schemas, so it switches zod's JIT off here: zod 4 probes
 * with `new Function`, which a strict Content-Security-Policy in the renderer reports (TOOLCHAIN.md).
 */
import { z } from 'zod';

z.config({ jitless: true });

/** Absolute zero in °C (BIPM SI Brochure, 9th ed. 2019, §2.3.1: 0 °C = 273.15 K). */
export const ABSOLUTE_ZERO_C = -273.15;

/** The allowed values of one quantity (SI units; temperatures in °C). */
export interface QuantityRange {
  min: number;
  /** True when `min` itself is refused (the value must be greater). */
  minExclusive?: boolean;
  max: number;
  /** True when `max` itself is refused (the value must be smaller). */
  maxExclusive?: boolean;
  /** Whole numbers only. */
  integer?: boolean;
  /** Why these bounds, saying "common practice" or "our own rule"; it becomes the JSON Schema description. */
  why: string;
}

const OURS = 'our own rule';
const TRADE = 'common practice';

/** The ranges, by quantity. Several fields share one quantity (every part's current rating, say). */
export const RANGES = {
  // --- voltages ---
  railV: { min: 0.2, max: 2000, why: `Input or output rail, 200 mV … 2 kV (${OURS}): from a sub-volt processor core rail or single-cell input to a 1.5 kV photovoltaic string with margin.` },
  ratingV: { min: 1, max: 10_000, why: `Voltage rating or stated-at voltage, 1 V … 10 kV (${OURS}): the lowest-voltage capacitors and MOSFETs are rated a few volts; no discrete part reaches 10 kV.` },
  curveV: { min: 0, max: 10_000, why: `Voltage of a point on a datasheet curve, 0 V … 10 kV (${OURS}): curves start at 0 V; no discrete part reaches 10 kV.` },
  gateV: { min: 0.1, max: 30, why: `Gate threshold or plateau, 0.1 V … 30 V (${TRADE}: thresholds of GaN, silicon and SiC parts lie between about 0.5 V and 6 V, gate ratings below 30 V).` },
  driveV: { min: 1, max: 30, why: `Gate-drive voltage, 1 V … 30 V (${TRADE}: logic-level drives from 2.5 V, SiC drives up to 20 V; 30 V leaves margin).` },
  curveForwardV: { min: 0, max: 10, why: `Forward voltage of a point on a datasheet VF(IF) curve, 0 V … 10 V (${TRADE}: silicon, Schottky and SiC diodes stay below about 5 V at their rated current).` },
  forwardV: { min: 0.05, max: 5, why: `Forward drop, 50 mV … 5 V (${TRADE}: Schottky knees from about 0.15 V, SiC body diodes and GaN reverse conduction up to about 4 V).` },
  rippleTargetV: { min: 1e-6, max: 2000, why: `Output ripple target, 1 µV … 2 kV (${OURS}); it must also be below the output voltage.` },
  // --- currents ---
  loadA: { min: 1e-3, max: 1000, why: `Rated load, 1 mA … 1 kA (${OURS}): from a bias rail of a few mA to multiphase rails of a few hundred A with margin.` },
  ratingA: { min: 1e-3, max: 2000, why: `Current rating or stated-at current, 1 mA … 2 kA (${OURS}): the largest discrete power packages carry a few hundred A.` },
  curveA: { min: 0, max: 2000, why: `Current of a point on a datasheet curve, 0 A … 2 kA (${OURS}: the ratings' range; curves may start at 0 A).` },
  leakageA: { min: 0, max: 1, why: `Reverse leakage at its stated temperature, 0 … 1 A (${OURS}: large Schottky diodes leak tens of mA when hot).` },
  quiescentA: { min: 0, max: 0.1, why: `Controller quiescent current, 0 … 100 mA (${TRADE}: µA to a few mA).` },
  // --- resistances ---
  conductionOhm: { min: 1e-5, max: 100, why: `Resistance in the power path, 10 µΩ … 100 Ω (${OURS}): the best discrete MOSFETs, shunts and chokes sit above 0.1 mΩ; small parts of a few-W converter stay below a few Ω.` },
  seriesOhm: { min: 0, max: 100, why: `Series resistance that may be neglected (0), up to 100 Ω (${OURS}).` },
  driveOhm: { min: 0, max: 1000, why: `Gate-loop resistance, 0 … 1 kΩ (${OURS}: drivers and internal gate resistors are 0.2–20 Ω; slow drives use up to a few hundred Ω).` },
  // --- reactive parts ---
  inductanceH: { min: 1e-9, max: 1, why: `Inductance, 1 nH … 1 H (${OURS}): a millimetre of PCB trace is about 1 nH, so no discrete power inductor is smaller; the ripple rule also refuses an inductance far too small for the switching frequency.` },
  capacitanceF: { min: 1e-10, max: 1, why: `Capacitance of one capacitor in a bank, 100 pF … 1 F (${OURS}); the output-ripple rule also refuses a bank far too small for the load and period.` },
  parasiticF: { min: 0, max: 1e-7, why: `Parasitic capacitance (Coss, Cj), 0 … 100 nF (${TRADE}: tens of pF to a few nF).` },
  // --- charges and energies ---
  gateChargeC: { min: 1e-11, max: 1e-5, why: `Total gate charge, 10 pC … 10 µC (${TRADE}: small GaN parts from about 0.1 nC, large silicon parts a few hundred nC).` },
  gateSubChargeC: { min: 1e-12, max: 1e-5, why: `Part of the gate charge (Qgs, Qgs2, Qgd), 1 pC … 10 µC (${TRADE}: small GaN parts have Qgd of tens of pC).` },
  outputChargeC: { min: 0, max: 1e-5, why: `Output charge Qoss, 0 … 10 µC (${OURS}).` },
  recoveryChargeC: { min: 0, max: 1e-4, why: `Reverse-recovery charge, 0 … 100 µC (${TRADE}: 0 for Schottky and SiC, up to tens of µC for slow PN diodes and high-voltage body diodes).` },
  energyJ: { min: 0, max: 1e-3, why: `Output-capacitance energy Eoss, 0 … 1 mJ (${OURS}).` },
  // --- frequency and time ---
  switchingHz: { min: 1000, max: 2e7, why: `Switching frequency, 1 kHz … 20 MHz (${OURS}): hard-switched discrete PWM converters run from a few kHz to a few MHz (GaN); above that the edge models do not apply.` },
  statedHz: { min: 10, max: 1e8, why: `Frequency of a datasheet point, 10 Hz … 100 MHz (${OURS}).` },
  deadTimeS: { min: 0, max: 1e-5, why: `Dead time, 0 … 10 µs (${TRADE}: 5 ns … 1 µs); it must also fit in the off time.` },
  // --- thermal ---
  ambientC: { min: -100, max: 200, why: `Ambient temperature, −100 °C … 200 °C (${OURS}: from cold-chamber tests to downhole electronics).` },
  partLimitC: { min: 40, max: 300, why: `A part's temperature limit, 40 °C … 300 °C (${TRADE}: 85–200 °C, high-temperature resistors up to 275 °C); it must also lie above the ambient.` },
  statedC: { min: -100, max: 300, why: `Temperature at which a datasheet value is stated, −100 °C … 300 °C (${OURS}).` },
  thetaJaKPerW: { min: 0.1, max: 1000, why: `Junction (or hot spot) to ambient, 0.1 … 1000 K/W (${OURS}: a tiny package on a bare board is about 300 K/W; below 1 K/W needs a large heatsink).` },
  thetaPartKPerW: { min: 0, max: 200, why: `Junction-to-case θJC or characterisation ΨJT, 0 … 200 K/W (${TRADE}: from a fraction of a K/W in power packages to about 100 K/W in small ones).` },
  thetaInterfaceKPerW: { min: 0, max: 100, why: `Case-to-heatsink interface θCS, 0 … 100 K/W (${TRADE}: pads and grease 0.1–5 K/W).` },
  thetaSinkKPerW: { min: 0.01, max: 1000, why: `Heatsink to ambient θSA, 0.01 … 1000 K/W (${OURS}: from a large forced-air sink to a copper pour).` },
  riseK: { min: 0.1, max: 300, why: `Stated temperature rise, 0.1 … 300 K (${OURS}).` },
  marginK: { min: 0, max: 200, why: `Temperature margin, 0 … 200 K (${OURS}).` },
  powerW: { min: 1e-3, max: 1000, why: `Power rating or stated dissipation, 1 mW … 1 kW (${OURS}).` },
  touchLimitC: { min: 25, minExclusive: true, max: 150, why: `Touch limit, above 25 °C up to 150 °C (${OURS}: the published limits lie between about 43 °C and 100 °C, docs/methods.md §11).` },
  // --- temperature laws ---
  rdsAlphaPerK: { min: 0, max: 0.05, why: `Linear RDS(on) coefficient, 0 … 5 %/K (${TRADE}: 0.4–0.8 %/K, docs/methods.md §5).` },
  rdsExponent: { min: 0, max: 5, why: `RDS(on) power-law exponent, 0 … 5 (${TRADE}: 1.5–2.5, docs/methods.md §5).` },
  hotRatio: { min: 0.1, max: 10, why: `RDS(on) hot/25 °C ratio, 0.1 … 10 (${TRADE}: 1.2–2.2).` },
  rdsRatio: { min: 0.1, max: 10, why: `RDS(on) at a temperature over RDS(on) at 25 °C, 0.1 … 10 (${TRADE}: about 0.7 at −40 °C to 2.2 at 175 °C).` },
  esrRatio: { min: 0.05, max: 100, why: `ESR at a temperature over ESR at 25 °C, 0.05 … 100 (${TRADE}: aluminium electrolytics rise several-fold towards −40 °C and fall to about half when hot; ceramics stay near 1).` },
  coreLossFactor: { min: 0.05, max: 20, why: `Core loss at a temperature over core loss at the Steinmetz coefficients' own temperature, 0.05 … 20 (${TRADE}: power ferrites have a minimum near 80–100 °C and lose about 1.5–3 × as much at 25 °C or 140 °C).` },
  vfTempCoVPerK: { min: -0.01, max: 0.01, why: `VF0 drift, −10 … +10 mV/K (${TRADE}: about −1 to −2 mV/K, docs/methods.md §6).` },
  leakageDoublingK: { min: 2, max: 50, why: `Leakage doubling interval, 2 … 50 K (${TRADE}: about 10 K, docs/methods.md §6).` },
  partTempCoPerK: { min: -0.05, max: 0.05, why: `Fractional change per kelvin, −5 … +5 %/K (${OURS}: Isat and ESR drifts are a fraction of a %/K).` },
  resistorTempCoPerK: { min: -0.01, max: 0.01, why: `Resistor temperature coefficient, −1 … +1 %/K (${TRADE}: copper is 0.39 %/K, metal-strip shunts 0.005 %/K).` },
  // --- magnetics ---
  turns: { min: 1, max: 10_000, why: `Turns, 1 … 10 000 (${OURS}).` },
  coreAreaM2: { min: 1e-8, max: 0.01, why: `Effective core area Ae, 0.01 mm² … 100 cm² (${OURS}: chip inductors have Ae of about 0.5 mm²).` },
  coreVolumeM3: { min: 1e-11, max: 1e-3, why: `Effective core volume Ve, 0.01 mm³ … 1 dm³ (${OURS}).` },
  steinmetzK: { min: 1e-12, max: 1e12, why: `Steinmetz k in W/m³ with f in Hz and B in T, 1e-12 … 1e12 (${OURS}; its size depends on α and β, docs/methods.md §7).` },
  steinmetzAlpha: { min: 0.5, max: 3, why: `Steinmetz frequency exponent α, 0.5 … 3 (${TRADE}: 1–2 for ferrites and powder cores, docs/methods.md §7).` },
  steinmetzBeta: { min: 1, max: 4, why: `Steinmetz flux exponent β, 1 … 4 (${TRADE}: 2–3, docs/methods.md §7).` },
  lossDensityWPerM3: { min: 1, max: 1e9, why: `Core-loss density of a datasheet point, 1 W/m³ … 1 GW/m³ (${OURS}: ferrites lose 10–1000 kW/m³ at their usual points).` },
  fluxT: { min: 1e-3, max: 2, why: `Peak flux density, 1 mT … 2 T (${TRADE}: no power-core material saturates above about 2 T).` },
  racOverRdc: { min: 1, max: 100, why: `Rac/Rdc at the switching frequency, 1 … 100 (${OURS}).` },
  layers: { min: 1, max: 100, why: `Winding layers for Dowell's model, 1 … 100 (${OURS}).` },
  conductorM: { min: 1e-6, max: 0.01, why: `Conductor or foil thickness, 1 µm … 10 mm (${OURS}).` },
  porosity: { min: 0.05, max: 1, why: `Layer porosity (copper fill of a layer), 0.05 … 1 (${TRADE}: 0.5–0.95).` },
  // --- ratios, counts and life ---
  maxDuty: { min: 0.05, max: 1, maxExclusive: true, why: `Largest duty cycle the controller commands, 0.05 up to (not including) 1 (${TRADE}: 0.8–0.99; D = 1 would never turn off).` },
  efficiency: { min: 0, minExclusive: true, max: 1, maxExclusive: true, why: 'Efficiency, a fraction strictly between 0 and 1.' },
  rippleRatio: { min: 0.01, max: 4, why: `Inductor ripple target as a fraction of the rated inductor current, 0.01 … 4 (${TRADE}: 0.2–0.4 in CCM, 2 at the DCM boundary).` },
  derating: { min: 0.1, max: 1, why: `Fraction of a rating that may be used, 0.1 … 1 (${TRADE}: 0.5–0.9).` },
  bankCount: { min: 1, max: 100, integer: true, why: `Capacitors in parallel, 1 … 100 (${OURS}).` },
  phaseCount: { min: 1, max: 8, integer: true, why: `Interleaved power stages, 1 … 8 (${OURS}: discrete multiphase rails rarely exceed 8 phases; 1 is a single-phase converter).` },
  sharingMismatch: { min: 0, max: 0.5, why: `Current-sharing mismatch of the worst phase, 0 … 0.5 (${TRADE}: current-mode sharing holds a few per cent, ±5–10 %; 0.5 leaves margin for a poorly matched layout).` },
  sheddingHysteresis: { min: 0, max: 0.5, why: `Phase-shedding hysteresis as a fraction of the crossover load, 0 … 0.5 (${OURS}: 5–20 % keeps a load near the crossover from toggling a phase).` },
  // --- bench measurements and calibration (shared-model/measurement, shared-model/fit) ---
  measuredLoadA: { min: 0, minExclusive: true, max: 1000, why: `Measured load current, above 0 up to 1 kA (${OURS}: the rated-load range; a point at no load has no efficiency).` },
  measuredPowerW: { min: 0, minExclusive: true, max: 100_000, why: `Measured input power, above 0 up to 100 kW (${OURS}: a few hundred A at a few hundred V with margin).` },
  measuredCurrentA: { min: 0, minExclusive: true, max: 2000, why: `Measured input current, above 0 up to 2 kA (${OURS}).` },
  measuredC: { min: -100, max: 300, why: `Measured temperature, −100 °C … 300 °C (${OURS}: the range of thermocouples and cameras used on a bench).` },
  measuredPercent: { min: 0, minExclusive: true, max: 100, maxExclusive: true, why: 'Efficiency in percent, strictly between 0 % and 100 %.' },
  fittedValue: { min: -1e12, max: 1e12, why: `A fitted parameter or its interval bound, in the parameter's own unit (${OURS}: multipliers of order one, currents in A).` },
  lifeHours: { min: 1, max: 1e7, why: `Life in hours, 1 h … 10 million h (${OURS}).` },
  // --- mission profile (shared-model/mission) ---
  timeFraction: { min: 0, max: 1, why: 'Share of the operating time spent at a row, 0 … 1 (by definition a fraction; the rows add up to 1).' },
  missionLoadA: { min: 0, max: 1000, why: `Load of a mission-profile row, 0 (standby) … 1 kA (${OURS}: the rated-load range, from no load up).` },
  hoursPerDay: { min: 0, minExclusive: true, max: 24, why: `Operating hours per day, above 0 up to 24 (a day has 24 h; refusing 0 is ${OURS}).` },
  batteryWh: { min: 1e-3, max: 1e6, why: `Battery capacity, 1 mWh … 1 MWh (${OURS}: from a coin cell to a stationary storage bank).` },
} as const satisfies Record<string, QuantityRange>;

export type QuantityName = keyof typeof RANGES;

/** The zod check of a quantity: its bounds, whole numbers where asked, and its reason as description. */
export function quantity(name: QuantityName): z.ZodNumber {
  const r: QuantityRange = RANGES[name];
  let s = z.number();
  s = r.minExclusive ? s.gt(r.min) : s.gte(r.min);
  s = r.maxExclusive ? s.lt(r.max) : s.lte(r.max);
  if (r.integer) s = s.int();
  return s.describe(r.why);
}
