/** The sections of the results column, in order (ids are used in element ids "results-<id>"). */
export const RESULT_SECTIONS = [
  { id: 'efficiency', label: 'Efficiency' },
  { id: 'notices', label: 'Warnings' },
  { id: 'ledger', label: 'Losses' },
  { id: 'loss-curves', label: 'Loss vs load' },
  { id: 'temperatures', label: 'Temperatures' },
  { id: 'phases', label: 'Phases' },
  { id: 'operating', label: 'Operating point' },
  { id: 'sizing', label: 'Sizing and checks' },
  { id: 'mission', label: 'Over the mission' },
  { id: 'frequency', label: 'Frequency and grid' },
  { id: 'tolerance', label: 'Tolerance' },
  { id: 'compare', label: 'Compare parts' },
] as const;

export type ResultSectionId = (typeof RESULT_SECTIONS)[number]['id'];
