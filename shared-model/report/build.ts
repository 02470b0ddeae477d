/**
 * buildReport: gathers every record the design-review report shows, from the engine, once.
 *
 * - the electro-thermal evaluation at rated load and nominal Vin (the loss ledger, temperatures,
 *   hazards, rating checks), and at rated load for Vin min and Vin max;
 * - the load sweep at nominal Vin with its landmarks (peak, knee, CCM/DCM boundary, thermal ceiling,
 *   regulation limit), the figures of merit (25/50/75/100 % and 10 % of rated load), and the Vin family;
 * - comparison and tolerance results when the caller ran them (they are reduced, not recomputed);
 * - the sizing from the specification and the design checks (reviewDesign), and the design's mission
 *   profile evaluated when it carries one (evaluateMission);
 * - the models used with their sources and limits, and the cautions;
 * - the title block with the SHA-256 of the design document's text.
 * The date and the program version are inputs: the engine reads no clock. Pure: records in, record out.
 */
import type { Design } from '../design/schema.ts';
import { evaluateDesign } from '../interleave/phase-evaluator.ts';
import { phaseShedding } from '../interleave/shedding.ts';
import { phaseSummary } from '../interleave/summary.ts';
import type { Evaluation, Mechanism } from '../ledger/types.ts';
import type { Comparison } from '../compare/compare-parts.ts';
import { sweepWithLandmarks } from '../landmarks/sweep-with-landmarks.ts';
import type { Landmarks } from '../landmarks/types.ts';
import { regulationCause } from '../landmarks/regulation-limit.ts';
import { figuresOfMerit } from '../sweep/figures-of-merit.ts';
import { isUsablePoint } from '../ledger/regulated.ts';
import type { LoadSweep, SweepSpacing } from '../sweep/types.ts';
import type { MonteCarlo } from '../tolerance/monte-carlo.ts';
import { calibrationSection } from '../fit/report-section.ts';
import type { WorstCase } from '../tolerance/worst-case.ts';
import { summarize } from './summary.ts';
import { REPORT_CAUTIONS } from './cautions.ts';
import { methodsFor } from './methods.ts';
import { loadKindOf } from '../operating-point/load.ts';
import { sha256Hex } from './sha256.ts';
import { reviewDesign } from '../design-checks/review.ts';
import { evaluateMission } from '../mission/evaluate-mission.ts';
import type {
  ReportPhases,
  FamilyCurve,
  InputVoltageCase,
  ReportComparison,
  ReportModel,
  ReportTolerance,
  TitleBlock,
} from './types.ts';
import { REPORT_FORMAT, REPORT_VERSION } from './types.ts';

export interface ReportInput {
  design: Design;
  /** The design's canonical text (serializeDesign, design/canonical.ts), hashed as UTF-8. */
  documentText: string;
  /** True when the document has changes not yet saved (the hash is then of the text it would be saved as). */
  unsaved?: boolean;
  /** Date of the report (ISO 8601 date), supplied by the caller. */
  date: string;
  /** WattLedger version, supplied by the caller. */
  appVersion: string;
  /** The project for the title block; when absent or blank, the design's own `project` field. */
  project?: string | null;
  /** Load sweep points and spacing (defaults: the engine's sweep defaults). */
  sweepPoints?: number;
  sweepSpacing?: SweepSpacing;
  /** Points of each Vin-family sweep (default 60). */
  familyPoints?: number;
  kneeThresholdPoints?: number;
  comparison?: Comparison | null;
  worstCase?: WorstCase | null;
  monteCarlo?: MonteCarlo | null;
}

export const DEFAULT_FAMILY_POINTS = 60;

export function titleBlock(input: Pick<ReportInput, 'design' | 'documentText' | 'unsaved' | 'date' | 'appVersion' | 'project'>): TitleBlock {
  const d = input.design;
  return {
    project: input.project?.trim() || d.project?.trim() || null,
    designName: d.name,
    revision: d.revision,
    author: d.author,
    date: input.date,
    appVersion: input.appVersion,
    designHash: sha256Hex(input.documentText),
    hashNote: input.unsaved
      ? 'SHA-256 of the design document\'s UTF-8 text as it would be saved now: the design has unsaved changes, so no file on disk matches yet.'
      : 'SHA-256 of the design\'s canonical text: the UTF-8 bytes WattLedger writes when it saves this design (keys in schema order, two-space indent, shortest round-trip numbers, final newline, no byte-order mark). For a file saved by WattLedger, or a shipped demo, it equals the output of "sha256sum FILE"; for a file edited by hand, save it from WattLedger first to get a file with this hash.',
  };
}

const usablePoint = (p: LoadSweep['points'][number]): boolean => isUsablePoint(p) && regulationCause(p) === null;

function familyCurve(label: string, sweep: LoadSweep, landmarks: Landmarks): FamilyCurve {
  return {
    label,
    vinV: sweep.vinV,
    loadsA: sweep.points.map((p) => p.loadA),
    efficiency: sweep.points.map((p) => p.efficiency),
    totalLossW: sweep.points.map((p) => p.totalLoss),
    usable: sweep.points.map(usablePoint),
    peak: landmarks.peak,
  };
}

export function reduceComparison(c: Comparison): ReportComparison {
  return {
    role: c.role,
    loadA: c.loadA,
    loadsA: c.loadsA,
    alternatives: c.alternatives.map((a) => ({
      partId: a.partId,
      partName: a.partName,
      evaluation: a.evaluation,
      efficiency: a.sweep.points.map((p) => p.efficiency),
      totalLossW: a.sweep.points.map((p) => p.totalLoss),
    })),
    winners: c.winners,
    crossovers: c.crossovers,
  };
}

export function reduceTolerance(worst: WorstCase | null | undefined, mc: MonteCarlo | null | undefined): ReportTolerance | null {
  if (!worst && !mc) return null;
  let worstCase: ReportTolerance['worstCase'] = null;
  if (worst) {
    const { corners, ...rest } = worst;
    const shown = [worst.nominal, worst.worstEfficiency, worst.worstTemperature].filter(
      (c, i, all) => all.findIndex((o) => o.label === c.label) === i,
    );
    worstCase = { ...rest, cornerCount: corners.length, shown };
  }
  let monteCarlo: ReportTolerance['monteCarlo'] = null;
  if (mc) {
    const { values: _values, ...rest } = mc;
    monteCarlo = rest;
  }
  return { worstCase, monteCarlo };
}

export function buildReport(input: ReportInput): ReportModel {
  const design = input.design;
  const s = design.spec;
  // A multiphase design is evaluated as the whole converter (issue 13 §1); its per-phase rows and the
  // phase-shedding curves go into `phases`.
  const evaluateAt = (vinV: number): Evaluation => evaluateDesign(design, { vinV, loadA: s.ratedLoadA }).evaluation;
  const nominal = evaluateDesign(design, { vinV: s.vinNomV, loadA: s.ratedLoadA });
  const rated = nominal.evaluation;
  const phases: ReportPhases | null = nominal.phased
    ? { atRated: phaseSummary(nominal.phased), shedding: phaseShedding(design, { conditions: { vinV: s.vinNomV }, spacing: input.sweepSpacing }) }
    : null;
  const inputVoltages: InputVoltageCase[] = [
    { label: 'Vin min', vinV: s.vinMinV, evaluation: evaluateAt(s.vinMinV) },
    { label: 'Vin nom', vinV: s.vinNomV, evaluation: rated },
    { label: 'Vin max', vinV: s.vinMaxV, evaluation: evaluateAt(s.vinMaxV) },
  ];

  const axis = { points: input.sweepPoints, spacing: input.sweepSpacing };
  const { sweep, landmarks } = sweepWithLandmarks(design, { ...axis, conditions: { vinV: s.vinNomV } }, { kneeThresholdPoints: input.kneeThresholdPoints });
  const figures = figuresOfMerit(design, { conditions: { vinV: s.vinNomV } });

  const familyPoints = input.familyPoints ?? DEFAULT_FAMILY_POINTS;
  const familyAt = (label: string, vinV: number): FamilyCurve => {
    const member = sweepWithLandmarks(design, { points: familyPoints, spacing: input.sweepSpacing, conditions: { vinV } }, { kneeThresholdPoints: input.kneeThresholdPoints, refine: false });
    return familyCurve(`${label} ${vinV} V`, member.sweep, member.landmarks);
  };
  const vinFamily = [
    familyAt('Vin min', s.vinMinV),
    familyCurve(`Vin nom ${s.vinNomV} V`, sweep, landmarks),
    familyAt('Vin max', s.vinMaxV),
  ];

  const comparison = input.comparison ? reduceComparison(input.comparison) : null;
  const tolerance = reduceTolerance(input.worstCase, input.monteCarlo);
  const mechanisms = new Set<Mechanism>([...rated.losses.map((t) => t.mechanism), ...sweep.columns.losses.map((c) => c.mechanism)]);

  return {
    format: REPORT_FORMAT,
    version: REPORT_VERSION,
    title: titleBlock(input),
    design,
    rated,
    inputVoltages,
    sweep,
    landmarks,
    figures,
    vinFamily,
    summary: summarize(rated, inputVoltages, sweep),
    comparison,
    tolerance,
    calibration: calibrationSection(design),
    phases,
    review: reviewDesign(design),
    mission: design.missionProfile ? evaluateMission(design) : null,
    methods: methodsFor({
      mechanisms,
      loadKind: loadKindOf(design.spec),
      pulseSkipping: design.topology.lightLoad === 'pulse-skipping',
      capacitorLife: rated.checks.some((c) => c.check === 'capacitor-life'),
      comparison: comparison !== null,
      tolerance: tolerance !== null,
    }),
    cautions: [...REPORT_CAUTIONS],
  };
}
