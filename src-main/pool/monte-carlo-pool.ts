/**
 * The Monte Carlo on a pool of worker threads: samples cut into contiguous chunks (about four per
 * worker), each evaluated by runMonteCarloSamples in a worker, put together by summarizeMonteCarlo on
 * this thread. A sample's variation does not depend on the split (tolerance/monte-carlo.ts), so the
 * result equals monteCarlo's exactly (test/src-main/pool/monte-carlo-pool.test.ts).
 */
import { checkMonteCarloOptions, DEFAULT_MONTE_CARLO_SAMPLES, libraryChunks, summarizeMonteCarlo } from '../../shared-model/index.ts';
import type { Design, MonteCarlo, MonteCarloOptions } from '../../shared-model/index.ts';
import { CHUNKS_PER_WORKER } from './rank-pool.ts';
import { coreCount, runOnPool, type PoolOptions } from './worker-pool.ts';

export async function monteCarloOnPool(design: Design, options: Omit<MonteCarloOptions, 'evaluator'>, pool: PoolOptions = {}): Promise<MonteCarlo> {
  const problems = checkMonteCarloOptions(options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const workers = Math.max(1, Math.floor(pool.workers ?? coreCount()));
  const n = options.samples ?? DEFAULT_MONTE_CARLO_SAMPLES;
  const tasks = libraryChunks(n, workers * CHUNKS_PER_WORKER).map(([from, to]) => ({ kind: 'monte-carlo-chunk' as const, design, options, from, to }));
  return summarizeMonteCarlo(design, options, await runOnPool(tasks, { ...pool, workers }));
}
