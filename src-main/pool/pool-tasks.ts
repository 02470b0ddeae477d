/**
 * The work a pool worker does: one task record in, one result record out, by the pure engine. The main
 * thread and the workers share these types; `runPoolTask` is the whole of a worker's job, so a test can
 * call it on the main thread too.
 */
import { judgeChunk, runMonteCarloSamples } from '../../shared-model/index.ts';
import type { Design, MonteCarloOptions, MonteCarloSampleChunk, PartVerdict, RankLibraryOptions } from '../../shared-model/index.ts';

export type PoolTask =
  | { kind: 'rank-chunk'; design: Design; options: Omit<RankLibraryOptions, 'evaluator'>; firstIndex: number }
  | { kind: 'monte-carlo-chunk'; design: Design; options: Omit<MonteCarloOptions, 'evaluator'>; from: number; to: number };

export interface PoolOutputs {
  'rank-chunk': PartVerdict[];
  'monte-carlo-chunk': MonteCarloSampleChunk;
}

export function runPoolTask(task: PoolTask): PoolOutputs[PoolTask['kind']] {
  switch (task.kind) {
    case 'rank-chunk':
      return judgeChunk(task.design, task.options, 0, task.options.library.length, task.firstIndex);
    case 'monte-carlo-chunk':
      return runMonteCarloSamples(task.design, task.options, task.from, task.to);
  }
}
