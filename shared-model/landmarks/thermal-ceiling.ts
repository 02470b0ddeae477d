/**
 * The thermal ceiling: the load at which each part first reaches its temperature limit (the part's limit
 * less the design's temperature margin) or its touch limit (burn hazard), and the lowest of these loads.
 *
 * For each part, the margin (limit − temperature, K) is followed along the sweep; the first point where it
 * is zero or negative — or where the electro-thermal solution has no fixed point (runaway) — brackets the
 * crossing with the point before it. The crossing is then found on the engine (Illinois regula falsi on
 * the margin) or by straight-line interpolation of the margin.
 * Hand check: a part whose loss is I²·R(T) with R(T) = R0·(1 + α·(T − T0)) and a thermal resistance θ
 * reaches T_lim at I = √((T_lim − Ta)/(θ·R(T_lim))) (docs/methods.md §10, fixed point T = Ta + θ·P(T)).
 */
import type { SweepColumns, SweepPoint } from '../sweep/types.ts';
import { findEdge, findRoot, interpolateCrossing } from './search.ts';
import type { PartCeiling, ThermalCeilingLandmark } from './types.ts';

/** A point whose margins can be trusted (converged electro-thermal fixed point). */
function hasFixedPoint(p: SweepPoint): boolean {
  return p.converged && !hasWarning(p, 'thermal-runaway');
}

/** Whether the point carries a warning with this code (a plain loop: it runs for every point of every part). */
function hasWarning(p: SweepPoint, code: string): boolean {
  const w = p.warnings;
  for (let i = 0; i < w.length; i++) if (w[i]!.code === code) return true;
  return false;
}

interface Series {
  base: Omit<PartCeiling, 'load' | 'value' | 'reason' | 'note' | 'method'>;
  margin: (p: SweepPoint) => number;
  what: string;
}

export function findThermalCeiling(
  columns: SweepColumns,
  points: readonly SweepPoint[],
  probe?: (load: number) => SweepPoint,
): ThermalCeilingLandmark {
  const series: Series[] = [];
  columns.temperatures.forEach((col, j) => {
    series.push({
      base: { unit: '°C', part: col.part, partName: col.partName, limitKind: 'temperature', thresholdC: col.deratedLimitC },
      margin: (p) => p.marginsK[j],
      what: `its temperature limit less the design margin (${round(col.deratedLimitC)} °C)`,
    });
  });
  columns.hazards.forEach((col, k) => {
    series.push({
      base: { unit: '°C', part: col.part, partName: col.partName, limitKind: 'touch', thresholdC: col.limitC },
      margin: (p) => p.hazardMarginsK[k],
      what: `the touch limit of its surface (${round(col.limitC)} °C, ${col.standard})`,
    });
  });
  const perPart = series.map((s) => ceilingOf(s, points, probe));
  let first: PartCeiling | null = null;
  for (const c of perPart) if (c.load !== null && (first === null || c.load < (first.load as number))) first = c;
  if (first === null) {
    const last = points.length > 0 ? points[points.length - 1].loadA : 0;
    return {
      load: null,
      value: null,
      unit: '°C',
      reason: `No part reaches its temperature limit or touch limit up to the heaviest swept load (${round(last)} A).`,
      note: null,
      method: 'none',
      part: null,
      partName: null,
      limitKind: null,
      perPart,
    };
  }
  return {
    load: first.load,
    value: first.value,
    unit: '°C',
    reason: null,
    note: `Set by the ${first.partName} (${first.part}) reaching ${first.limitKind === 'touch' ? 'its touch limit' : 'its temperature limit less the margin'}.`,
    method: first.method,
    part: first.part,
    partName: first.partName,
    limitKind: first.limitKind,
    perPart,
  };
}

/** The part named by a thermal-runaway warning at this point, or null. */
function runawayPart(p: SweepPoint): string | null {
  const w = p.warnings.find((x) => x.code === 'thermal-runaway');
  return w ? (w.part ?? '') : null;
}

function ceilingOf(s: Series, points: readonly SweepPoint[], probe?: (load: number) => SweepPoint): PartCeiling {
  // A point without a steady state counts against the part that runs away; for the others it ends the search.
  const runsAway = (p: SweepPoint) => !hasFixedPoint(p) && (runawayPart(p) === s.base.part || runawayPart(p) === '');
  const over = (p: SweepPoint) => (hasFixedPoint(p) ? s.margin(p) <= 0 : runsAway(p));
  const i = points.findIndex((p) => over(p) || !hasFixedPoint(p));
  const none = (reason: string): PartCeiling => ({ ...s.base, load: null, value: null, reason, note: null, method: 'none' });
  if (i < 0) {
    const last = points[points.length - 1];
    if (!last) return none('The sweep has no points.');
    const hottest = s.base.thresholdC - s.margin(last);
    return none(`The ${s.base.partName} stays below ${s.what} up to the heaviest swept load (${round(last.loadA)} A, where it reaches ${round(hottest)} °C).`);
  }
  if (!over(points[i])) {
    return none(
      `Above ${round(points[i].loadA)} A the design has no steady temperature (thermal runaway of the ${runawayPart(points[i]) || 'design'}) ` +
        `before the ${s.base.partName} reaches ${s.what}.`,
    );
  }
  if (i === 0) return none(`The ${s.base.partName} is already at or over ${s.what} at the lightest swept load (${round(points[0].loadA)} A).`);
  const a = points[i - 1];
  const b = points[i];
  const smooth = hasFixedPoint(b);
  let load: number;
  let method: PartCeiling['method'];
  if (probe && smooth) {
    load = findRoot((x) => {
      const p = probe(x);
      return hasFixedPoint(p) ? s.margin(p) : -1;
    }, a.loadA, b.loadA, s.margin(a), s.margin(b));
    method = 'refined';
  } else if (probe) {
    load = findEdge((x) => over(probe(x)), a.loadA, b.loadA);
    method = 'refined';
  } else {
    load = smooth ? interpolateCrossing(a.loadA, s.margin(a), b.loadA, s.margin(b), 0) : (a.loadA + b.loadA) / 2;
    method = 'interpolated';
  }
  const note = smooth ? null : `The ${s.base.partName} runs away thermally at this load: above it there is no steady temperature.`;
  return { ...s.base, load, value: s.base.thresholdC, reason: null, note, method };
}

function round(x: number): number {
  return Number(x.toPrecision(4));
}
