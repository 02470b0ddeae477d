/**
 * A pool worker thread (worker_threads): answers each { id, task } with { id, ok, output } or
 * { id, ok: false, message }. Built as out/cli/pool-worker.js beside the command line
 * (src-main/dev/build-package.ts) and as out/bench/pool-worker.js for the benchmark.
 */
import { parentPort } from 'node:worker_threads';
import { runPoolTask, type PoolTask } from './pool-tasks.ts';

parentPort?.on('message', (message: { id: number; task: PoolTask }) => {
  try {
    parentPort?.postMessage({ id: message.id, ok: true, output: runPoolTask(message.task) });
  } catch (error) {
    parentPort?.postMessage({ id: message.id, ok: false, message: error instanceof Error ? error.message : String(error) });
  }
});
