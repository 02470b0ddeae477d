/**
 * Runs one worker job on the pure engine: option checks first (problems come back as data), then the
 * computation. No state, no browser API: the worker and the tests call the same function.
 */
import {
  buildReport,
  checkFrequencySweepOptions,
  checkGridOptions,
  checkLoadSweepOptions,
  checkMonteCarloOptions,
  checkTolerances,
  compareParts,
  figuresOfMerit,
  checkRankOptions,
  judgeChunk,
  phaseShedding,
  reviewDesign,
  evaluateMission,
  sweepFamilies,
  sweepFrequency,
  sweepGrid,
  designPointEvaluator,
  sweepWithLandmarks,
  worstCase,
  monteCarlo,
} from '../../shared-model/index.ts';
import type { OptionProblem } from '../../shared-model/index.ts';
import type { EngineError, EngineRequest, JobKind, JobOutput } from './engine-messages.ts';

export type JobResult = { ok: true; output: JobOutput<JobKind> } | { ok: false; error: EngineError };

function refused(problems: OptionProblem[]): JobResult {
  return { ok: false, error: { message: problems.map((p) => p.message).join(' '), problems } };
}

export function runJob(request: Extract<EngineRequest, { type: 'run' }>): JobResult {
  try {
    switch (request.kind) {
      case 'sweep': {
        const { design, options = {}, landmarks = {} } = request.input;
        const problems = checkLoadSweepOptions(design, options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: sweepWithLandmarks(design, { ...options, evaluator: designPointEvaluator(design) }, landmarks) };
      }
      case 'families': {
        const { design, options = {} } = request.input;
        const problems = checkLoadSweepOptions(design, options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: sweepFamilies(design, options) };
      }
      case 'frequency': {
        const { design, options = {} } = request.input;
        const problems = checkFrequencySweepOptions(design, options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: sweepFrequency(design, options) };
      }
      case 'grid': {
        const { design, options = {} } = request.input;
        const problems = checkGridOptions(design, options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: sweepGrid(design, options) };
      }
      case 'figures':
        return { ok: true, output: figuresOfMerit(request.input.design) };
      case 'compare': {
        const outcome = compareParts(request.input.design, request.input.options);
        return outcome.ok ? { ok: true, output: outcome.comparison } : refused(outcome.problems);
      }
      case 'shedding':
        return { ok: true, output: phaseShedding(request.input.design, { conditions: { vinV: request.input.vinV } }) };
      case 'review':
        return { ok: true, output: reviewDesign(request.input.design) };
      case 'mission':
        return { ok: true, output: evaluateMission(request.input.design) };
      case 'rank-chunk': {
        const { design, options, from, to } = request.input;
        const problems = checkRankOptions(design, options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: judgeChunk(design, options, from, to) };
      }
      case 'worst-case': {
        const { design, options = {} } = request.input;
        const problems = checkTolerances(options.tolerances ?? {});
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: worstCase(design, options) };
      }
      case 'monte-carlo': {
        const { design, options } = request.input;
        const problems = checkMonteCarloOptions(options);
        if (problems.length > 0) return refused(problems);
        return { ok: true, output: monteCarlo(design, options) };
      }
      case 'report':
        return { ok: true, output: buildReport(request.input) };
    }
  } catch (e) {
    // A programmer error inside the engine: report it as data so the UI can show it and stay alive.
    return { ok: false, error: { message: `The engine failed on a ${request.kind} job: ${e instanceof Error ? e.message : String(e)}`, problems: [] } };
  }
}
