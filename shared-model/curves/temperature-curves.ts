/**
 * Curves stored as lists of point records — an RDS(on), ESR or core-loss ratio against temperature, an ESR
 * against frequency — read by straight lines between points with the end values held outside the table
 * (as curves/table.ts). The slope is that of the segment x rises into, 0 outside the table (the tangent
 * the electro-thermal Newton step uses, physics/temperature-slopes.ts).
 * Piecewise-linear interpolation of tabulated data — common practice.
 */

/** y(at) of the points whose x and y the two readers give, straight lines between points, ends held. */
export function pointCurveAt<P>(points: readonly P[], x: (p: P) => number, y: (p: P) => number, at: number): number {
  const n = points.length;
  if (at <= x(points[0]!)) return y(points[0]!);
  if (at >= x(points[n - 1]!)) return y(points[n - 1]!);
  let i = 0;
  while (x(points[i + 1]!) < at) i++;
  const a = points[i]!;
  const b = points[i + 1]!;
  return y(a) + ((at - x(a)) / (x(b) - x(a))) * (y(b) - y(a));
}

/** dy/dx at `at`: the slope of the segment `at` rises into; 0 outside the table. */
export function pointCurveSlopeAt<P>(points: readonly P[], x: (p: P) => number, y: (p: P) => number, at: number): number {
  const n = points.length;
  if (at < x(points[0]!) || at >= x(points[n - 1]!)) return 0;
  let i = 0;
  while (x(points[i + 1]!) <= at) i++;
  const a = points[i]!;
  const b = points[i + 1]!;
  return (y(b) - y(a)) / (x(b) - x(a));
}

/** One point of a ratio curve against temperature (ESR(T), core loss(T)). */
export interface TemperaturePoint {
  tC: number;
}

const tOf = (p: TemperaturePoint): number => p.tC;

/** value(tC) of a curve against temperature whose y is read by `y`. */
export function temperatureCurveAt<P extends TemperaturePoint>(points: readonly P[], y: (p: P) => number, tC: number): number {
  return pointCurveAt(points, tOf, y, tC);
}

/** d value/dT at tC of a curve against temperature. */
export function temperatureCurveSlopeAt<P extends TemperaturePoint>(points: readonly P[], y: (p: P) => number, tC: number): number {
  return pointCurveSlopeAt(points, tOf, y, tC);
}
