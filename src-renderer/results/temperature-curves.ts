/**
 * Chart data of part temperatures against load: every part's junction or hot-spot temperature from
 * the sweep, with its limits drawn — the limit less the design margin (what the thermal ceiling is
 * measured against), the part's own limit, and for a touchable part its surface temperature against
 * the touch limit of its surface — and the thermal ceiling marked.
 */
import type { Landmarks, LoadSweep, Role } from '../../shared-model/index.ts';
import type { LineMarker, LineSeries } from '../charts/chart-data.ts';
import type { CurveChart } from './load-curves.ts';

/** `part` = null shows every part, with each distinct limit drawn once. */
export function temperatureCurves(sweep: LoadSweep, landmarks: Landmarks | null, part: Role | null, labelOf: (role: Role) => string): CurveChart {
  const xValues = sweep.points.map((p) => p.loadA);
  const cols = sweep.columns.temperatures;
  const hazards = sweep.columns.hazards;
  const shown = cols.map((c, j) => ({ c, j })).filter(({ c }) => part === null || c.part === part);
  const series: LineSeries[] = shown.map(({ c, j }) => ({
    key: c.part,
    label: `${labelOf(c.part)} (${c.kind})`,
    values: sweep.points.map((p) => p.temperaturesC[j]),
    tone: j,
  }));
  const markers: LineMarker[] = [];
  if (part !== null && shown.length === 1) {
    const { c, j } = shown[0];
    markers.push({ key: 'derated', axis: 'y', value: c.deratedLimitC, label: `limit less margin ${c.deratedLimitC} °C`, tone: 'danger' });
    if (c.limitC !== c.deratedLimitC) markers.push({ key: 'limit', axis: 'y', value: c.limitC, label: `part limit ${c.limitC} °C`, tone: 'danger', dashed: true });
    const touch = hazards.find((h) => h.part === c.part);
    if (touch) {
      series.push({ key: `${c.part}-surface`, label: 'Touchable surface', values: sweep.points.map((p) => p.surfacesC[j]), tone: j + 1, dashed: true });
      markers.push({ key: 'touch', axis: 'y', value: touch.limitC, label: `touch limit ${touch.limitC} °C`, tone: 'caution', dashed: true });
    }
  } else {
    const limits = new Set(shown.map(({ c }) => c.deratedLimitC));
    // Short labels on the chart; which part has which limit is in the table under it.
    for (const value of limits) markers.push({ key: `limit-${value}`, axis: 'y', value, label: `limit ${value} °C`, tone: 'danger' });
    const touchLimits = new Set(hazards.map((h) => h.limitC));
    for (const value of touchLimits) markers.push({ key: `touch-${value}`, axis: 'y', value, label: `touch ${value} °C`, tone: 'caution', dashed: true });
  }
  const ceiling = landmarks?.thermalCeiling;
  if (ceiling && ceiling.load !== null) markers.push({ key: 'ceiling', axis: 'x', value: ceiling.load, label: 'thermal ceiling', tone: 'danger' });
  markers.push({ key: 'rated', axis: 'x', value: sweep.ratedLoadA, label: 'rated', tone: 'muted' });
  return { xValues, series, markers, points: [] };
}
