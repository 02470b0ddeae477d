/**
 * The ranking view's state (issue 11 §3): what to rank (role, score, library), the run on the Web
 * Worker pool (workers/rank-pool.ts) with its progress and Cancel, and the outcome: the ranking, or
 * every refused option as a sentence naming the field by its on-screen label, its value and what is
 * allowed. Kept on the workspace so a ranking survives a visit to another screen. The design ranked is
 * the last valid design; `rankedRevision` says which edit it was, so the view can say when the design has
 * changed since.
 */
import { DEFAULT_RANK_SCORE } from '../../shared-model/index.ts';
import type { Design, LibraryRanking, OptionProblem, PartsLibrary, RankScore, Role } from '../../shared-model/index.ts';
import { startEngineWorker } from '../workers/engine-client.ts';
import { browserCores, rankOnWorkers, type ChunkWorker } from '../workers/rank-pool.ts';

export type RankStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'refused' | 'failed';

/** On-screen labels of the ranking's fields (the problems' `path`). */
export const RANK_FIELD_LABELS: Readonly<Record<string, string>> = { role: 'Role', by: 'Score', library: 'Library', currentDerating: 'Current derating' };

/** A refused option as the view says it: label, path, the engine's sentence, the value and what is allowed. */
export function problemSentence(p: OptionProblem): string {
  const label = RANK_FIELD_LABELS[p.path] ?? p.path;
  return `${label} (${p.path}): ${p.message} Value: ${String(p.value)}; allowed: ${p.allowed}.`;
}

function startWorker(index: number): ChunkWorker {
  return startEngineWorker(`wattledger-rank-${index + 1}`);
}

export class RankingRun {
  role: Role = $state('switch');
  by: RankScore = $state(DEFAULT_RANK_SCORE);
  libraryId: string | null = $state(null);
  status: RankStatus = $state('idle');
  judged = $state(0);
  total = $state(0);
  ranking: LibraryRanking | null = $state.raw(null);
  /** What the ranking was made from: the library's id and name (adopting links the part to it). */
  rankedLibrary: { id: string; name: string } | null = $state.raw(null);
  rankedRevision = $state(-1);
  problems: string[] = $state.raw([]);
  failure: string | null = $state(null);
  workers = $state(0);
  elapsedMs = $state(0);
  #control: AbortController | null = null;

  /** Ranks `library` for the chosen role and score on `workers` Web Workers (default: every core). */
  async start(design: Design, library: PartsLibrary, revision: number, workers = browserCores()): Promise<void> {
    this.#control?.abort();
    const control = new AbortController();
    this.#control = control;
    this.status = 'running';
    this.problems = [];
    this.failure = null;
    this.judged = 0;
    this.total = library.parts.length;
    const t0 = performance.now();
    const outcome = await rankOnWorkers(design, { role: this.role, library: library.parts, by: this.by }, {
      workers,
      start: startWorker,
      signal: control.signal,
      onProgress: (judged, total) => {
        if (this.#control !== control) return;
        this.judged = judged;
        this.total = total;
      },
    });
    if (this.#control !== control) return; // a newer run (or a cancel) took over
    this.#control = null;
    this.elapsedMs = performance.now() - t0;
    switch (outcome.status) {
      case 'done':
        this.ranking = outcome.ranking;
        this.rankedLibrary = { id: library.id, name: library.name };
        this.rankedRevision = revision;
        this.workers = outcome.workers;
        this.status = 'done';
        break;
      case 'refused':
        this.ranking = null;
        this.problems = outcome.problems.map(problemSentence);
        this.status = 'refused';
        break;
      case 'failed':
        this.failure = outcome.message;
        this.status = 'failed';
        break;
      case 'cancelled':
        this.status = 'cancelled';
        break;
    }
  }

  /** Stops the running ranking at once (every worker is terminated); the previous ranking stays cleared. */
  cancel(): void {
    if (!this.#control) return;
    this.#control.abort();
    this.#control = null;
    this.ranking = null;
    this.status = 'cancelled';
  }
}
