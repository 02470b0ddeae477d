import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../shared-model/index.ts';
import { ledgerRows, ledgerTotals, sortLedger } from '../../../src-renderer/results/ledger-rows.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { labelOf } from './demo.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('ledger rows of the demo design at rated load', () => {
  const evaluation = evaluate(demoDesign());
  const rows = ledgerRows(evaluation, labelOf);

  it('has one row per loss term of the engine, with watts unchanged', () => {
    expect(rows.map((r) => r.watts)).toEqual(evaluation.losses.map((t) => t.watts)); // engine record, rendered not recomputed (team brief)
  });

  it('adds up to input power minus output power', () => {
    const sum = rows.reduce((s, r) => s + r.watts, 0);
    closeTo(sum, evaluation.inputPower - evaluation.outputPower, 1e-9, 1e-12); // energy balance Pin = Pout + ΣPloss (first law; docs/methods.md power balance)
  });

  it('gives shares that sum to one', () => {
    closeTo(rows.reduce((s, r) => s + r.share, 0), 1, 1e-12); // a share is watts / total (definition)
  });

  it('sorts by watts, largest first, and by part name', () => {
    const byWatts = sortLedger(rows, { key: 'watts', descending: true }).map((r) => r.watts);
    expect(byWatts).toEqual([...byWatts].sort((a, b) => b - a)); // ordering check against Array.prototype.sort (ECMAScript)
    const byPart = sortLedger(rows, { key: 'part', descending: false }).map((r) => r.partLabel);
    expect(byPart).toEqual([...byPart].sort((a, b) => a.localeCompare(b))); // ordering check against String.prototype.localeCompare (ECMAScript)
  });

  it('totals by part keep the whole loss', () => {
    const totals = ledgerTotals(rows, 'part');
    closeTo(totals.reduce((s, t) => s + t.watts, 0), evaluation.totalLoss, 1e-12, 1e-15); // grouping keeps the sum (engine totalLoss)
    expect(new Set(totals.map((t) => t.key)).size).toBe(totals.length); // one bar per part
  });
});
