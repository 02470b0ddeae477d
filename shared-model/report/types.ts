/**
 * The report model: every record the design-review report shows, gathered from the engine once.
 * The report view only formats these records (shared-model/report/format.ts); it never computes physics.
 * Plain data (JSON-safe), so it can be embedded in a self-contained HTML file and read back unchanged.
 * Units as in the engine: W, A, V, Hz, °C, K; loads in A.
 */
import type { Design, Role } from '../design/schema.ts';
import type { DesignReview } from '../design-checks/types.ts';
import type { MissionResult } from '../mission/types.ts';
import type { CalibrationSection } from '../fit/report-section.ts';
import type { Evaluation } from '../ledger/types.ts';
import type { Landmarks } from '../landmarks/types.ts';
import type { FiguresOfMerit } from '../sweep/figures-of-merit.ts';
import type { LoadSweep } from '../sweep/types.ts';
import type { CompareCrossover } from '../compare/compare-parts.ts';
import type { MonteCarlo } from '../tolerance/monte-carlo.ts';
import type { ToleranceCorner, WorstCase } from '../tolerance/worst-case.ts';
import type { Severity, WarningCode } from '../warnings.ts';
import type { PhaseShedding } from '../interleave/shedding.ts';
import type { PhaseSummary } from '../interleave/summary.ts';

export const REPORT_FORMAT = 'wattledger.report';
export const REPORT_VERSION = 1;

export interface TitleBlock {
  /** The project the design belongs to (the design's `project` field or the caller's; null when not stated). */
  project: string | null;
  designName: string;
  revision: string;
  author: string;
  /** Date of the report, as given to the builder (ISO 8601 date, e.g. "2026-12-02"). */
  date: string;
  appVersion: string;
  /** SHA-256 of the design document's UTF-8 text, 64 hex digits. */
  designHash: string;
  /** What exactly was hashed, in one sentence. */
  hashNote: string;
}

/** The operating point at one input voltage (rated load), fully electro-thermal. */
export interface InputVoltageCase {
  label: 'Vin min' | 'Vin nom' | 'Vin max';
  vinV: number;
  evaluation: Evaluation;
}

/** One entry of the summary's list of warnings and hazards, merged over the conditions where it occurs. */
export interface ReportAlert {
  severity: Severity;
  code: WarningCode;
  part: string | null;
  message: string;
  /** Where it was seen, e.g. ["rated load, Vin nom", "Vin max"]. */
  seenAt: string[];
}

export interface HottestPart {
  part: Role;
  partName: string;
  celsius: number;
  limitC: number;
  marginK: number;
}

export interface ReportSummary {
  /** The part with the highest temperature at rated load, nominal Vin. */
  hottest: HottestPart | null;
  /** The part with the smallest margin below its derated limit (may be the hottest). */
  tightest: HottestPart | null;
  alerts: ReportAlert[];
}

/** One sweep of a family (same load axis, another input voltage). */
export interface FamilyCurve {
  label: string;
  vinV: number;
  loadsA: number[];
  efficiency: number[];
  totalLossW: number[];
  /** Points that regulate and converged (efficiency means something there). */
  usable: boolean[];
  peak: Landmarks['peak'];
}

export interface ComparisonAlternative {
  partId: string;
  partName: string;
  evaluation: Evaluation;
  /** Efficiency and total loss on the shared load axis. */
  efficiency: number[];
  totalLossW: number[];
}

export interface ReportComparison {
  role: Role;
  loadA: number;
  loadsA: number[];
  alternatives: ComparisonAlternative[];
  winners: number[];
  crossovers: CompareCrossover[];
}

/** The worst-case analysis without the full list of corners (their count is kept). */
export interface ReportWorstCase extends Omit<WorstCase, 'corners'> {
  cornerCount: number;
  /** The corners of lowest efficiency and least temperature margin, and the nominal one. */
  shown: ToleranceCorner[];
}

export interface ReportTolerance {
  worstCase: ReportWorstCase | null;
  monteCarlo: Omit<MonteCarlo, 'values'> | null;
}

/** One model the engine used: its formula in plain text, its published source, its known limits. */
export interface MethodEntry {
  id: string;
  title: string;
  formula: string;
  source: string;
  limits: string[];
}

/** The interleaving part of the report (issue 13 §1). */
export interface ReportPhases {
  atRated: PhaseSummary;
  shedding: PhaseShedding;
}

export interface ReportModel {
  format: typeof REPORT_FORMAT;
  version: typeof REPORT_VERSION;
  title: TitleBlock;
  design: Design;
  /** Rated load, nominal Vin, the design's ambient and switching frequency. */
  rated: Evaluation;
  inputVoltages: InputVoltageCase[];
  sweep: LoadSweep;
  landmarks: Landmarks;
  figures: FiguresOfMerit;
  vinFamily: FamilyCurve[];
  summary: ReportSummary;
  comparison: ReportComparison | null;
  tolerance: ReportTolerance | null;
  /** The bench measurement the design carries, its adopted fitted values and residuals (null without one). */
  calibration: CalibrationSection | null;
  /** A multiphase design's per-phase ledger at rated load and nominal Vin and its phase-shedding curves (null for one phase). */
  phases: ReportPhases | null;
  /**
   * The sizing from the specification and the design checks (sizing/, design-checks/; issue 11). Optional
   * so that a report saved before these sections were added still opens (the view then leaves them out).
   */
  review?: DesignReview;
  /** The design's mission profile evaluated (mission/); null when the design carries none. Optional as `review`. */
  mission?: MissionResult | null;
  methods: MethodEntry[];
  cautions: string[];
}
