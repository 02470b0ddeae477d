/**
 * Flags shared by commands that evaluate one operating condition: --vin, --load, --ambient, --json.
 * Values use engineering entry in their unit ("--load 500m", "--vin 12V", "--ambient 40C").
 */
import type { Conditions } from '../../../shared-model/index.ts';
import { formatEngineering } from '../../../shared-model/index.ts';
import type { FlagSpec, ParsedArgs } from '../command.ts';

export const CONDITION_FLAGS: readonly FlagSpec[] = [
  {
    name: 'load',
    kind: 'number',
    unit: 'A',
    placeholder: 'A',
    help: 'Load current (default: the rated load), e.g. 2.5, 500m, 750mA.',
    check: (v) => (v >= 0 ? null : `must be 0 A or more; got ${formatEngineering(v, 'A')}.`),
  },
  {
    name: 'vin',
    kind: 'number',
    unit: 'V',
    placeholder: 'V',
    help: 'Input voltage (default: the nominal input voltage), e.g. 12, 3.7V.',
    check: (v) => (v > 0 ? null : `must be greater than 0 V; got ${formatEngineering(v, 'V')}.`),
  },
  {
    name: 'ambient',
    kind: 'number',
    unit: '°C',
    placeholder: '°C',
    help: "Ambient temperature (default: the design's), e.g. 40, 40C, -10.",
    check: (v) => (v >= -100 && v <= 200 ? null : `must lie between -100 °C and 200 °C; got ${formatEngineering(v, '°C')}.`),
  },
  { name: 'json', kind: 'switch', help: 'Print JSON (SI units: V, A, W, Hz, s, °C) instead of a table.' },
];

/** Condition overrides from the flags that were given. */
export function conditionOverrides(args: ParsedArgs): Partial<Conditions> {
  const out: Partial<Conditions> = {};
  if (args.numbers.vin !== undefined) out.vinV = args.numbers.vin;
  if (args.numbers.load !== undefined) out.loadA = args.numbers.load;
  if (args.numbers.ambient !== undefined) out.ambientC = args.numbers.ambient;
  return out;
}

/** "Vin 14.4 V, load 5 A, fs 500 kHz, ambient 40 °C". */
export function describeConditions(c: Conditions): string {
  return [
    `Vin ${formatEngineering(c.vinV, 'V', 4)}`,
    `load ${formatEngineering(c.loadA, 'A', 4)}`,
    `fs ${formatEngineering(c.switchingFrequencyHz, 'Hz', 4)}`,
    `ambient ${formatEngineering(c.ambientC, '°C', 4)}`,
  ].join(', ');
}
