/**
 * A multiphase point as screen and report tables (issue 13 §1): the loss of each part in each active phase
 * and of the shared parts, with totals per phase and for the converter; one temperature row per part and
 * phase (a part role × phase thermal node); and the phase-shedding chart's curves, markers and landmark
 * lines. Rows are the engine's own records (`PhasedEvaluation`, `PhaseShedding`); the only arithmetic here
 * is summing the engine's rows.
 */
import { ROLE_LABELS } from '../../shared-model/index.ts';
import type { PhaseIndex, PhaseShedding } from '../../shared-model/index.ts';
import type { LineMarker, LineSeries, PointMarker } from '../charts/chart-data.ts';

/** What the tables read: the engine's PhasedEvaluation, or its PhaseSummary (the report's copy). */
export interface PhaseRecord {
  activePhases: number;
  phaseLoadsA: readonly number[];
  rows: readonly { phase: PhaseIndex; part: string; watts: number }[];
  temperatures: readonly { phase: PhaseIndex; part: string; celsius: number; limit: number; marginK: number }[];
}

const labelOf = (part: string): string => (ROLE_LABELS as Record<string, string>)[part] ?? part;

export interface PhaseColumn {
  key: string;
  phase: PhaseIndex | 'total';
  label: string;
  /** The phase's load current, A (null for the shared parts and the total). */
  loadA: number | null;
}

export interface PhaseLossRow {
  part: string;
  label: string;
  /** Loss in each column (null: the part has no copy there), W; the last column is the row's total. */
  cells: (number | null)[];
}

export interface PhaseLossTable {
  columns: PhaseColumn[];
  rows: PhaseLossRow[];
  /** Column totals, W (the last is the converter's total loss). */
  totals: number[];
}

export interface PhaseTemperatureRow {
  key: string;
  part: string;
  phase: PhaseIndex;
  label: string;
  phaseLabel: string;
  celsius: number;
  limit: number;
  marginK: number;
}

/** "Phase 1 (worst, +5 %)", "Phase 2", "Shared". */
export function phaseLabel(p: Pick<PhaseRecord, 'activePhases' | 'phaseLoadsA'>, phase: PhaseIndex): string {
  if (phase === 'shared') return 'Shared';
  const loads = p.phaseLoadsA;
  const even = loads.reduce((s, a) => s + a, 0) / Math.max(loads.length, 1);
  const excess = even > 0 ? loads[0]! / even - 1 : 0;
  if (phase === 1 && p.activePhases > 1 && excess > 1e-9) return `Phase 1 (worst, +${formatPercent(excess)})`;
  return `Phase ${phase}`;
}

function formatPercent(fraction: number): string {
  const pct = fraction * 100;
  return `${Number.isInteger(Math.round(pct * 10) / 10) ? pct.toFixed(0) : pct.toFixed(1)} %`;
}

export function phaseLossTable(p: PhaseRecord): PhaseLossTable {
  const phases = Array.from({ length: p.activePhases }, (_, k) => k + 1);
  const columns: PhaseColumn[] = [
    ...phases.map((k) => ({ key: `phase-${k}`, phase: k, label: phaseLabel(p, k), loadA: p.phaseLoadsA[k - 1] ?? null })),
    { key: 'shared', phase: 'shared' as const, label: 'Shared', loadA: null },
    { key: 'total', phase: 'total' as const, label: 'Total', loadA: null },
  ];
  const index = (phase: PhaseIndex) => (phase === 'shared' ? phases.length : phase - 1);
  const byPart = new Map<string, (number | null)[]>();
  for (const row of p.rows) {
    const cells = byPart.get(row.part) ?? columns.map(() => null);
    const i = index(row.phase);
    cells[i] = (cells[i] ?? 0) + row.watts;
    cells[columns.length - 1] = (cells[columns.length - 1] ?? 0) + row.watts;
    byPart.set(row.part, cells);
  }
  const rows = [...byPart.entries()].map(([part, cells]) => ({ part, label: labelOf(part), cells }));
  const totals = columns.map((_, i) => rows.reduce((s, r) => s + (r.cells[i] ?? 0), 0));
  return { columns, rows, totals };
}

/** One row per part and phase, the parts in ledger order, each part's phases in order, shared parts once. */
export function phaseTemperatureRows(p: PhaseRecord): PhaseTemperatureRow[] {
  const order = new Map<string, number>();
  p.rows.forEach((r) => order.has(r.part) || order.set(r.part, order.size));
  const rank = (phase: PhaseIndex) => (phase === 'shared' ? 0 : phase);
  return [...p.temperatures]
    .sort((a, b) => (order.get(a.part) ?? 99) - (order.get(b.part) ?? 99) || rank(a.phase) - rank(b.phase))
    .map((t) => ({
      key: `${t.part}:${t.phase}`,
      part: t.part,
      phase: t.phase,
      label: labelOf(t.part),
      phaseLabel: phaseLabel(p, t.phase),
      celsius: t.celsius,
      limit: t.limit,
      marginK: t.marginK,
    }));
}

export interface SheddingChart {
  xValues: number[];
  series: LineSeries[];
  markers: LineMarker[];
  points: PointMarker[];
  /** One sentence per shedding step, for the list under the chart and the report. */
  lines: string[];
}

const amps = (a: number) => `${a.toPrecision(3)} A`;

/**
 * Efficiency against load for each active-phase count (points that do not regulate or converge are left
 * out), the envelope with ideal shedding (dashed), a line at each crossover n → n − 1 with a point on the
 * envelope, and the suggested hysteresis band's edges (thin, unlabelled: the list says their values).
 */
export function sheddingChart(s: PhaseShedding): SheddingChart {
  const xValues = (s.curves[0]?.points ?? []).map((p) => p.loadA);
  const series: LineSeries[] = s.curves.map((c) => ({
    key: `phases-${c.activePhases}`,
    label: `${c.activePhases} phase${c.activePhases === 1 ? '' : 's'}`,
    values: c.points.map((p) => (p.usable ? p.efficiency : null)),
    tone: c.activePhases - 1,
  }));
  series.push({
    key: 'envelope',
    label: 'Best phase count (envelope)',
    values: s.envelope.map((e) => (e.activePhases > 0 ? e.efficiency : null)),
    tone: 'text',
    dashed: true,
  });
  const markers: LineMarker[] = [];
  const points: PointMarker[] = [];
  const lines: string[] = [];
  const band = `${formatPercent(s.hysteresisFraction)} hysteresis${s.hysteresisSuggested ? ', suggested' : ', from the design'}`;
  for (const l of s.landmarks) {
    const step = `${l.fromPhases} → ${l.toPhases}`;
    if (!l.found || l.crossoverA === undefined) {
      lines.push(`${step} phases: no crossover in the swept range${l.reason ? ` (${l.reason})` : ''}.`);
      continue;
    }
    markers.push({ key: `cross-${l.fromPhases}`, axis: 'x', value: l.crossoverA, label: step, tone: 'accent', dashed: true });
    if (l.shedBelowA !== undefined) markers.push({ key: `shed-${l.fromPhases}`, axis: 'x', value: l.shedBelowA, label: '', tone: 'muted', dashed: true });
    if (l.addAboveA !== undefined) markers.push({ key: `add-${l.fromPhases}`, axis: 'x', value: l.addAboveA, label: '', tone: 'muted', dashed: true });
    if (l.efficiencyAtCrossover !== undefined)
      points.push({ key: `cross-${l.fromPhases}`, x: l.crossoverA, y: l.efficiencyAtCrossover, label: `Crossover ${step}`, tone: 'accent' });
    const saved = l.lossSavedAtShedW !== undefined ? `; shedding there saves ${(l.lossSavedAtShedW * 1000).toPrecision(3)} mW` : '';
    lines.push(
      `${step} phases: crossover ${amps(l.crossoverA)}; shed below ${l.shedBelowA !== undefined ? amps(l.shedBelowA) : '—'}, ` +
        `add back above ${l.addAboveA !== undefined ? amps(l.addAboveA) : '—'} (${band})${saved}.`,
    );
  }
  return { xValues, series, markers, points, lines };
}
