/**
 * WattLedger engine: the whole public surface. The renderer, main process, command line and tests
 * import from here only (never deep paths). Each section is owned by one concept; keep it sorted.
 */

// --- units ---
export type * from './units/quantities.ts';

// --- warnings ---
export type { Severity, Warning, WarningCode } from './warnings.ts';

// --- design document ---
export * from './design/parts.ts';
export * from './design/schema.ts';

// --- operating point ---
export type * from './operating-point/types.ts';

// --- ledger ---
export type * from './ledger/types.ts';

// --- sweeps, comparison, tolerance ---

// --- desktop API contract (types only) ---
export type * from './desktop-api.ts';
