/**
 * Flags shared by commands that evaluate one operating condition: --vin, --load, --fs, --ambient, --json.
 * Values use engineering entry in their unit ("--load 500m", "--vin 12V", "--fs 450k", "--ambient 40C")
 * and the range of the design field each stands for (number-option.ts). Once the design is loaded, the
 * overrides also pass the rules that say where the models stop meaning anything for that design
 * (checkConditionOverrides): a frequency far too low for its inductor is refused like the same value in
 * the file.
 */
import type { Conditions, Design } from '../../../shared-model/index.ts';
import { checkConditionOverrides, describeValue, formatEngineering, unitOfPath } from '../../../shared-model/index.ts';
import type { FlagSpec, ParsedArgs } from '../command.ts';
import type { CliIo } from '../io.ts';
import { OPTION_RANGES } from '../number-option.ts';

export const CONDITION_FLAGS: readonly FlagSpec[] = [
  {
    name: 'load', kind: 'number', unit: 'A', placeholder: 'A', range: OPTION_RANGES.load,
    help: 'Load current (default: the rated load), e.g. 2.5, 500m, 750mA.',
  },
  {
    name: 'vin', kind: 'number', unit: 'V', placeholder: 'V', range: OPTION_RANGES.vin,
    help: 'Input voltage (default: the nominal input voltage), e.g. 12, 3.7V.',
  },
  {
    name: 'fs', kind: 'number', unit: 'Hz', placeholder: 'Hz', range: OPTION_RANGES.fs,
    help: "Switching frequency (default: the design's), e.g. 450k, 1.2MHz.",
  },
  {
    name: 'ambient', kind: 'number', unit: '°C', placeholder: '°C', range: OPTION_RANGES.ambient,
    help: "Ambient temperature (default: the design's), e.g. 40, 40C, -10.",
  },
  { name: 'json', kind: 'switch', help: 'Print JSON (SI units: V, A, W, Hz, s, °C) instead of a table.' },
];

/** The flag that sets each condition (for messages). */
const FLAG_OF_CONDITION: Record<string, string> = {
  'conditions.vinV': '--vin',
  'conditions.loadA': '--load',
  'conditions.switchingFrequencyHz': '--fs',
  'conditions.ambientC': '--ambient',
};

/** Condition overrides from the flags that were given. */
export function conditionOverrides(args: ParsedArgs): Partial<Conditions> {
  const out: Partial<Conditions> = {};
  if (args.numbers.vin !== undefined) out.vinV = args.numbers.vin;
  if (args.numbers.load !== undefined) out.loadA = args.numbers.load;
  if (args.numbers.fs !== undefined) out.switchingFrequencyHz = args.numbers.fs;
  if (args.numbers.ambient !== undefined) out.ambientC = args.numbers.ambient;
  return out;
}

/**
 * Checks the overrides against the loaded design; prints every problem (naming the flag, its value and
 * the range that would be valid) and returns false when there is one.
 */
export function overridesFit(design: Design, overrides: Partial<Conditions>, io: CliIo, prefix: string): boolean {
  const problems = checkConditionOverrides(design, overrides);
  if (problems.length === 0) return true;
  const lines = problems.map((p) => {
    const flag = FLAG_OF_CONDITION[p.path] ?? p.path;
    return `  - ${p.message.replaceAll(p.path, flag)}\n    option: ${flag} | value: ${describeValue(p.value, unitOfPath(p.path))} | allowed: ${p.allowed.replaceAll(p.path, flag)}`;
  });
  io.err(`${prefix}: the options do not fit this design:\n${lines.join('\n')}`);
  return false;
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
