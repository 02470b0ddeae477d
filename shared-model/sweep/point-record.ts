/**
 * Compact per-point records for sweeps: an Evaluation (or the ledger's lean evaluation of the same point,
 * which carries the same numbers and warnings) reduced to numbers aligned with shared columns.
 * The columns come from the first point: the ledger's term slots depend only on the design, never on the
 * operating conditions, so every point of one design has the same terms, parts and heat sinks (a mechanism
 * that does not occur at a point, such as turn-on overlap in DCM, is there with 0 W; ledger/slots.ts).
 * A term, part or heat sink not seen before still gets a column of its own, and `finish` pads the earlier
 * points (0 W, ambient) — a safeguard for a caller that feeds records of different designs, not a case
 * one design's sweep reaches.
 */
import type { Role, TouchLimitRow } from '../design/schema.ts';
import type { Mechanism, TemperatureKind } from '../ledger/types.ts';
import type { Conditions, ConductionMode } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';
import type { LossColumn, SweepColumns, SweepPoint } from './types.ts';

/** What a sweep point is made from: the fields of an Evaluation it reads (a LeanEvaluation has them too). */
export interface RecordSource {
  conditions: Conditions;
  regulated: boolean;
  converged: boolean;
  efficiency: number;
  totalLoss: number;
  inputPower: number;
  outputPower: number;
  dutyCycle: number;
  conductionMode: ConductionMode;
  losses: readonly { part: Role; partName: string; mechanism: Mechanism; watts: number }[];
  temperatures: readonly {
    part: Role;
    partName: string;
    kind: TemperatureKind;
    celsius: number;
    limit: number;
    marginK: number;
    surfaceC: number;
  }[];
  hazards: readonly { part: Role; partName: string; row: Pick<TouchLimitRow, 'limitC' | 'id' | 'standard'>; marginK: number }[];
  heatsinks: readonly { id: string; name: string; celsius: number }[];
  /** The operating point's conditions carry the rate it was solved at (the pulse rate while pulses skip). */
  operatingPoint: { voutV: number; conditions: { switchingFrequencyHz: number }; inductor: { peakA: number; rippleA: number } };
  warnings: Warning[];
}

export class ColumnBook {
  readonly columns: SweepColumns = { losses: [], temperatures: [], hazards: [], heatsinks: [] };
  /** Column index by part, then mechanism (two lookups, no string building per term). */
  private readonly lossIndex = new Map<string, Map<string, number>>();
  private readonly temperatureIndex = new Map<string, number>();
  private readonly hazardIndex = new Map<string, number>();
  private readonly heatsinkIndex = new Map<string, number>();

  /** A book that continues existing columns (a copy: the given columns are not changed). */
  static resume(columns: SweepColumns): ColumnBook {
    const book = new ColumnBook();
    for (const col of columns.losses) book.lossColumn(col.part, col.partName, col.mechanism);
    for (const col of columns.temperatures) {
      book.temperatureIndex.set(col.part, book.columns.temperatures.length);
      book.columns.temperatures.push({ ...col });
    }
    for (const col of columns.hazards) {
      book.hazardIndex.set(col.part, book.columns.hazards.length);
      book.columns.hazards.push({ ...col });
    }
    for (const col of columns.heatsinks) {
      book.heatsinkIndex.set(col.id, book.columns.heatsinks.length);
      book.columns.heatsinks.push({ ...col });
    }
    return book;
  }

  private lossColumn(part: LossColumn['part'], partName: string, mechanism: LossColumn['mechanism']): number {
    let byMechanism = this.lossIndex.get(part);
    if (!byMechanism) {
      byMechanism = new Map();
      this.lossIndex.set(part, byMechanism);
    }
    let i = byMechanism.get(mechanism);
    if (i === undefined) {
      i = this.columns.losses.length;
      byMechanism.set(mechanism, i);
      this.columns.losses.push({ part, partName, mechanism });
    }
    return i;
  }

  /** Reduces one evaluation to a sweep point (plain loops: this runs once per swept point). */
  record(e: RecordSource): SweepPoint {
    const c = this.columns;
    const ambient = e.conditions.ambientC;
    const losses: number[] = zeros(c.losses.length);
    for (let k = 0; k < e.losses.length; k++) {
      const term = e.losses[k]!;
      const i = this.lossColumn(term.part, term.partName, term.mechanism);
      losses[i] = (losses[i] ?? 0) + term.watts;
    }
    const nT = c.temperatures.length;
    const temperaturesC: number[] = new Array<number>(nT);
    const marginsK: number[] = new Array<number>(nT);
    const surfacesC: number[] = new Array<number>(nT);
    for (let j = 0; j < nT; j++) {
      temperaturesC[j] = ambient;
      marginsK[j] = c.temperatures[j].deratedLimitC - ambient;
      surfacesC[j] = ambient;
    }
    for (let k = 0; k < e.temperatures.length; k++) {
      const t = e.temperatures[k];
      let i = this.temperatureIndex.get(t.part);
      if (i === undefined) {
        i = c.temperatures.length;
        this.temperatureIndex.set(t.part, i);
        c.temperatures.push({ part: t.part, partName: t.partName, kind: t.kind, limitC: t.limit, deratedLimitC: t.celsius + t.marginK });
      }
      temperaturesC[i] = t.celsius;
      marginsK[i] = t.marginK;
      surfacesC[i] = t.surfaceC;
    }
    const nH = c.hazards.length;
    const hazardMarginsK: number[] = new Array<number>(nH);
    for (let j = 0; j < nH; j++) hazardMarginsK[j] = c.hazards[j].limitC - ambient;
    for (let k = 0; k < e.hazards.length; k++) {
      const h = e.hazards[k];
      let i = this.hazardIndex.get(h.part);
      if (i === undefined) {
        i = c.hazards.length;
        this.hazardIndex.set(h.part, i);
        c.hazards.push({ part: h.part, partName: h.partName, limitC: h.row.limitC, rowId: h.row.id, standard: h.row.standard });
      }
      hazardMarginsK[i] = h.marginK;
    }
    const heatsinksC: number[] = new Array<number>(c.heatsinks.length).fill(ambient);
    for (let k = 0; k < e.heatsinks.length; k++) {
      const s = e.heatsinks[k];
      let i = this.heatsinkIndex.get(s.id);
      if (i === undefined) {
        i = c.heatsinks.length;
        this.heatsinkIndex.set(s.id, i);
        c.heatsinks.push({ id: s.id, name: s.name });
      }
      heatsinksC[i] = s.celsius;
    }
    const op = e.operatingPoint;
    return {
      loadA: e.conditions.loadA,
      vinV: e.conditions.vinV,
      ambientC: ambient,
      switchingFrequencyHz: e.conditions.switchingFrequencyHz,
      equivalentSwitchingHz: op.conditions.switchingFrequencyHz,
      efficiency: e.efficiency,
      totalLoss: e.totalLoss,
      inputPower: e.inputPower,
      outputPower: e.outputPower,
      dutyCycle: e.dutyCycle,
      mode: e.conductionMode,
      regulated: e.regulated,
      voutV: op.voutV,
      converged: e.converged,
      inductorPeakA: op.inductor.peakA,
      inductorRippleA: op.inductor.rippleA,
      losses,
      temperaturesC,
      marginsK,
      surfacesC,
      hazardMarginsK,
      heatsinksC,
      warnings: e.warnings,
    };
  }

  /** Pads every point's arrays to the final column counts. */
  finish(points: SweepPoint[]): SweepPoint[] {
    const c = this.columns;
    for (const p of points) {
      if (isComplete(p, c)) continue; // the usual case: no padding callbacks made for it
      // A part missing from a point (never expected) reads as sitting at ambient, with no loss.
      pad(p.losses, c.losses.length, () => 0);
      pad(p.temperaturesC, c.temperatures.length, () => p.ambientC);
      pad(p.marginsK, c.temperatures.length, (i) => c.temperatures[i].deratedLimitC - p.ambientC);
      pad(p.surfacesC, c.temperatures.length, () => p.ambientC);
      pad(p.hazardMarginsK, c.hazards.length, (i) => c.hazards[i].limitC - p.ambientC);
      pad(p.heatsinksC, c.heatsinks.length, () => p.ambientC);
    }
    return points;
  }
}

function zeros(n: number): number[] {
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) out[i] = 0;
  return out;
}

/** Whether every array of the point already has its column count. */
function isComplete(p: SweepPoint, c: SweepColumns): boolean {
  const nT = c.temperatures.length;
  return (
    p.losses.length >= c.losses.length &&
    p.temperaturesC.length >= nT &&
    p.marginsK.length >= nT &&
    p.surfacesC.length >= nT &&
    p.hazardMarginsK.length >= c.hazards.length &&
    p.heatsinksC.length >= c.heatsinks.length
  );
}

function pad(values: number[], length: number, fill: (index: number) => number): void {
  while (values.length < length) values.push(fill(values.length));
}

/** Total loss of each mechanism summed over the parts, for one point. */
export function lossByMechanism(columns: SweepColumns, point: SweepPoint): Map<string, number> {
  const out = new Map<string, number>();
  columns.losses.forEach((col, i) => out.set(col.mechanism, (out.get(col.mechanism) ?? 0) + (point.losses[i] ?? 0)));
  return out;
}
