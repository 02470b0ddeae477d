/**
 * The library ranked on a pool of Web Workers (issue 11 §3, issue 14): as many engine workers as the
 * browser reports cores (navigator.hardwareConcurrency), each running `rank-chunk` jobs
 * (workers/engine-jobs.ts → ranking/rank-library.ts judgeChunk). The library is cut into contiguous
 * chunks (`rankChunkInputs`: about four per worker, and at most 25 parts each so progress moves on a
 * long library); a worker that finishes a chunk takes the next one; the verdicts are put together on this
 * thread by the engine's `assembleRanking`, which does not care about the split or the order the chunks
 * finish in — so the result equals the one-thread `rankLibrary` exactly (test/src-renderer/workers/
 * rank-pool.test.ts, and in Chromium test/e2e/ranking.test.ts). Cancel terminates every worker at once.
 * The pool starts its workers for one ranking and stops them when it ends.
 */
import { assembleRanking, checkRankOptions, DEFAULT_RANK_SCORE, libraryChunks } from '../../shared-model/index.ts';
import type { Design, LibraryRanking, OptionProblem, PartVerdict, RankLibraryOptions } from '../../shared-model/index.ts';
import type { EngineOutcome, JobInput } from './engine-messages.ts';

export type RankChunkInput = JobInput<'rank-chunk'>;
export type PlainRankOptions = Omit<RankLibraryOptions, 'evaluator'>;

/** A chunk per worker ×4, and chunks of at most this many parts (progress on a long library). */
export const CHUNKS_PER_WORKER = 4;
export const MAX_PARTS_PER_CHUNK = 25;

/** One worker of the pool: runs a chunk, and can be stopped (an EngineClient, or a stand-in in tests). */
export interface ChunkWorker {
  run(kind: 'rank-chunk', input: RankChunkInput, lane?: string): Promise<EngineOutcome<'rank-chunk'>>;
  dispose(): void;
}

export interface RankPoolOptions {
  /** Workers to start (default: navigator.hardwareConcurrency, at least 1). */
  workers?: number;
  /** Starts one worker (default: the engine's Web Worker). */
  start: (index: number) => ChunkWorker;
  /** Parts judged so far, of the library's length. */
  onProgress?: (judged: number, total: number) => void;
  signal?: AbortSignal;
}

export type RankPoolOutcome =
  | { status: 'done'; ranking: LibraryRanking; workers: number; chunks: number }
  | { status: 'refused'; problems: OptionProblem[] }
  | { status: 'cancelled' }
  | { status: 'failed'; message: string };

/** The cores the browser reports (at least 1). */
export function browserCores(): number {
  const n = typeof navigator === 'undefined' ? 1 : navigator.hardwareConcurrency;
  return Math.max(1, Math.floor(Number.isFinite(n) ? n : 1));
}

/** The split: contiguous [from, to) chunks of the whole library, each a `rank-chunk` job's input. */
export function rankChunkInputs(design: Design, options: PlainRankOptions, workers: number): RankChunkInput[] {
  const n = options.library.length;
  const pieces = Math.max(Math.max(1, Math.floor(workers)) * CHUNKS_PER_WORKER, Math.ceil(n / MAX_PARTS_PER_CHUNK));
  return libraryChunks(n, pieces).map(([from, to]) => ({ design, options, from, to }));
}

/** The merge: verdicts of every chunk, in any order, into the ranking. */
export function mergeRanking(design: Design, options: PlainRankOptions, chunks: readonly (readonly PartVerdict[])[]): LibraryRanking {
  return assembleRanking(design, { role: options.role, by: options.by ?? DEFAULT_RANK_SCORE }, chunks.flat());
}

export async function rankOnWorkers(design: Design, options: PlainRankOptions, pool: RankPoolOptions): Promise<RankPoolOutcome> {
  const problems = checkRankOptions(design, options);
  if (problems.length > 0) return { status: 'refused', problems };
  const requested = pool.workers ?? browserCores();
  const inputs = rankChunkInputs(design, options, requested);
  const size = Math.max(1, Math.min(Math.floor(requested), inputs.length));
  const total = options.library.length;
  const outputs: PartVerdict[][] = new Array<PartVerdict[]>(inputs.length);
  const workers: ChunkWorker[] = [];
  let next = 0;
  let judged = 0;
  let stopped: RankPoolOutcome | null = null;
  const stopAll = () => {
    for (const w of workers) w.dispose();
    workers.length = 0;
  };
  if (pool.signal?.aborted) return { status: 'cancelled' };
  return await new Promise<RankPoolOutcome>((resolve) => {
    const end = (outcome: RankPoolOutcome) => {
      if (stopped) return;
      stopped = outcome;
      pool.signal?.removeEventListener('abort', onAbort);
      stopAll();
      resolve(outcome);
    };
    const onAbort = () => end({ status: 'cancelled' });
    pool.signal?.addEventListener('abort', onAbort);
    let finished = 0;
    const feed = (worker: ChunkWorker, lane: string) => {
      if (stopped || next >= inputs.length) return;
      const k = next++;
      const input = inputs[k]!;
      void worker.run('rank-chunk', input, lane).then((outcome) => {
        if (stopped) return;
        if (outcome.status === 'error') {
          end(outcome.error.problems.length > 0 ? { status: 'refused', problems: outcome.error.problems } : { status: 'failed', message: outcome.error.message });
          return;
        }
        if (outcome.status === 'superseded') return end({ status: 'cancelled' });
        outputs[k] = outcome.output;
        judged += input.to - input.from;
        finished += 1;
        pool.onProgress?.(judged, total);
        if (finished === inputs.length) end({ status: 'done', ranking: mergeRanking(design, options, outputs), workers: size, chunks: inputs.length });
        else feed(worker, lane);
      });
    };
    pool.onProgress?.(0, total);
    for (let i = 0; i < size; i++) {
      const worker = pool.start(i);
      workers.push(worker);
      feed(worker, `rank-${i}`);
    }
  });
}
