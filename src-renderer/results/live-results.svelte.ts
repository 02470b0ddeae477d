/**
 * Everything the results area computes for the last valid design at the chosen load and Vin:
 * - the full evaluation at that point, synchronously on every change (the engine's evaluate);
 * - the 200-point load sweep with its landmarks: here, in the keystroke's own task, while the median of
 *   the last three sweeps stays within SYNC_SWEEP_BUDGET_MS, otherwise in the engine worker (the rule is
 *   in sweep-pace.ts); newest request wins;
 * - the Vin family, frequency sweep, load × Vin (or × fs) grid, worst-case corners, Monte Carlo and
 *   part comparison, always in a worker, and only while the section that shows them is on screen (or
 *   on request). Two workers: the load sweep never waits behind a grid or a Monte Carlo.
 * Nothing here recomputes physics: the engine's records are kept as they come.
 */
import { untrack } from 'svelte';
import {
  DEFAULT_KNEE_THRESHOLD_POINTS,
  DEFAULT_MONTE_CARLO_SAMPLES,
  DEFAULT_MONTE_CARLO_SEED,
  designPointEvaluator,
  evaluateDesign,
  partInRole,
  phaseCount,
  sweepWithLandmarks,
} from '../../shared-model/index.ts';
import type {
  Comparison,
  Design,
  DesignReview,
  MissionResult,
  Evaluation,
  FiguresOfMerit,
  FrequencySweep,
  GridAxis,
  LoadGrid,
  LoadSweepOptions,
  MonteCarlo,
  MonteCarloDistribution,
  PhasedEvaluation,
  PhaseShedding,
  Role,
  SweepFamilies,
  SweepWithLandmarks,
  Tolerances,
  WorstCase,
} from '../../shared-model/index.ts';
import { conditionsFor } from '../state/compute.ts';
import type { Workspace } from '../state/workspace.svelte.ts';
import { startEngineWorker, type EngineClient } from '../workers/engine-client.ts';
import type { GridQuantity } from './frequency-data.ts';
import { JobSlot } from './job-slot.svelte.ts';
import { SweepPace } from './sweep-pace.ts';

/**
 * Sweeps run here while their recent median stays within this time. Here, the chart follows a keystroke
 * in the same task; through the worker it waits for the round trip and for the page's own work on the
 * keystroke (50–100 ms measured on a 2-core machine), so the worker is only for sweeps too long to run
 * here without holding up typing.
 */
export const SYNC_SWEEP_BUDGET_MS = 40;
/** Sweeps run after start-up to compile the engine and chart code before the first keystroke. */
export const WARM_UP_ROUNDS = 4;

/** `phased`: the per-phase record of a multiphase design (null for one phase); `evaluation` is the whole converter. */
export type EvaluationOutcome = { ok: true; evaluation: Evaluation; phased: PhasedEvaluation | null; ms: number } | { ok: false; message: string };
/** The live load sweep with its landmarks (the engine's record). */
export type SweepResult = SweepWithLandmarks;
type SweepKey = {
  design: Design;
  vinV: number;
  spacing: LoadSweepOptions['spacing'];
  knee: number;
};

export class LiveResults {
  readonly ws: Workspace;
  /** Sections scrolled into view: heavy jobs run only for those. */
  visible: Record<string, boolean> = $state({});
  loadScale: 'log' | 'linear' = $state('log');
  kneeThresholdPoints = $state(DEFAULT_KNEE_THRESHOLD_POINTS);
  vinFamily = $state(false);
  /** The efficiency axis: the whole curve, or zoomed to the points near the peak. */
  efficiencyRange: 'whole' | 'near-peak' = $state('whole');
  stackBy: 'mechanism' | 'part' = $state('mechanism');
  temperaturePart: Role | null = $state(null);
  gridAxis: GridAxis = $state('vin');
  gridQuantity: GridQuantity = $state('efficiency');
  tolerances: Tolerances = $state.raw({});
  seed = $state(DEFAULT_MONTE_CARLO_SEED);
  samples = $state(DEFAULT_MONTE_CARLO_SAMPLES);
  distribution: MonteCarloDistribution = $state('uniform');
  compareRole: Role = $state('switch');
  compareParts: string[] = $state.raw([]);
  /** Milliseconds the page's first load sweep took (cold: the engine code not yet compiled), for the speed note. */
  firstSweepMs: number | null = $state(null);
  /** How the last load sweep was computed, for the speed note. */
  sweepMode: 'worker' | 'here' = $state('worker');

  readonly sweep = new JobSlot<SweepResult>();
  /** Average (25/50/75/100 %) and 10 % efficiency at nominal Vin: five exact evaluations, in the worker. */
  readonly figures = new JobSlot<FiguresOfMerit>();
  readonly families = new JobSlot<SweepFamilies>();
  readonly frequency = new JobSlot<FrequencySweep>();
  readonly grid = new JobSlot<LoadGrid>();
  readonly worstCase = new JobSlot<WorstCase>();
  /** Sizing and design checks of the design (its own corners; the chosen load does not enter). */
  readonly review = new JobSlot<DesignReview>();
  /** The design's mission profile evaluated (none without a profile). */
  readonly mission = new JobSlot<MissionResult>();
  readonly monteCarlo = new JobSlot<MonteCarlo>();
  readonly comparison = new JobSlot<Comparison>();
  /** Efficiency against load for 1 … N active phases (multiphase designs only). */
  readonly shedding = new JobSlot<PhaseShedding>();

  design: Design = $derived(this.#workspace().doc.shown);
  conditions = $derived(conditionsFor(this.design, { loadA: this.#workspace().results.loadA, vinV: this.#workspace().results.vinV }));
  /** The chosen load as a number: charts that mark it redraw only when it moves, not on every edit. */
  chosenLoadA = $derived(this.conditions.loadA);
  evaluation: EvaluationOutcome = $derived.by(() => {
    const t0 = performance.now();
    try {
      const { evaluation, phased } = evaluateDesign(this.design, this.conditions);
      return { ok: true, evaluation, phased, ms: performance.now() - t0 };
    } catch (error) {
      return { ok: false, message: `The engine stopped on this design: ${(error as Error).message}` };
    }
  });

  #quick: EngineClient | null = null;
  #heavy: EngineClient | null = null;
  #pace = new SweepPace(SYNC_SWEEP_BUDGET_MS);
  #warmed = false;

  constructor(ws: Workspace) {
    this.ws = ws;
  }

  /** The workspace, for the derived fields above (read lazily, after the constructor has run). */
  #workspace(): Workspace {
    return this.ws;
  }

  /** The worker for the load sweep and its family: never queued behind a grid or a Monte Carlo. */
  get quick(): EngineClient {
    this.#quick ??= startEngineWorker();
    return this.#quick;
  }

  /** The worker for grids, frequency sweeps, tolerance runs and comparisons. */
  get heavy(): EngineClient {
    this.#heavy ??= startEngineWorker();
    return this.#heavy;
  }

  dispose(): void {
    this.#quick?.dispose();
    this.#heavy?.dispose();
    this.#quick = this.#heavy = null;
  }

  sweepOptions(): LoadSweepOptions {
    return { spacing: this.loadScale, conditions: { vinV: this.conditions.vinV } };
  }

  /** Load sweep and landmarks of the current design (reads its inputs, so an effect re-runs on change). */
  requestSweep(): void {
    const key: SweepKey = { design: this.design, vinV: this.conditions.vinV, spacing: this.loadScale, knee: this.kneeThresholdPoints };
    const options = this.sweepOptions();
    if (this.#pace.here()) {
      const t0 = performance.now();
      try {
        // A multiphase design sweeps the whole converter (every phase, or the best count when it sheds phases).
        const result = sweepWithLandmarks(key.design, { ...options, evaluator: designPointEvaluator(key.design) }, { kneeThresholdPoints: key.knee });
        const ms = performance.now() - t0;
        this.sweep.set(key, result, ms);
        // The page's first sweep also compiles the engine: it says nothing about the speed of the next.
        if (this.firstSweepMs === null) this.firstSweepMs = ms;
        else this.#pace.record(ms, 'here');
        this.sweepMode = 'here';
      } catch (error) {
        this.sweep.fail(`The load sweep failed: ${(error as Error).message}`);
      }
      return;
    }
    void this.sweep
      .run(key, () => this.quick.run('sweep', { design: key.design, options, landmarks: { kneeThresholdPoints: key.knee } }), (o) => o.output)
      .then((outcome) => {
        if (outcome?.status !== 'done') return;
        this.sweepMode = 'worker';
        this.#pace.record(outcome.elapsedMs, 'worker');
      });
  }

  /**
   * Runs the live sweep (and so the efficiency chart's update) a few more times while the page is idle
   * after start-up: the first runs of any JavaScript are several times slower than later ones, and
   * without this the first keystrokes would pay for compiling the engine and the chart code. Each round
   * waits for an idle moment, so typing is never held up; once per page.
   */
  warmUp(rounds = WARM_UP_ROUNDS): void {
    if (this.#warmed) return;
    this.#warmed = true;
    const idle = (next: () => void) => (typeof requestIdleCallback === 'function' ? requestIdleCallback(next, { timeout: 1000 }) : setTimeout(next, 30));
    const round = (left: number) => {
      if (left <= 0 || !this.#pace.here()) return;
      untrack(() => this.requestSweep());
      idle(() => round(left - 1));
    };
    idle(() => round(rounds));
  }

  /** At the design's nominal conditions (the worker's figures job takes the design only). */
  requestFigures(): void {
    const design = this.design;
    void this.figures.run({ design }, () => this.quick.run('figures', { design }), (o) => o.output);
  }

  requestFamilies(): void {
    const design = this.design;
    const options = { spacing: this.loadScale, kneeThresholdPoints: this.kneeThresholdPoints };
    void this.families.run({ design, ...options }, () => this.quick.run('families', { design, options }), (o) => o.output);
  }

  requestFrequency(): void {
    const design = this.design;
    const { loadA, vinV } = this.conditions;
    void this.frequency.run({ design, loadA, vinV }, () => this.heavy.run('frequency', { design, options: { loadA, conditions: { vinV } } }), (o) => o.output);
  }

  requestGrid(): void {
    const design = this.design;
    const axis = this.gridAxis;
    const conditions = axis === 'frequency' ? { vinV: this.conditions.vinV } : {};
    void this.grid.run({ design, axis, vinV: conditions.vinV ?? null }, () => this.heavy.run('grid', { design, options: { axis, conditions } }), (o) => o.output);
  }

  requestReview(): void {
    const design = this.design;
    void this.review.run({ design }, () => this.heavy.run('review', { design }), (o) => o.output);
  }

  /** The phase-shedding curves of a multiphase design at the chosen Vin (a few hundred evaluations: the worker). */
  requestShedding(): void {
    const design = this.design;
    if (phaseCount(design) <= 1) return;
    const vinV = this.conditions.vinV;
    void this.shedding.run({ design, vinV }, () => this.heavy.run('shedding', { design, vinV }), (o) => o.output);
  }

  /** The design's mission profile (one evaluation per row: the worker). */
  requestMission(): void {
    const design = this.design;
    if (!design.missionProfile) {
      this.mission.clear();
      return;
    }
    void this.mission.run({ design }, () => this.heavy.run('mission', { design }), (o) => o.output);
  }

  requestWorstCase(): void {
    const design = this.design;
    const { loadA, vinV } = this.conditions;
    const tolerances = this.tolerances;
    void this.worstCase.run(
      { design, loadA, vinV, tolerances: JSON.stringify(tolerances) },
      () => this.heavy.run('worst-case', { design, options: { loadA, tolerances, conditions: { vinV } } }),
      (o) => o.output,
    );
  }

  runMonteCarlo(): void {
    const design = this.design;
    const { loadA, vinV } = this.conditions;
    const options = { seed: this.seed, samples: this.samples, distribution: this.distribution, tolerances: this.tolerances, loadA, conditions: { vinV } };
    void this.monteCarlo.run({ design, ...options, tolerances: JSON.stringify(options.tolerances), conditions: options.conditions.vinV }, () => this.heavy.run('monte-carlo', { design, options }), (o) => o.output);
  }

  requestComparison(): void {
    const design = this.design;
    const role = this.compareRole;
    const current = partInRole(design, role);
    const parts = this.compareParts.map((id) => (current?.id === id ? current : this.ws.library.find(id))).filter((p) => p !== undefined);
    if (parts.length < 2) {
      this.comparison.clear();
      return;
    }
    const loadA = this.conditions.loadA;
    const sweep = { spacing: this.loadScale, conditions: { vinV: this.conditions.vinV } };
    void this.comparison.run({ design, role, ids: parts.map((p) => p.id), loadA, spacing: sweep.spacing, vinV: sweep.conditions.vinV }, () => this.heavy.run('compare', { design, options: { role, parts, loadA, sweep } }), (o) => o.output);
  }

  /** True when a slot's value was computed for the design now shown. */
  isCurrent(slot: JobSlot<unknown>): boolean {
    return (slot.inputs as { design?: Design } | null)?.design === this.design;
  }
}
