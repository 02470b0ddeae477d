/**
 * Where an evaluation keeps its rating checks and burn hazards. Two keepers, one interface, no mode
 * chosen by a null argument:
 *   keepRecords — the full Evaluation record: every RatingCheck and Hazard record is kept;
 *   keepMargins — a sweep point: each check is made in one scratch record and dropped, and only the
 *                 touch margins are written (into the sweep's reused hazard records).
 * The comparisons and the warnings are the same either way (ledger/checks.ts, ledger/hazards.ts;
 * test: test/shared-model/sweep/lean-point.test.ts).
 */
import { touchHazard } from '../hazards/touch-check.ts';
import type { TouchPick } from './hazards.ts';
import type { Hazard, PartTemperature, RatingCheck } from './types.ts';

export interface Keeper {
  /** The record the next check is made in; undefined: a new record each time. */
  readonly scratch: RatingCheck | undefined;
  /** Whether to keep the record-only checks (stresses the operating point has already warned on). */
  readonly records: boolean;
  /** Keeps (or drops) a check just made. */
  check(c: RatingCheck): void;
  /** Keeps touchable surface k (the k-th pick, its part's temperature record) with its margin, K. */
  hazard(k: number, pick: TouchPick, t: PartTemperature, marginK: number, runaway: boolean): void;
}

class RecordKeeper implements Keeper {
  readonly scratch = undefined;
  readonly records = true;
  constructor(private readonly checks: RatingCheck[], private readonly hazards: Hazard[]) {}
  check(c: RatingCheck): void {
    this.checks.push(c);
  }
  hazard(_k: number, p: TouchPick, t: PartTemperature, _marginK: number, runaway: boolean): void {
    const h = touchHazard(t.part, t.partName, t.surfaceC, p.row, p.fit, p.material, p.contact);
    if (runaway) {
      // No steady surface temperature exists: the row reads runaway (unknown, counted as too hot), never "within".
      h.status = 'runaway';
      h.exceeded = true;
    }
    this.hazards.push(h);
  }
}

class MarginKeeper implements Keeper {
  readonly records = false;
  constructor(private readonly margins: { marginK: number }[], readonly scratch: RatingCheck) {}
  check(): void {}
  hazard(k: number, _p: TouchPick, _t: PartTemperature, marginK: number): void {
    this.margins[k]!.marginK = marginK;
  }
}

/** The full record's keeper: appends every check to `checks` and every hazard to `hazards`. */
export function keepRecords(checks: RatingCheck[], hazards: Hazard[]): Keeper {
  return new RecordKeeper(checks, hazards);
}

/** A sweep's keeper: checks made in `scratch`, the k-th touch margin written to `margins[k]`. */
export function keepMargins(margins: { marginK: number }[], scratch: RatingCheck): Keeper {
  return new MarginKeeper(margins, scratch);
}
