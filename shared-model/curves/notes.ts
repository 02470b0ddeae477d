/**
 * Warnings of an evaluated point whose numbers came from a datasheet curve read outside its table: a
 * diode's VF(IF, Tj) curves past their highest current (VF extrapolated along the last segment) or at a
 * junction temperature outside the curves' temperatures (the nearest curve held). A digitised curve says
 * nothing beyond its points; the engineer should know where the estimate leaves it (our own rule).
 */
import type { Design } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { PartTemperature } from '../ledger/types.ts';
import { forwardTableSpanC, forwardTableTopA } from './forward-table.ts';

const f4 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(4)).toString() : String(x));

/** The currents of the point the curve notes read. */
export interface CurvePoint {
  stats: { rectifier: { peakA: number } };
}

/** Appends the curve notes of the point to `out`. */
export function curveNotes(design: Design, op: CurvePoint, temps: readonly PartTemperature[], out: Warning[]): void {
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
