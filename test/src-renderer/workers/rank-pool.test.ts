/**
 * The renderer's Web Worker pool for the ranking (src-renderer/workers/rank-pool.ts): the split into
 * `rank-chunk` jobs and the merge give exactly the one-thread ranking (issue 11 §3: "results identical to
 * the single-threaded ranking"), whatever the number of workers and whatever order the chunks finish in;
 * refused options come back naming the field; Cancel stops every worker. The stand-in workers run the very
 * job function the Web Worker runs (workers/engine-jobs.ts runJob), answering after seeded delays so the
 * chunks finish out of order. Chromium's real Web Workers: test/e2e/ranking.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { libraryChunks, profileFromWeighting, rankLibrary } from '../../../shared-model/index.ts';
import type { Design, Part } from '../../../shared-model/index.ts';
import { runJob } from '../../../src-renderer/workers/engine-jobs.ts';
import type { EngineOutcome } from '../../../src-renderer/workers/engine-messages.ts';
import { MAX_PARTS_PER_CHUNK, mergeRanking, rankChunkInputs, rankOnWorkers, type ChunkWorker, type RankChunkInput } from '../../../src-renderer/workers/rank-pool.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';

/** Stand-in workers: runJob in this thread, answered after a delay from a seeded sequence (out of order). */
function standIns(seed = 7) {
  let s = seed;
  const delay = () => {
    s = (s * 1103515245 + 12345) % 2147483648;
    return s % 7;
  };
  const started: { disposed: boolean; jobs: number }[] = [];
  let id = 0;
  const start = (): ChunkWorker => {
    const me = { disposed: false, jobs: 0 };
    started.push(me);
    return {
      run: (kind, input) =>
        new Promise<EngineOutcome<'rank-chunk'>>((resolve) => {
          me.jobs += 1;
          const result = runJob({ type: 'run', id: ++id, lane: 'x', kind, input });
          setTimeout(() => {
            if (me.disposed) return; // a terminated worker never answers
            resolve(result.ok ? { status: 'done', output: result.output as never, elapsedMs: 0 } : { status: 'error', error: result.error });
          }, delay());
        }),
      dispose: () => {
        me.disposed = true;
      },
    };
  };
  return { start, started };
}

/** The shipped library repeated `times` over with unique ids: a longer library for the split. */
function longLibrary(times: number): Part[] {
  return Array.from({ length: times }, (_, k) => demoParts().map((p) => ({ ...p, id: `${p.id}-${k}` }))).flat();
}

describe('split and merge of the ranking over Web Workers', () => {
  it('the split covers every part once, in order, with no chunk over the size cap', () => {
    const design = demoDesign();
    const library = longLibrary(4); // 4 × the shipped library
    const inputs = rankChunkInputs(design, { role: 'switch', library }, 3);
    expect(inputs[0]!.from).toBe(0);
    expect(inputs.at(-1)!.to).toBe(library.length);
    for (let i = 1; i < inputs.length; i++) expect(inputs[i]!.from).toBe(inputs[i - 1]!.to); // contiguous, no gap or overlap
    expect(Math.max(...inputs.map((c) => c.to - c.from))).toBeLessThanOrEqual(MAX_PARTS_PER_CHUNK);
    expect(inputs.length).toBeGreaterThanOrEqual(12); // at least four chunks per worker
    expect(inputs.map((c) => [c.from, c.to])).toEqual(libraryChunks(library.length, inputs.length)); // the engine's own cut
  });

  it('merging chunk verdicts in reverse order gives the one-thread ranking', () => {
    const design = demoDesign();
    const options = { role: 'inductor' as const, library: demoParts(), by: 'loss-at-rated' as const };
    const outputs = rankChunkInputs(design, options, 2).map((input: RankChunkInput) => {
      const r = runJob({ type: 'run', id: 1, lane: 'x', kind: 'rank-chunk', input });
      if (!r.ok) throw new Error(r.error.message);
      return r.output as ReturnType<typeof mergeRanking>['ranking'];
    });
    expect(mergeRanking(design, options, [...outputs].reverse())).toEqual(rankLibrary(design, options));
  });

  for (const workers of [1, 2, 3, 8]) {
    it(`${workers} worker(s), chunks finishing out of order: the ranking equals rankLibrary on one thread`, async () => {
      const demo = demoDesign();
      const design: Design = { ...demo, missionProfile: profileFromWeighting(demo, 'european') };
      const options = { role: 'switch' as const, library: longLibrary(2), by: 'energy' as const };
      const { start, started } = standIns(workers);
      const seen: number[] = [];
      const outcome = await rankOnWorkers(design, options, { workers, start, onProgress: (judged) => seen.push(judged) });
      expect(outcome.status).toBe('done');
      if (outcome.status !== 'done') return;
      expect(outcome.ranking).toEqual(rankLibrary(design, options)); // identical to the one-thread ranking
      expect(outcome.ranking.ranking.length).toBeGreaterThan(1); // the comparison has something to order
      expect(outcome.workers).toBe(workers);
      expect(started.length).toBe(workers);
      expect(started.every((w) => w.jobs > 0 && w.disposed)).toBe(true); // every worker worked, and is stopped at the end
      expect(seen.at(-1)).toBe(options.library.length); // progress reaches every part
      expect([...seen].sort((a, b) => a - b)).toEqual(seen); // and never goes back
    });
  }

  it('a role no part fits is refused before any worker starts, naming the library', async () => {
    const { start, started } = standIns();
    const inductors = demoParts().filter((p) => p.kind === 'inductor');
    const outcome = await rankOnWorkers(demoDesign(), { role: 'switch', library: inductors }, { workers: 2, start });
    expect(outcome.status).toBe('refused');
    if (outcome.status !== 'refused') return;
    expect(outcome.problems.map((p) => p.path)).toEqual(['library']);
    expect(outcome.problems[0]!.message).toMatch(/No part in the library fits the control switch role/);
    expect(started.length).toBe(0);
  });

  it('cancel stops every worker and returns no ranking', async () => {
    const { start, started } = standIns();
    const control = new AbortController();
    const outcome = rankOnWorkers(demoDesign(), { role: 'switch', library: longLibrary(3) }, {
      workers: 2,
      start,
      signal: control.signal,
      onProgress: (judged) => {
        if (judged > 0) control.abort(); // after the first chunk comes back
      },
    });
    const result = await outcome;
    expect(result.status).toBe('cancelled');
    expect(started.length).toBe(2);
    expect(started.every((w) => w.disposed)).toBe(true);
  });
});
