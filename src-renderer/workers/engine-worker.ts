/**
 * The engine's Web Worker: a thin wrapper that receives requests, runs them on the pure engine (through
 * engine-host.ts and engine-jobs.ts) and posts the responses back. Heavy work (Monte Carlo, grids,
 * families) runs here so the interface never freezes. Start it with `startEngineWorker()` in
 * engine-client.ts.
 */
import { createEngineHost } from './engine-host.ts';
import { runJob } from './engine-jobs.ts';
import type { EngineRequest, EngineResponse } from './engine-messages.ts';

interface WorkerScope {
  postMessage(message: EngineResponse): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<EngineRequest>) => void): void;
}

const scope = globalThis as unknown as WorkerScope;
const host = createEngineHost(
  (response) => scope.postMessage(response),
  (task) => setTimeout(task, 0),
  runJob,
  () => performance.now(),
);
scope.addEventListener('message', (event) => host.receive(event.data));
