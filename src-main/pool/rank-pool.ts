/**
 * The library ranked on a pool of worker threads: the library is cut into contiguous chunks (about four
 * per worker, so a slow chunk does not leave the other cores idle and progress moves), each worker judges
 * its slice (ranking/rank-library.ts judgeChunk), and the verdicts are assembled on this thread. The
 * engine's verdicts do not depend on the split, so the result equals rankLibrary's exactly
 * (test/src-main/pool/rank-pool.test.ts).
 */
import { assembleRanking, checkRankOptions, libraryChunks } from '../../shared-model/index.ts';
import type { Design, LibraryRanking, RankLibraryOptions } from '../../shared-model/index.ts';
import { coreCount, runOnPool, type PoolOptions } from './worker-pool.ts';

export const CHUNKS_PER_WORKER = 4;

export async function rankOnPool(design: Design, options: Omit<RankLibraryOptions, 'evaluator'>, pool: PoolOptions = {}): Promise<LibraryRanking> {
  const problems = checkRankOptions(design, options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  const workers = Math.max(1, Math.floor(pool.workers ?? coreCount()));
  const chunks = libraryChunks(options.library.length, workers * CHUNKS_PER_WORKER);
  const tasks = chunks.map(([from, to]) => ({ kind: 'rank-chunk' as const, design, options: { ...options, library: options.library.slice(from, to) }, firstIndex: from }));
  const verdicts = await runOnPool(tasks, { ...pool, workers });
  return assembleRanking(design, options, verdicts.flat());
}
