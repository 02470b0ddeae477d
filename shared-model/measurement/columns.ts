/**
 * The columns of a measurement CSV, named by quantity and unit (issue 12): `vinV`, `loadA` (required);
 * one of `efficiency` (a fraction, or a percentage when the cell ends in `%`), `efficiencyPct`
 * (percent), `inputPowerW`, `inputCurrentA`; optional `voutV`, `ambientC`, `fsHz`, and a measured
 * surface temperature per part role as `<role>C` (`switchC`, `rectifierC`, `inductorC`,
 * `inputCapacitorC`, `outputCapacitorC`, `senseResistorC`, `controllerC`). Headers match
 * case-insensitively. Each column reads into the measured-point field of the same name (schema.ts);
 * its allowed range is that field's range.
 */
import type { z } from 'zod';
import { ROLES, type Role } from '../design/schema.ts';
import { measuredPointSchema, measuredTemperaturesSchema } from './schema.ts';

export type ColumnKey =
  | 'vinV' | 'loadA' | 'efficiency' | 'efficiencyPct' | 'inputPowerW' | 'inputCurrentA' | 'voutV' | 'ambientC' | 'fsHz';

export interface ColumnSpec {
  /** The header as documented. */
  name: string;
  /** The measured-point field it fills, or the role of a temperature column. */
  target: { field: ColumnKey } | { role: Role };
  unit: string;
  /** The zod number schema that holds its range. */
  schema: z.ZodType;
  /** What the column means, for messages and the app's help. */
  meaning: string;
}

const field = (name: ColumnKey, unit: string, meaning: string, schema: z.ZodType): ColumnSpec => ({
  name,
  target: { field: name },
  unit,
  schema,
  meaning,
});

const shape = measuredPointSchema.shape;
const unwrap = (s: z.ZodType): z.ZodType => ((s as { unwrap?: () => z.ZodType }).unwrap ? (s as unknown as { unwrap: () => z.ZodType }).unwrap() : s);

/** Every known column. */
export const COLUMNS: readonly ColumnSpec[] = [
  field('vinV', 'V', 'input voltage', shape.vinV),
  field('loadA', 'A', 'load (output) current', shape.loadA),
  field('efficiency', '', 'efficiency as a fraction (0.912) or a percentage with a % sign (91.2 %)', unwrap(shape.efficiency)),
  field('efficiencyPct', '%', 'efficiency in percent (91.2)', unwrap(shape.efficiency)),
  field('inputPowerW', 'W', 'input power', unwrap(shape.inputPowerW)),
  field('inputCurrentA', 'A', 'input current (input power = vinV · inputCurrentA)', unwrap(shape.inputCurrentA)),
  field('voutV', 'V', 'measured output voltage (the design\'s output voltage when absent)', unwrap(shape.voutV)),
  field('ambientC', '°C', 'ambient temperature (the design\'s ambient when absent)', unwrap(shape.ambientC)),
  field('fsHz', 'Hz', 'switching frequency (the design\'s when absent)', unwrap(shape.fsHz)),
  ...ROLES.map(
    (role): ColumnSpec => ({
      name: `${role}C`,
      target: { role },
      unit: '°C',
      schema: unwrap(measuredTemperaturesSchema.shape[role]),
      meaning: `measured surface temperature of the ${role} (case top, or its heatsink)`,
    }),
  ),
];

/** The columns that carry the input side of the power balance; a measurement needs exactly one. */
export const INPUT_COLUMNS: readonly ColumnKey[] = ['efficiency', 'efficiencyPct', 'inputPowerW', 'inputCurrentA'];
export const REQUIRED_COLUMNS: readonly ColumnKey[] = ['vinV', 'loadA'];

const BY_LOWER = new Map(COLUMNS.map((c) => [c.name.toLowerCase(), c]));

/** The column a header names (case-insensitive, surrounding spaces ignored), or undefined. */
export function columnOf(header: string): ColumnSpec | undefined {
  return BY_LOWER.get(header.trim().toLowerCase());
}
