/**
 * A pool of worker threads sized to the cores (os.availableParallelism()), for the command line and the
 * benchmark. Tasks are handed out one at a time to whichever worker is free; results come back in task
 * order, whatever order the workers finish in. Progress is reported per finished task; an AbortSignal
 * stops every worker at once. With one worker (or one task) the tasks run on this thread: no thread is
 * started for nothing.
 * The worker script is pool-worker.js beside the bundle this module is built into (out/cli, out/bench;
 * built from worker-entry.ts). Run from the sources (a TypeScript loader, a test runner) there is none:
 * Node 20 worker threads do not inherit the loader, so the tasks run on this thread — the result is the
 * same, only slower; `threadsUsed` says which.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { runPoolTask, type PoolOutputs, type PoolTask } from './pool-tasks.ts';

export interface PoolOptions {
  /** Worker threads (default: every core). */
  workers?: number;
  onProgress?: (done: number, total: number) => void;
  signal?: AbortSignal;
  /** The worker script (default: beside this module, see the header). */
  script?: URL;
}

export function coreCount(): number {
  return Math.max(1, availableParallelism());
}

/** The worker script this process can start, or null when it can start none (see the header). */
export function workerScript(): URL | null {
  if (!import.meta.url.startsWith('file:')) return null;
  const built = new URL('./pool-worker.js', import.meta.url);
  if (existsSync(fileURLToPath(built))) return built;
  return null;
}

/** How many threads a pool of `requested` workers will really use for `tasks` tasks. */
export function threadsUsed(requested: number | undefined, tasks: number, script: URL | null = workerScript()): number {
  if (script === null) return 1;
  return Math.max(1, Math.min(Math.floor(requested ?? coreCount()), tasks));
}

export async function runOnPool<K extends PoolTask['kind']>(tasks: readonly Extract<PoolTask, { kind: K }>[], options: PoolOptions = {}): Promise<PoolOutputs[K][]> {
  const script = options.script ?? workerScript();
  const size = threadsUsed(options.workers, tasks.length, script);
  const results = new Array<PoolOutputs[K]>(tasks.length);
  if (size === 1 || script === null) {
    for (let i = 0; i < tasks.length; i++) {
      if (options.signal?.aborted) throw new Error('cancelled');
      results[i] = runPoolTask(tasks[i]!) as PoolOutputs[K];
      options.onProgress?.(i + 1, tasks.length);
    }
    return results;
  }
  const workers: Worker[] = [];
  return await new Promise<PoolOutputs[K][]>((resolve, reject) => {
    let next = 0;
    let done = 0;
    let settled = false;
    const finish = (error?: Error) => {
      if (settled) return;
      settled = true;
      options.signal?.removeEventListener('abort', onAbort);
      for (const w of workers) void w.terminate();
      if (error) reject(error);
      else resolve(results);
    };
    const onAbort = () => finish(new Error('cancelled'));
    options.signal?.addEventListener('abort', onAbort);
    const feed = (w: Worker) => {
      if (next >= tasks.length) return;
      const id = next++;
      w.postMessage({ id, task: tasks[id] });
    };
    for (let k = 0; k < size; k++) {
      const w = new Worker(script);
      workers.push(w);
      w.on('message', (m: { id: number; ok: boolean; output?: PoolOutputs[K]; message?: string }) => {
        if (!m.ok) return finish(new Error(m.message ?? 'a pool worker failed'));
        results[m.id] = m.output as PoolOutputs[K];
        done += 1;
        options.onProgress?.(done, tasks.length);
        if (done === tasks.length) finish();
        else feed(w);
      });
      w.on('error', (e) => finish(e));
      w.on('exit', (code) => {
        if (!settled && code !== 0) finish(new Error(`a pool worker stopped with exit code ${code}`));
      });
      feed(w);
    }
    if (options.signal?.aborted) onAbort();
  });
}
