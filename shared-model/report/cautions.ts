/**
 * The cautions every report closes with (team brief, rule 4), and the short line printed under the
 * summary and the thermal table. Wording only.
 */

export const REPORT_CAUTIONS: readonly string[] = [
  'Every number in this report is an estimate from models with stated limits (see "Method and assumptions"). It is not a measurement.',
  'Measure losses, temperatures and surface temperatures on the hardware, in its enclosure, at the worst-case conditions, before relying on them.',
  'Touch-temperature limits depend on the edition of the standard and on the product standard that applies: confirm every limit used here against the current edition.',
  'Defer to local codes, the applicable product and safety standards, and licensed professional practice. This report does not certify compliance with anything.',
];

export const SHORT_CAUTION =
  'Estimates only: measure on hardware, confirm limits against the current edition of the standards, and defer to local codes and licensed practice.';
