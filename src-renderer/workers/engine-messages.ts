/**
 * The one message contract between the renderer and the engine worker (declared once, used by both).
 * Requests carry an id and a lane; within a lane the newest request wins: an older request still waiting
 * is answered "superseded" and never run. Results and errors travel as data, never as exceptions.
 */
import type {
  CompareOptions,
  Comparison,
  Design,
  DesignReview,
  FamilyOptions,
  FiguresOfMerit,
  FrequencySweep,
  FrequencySweepOptions,
  GridOptions,
  LoadGrid,
  LoadSweepOptions,
  MissionResult,
  MonteCarlo,
  MonteCarloOptions,
  OptionProblem,
  PartVerdict,
  PhaseShedding,
  RankLibraryOptions,
  ReportInput,
  ReportModel,
  SweepFamilies,
  SweepLandmarkOptions,
  SweepWithLandmarks,
  WorstCase,
  WorstCaseOptions,
} from '../../shared-model/index.ts';

type Plain<T> = Omit<T, 'evaluator'>;

/** Input and output of every job the worker runs. */
export interface EngineJobs {
  sweep: {
    input: { design: Design; options?: Plain<LoadSweepOptions>; landmarks?: Pick<SweepLandmarkOptions, 'kneeThresholdPoints'> };
    output: SweepWithLandmarks;
  };
  families: { input: { design: Design; options?: Plain<FamilyOptions> }; output: SweepFamilies };
  frequency: { input: { design: Design; options?: Plain<FrequencySweepOptions> }; output: FrequencySweep };
  grid: { input: { design: Design; options?: Plain<GridOptions> }; output: LoadGrid };
  figures: { input: { design: Design }; output: FiguresOfMerit };
  compare: { input: { design: Design; options: Plain<CompareOptions> }; output: Comparison };
  /** Library parts [from, to) judged for a role; the pool assembles the chunks (ranking/rank-library.ts). */
  'rank-chunk': { input: { design: Design; options: Plain<RankLibraryOptions>; from: number; to: number }; output: PartVerdict[] };
  'worst-case': { input: { design: Design; options?: Plain<WorstCaseOptions> }; output: WorstCase };
  'monte-carlo': { input: { design: Design; options: Plain<MonteCarloOptions> }; output: MonteCarlo };
  /** Sizing and design checks: the design at its corners of Vin at rated load (a few evaluations). */
  review: { input: { design: Design }; output: DesignReview };
  /** Efficiency against load for 1 … N active phases, the shedding landmarks and the envelope (issue 13 §1). */
  shedding: { input: { design: Design; vinV: number }; output: PhaseShedding };
  /** The design's mission profile: one electro-thermal evaluation per row (mission/evaluate-mission.ts). */
  mission: { input: { design: Design }; output: MissionResult };
  /** The review report's model (a few hundred electro-thermal evaluations). */
  report: { input: ReportInput; output: ReportModel };
}

export type JobKind = keyof EngineJobs;
export type JobInput<K extends JobKind> = EngineJobs[K]['input'];
export type JobOutput<K extends JobKind> = EngineJobs[K]['output'];

export type EngineRequest =
  | { [K in JobKind]: { type: 'run'; id: number; lane: string; kind: K; input: JobInput<K> } }[JobKind]
  | { type: 'cancel'; lane: string };

export interface EngineError {
  message: string;
  /** Invalid options, each naming its field, value and allowed range. */
  problems: OptionProblem[];
}

export type EngineResponse =
  | { [K in JobKind]: { status: 'done'; id: number; lane: string; kind: K; output: JobOutput<K>; elapsedMs: number } }[JobKind]
  | { status: 'error'; id: number; lane: string; kind: JobKind; error: EngineError }
  | { status: 'superseded'; id: number; lane: string; kind: JobKind };

/** What a caller gets back for one job (the client never rejects). */
export type EngineOutcome<K extends JobKind> =
  | { status: 'done'; output: JobOutput<K>; elapsedMs: number }
  | { status: 'error'; error: EngineError }
  | { status: 'superseded' };
