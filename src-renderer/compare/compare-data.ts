/**
 * The comparison record (shared-model compareParts) as tables and chart data: ledgers side by side
 * (one column per part, the union of every part × mechanism row, and the difference from the first
 * part), efficiency curves overlaid, the loss difference against load, the crossover loads marked,
 * and the winner at the chosen load. Only the engine's numbers, regrouped.
 */
import { formatEngineering, isUsablePoint } from '../../shared-model/index.ts';
import type { Comparison, Part, Role } from '../../shared-model/index.ts';
import type { LineMarker, LineSeries } from '../charts/chart-data.ts';

export interface Candidate {
  id: string;
  name: string;
  invented: boolean;
  inDesign: boolean;
  part: Part;
}

/** The parts that may fill `role`: the design's own part first, then the library's parts of that kind. */
export function candidatesFor(current: Part | undefined, kind: Part['kind'], library: readonly Part[]): Candidate[] {
  const out: Candidate[] = [];
  if (current) out.push({ id: current.id, name: current.name, invented: current.invented === true, inDesign: true, part: current });
  for (const part of library) {
    if (part.kind !== kind || part.id === current?.id) continue;
    out.push({ id: part.id, name: part.name, invented: part.invented === true, inDesign: false, part });
  }
  return out;
}

export interface CompareRow {
  key: string;
  part: Role;
  mechanism: string;
  /** Watts per alternative (0 where that part has no such term). */
  watts: number[];
  /** Watts minus the first alternative's. */
  difference: number[];
}

export function compareRows(comparison: Comparison): CompareRow[] {
  const keys = new Map<string, { part: Role; mechanism: string }>();
  for (const alt of comparison.alternatives) for (const t of alt.evaluation.losses) keys.set(`${t.part}:${t.mechanism}`, { part: t.part, mechanism: t.mechanism });
  const rows = [...keys.entries()].map(([key, k]) => {
    const watts = comparison.alternatives.map((alt) =>
      alt.evaluation.losses.filter((t) => t.part === k.part && t.mechanism === k.mechanism).reduce((s, t) => s + t.watts, 0),
    );
    return { key, part: k.part, mechanism: k.mechanism, watts, difference: watts.map((w) => w - watts[0]) };
  });
  return rows.sort((a, b) => Math.max(...b.watts) - Math.max(...a.watts));
}

/**
 * Index of the lowest total loss at the chosen load among the parts with which the design regulates and
 * converges there (ties: the first); −1 when there is none.
 */
export function winnerAtLoad(comparison: Comparison): number {
  let best = -1;
  comparison.alternatives.forEach((alt, k) => {
    if (!isUsablePoint(alt.evaluation)) return;
    if (best < 0 || alt.evaluation.totalLoss < comparison.alternatives[best].evaluation.totalLoss) best = k;
  });
  return best;
}

export function crossoverMarkers(comparison: Comparison): LineMarker[] {
  return comparison.crossovers.map((c, i) => ({ key: `cross-${i}`, axis: 'x', value: c.load, label: 'crossover', tone: 'danger', dashed: true }));
}

export function efficiencyOverlay(comparison: Comparison): LineSeries[] {
  return comparison.alternatives.map((alt, k) => ({ key: alt.partId, label: alt.partName, values: alt.sweep.points.map((p) => p.efficiency), tone: k }));
}

export function differenceSeries(comparison: Comparison): LineSeries[] {
  return comparison.alternatives.slice(1).map((alt, k) => ({ key: alt.partId, label: `${alt.partName} minus ${comparison.alternatives[0].partName}`, values: alt.lossDifferenceW, tone: k + 1 }));
}

/** One sentence per crossover: which part wins below and above it. */
export function crossoverSentences(comparison: Comparison): string[] {
  const name = (id: string) => comparison.alternatives.find((a) => a.partId === id)?.partName ?? id;
  return comparison.crossovers.map(
    (c) => `At ${formatEngineering(c.load, 'A', 4, 'table')}: below it ${name(c.fromPartId)} loses less, above it ${name(c.toPartId)} does (${c.method === 'refined' ? 'found on the engine' : 'interpolated'}).`,
  );
}

/** Differences smaller than this share of the total loss are noise of the solver, not of the parts. */
export const DIFFERENCE_RESOLUTION = 1e-4;

/**
 * A loss difference as the table prints it: signed with its unit, "≈ 0" when it is smaller than
 * DIFFERENCE_RESOLUTION of `totalW` (the larger total loss compared), "—" when exactly zero.
 */
export function differenceText(w: number, totalW: number): string {
  if (w === 0) return '—';
  if (Math.abs(w) < DIFFERENCE_RESOLUTION * Math.abs(totalW)) return '≈ 0';
  return `${w > 0 ? '+' : ''}${formatEngineering(w, 'W', 3, 'table')}`;
}
