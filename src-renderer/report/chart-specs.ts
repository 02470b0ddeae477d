/**
 * The report's charts described as data (chart-spec.ts) from the report model's records: which series,
 * which marks, which axis range. Sums of a part's loss columns are the only arithmetic (presentation).
 */
import type { ReportModel, Role } from '../../shared-model/index.ts';
import { formatAmps, formatPercent, roleLabel } from '../../shared-model/index.ts';
import type { BarChartSpec, LineChartSpec, LineSeries, XMark } from '../charts/report/chart-spec.ts';

export const ROLE_COLORS: Readonly<Record<Role, string>> = {
  switch: '#1f5fa8',
  rectifier: '#b5501b',
  inductor: '#2f7d32',
  inputCapacitor: '#7a3f98',
  outputCapacitor: '#8a6d00',
  senseResistor: '#b0276b',
  controller: '#4a5560',
};

const FAMILY_COLORS = ['#6b8fc7', '#123e73', '#c77f4f'];
const MARK = { rated: '#404040', peak: '#0b6b3a', knee: '#7a4f00', ceiling: '#a8231b', crossover: '#5a2d82' };

const colorOf = (role: string): string => (ROLE_COLORS as Record<string, string>)[role] ?? '#333333';

export function loadMarks(model: ReportModel): XMark[] {
  const marks: XMark[] = [{ x: model.design.spec.ratedLoadA, label: `rated ${formatAmps(model.design.spec.ratedLoadA)}`, color: MARK.rated }];
  const ceiling = model.landmarks.thermalCeiling;
  if (ceiling.load !== null) marks.push({ x: ceiling.load, label: `thermal ceiling ${formatAmps(ceiling.load)}`, color: MARK.ceiling });
  return marks;
}

/** The swept load range, so every curve of a chart shares the same x axis. */
function loadRange(loads: readonly number[]): { xMin?: number; xMax?: number } {
  return loads.length > 0 ? { xMin: Math.min(...loads), xMax: Math.max(...loads) } : {};
}

function floorTo(x: number, step: number): number {
  return Math.floor(x / step) * step;
}

export function efficiencyChart(model: ReportModel): LineChartSpec {
  const series: LineSeries[] = model.vinFamily.map((f, k) => ({
    label: f.label,
    x: f.loadsA,
    y: f.efficiency.map((e, i) => (f.usable[i] ? e : null)),
    color: FAMILY_COLORS[k % FAMILY_COLORS.length]!,
    width: f.vinV === model.design.spec.vinNomV ? 2.4 : 1.4,
    dash: f.vinV === model.design.spec.vinNomV ? undefined : [5, 3],
  }));
  const rated = model.design.spec.ratedLoadA;
  const shown = model.vinFamily.flatMap((f) => f.efficiency.filter((e, i) => f.usable[i] && f.loadsA[i]! >= 0.05 * rated));
  const low = shown.length > 0 ? Math.min(...shown) : 0;
  const { peak, knee } = model.landmarks;
  const pointMarks = [];
  if (peak.load !== null && peak.value !== null) pointMarks.push({ x: peak.load, y: peak.value, label: `peak ${formatPercent(peak.value)}`, color: MARK.peak });
  if (knee.load !== null && knee.value !== null) pointMarks.push({ x: knee.load, y: knee.value, label: 'knee', color: MARK.knee });
  return {
    title: 'Efficiency versus load at Vin min, nom and max',
    xTitle: 'Load current (A)',
    yTitle: 'Efficiency (%)',
    xLog: model.sweep.spacing === 'log',
    ...loadRange(model.vinFamily.flatMap((f) => f.loadsA)),
    yMin: Math.max(0, floorTo(low, 0.05)),
    yMax: 1,
    yTickScale: 100,
    series,
    xMarks: loadMarks(model),
    pointMarks,
  };
}

/** Total loss and each part's loss (the sum of its loss columns) along the nominal sweep. */
export function lossChart(model: ReportModel): LineChartSpec {
  const sweep = model.sweep;
  const x = sweep.points.map((p) => p.loadA);
  const roles = [...new Set(sweep.columns.losses.map((c) => c.part))];
  const series: LineSeries[] = roles.map((role) => ({
    label: roleLabel(role),
    x,
    y: sweep.points.map((p) => p.losses.reduce((sum, w, i) => (sweep.columns.losses[i]!.part === role ? sum + w : sum), 0)),
    color: colorOf(role),
    width: 1.4,
  }));
  series.unshift({ label: 'Total loss', x, y: sweep.points.map((p) => p.totalLoss), color: '#111111', width: 2.4 });
  return {
    title: `Loss versus load at Vin nom ${sweep.vinV} V`,
    xTitle: 'Load current (A)',
    yTitle: 'Loss (W)',
    xLog: sweep.spacing === 'log',
    ...loadRange(x),
    yMin: 0,
    series,
    xMarks: loadMarks(model),
    pointMarks: [],
  };
}

/** Each part's temperature along the nominal sweep, its derated limit (dashed) and touch limit (dotted). */
export function temperatureChart(model: ReportModel): LineChartSpec {
  const sweep = model.sweep;
  const x = sweep.points.map((p) => p.loadA);
  const cols = sweep.columns.temperatures;
  const series: LineSeries[] = cols.map((c, k) => ({
    label: roleLabel(c.part),
    x,
    y: sweep.points.map((p) => p.temperaturesC[k] ?? null),
    color: colorOf(c.part),
    width: 1.8,
  }));
  const hottest = Math.max(...sweep.points.flatMap((p) => p.temperaturesC));
  const limits = [...cols.map((c) => c.deratedLimitC), ...sweep.columns.hazards.map((h) => h.limitC)];
  const top = Math.max(hottest, Math.min(...limits)) + 10;
  const ends = [x[0]!, x[x.length - 1]!];
  for (const c of cols) {
    if (c.deratedLimitC <= top) series.push({ label: `${roleLabel(c.part)} limit`, x: ends, y: [c.deratedLimitC, c.deratedLimitC], color: colorOf(c.part), dash: [6, 4], width: 1.2, hideInLegend: true });
  }
  for (const h of sweep.columns.hazards) {
    if (h.limitC <= top) series.push({ label: `${roleLabel(h.part)} touch limit`, x: ends, y: [h.limitC, h.limitC], color: colorOf(h.part), dash: [2, 3], width: 1.2, hideInLegend: true });
  }
  return {
    title: `Temperatures versus load at Vin nom ${sweep.vinV} V, ambient ${sweep.ambientC} °C`,
    xTitle: 'Load current (A)',
    yTitle: 'Temperature (°C)',
    xLog: sweep.spacing === 'log',
    ...loadRange(x),
    yMin: floorTo(sweep.ambientC, 10),
    yMax: Math.ceil(top / 10) * 10,
    series,
    xMarks: loadMarks(model),
    pointMarks: [],
  };
}

/** The rated-load ledger as sorted horizontal bars, one per term. */
export function breakdownChart(model: ReportModel): BarChartSpec {
  const terms = [...model.rated.losses].sort((a, b) => b.watts - a.watts);
  return {
    title: 'Loss breakdown at rated load, Vin nom',
    labels: terms.map((t) => `${roleLabel(t.part)} · ${t.mechanism}`),
    values: terms.map((t) => t.watts),
    colors: terms.map((t) => colorOf(t.part)),
    xTitle: 'Loss (W)',
  };
}

export function comparisonChart(model: ReportModel): LineChartSpec | null {
  const c = model.comparison;
  if (!c) return null;
  return {
    title: `Efficiency versus load for each ${roleLabel(c.role).toLowerCase()} compared`,
    xTitle: 'Load current (A)',
    yTitle: 'Efficiency (%)',
    xLog: model.sweep.spacing === 'log',
    ...loadRange(c.loadsA),
    yTickScale: 100,
    series: c.alternatives.map((a, k) => ({ label: a.partName, x: c.loadsA, y: a.efficiency, color: FAMILY_COLORS[k % FAMILY_COLORS.length]!, width: 1.8 })),
    xMarks: c.crossovers.map((x) => ({ x: x.load, label: `crossover ${formatAmps(x.load)}`, color: MARK.crossover })),
    pointMarks: [],
  };
}

export function monteCarloChart(model: ReportModel): BarChartSpec | null {
  const mc = model.tolerance?.monteCarlo;
  if (!mc) return null;
  const { edges, counts } = mc.efficiency.histogram;
  return {
    title: `Efficiency of ${mc.samples} Monte Carlo samples (seed ${mc.seed})`,
    labels: counts.map((_, i) => `${formatPercent(edges[i]!)} to ${formatPercent(edges[i + 1]!)}`),
    values: counts,
    colors: counts.map(() => '#1f5fa8'),
    xTitle: 'Samples',
  };
}

const PHASE_COLORS = ['#1f5fa8', '#b5501b', '#2f7d32', '#7a3f98', '#8a6d00', '#b0276b', '#4a5560', '#0b6b8a'];

/**
 * Phase shedding (issue 13 §1): efficiency against load with 1 … N phases switching, the envelope with ideal
 * shedding (dashed, dark) and a line at each crossover n → n − 1. Null for a one-phase design.
 */
export function sheddingReportChart(model: ReportModel): LineChartSpec | null {
  const s = model.phases?.shedding;
  if (!s) return null;
  const loads = s.curves[0]?.points.map((p) => p.loadA) ?? [];
  const series: LineSeries[] = s.curves.map((c, k) => ({
    label: `${c.activePhases} phase${c.activePhases === 1 ? '' : 's'}`,
    x: loads,
    y: c.points.map((p) => (p.usable ? p.efficiency : null)),
    color: PHASE_COLORS[k % PHASE_COLORS.length]!,
    width: 1.4,
  }));
  series.push({ label: 'Best count (envelope)', x: loads, y: s.envelope.map((e) => (e.activePhases > 0 ? e.efficiency : null)), color: '#202020', width: 2.2, dash: [6, 3] });
  const shown = s.envelope.filter((e) => e.activePhases > 0 && e.loadA >= 0.05 * model.design.spec.ratedLoadA).map((e) => e.efficiency);
  const low = Math.min(...shown, ...s.curves.flatMap((c) => c.points.filter((p) => p.usable && p.loadA >= 0.05 * model.design.spec.ratedLoadA).map((p) => p.efficiency)));
  return {
    title: `Efficiency versus load with 1 … ${s.phases} phases switching`,
    xTitle: 'Load current (A)',
    yTitle: 'Efficiency (%)',
    xLog: model.sweep.spacing === 'log',
    ...loadRange(loads),
    yMin: Number.isFinite(low) ? Math.max(0, floorTo(low, 0.05)) : 0,
    yMax: 1,
    yTickScale: 100,
    series,
    xMarks: s.landmarks.filter((l) => l.found && l.crossoverA !== undefined).map((l) => ({ x: l.crossoverA!, label: `${l.fromPhases}→${l.toPhases}`, color: MARK.crossover })),
    pointMarks: [],
  };
}
