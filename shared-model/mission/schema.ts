/**
 * The mission profile: how the product is really used, as a table of operating conditions, each with the
 * fraction of the operating time spent there (the design document's optional `missionProfile` section).
 * A row gives the input voltage, the load (0 A: standby) and optionally the ambient (absent: the
 * design's `spec.ambientC`); the fractions add up to 1 (mission/rules.ts). `hoursPerDay` turns the
 * average loss into energy per day; `batteryWh`, when given, into the share of a battery wasted per day.
 * Units: V, A, °C, h, Wh. Ranges: design/numbers.ts.
 */
import { z } from 'zod';
import { quantity as q } from '../design/numbers.ts';

const MAX_MISSION_ROWS = 100;

export const missionRowSchema = z.object({
  /** What the product is doing in this row ("standby", "charging"...), free text. */
  label: z.string().max(80).optional(),
  vinV: q('railV'),
  loadA: q('missionLoadA'),
  ambientC: q('ambientC').optional(),
  /** Fraction of the operating time, 0 … 1. */
  fraction: q('timeFraction'),
});

export const missionProfileSchema = z.object({
  /** Where the profile comes from (an engineer's own, or a published weighting set), free text. */
  name: z.string().max(120),
  rows: z.array(missionRowSchema).min(1).max(MAX_MISSION_ROWS),
  hoursPerDay: q('hoursPerDay'),
  batteryWh: q('batteryWh').optional(),
});

export type MissionRow = z.infer<typeof missionRowSchema>;
export type MissionProfile = z.infer<typeof missionProfileSchema>;
