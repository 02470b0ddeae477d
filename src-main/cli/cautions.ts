/**
 * The cautions printed under every temperature, hazard or rating output (team brief, rule 4).
 */
export const CAUTIONS: readonly string[] = [
  'Estimates only: measure temperatures and losses on hardware before relying on them.',
  'Confirm touch-temperature limits against the current edition of the standard.',
  'Defer to local codes, the applicable standards and licensed practice.',
];

/** The cautions as one line for the end of a table. */
export const CAUTION_LINE = `Caution: ${CAUTIONS.join(' ')}`;
