/**
 * `--current-derating` and `--voltage-derating` on `size` and `evaluate`: the design's derating margins
 * (margins.currentDerating, margins.voltageDerating) for this run only, as fractions of a rating
 * ("0.7" or "70 %"). Their range is the design field's (0.1 … 1), and a refusal names the option, the
 * editor's label, the value and that range (number-option.ts). The file is not changed.
 */
import type { Design } from '../../../shared-model/index.ts';
import type { FlagSpec, ParsedArgs } from '../command.ts';
import { OPTION_RANGES } from '../number-option.ts';

export const DERATING_FLAGS: readonly FlagSpec[] = [
  {
    name: 'current-derating', kind: 'number', unit: '', placeholder: 'FRACTION', range: OPTION_RANGES.currentDerating,
    help: "Usable share of current ratings for this run (default: the design's, else 0.8), e.g. 0.7, 70%.",
  },
  {
    name: 'voltage-derating', kind: 'number', unit: '', placeholder: 'FRACTION', range: OPTION_RANGES.voltageDerating,
    help: "Usable share of voltage ratings for this run (default: the design's), e.g. 0.8, 80%.",
  },
];

/** The design with the derating options applied (the same object when none was given). */
export function withDerating(design: Design, args: ParsedArgs): Design {
  const current = args.numbers['current-derating'];
  const voltage = args.numbers['voltage-derating'];
  if (current === undefined && voltage === undefined) return design;
  return {
    ...design,
    margins: {
      ...design.margins,
      ...(current === undefined ? {} : { currentDerating: current }),
      ...(voltage === undefined ? {} : { voltageDerating: voltage }),
    },
  };
}
