/**
 * Conditions for the property runs: mostly near the design (0 A to 150 % of rated load, the input range
 * widened by 20 %, the design's frequency and ambient), and a share anywhere in the override ranges the
 * validator accepts (CONDITION_RANGES, design/overrides.ts), each kept only when checkConditionOverrides
 * accepts it for that design — "any override it accepts".
 */
import fc from 'fast-check';
import { CONDITION_RANGES, checkConditionOverrides, type Conditions, type Design } from '../../shared-model/index.ts';

export interface Draw {
  index: number;
  /** 0…1: where in the near range (or the whole range) each condition falls. */
  load: number;
  vin: number;
  fs: number;
  ambient: number;
  /** 0: near the design; 1: load anywhere; 2: everything anywhere in the accepted ranges. */
  reach: number;
  zeroLoad: boolean;
}

export const arbitraryDraw = (poolSize: number): fc.Arbitrary<Draw> =>
  fc.record({
    index: fc.nat({ max: poolSize - 1 }),
    load: fc.double({ min: 0, max: 1, noNaN: true }),
    vin: fc.double({ min: 0, max: 1, noNaN: true }),
    fs: fc.double({ min: 0, max: 1, noNaN: true }),
    ambient: fc.double({ min: 0, max: 1, noNaN: true }),
    reach: fc.constantFrom(0, 0, 0, 0, 1, 2),
    zeroLoad: fc.boolean(),
  });

/** A range's bound (every condition range has both, design/numbers.ts). */
const bound = (x: number | undefined): number => {
  if (x === undefined) throw new Error('a condition range without a bound');
  return x;
};
const logBetween = (lo: number, hi: number, u: number) => lo * (hi / lo) ** u;
const between = (lo: number, hi: number, u: number) => lo + (hi - lo) * u;

/** The conditions of a draw for `d`, or undefined when the validator refuses them (not a valid question). */
export function conditionsOf(d: Design, r: Draw): Partial<Conditions> | undefined {
  const s = d.spec;
  const R = CONDITION_RANGES;
  const loadA = r.zeroLoad && r.load < 0.1 ? 0 : r.reach >= 1 ? logBetween(1e-6, bound(R.loadA.max), r.load) : logBetween(1e-3 * s.ratedLoadA, 1.5 * s.ratedLoadA, r.load);
  const c: Partial<Conditions> =
    r.reach === 2
      ? {
          loadA,
          vinV: logBetween(bound(R.vinV.min), bound(R.vinV.max), r.vin),
          switchingFrequencyHz: logBetween(bound(R.switchingFrequencyHz.min), bound(R.switchingFrequencyHz.max), r.fs),
          ambientC: between(bound(R.ambientC.min), bound(R.ambientC.max), r.ambient),
        }
      : { loadA, vinV: between(0.8 * s.vinMinV, 1.2 * s.vinMaxV, r.vin), ambientC: between(s.ambientC - 20, s.ambientC + 20, r.ambient) };
  return checkConditionOverrides(d, c).length === 0 ? c : undefined;
}
