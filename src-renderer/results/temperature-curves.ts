/**
 * Chart data of part temperatures against load: every part's junction or hot-spot temperature from
 * the sweep, with its limits drawn — the limit less the design margin (what the thermal ceiling is
 * measured against), the part's own limit, and for a touchable part its surface temperature against
 * the touch limit of its surface — and the thermal ceiling marked.
 */
import type { Landmarks, LoadSweep, Role } from '../../shared-model/index.ts';
import type { LineMarker, LineSeries } from '../charts/chart-data.ts';
import type { CurveChart } from './load-curves.ts';

/** Short names of the parts for the labels on the chart (the table under it gives the full names). */
export const SHORT_ROLE: Readonly<Record<Role, string>> = {
  switch: 'switch',
  rectifier: 'rectifier',
  inductor: 'inductor',
  inputCapacitor: 'Cin',
  outputCapacitor: 'Cout',
  senseResistor: 'sense R',
  controller: 'controller',
};

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
    tone: { part: c.part },
  }));
  const markers: LineMarker[] = [];
  if (part !== null && shown.length === 1) {
    const { c, j } = shown[0];
    markers.push({ key: 'derated', axis: 'y', value: c.deratedLimitC, label: `limit less margin ${c.deratedLimitC} °C`, tone: 'danger' });
    if (c.limitC !== c.deratedLimitC) markers.push({ key: 'limit', axis: 'y', value: c.limitC, label: `part limit ${c.limitC} °C`, tone: 'danger', dashed: true });
    const touch = hazards.find((h) => h.part === c.part);
    if (touch) {
      series.push({ key: `${c.part}-surface`, label: 'Touchable surface', values: sweep.points.map((p) => p.surfacesC[j]), tone: { part: c.part, shade: 0.45 }, dashed: true });
      markers.push({ key: 'touch', axis: 'y', value: touch.limitC, label: `touch limit ${touch.limitC} °C`, tone: 'caution', dashed: true });
    }
  } else {
    // Each limit line says whose it is: one part's limit in that part's colour, a limit several parts
    // share in the danger colour with every owner named.
    const byLimit = new Map<number, number[]>();
    for (const { c, j } of shown) byLimit.set(c.deratedLimitC, [...(byLimit.get(c.deratedLimitC) ?? []), j]);
    for (const [value, owners] of byLimit) {
      const names = owners.map((j) => SHORT_ROLE[cols[j].part]).join(', ');
      markers.push({ key: `limit-${value}`, axis: 'y', value, label: `${names}: limit ${value} °C`, tone: owners.length === 1 ? { part: cols[owners[0]].part } : 'danger' });
    }
    const byTouch = new Map<number, Role[]>();
    for (const h of hazards) if (part === null || h.part === part) byTouch.set(h.limitC, [...(byTouch.get(h.limitC) ?? []), h.part]);
    for (const [value, owners] of byTouch)
      markers.push({ key: `touch-${value}`, axis: 'y', value, label: `${owners.map((r) => SHORT_ROLE[r]).join(', ')}: touch ${value} °C`, tone: 'caution', dashed: true });
  }
  const ceiling = landmarks?.thermalCeiling;
  if (ceiling && ceiling.load !== null) markers.push({ key: 'ceiling', axis: 'x', value: ceiling.load, label: 'thermal ceiling', tone: 'danger' });
  markers.push({ key: 'rated', axis: 'x', value: sweep.ratedLoadA, label: 'rated', tone: 'muted' });
  return { xValues, series, markers, points: [] };
}
