/**
 * The bench screen's state: the measurement text (typed, pasted or opened), what the engine made of it
 * (the measurement or every problem), the parameters chosen to move, and the last calibration. The
 * engine does the work (readMeasurement, calibrate); a fit of a few dozen points takes tens of
 * milliseconds (npm run bench: fit-30-points-4-params-ms), so it runs on the page's own thread.
 */
import {
  calibrate,
  defaultFitParameters,
  readMeasurement,
  type Calibration,
  type Design,
  type Measurement,
  type MeasurementProblem,
  type OptionProblem,
  type Role,
} from '../../shared-model/index.ts';

const ROLES: readonly Role[] = ['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'senseResistor', 'controller'];

export class BenchState {
  text = $state('');
  sourceName = $state('pasted measurement');
  measurement: Measurement | null = $state.raw(null);
  problems: MeasurementProblem[] = $state.raw([]);
  selected: string[] = $state([]);
  calibration: Calibration | null = $state.raw(null);
  /** The design the calibration was fitted from (its "before"). */
  fittedFrom: Design | null = $state.raw(null);
  fitProblems: OptionProblem[] = $state.raw([]);

  /** Reads the text as a measurement for `design`; on success selects the default parameters. */
  read(design: Design): void {
    const read = readMeasurement(this.text, { design, name: this.sourceName });
    this.calibration = null;
    this.fitProblems = [];
    if (read.ok) {
      this.measurement = read.measurement;
      this.problems = [];
      this.selected = defaultFitParameters(design, measuredRolesOf(read.measurement));
    } else {
      this.measurement = null;
      this.problems = read.problems;
    }
  }

  /** Takes the measurement saved with the design. */
  useSaved(design: Design): void {
    if (!design.measurements) return;
    this.measurement = design.measurements;
    this.problems = [];
    this.calibration = null;
    this.fitProblems = [];
    this.selected = defaultFitParameters(design, measuredRolesOf(design.measurements));
  }

  fit(design: Design): void {
    if (!this.measurement) return;
    const out = calibrate(design, this.measurement, { parameters: this.selected });
    if (out.ok) {
      this.calibration = out.calibration;
      this.fittedFrom = design;
      this.fitProblems = [];
    } else {
      this.calibration = null;
      this.fitProblems = out.problems;
    }
  }

  toggle(name: string, on: boolean): void {
    this.selected = on ? [...this.selected.filter((n) => n !== name), name] : this.selected.filter((n) => n !== name);
  }
}

export function measuredRolesOf(m: Measurement): Role[] {
  return ROLES.filter((r) => m.points.some((p) => p.temperaturesC?.[r] !== undefined));
}
