/**
 * Number fields of the design document: one helper per kind of range, built from zod's own checks so
 * the generated JSON Schema carries the same bounds (exclusiveMinimum, maximum, ...).
 *
 * Every number must be finite (zod 4 refuses NaN and ±Infinity). Upper bounds are sanity limits, not
 * physics: wide enough for any discrete buck or boost of a few W to a few hundred W, tight enough that a
 * typo such as a missing prefix (4.7 instead of 4.7e-6 H) or a value from another universe (1e300 V) is
 * refused with a message instead of producing absurd results [common practice: ranges chosen by us].
 *
 * This is the first module that builds zod schemas, so it switches zod's JIT off here: zod 4 probes
 * with `new Function`, which a strict Content-Security-Policy in the renderer reports (TOOLCHAIN.md).
 */
import { z } from 'zod';

z.config({ jitless: true });

/** Absolute zero in °C (BIPM SI Brochure, 9th ed. 2019, §2.3.1: 0 °C = 273.15 K). */
export const ABSOLUTE_ZERO_C = -273.15;

/** A finite number in (0, max]. */
export const positive = (max = 1e12) => z.number().gt(0).lte(max);
/** A finite number in [0, max]. */
export const nonNegative = (max = 1e12) => z.number().gte(0).lte(max);
/** A finite number in [min, max]. */
export const between = (min: number, max: number) => z.number().gte(min).lte(max);
/** A fraction in (0, 1] (deratings, porosity). */
export const fractionUpToOne = () => z.number().gt(0).lte(1);
/** A fraction strictly between 0 and 1 (duty limit, efficiency target). */
export const openFraction = () => z.number().gt(0).lt(1);
/** A temperature in °C above absolute zero and at most `max` (defaults: any part limit up to 1000 °C). */
export const temperatureC = (min = ABSOLUTE_ZERO_C, max = 1000) =>
  min === ABSOLUTE_ZERO_C ? z.number().gt(min).lte(max) : z.number().gte(min).lte(max);

/** Sanity ceilings used across the document (SI units). */
export const LIMITS = {
  voltageV: 10_000,
  gateVoltageV: 30,
  forwardVoltageV: 5,
  currentA: 10_000,
  loadA: 1_000,
  resistanceOhm: 100,
  driveResistanceOhm: 1_000,
  inductanceH: 1,
  capacitanceF: 1,
  parasiticCapacitanceF: 1e-6,
  gateChargeC: 1e-5,
  recoveryChargeC: 1e-4,
  energyJ: 1e-3,
  frequencyMinHz: 1_000,
  frequencyMaxHz: 1e8,
  deadTimeS: 1e-3,
  thetaKPerW: 1_000,
  leakageA: 1,
  areaM2: 0.01,
  volumeM3: 1e-3,
  lengthM: 0.01,
  powerW: 1_000,
  hours: 1e7,
  tempCoPerK: 0.05,
  ambientMinC: -100,
  ambientMaxC: 200,
  touchLimitMinC: 25,
  touchLimitMaxC: 150,
} as const;
