/**
 * The one reader of every numeric option of every command: engineering entry in the option's unit
 * ("--load 500m", "--vin 12V", "--fs 450k", "--ambient 40C"), then the option's range. Options that stand
 * for a design field (--vin, --load, --fs, --ambient, --from, --to) take their range from the design
 * schema (shared-model CONDITION_RANGES), so an option can never reach a value a design file could not
 * hold; the others (--points, --samples, --seed, --knee-points) state theirs here. A refusal is one
 * sentence naming the option (and, where it sets a condition, its on-screen label), the value and the
 * allowed range.
 */
import type { FieldRange, NumberRange } from '../../shared-model/index.ts';
import {
  CONDITION_RANGES,
  designFieldRange,
  describeValue,
  inRange,
  MAX_AXIS_POINTS,
  MAX_MONTE_CARLO_SAMPLES,
  parseEngineering,
  rangeText,
} from '../../shared-model/index.ts';

/**
 * The range of a numeric option; `field` names the design field it mirrors, if any, and `label` what the
 * option sets as the app's screen names it (the engine's label table, shared-model design/field-labels.ts).
 */
export type OptionRange = NumberRange & { field?: string; label?: string };

const whole = (min: number, max: number): OptionRange => ({ min, minInclusive: true, max, maxInclusive: true, integer: true });

/** A load given as a sweep end or a tolerance load: the load range, without zero. */
const positiveLoad = (r: FieldRange): OptionRange => ({ ...r, min: 0, minInclusive: false });

export const OPTION_RANGES = {
  vin: CONDITION_RANGES.vinV,
  load: CONDITION_RANGES.loadA,
  positiveLoad: positiveLoad(CONDITION_RANGES.loadA),
  fs: CONDITION_RANGES.switchingFrequencyHz,
  ambient: CONDITION_RANGES.ambientC,
  sweepPoints: whole(2, MAX_AXIS_POINTS),
  samples: whole(1, MAX_MONTE_CARLO_SAMPLES),
  seed: whole(0, 0xffffffff),
  workers: whole(1, 256),
  kneePoints: { min: 0, minInclusive: false, max: 100, maxInclusive: false, integer: false },
  currentDerating: designFieldRange('margins.currentDerating'),
  voltageDerating: designFieldRange('margins.voltageDerating'),
} as const satisfies Record<string, OptionRange>;

/** "200 mV ≤ --vin ≤ 2 kV" for the usage text and messages. */
export function optionRangeText(name: string, unit: string, range: OptionRange): string {
  return rangeText(range, `--${name}`, unit);
}

export type OptionReading = { ok: true; value: number } | { ok: false; message: string };

/** Reads the text of numeric option `--name` in `unit` and checks it against `range`. Never throws. */
export function readNumberOption(name: string, unit: string, range: OptionRange, text: string): OptionReading {
  const parsed = parseEngineering(text, unit);
  if (!parsed.ok) return { ok: false, message: `Option "--${name}": ${parsed.message}` };
  if (inRange(parsed.value, range)) return { ok: true, value: parsed.value };
  const same = range.field === undefined ? '' : ` (the range of ${range.field} in a design file)`;
  const label = range.label === undefined ? '' : ` (${range.label})`;
  return {
    ok: false,
    message: `Option "--${name}"${label} is ${describeValue(parsed.value, unit)}; allowed: ${optionRangeText(name, unit, range)}${same}.`,
  };
}
