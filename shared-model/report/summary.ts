/**
 * The summary's selections from the engine's records: the hottest part, the part with the least
 * margin, and one short list of every warning and hazard, merged by warning code and part over the
 * conditions where it was seen (rated load at Vin min/nom/max, and the load sweep). Selection and
 * ordering only; no physics.
 */
import type { Evaluation } from '../ledger/types.ts';
import type { LoadSweep } from '../sweep/types.ts';
import type { Severity, Warning } from '../warnings.ts';
import { formatAmps } from './format.ts';
import type { HottestPart, InputVoltageCase, ReportAlert, ReportSummary } from './types.ts';

const SEVERITY_ORDER: Readonly<Record<Severity, number>> = { danger: 0, caution: 1, info: 2 };

function partRecord(t: Evaluation['temperatures'][number]): HottestPart {
  return { part: t.part, partName: t.partName, celsius: t.celsius, limitC: t.limit, marginK: t.marginK };
}

export function hottestPart(e: Evaluation): HottestPart | null {
  let best: Evaluation['temperatures'][number] | null = null;
  for (const t of e.temperatures) if (!best || t.celsius > best.celsius) best = t;
  return best ? partRecord(best) : null;
}

export function tightestPart(e: Evaluation): HottestPart | null {
  let best: Evaluation['temperatures'][number] | null = null;
  for (const t of e.temperatures) if (!best || t.marginK < best.marginK) best = t;
  return best ? partRecord(best) : null;
}

/** Merges warnings by code and part, keeping the first message and listing every place seen. */
export function mergeAlerts(sources: { where: string; warnings: readonly Warning[] }[]): ReportAlert[] {
  const byKey = new Map<string, ReportAlert>();
  for (const { where, warnings } of sources) {
    for (const w of warnings) {
      const key = `${w.code}|${w.part ?? ''}`;
      const found = byKey.get(key);
      if (!found) {
        byKey.set(key, { severity: w.severity, code: w.code, part: w.part ?? null, message: w.message, seenAt: [where] });
        continue;
      }
      if (!found.seenAt.includes(where)) found.seenAt.push(where);
      if (SEVERITY_ORDER[w.severity] < SEVERITY_ORDER[found.severity]) found.severity = w.severity;
    }
  }
  return [...byKey.values()].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}

/** Warnings of a sweep, each once, with the load range over which it occurs. */
export function sweepWarnings(sweep: LoadSweep): { where: string; warnings: Warning[] }[] {
  const ranges = new Map<string, { first: Warning; from: number; to: number }>();
  for (const p of sweep.points) {
    for (const w of p.warnings) {
      const key = `${w.code}|${w.part ?? ''}`;
      const r = ranges.get(key);
      if (!r) ranges.set(key, { first: w, from: p.loadA, to: p.loadA });
      else {
        r.from = Math.min(r.from, p.loadA);
        r.to = Math.max(r.to, p.loadA);
      }
    }
  }
  return [...ranges.values()].map((r) => ({
    where: r.from === r.to ? `load sweep at ${formatAmps(r.from)}` : `load sweep ${formatAmps(r.from)} to ${formatAmps(r.to)}`,
    warnings: [r.first],
  }));
}

export function summarize(rated: Evaluation, cases: readonly InputVoltageCase[], sweep: LoadSweep): ReportSummary {
  const sources = [{ where: 'rated load, Vin nom', warnings: rated.warnings }];
  for (const c of cases) {
    if (c.evaluation !== rated) sources.push({ where: `rated load, ${c.label}`, warnings: c.evaluation.warnings });
  }
  sources.push(...sweepWarnings(sweep));
  return { hottest: hottestPart(rated), tightest: tightestPart(rated), alerts: mergeAlerts(sources) };
}
