/**
 * Chart data of the load sweep: efficiency against load with the engine's landmarks marked (peak,
 * knee, CCM/DCM boundary, rated load, thermal ceiling, regulation limit), the Vin family, and the loss
 * against load stacked by mechanism or by part. Everything plotted is a number from the sweep record
 * or the landmarks; the stacks only add the engine's loss columns.
 */
import type { FamilyMember, Landmark, Landmarks, LoadSweep, Role, SweepPoint } from '../../shared-model/index.ts';
import { formatEngineering, isUsablePoint } from '../../shared-model/index.ts';
import type { LineMarker, LineSeries, PointMarker, Tone } from '../charts/chart-data.ts';

export interface CurveChart {
  xValues: number[];
  series: LineSeries[];
  markers: LineMarker[];
  points: PointMarker[];
  /** Why part of a curve is drawn dashed (points that do not regulate or have no steady state), or null. */
  note?: string | null;
}

/**
 * One efficiency curve as two series: solid where the point is regulated and converged, dashed where it
 * is not (the dashed part joins the solid at the boundary point, so the curve stays one line).
 */
function usableSplit(key: string, label: string, points: readonly SweepPoint[], tone: Tone): LineSeries[] {
  const usable = points.map((p) => isUsablePoint(p));
  const solid = points.map((p, i) => (usable[i] ? p.efficiency : null));
  // A point in thermal runaway has no steady state: a gap in both series (the note says why).
  const dashed = points.map((p, i) =>
    !runsAway(p) && (!usable[i] || usable[i - 1] === false || usable[i + 1] === false) ? p.efficiency : null,
  );
  if (usable.every(Boolean)) return [{ key, label, values: solid, tone }];
  return [
    { key, label, values: solid, tone },
    { key: `${key}-unregulated`, label: `${label}: not regulated or no steady state`, values: dashed, tone, dashed: true, thin: true },
  ];
}

const runsAway = (p: SweepPoint): boolean => p.warnings.some((w) => w.code === 'thermal-runaway');

/** The sentence that says why a dashed part (or a gap) is drawn, from the sweep's own points. */
function unusableNote(points: readonly SweepPoint[]): string | null {
  const unregulated = points.filter((p) => !p.regulated && !runsAway(p));
  const unsettled = points.filter((p) => !p.converged && !runsAway(p) && p.regulated);
  const runaway = points.filter(runsAway);
  if (unregulated.length === 0 && unsettled.length === 0 && runaway.length === 0) return null;
  const parts: string[] = [];
  if (unregulated.length > 0) {
    const lowest = unregulated.reduce((a, p) => (p.voutV < a.voutV ? p : a));
    parts.push(
      `${unregulated.length} of ${points.length} points do not regulate (the output falls to as low as ${formatEngineering(lowest.voutV, 'V', 4)} at ${formatEngineering(lowest.loadA, 'A', 3)})`,
    );
  }
  if (unsettled.length > 0) parts.push(`${unsettled.length} did not converge to an electro-thermal steady state`);
  const gap =
    runaway.length > 0
      ? ` Gap: ${runaway.length} points from ${formatEngineering(runaway[0]!.loadA, 'A', 3)} run away thermally (no steady state, so no efficiency).`
      : '';
  if (parts.length === 0) return gap.trim();
  return `Dashed: ${parts.join('; ')}. Their efficiency is that of a lower output or of no steady state, not the design's; the peak, knee and figures of merit leave them out.${gap}`;
}

const found = (l: Landmark): l is Landmark & { load: number; value: number } => l.load !== null && l.value !== null;

/**
 * Vertical markers shared by the load charts: rated load, the load the ledger is shown at (when it is
 * not the rated load), mode boundary, thermal ceiling, regulation limit.
 */
export function loadMarkers(sweep: LoadSweep, landmarks: Landmarks | null, chosenA: number | null = null): LineMarker[] {
  const markers: LineMarker[] = [{ key: 'rated', axis: 'x', value: sweep.ratedLoadA, label: 'rated', tone: 'muted' }];
  if (chosenA !== null && chosenA !== sweep.ratedLoadA) markers.push({ key: 'chosen', axis: 'x', value: chosenA, label: 'shown load', tone: 'text', dashed: true });
  if (!landmarks) return markers;
  if (landmarks.modeBoundary.load !== null)
    markers.push({ key: 'mode', axis: 'x', value: landmarks.modeBoundary.load, label: 'DCM | CCM', tone: 'caution', dashed: true });
  if (landmarks.thermalCeiling.load !== null)
    markers.push({ key: 'ceiling', axis: 'x', value: landmarks.thermalCeiling.load, label: 'thermal ceiling', tone: 'danger' });
  if (landmarks.regulationLimit.load !== null)
    markers.push({ key: 'regulation', axis: 'x', value: landmarks.regulationLimit.load, label: 'regulation limit', tone: 'danger', dashed: true });
  return markers;
}

export function efficiencyCurves(
  sweep: LoadSweep,
  landmarks: Landmarks | null,
  family: readonly FamilyMember[] | null = null,
  chosenA: number | null = null,
): CurveChart {
  const xValues = sweep.points.map((p) => p.loadA);
  const sameAxis = family?.every((m) => m.sweep.points.length === xValues.length && m.sweep.points.every((p, i) => p.loadA === xValues[i]));
  const series: LineSeries[] =
    family && sameAxis
      ? family.flatMap((m, k) => usableSplit(`family-${k}`, m.label, m.sweep.points, k))
      : usableSplit('efficiency', `Efficiency at ${sweep.vinV} V in`, sweep.points, 0);
  const note = unusableNote(family && sameAxis ? family.flatMap((m) => m.sweep.points) : sweep.points);
  const markers = loadMarkers(sweep, landmarks, chosenA);
  const points: PointMarker[] = [];
  if (landmarks && found(landmarks.knee)) {
    markers.push({ key: 'knee', axis: 'x', value: landmarks.knee.load, label: 'knee', tone: 'focus', dashed: true });
    points.push({ key: 'knee', x: landmarks.knee.load, y: landmarks.knee.value, label: 'Knee', tone: 'focus' });
  }
  if (landmarks && found(landmarks.peak)) {
    markers.push({ key: 'peak', axis: 'x', value: landmarks.peak.load, label: 'peak', tone: 'accent', dashed: true });
    points.push({ key: 'peak', x: landmarks.peak.load, y: landmarks.peak.value, label: 'Peak efficiency', tone: 'accent' });
  }
  return { xValues, series, markers, points, note };
}

/** A mechanism below this share of the total loss at every load joins its part's "other" band. */
export const SMALL_SHARE = 0.02;

interface Band {
  key: string;
  part: Role;
  mechanism: string;
  label: string;
  values: number[];
}

const lastOf = (values: readonly number[]) => values[values.length - 1] ?? 0;

/**
 * Loss against load as stacked bands. By part: one band per part. By mechanism: one band per part and
 * mechanism, grouped by part (largest part at the heaviest load at the bottom), each part in its own
 * hue and its mechanisms in shades of it; the mechanisms of a part that stay below SMALL_SHARE of the
 * total loss at every load are one band "other (…)" naming them.
 */
export function lossStack(sweep: LoadSweep, by: 'mechanism' | 'part', labelOf: (role: Role) => string): CurveChart {
  const sum = (columns: readonly number[]) => sweep.points.map((p) => columns.reduce((s, i) => s + (p.losses[i] ?? 0), 0));
  const byPart = new Map<Role, Map<string, number[]>>();
  sweep.columns.losses.forEach((col, i) => {
    const mechanisms = byPart.get(col.part) ?? new Map<string, number[]>();
    mechanisms.set(col.mechanism, [...(mechanisms.get(col.mechanism) ?? []), i]);
    byPart.set(col.part, mechanisms);
  });
  const small = (values: readonly number[]) => values.every((v, i) => v < SMALL_SHARE * sweep.points[i].totalLoss);
  const parts = [...byPart.entries()]
    .map(([part, mechanisms]) => {
      const bands: Band[] = [...mechanisms.entries()]
        .map(([mechanism, columns]) => ({ key: `${part}:${mechanism}`, part, label: `${labelOf(part)}: ${mechanism}`, mechanism, values: sum(columns) }))
        .filter((b) => b.values.some((v) => v > 0))
        .sort((a, b) => lastOf(b.values) - lastOf(a.values));
      const minor = bands.filter((b) => small(b.values));
      const kept: Band[] = minor.length > 1 ? bands.filter((b) => !minor.includes(b)) : bands;
      if (minor.length > 1)
        kept.push({
          key: `${part}:other`,
          part,
          mechanism: 'other',
          label: `${labelOf(part)}: other (${minor.map((b) => b.mechanism).join(', ')})`,
          values: sweep.points.map((_, i) => minor.reduce((s, b) => s + b.values[i], 0)),
        });
      return { part, bands: kept, total: sum([...mechanisms.values()].flat()) };
    })
    .filter((p) => p.bands.length > 0)
    .sort((a, b) => lastOf(b.total) - lastOf(a.total));
  const series: LineSeries[] =
    by === 'part'
      ? parts.map((p) => ({ key: p.part, label: labelOf(p.part), values: p.total, tone: { part: p.part } }))
      : parts.flatMap((p) => p.bands.map((b, k) => ({ key: b.key, label: b.label, values: b.values, tone: { part: p.part, shade: p.bands.length > 1 ? (0.6 * k) / (p.bands.length - 1) : 0 } })));
  return { xValues: sweep.points.map((p) => p.loadA), series, markers: [], points: [] };
}

/** Points (percentage points) below the peak that the "near the peak" efficiency axis shows. */
export const NEAR_PEAK_POINTS = 20;

/**
 * The lower end of the efficiency axis: none (fit to the curve) for the whole curve; near the peak,
 * NEAR_PEAK_POINTS below the highest efficiency plotted, rounded down to a whole percent, never below 0.
 */
export function efficiencyFloor(series: readonly LineSeries[], range: 'whole' | 'near-peak'): number | undefined {
  if (range === 'whole') return undefined;
  let peak = -Infinity;
  for (const s of series) for (const v of s.values) if (v !== null && v > peak) peak = v;
  if (!Number.isFinite(peak)) return undefined;
  return Math.max(0, Math.floor((peak - NEAR_PEAK_POINTS / 100) * 100) / 100);
}
