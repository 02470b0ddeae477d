/**
 * Warnings of an evaluated point whose numbers came from a datasheet curve read outside its table: a
 * diode's VF(IF, Tj) curves past their highest current (VF extrapolated along the last segment) or at a
 * junction temperature outside the curves' temperatures (the nearest curve held); an inductor's L(I) curve
 * passed by the peak current or fallen below ROLL_OFF_WARN_FRACTION of its first value at the peak; a
 * capacitor's ESR(f) table not reaching down or up to the switching frequency, its ESR(T) table or the
 * inductor's core-loss(T) table read at a temperature outside it (the end value held). A digitised curve says
 * nothing beyond its points; the engineer should know where the estimate leaves it (our own rule).
 */
import type { Design } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { PartTemperature } from '../ledger/types.ts';
import { forwardTableSpanC, forwardTableTopA } from './forward-table.ts';
import { inductanceOnCurve, inductanceTableTopA } from './inductance-table.ts';

const f4 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(4)).toString() : String(x));

/** The currents of the point the curve notes read. */
export interface CurvePoint {
  periodS: number;
  stats: { rectifier: { peakA: number } };
  inductor: { peakA: number; minA: number };
}

/**
 * Below this fraction of its first value the inductance at the peak is deep in roll-off: many datasheets
 * state Isat where L has fallen by 20–30 % (common practice); past 30 % a small change of current moves the
 * peak a lot, so the estimate leans on the digitised curve's accuracy.
 */
export const ROLL_OFF_WARN_FRACTION = 0.7;

/** Appends the curve notes of the point to `out`. */
export function curveNotes(design: Design, op: CurvePoint, temps: readonly PartTemperature[], out: Warning[]): void {
  inductorNotes(design, op, out);
  passiveTemperatureNotes(design, op, temps, out);
  const rect = design.parts.rectifier;
  if (rect.kind === 'diode' && rect.vfCurves) {
    const path = 'parts.rectifier.vfCurves.points';
    const points = rect.vfCurves.points;
    const top = forwardTableTopA(points);
    const peak = op.stats.rectifier.peakA;
    if (peak > top) {
      out.push({ code: 'model-limit', severity: 'caution', part: 'rectifier', path,
        message: `The rectifier's peak current ${f4(peak)} A lies beyond its VF(IF, Tj) table, whose curves end at ${f4(top)} A: VF is extrapolated along each curve's last segment there; add points from the datasheet up to the peak.` });
    }
    const tj = temps.find((t) => t.part === 'rectifier')?.celsius;
    const span = forwardTableSpanC(points);
    if (tj !== undefined && (tj < span.lowC || tj > span.highC)) {
      const end = tj > span.highC ? span.highC : span.lowC;
      out.push({ code: 'model-limit', severity: 'caution', part: 'rectifier', path,
        message: `The rectifier's junction at ${f4(tj)} °C lies outside the temperatures of its VF(IF, Tj) curves (${f4(span.lowC)} … ${f4(span.highC)} °C): the ${f4(end)} °C curve is used as it is.` });
    }
  }
}

function inductorNotes(design: Design, op: CurvePoint, out: Warning[]): void {
  const points = design.parts.inductor.inductanceCurve?.points;
  if (!points) return;
  const path = 'parts.inductor.inductanceCurve.points';
  const peak = Math.max(Math.abs(op.inductor.peakA), Math.abs(op.inductor.minA));
  const top = inductanceTableTopA(points);
  if (peak > top) {
    out.push({ code: 'saturation', severity: 'danger', part: 'inductor', path,
      message: `The inductor's peak current ${f4(peak)} A lies beyond its L(I) table, which ends at ${f4(top)} A: the inductance is held at its last value there, so the real peak is higher than shown; add points up to the peak or choose a larger inductor.` });
  }
  const l0 = points[0]!.inductanceH;
  const lPeak = inductanceOnCurve(points, peak);
  if (lPeak < ROLL_OFF_WARN_FRACTION * l0) {
    out.push({ code: 'saturation', severity: 'caution', part: 'inductor', path,
      message: `At the peak current ${f4(peak)} A the inductance has fallen to ${f4((lPeak / l0) * 100)} % of its first value (${f4(l0)} H → ${f4(lPeak)} H), below ${ROLL_OFF_WARN_FRACTION * 100} %: the core is deep in roll-off and the ripple and peak depend steeply on the current.` });
  }
}

/** Where a table of points along x is read outside its first and last x: the sentence's range, or undefined. */
function outside(xs: readonly number[], x: number): { low: number; high: number } | undefined {
  const low = xs[0]!;
  const high = xs[xs.length - 1]!;
  return x < low || x > high ? { low, high } : undefined;
}

function passiveTemperatureNotes(design: Design, op: CurvePoint, temps: readonly PartTemperature[], out: Warning[]): void {
  const fs = 1 / op.periodS;
  for (const bank of ['inputCapacitor', 'outputCapacitor'] as const) {
    const cap = design.parts[bank].part;
    const label = bank === 'inputCapacitor' ? 'input' : 'output';
    const fCurve = cap.esrFrequencyCurve;
    if (fCurve) {
      const o = outside(fCurve.points.map((p) => p.frequencyHz), fs);
      if (o)
        out.push({ code: 'model-limit', severity: 'caution', part: bank, path: `parts.${bank}.part.esrFrequencyCurve.points`,
          message: `The switching frequency ${f4(fs)} Hz lies outside the ${label} capacitor's ESR(f) table (${f4(o.low)} … ${f4(o.high)} Hz): the ESR of the nearest end is used there (extrapolation); add datasheet points around the switching frequency.` });
    }
    const tCurve = cap.esrTemperatureCurve;
    const t = temps.find((x) => x.part === bank)?.celsius;
    if (tCurve && t !== undefined) {
      const o = outside(tCurve.points.map((p) => p.tC), t);
      if (o)
        out.push({ code: 'model-limit', severity: 'caution', part: bank, path: `parts.${bank}.part.esrTemperatureCurve.points`,
          message: `The ${label} capacitor at ${f4(t)} °C lies outside its ESR(T) table (${f4(o.low)} … ${f4(o.high)} °C): the ratio of the nearest end is used (extrapolation).` });
    }
  }
  const core = design.parts.inductor.coreLossTemperatureCurve;
  const tL = temps.find((x) => x.part === 'inductor')?.celsius;
  if (core && tL !== undefined) {
    const o = outside(core.points.map((p) => p.tC), tL);
    if (o)
      out.push({ code: 'model-limit', severity: 'caution', part: 'inductor', path: 'parts.inductor.coreLossTemperatureCurve.points',
        message: `The inductor at ${f4(tL)} °C lies outside its core loss (T) table (${f4(o.low)} … ${f4(o.high)} °C): the factor of the nearest end is used (extrapolation).` });
  }
}
