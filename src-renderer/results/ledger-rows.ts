/**
 * The loss ledger at one load as table rows (part, mechanism, watts, share of the total) and as
 * totals by part and by mechanism for the breakdown chart. Rows are the engine's own loss terms; the
 * only arithmetic here is summing and dividing by the engine's total.
 */
import type { Evaluation, Role } from '../../shared-model/index.ts';

export interface LedgerRow {
  key: string;
  part: Role;
  partLabel: string;
  partName: string;
  mechanism: string;
  watts: number;
  /** watts / total loss (0 when the total is 0). */
  share: number;
  formula: string;
}

export type LedgerSortKey = 'part' | 'mechanism' | 'watts';
export interface LedgerSort {
  key: LedgerSortKey;
  descending: boolean;
}

export function ledgerRows(evaluation: Evaluation, labelOf: (role: Role) => string): LedgerRow[] {
  const total = evaluation.totalLoss;
  return evaluation.losses.map((term, i) => ({
    key: `${term.part}:${term.mechanism}:${i}`,
    part: term.part,
    partLabel: labelOf(term.part),
    partName: term.partName,
    mechanism: term.mechanism,
    watts: term.watts,
    share: total > 0 ? term.watts / total : 0,
    formula: term.formula,
  }));
}

export function sortLedger(rows: readonly LedgerRow[], sort: LedgerSort): LedgerRow[] {
  const sign = sort.descending ? -1 : 1;
  const byText = (a: string, b: string) => a.localeCompare(b);
  return [...rows].sort((a, b) => {
    const primary =
      sort.key === 'watts' ? a.watts - b.watts : sort.key === 'part' ? byText(a.partLabel, b.partLabel) : byText(a.mechanism, b.mechanism);
    // Ties (same part or mechanism) fall back to the larger loss first.
    return primary !== 0 ? sign * primary : b.watts - a.watts;
  });
}

export interface LedgerTotal {
  key: string;
  label: string;
  watts: number;
  share: number;
}

/** Sum of the rows by part or by mechanism, largest first. */
export function ledgerTotals(rows: readonly LedgerRow[], by: 'part' | 'mechanism'): LedgerTotal[] {
  const sums = new Map<string, { label: string; watts: number }>();
  for (const row of rows) {
    const key = by === 'part' ? row.part : row.mechanism;
    const entry = sums.get(key) ?? { label: by === 'part' ? row.partLabel : row.mechanism, watts: 0 };
    entry.watts += row.watts;
    sums.set(key, entry);
  }
  const total = rows.reduce((s, r) => s + r.watts, 0);
  return [...sums.entries()]
    .map(([key, e]) => ({ key, label: e.label, watts: e.watts, share: total > 0 ? e.watts / total : 0 }))
    .sort((a, b) => b.watts - a.watts);
}
