/**
 * Bench measurements: one record per measured operating point, and the measurement a design may carry
 * (the design document's optional `measurements` section). Keys are the CSV column names (measurement/
 * columns.ts), SI units, temperatures in °C. A point gives the load and input voltage, and one of
 * efficiency, input power or input current; optional output voltage, ambient, switching frequency and
 * measured surface temperatures by part role (`temperaturesC.switch` from the column `switchC`).
 * Ranges: design/numbers.ts (measured quantities are sanity limits like every other number).
 */
import { z } from 'zod';
import { quantity as q } from '../design/numbers.ts';

export const measuredTemperaturesSchema = z.object({
  switch: q('measuredC').optional(),
  rectifier: q('measuredC').optional(),
  inductor: q('measuredC').optional(),
  inputCapacitor: q('measuredC').optional(),
  outputCapacitor: q('measuredC').optional(),
  senseResistor: q('measuredC').optional(),
  controller: q('measuredC').optional(),
});

export const measuredPointSchema = z.object({
  vinV: q('railV'),
  loadA: q('measuredLoadA'),
  /** Efficiency as a fraction (a CSV may give it in percent; the reader converts). */
  efficiency: q('efficiency').optional(),
  inputPowerW: q('measuredPowerW').optional(),
  inputCurrentA: q('measuredCurrentA').optional(),
  voutV: q('railV').optional(),
  ambientC: q('ambientC').optional(),
  fsHz: q('switchingHz').optional(),
  /** Measured surface temperatures (case top, or the heatsink for a heatsink path), by part role. */
  temperaturesC: measuredTemperaturesSchema.optional(),
});

export const measurementSchema = z.object({
  /** What was measured, e.g. the prototype and the date (free text). */
  name: z.string().max(200),
  points: z.array(measuredPointSchema).min(1).max(10_000),
});

/** The record of a calibration adopted into the design: which measurement, which values. */
export const calibrationSchema = z.object({
  /** SHA-256 (hex) of the measurement's canonical text (measurement/hash.ts). */
  measurementSha256: z.string().regex(/^[0-9a-f]{64}$/),
  parameters: z
    .array(
      z.object({
        name: z.string().min(1).max(80),
        initial: q('fittedValue'),
        fitted: q('fittedValue'),
        lower95: q('fittedValue'),
        upper95: q('fittedValue'),
      }),
    )
    .max(40),
});

export type MeasuredTemperatures = z.infer<typeof measuredTemperaturesSchema>;
export type MeasuredPoint = z.infer<typeof measuredPointSchema>;
export type Measurement = z.infer<typeof measurementSchema>;
export type CalibrationRecord = z.infer<typeof calibrationSchema>;
