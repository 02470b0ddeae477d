/**
 * The renderer's typed client for the engine worker. `run(kind, input, lane?)` returns a promise that
 * always resolves (never rejects) to done, error or superseded. Within a lane (default: the job kind) the
 * newest request wins: calling `run` again settles the previous promise as superseded at once, and a late
 * answer to an old request is ignored.
 */
import type { EngineOutcome, EngineRequest, EngineResponse, JobInput, JobKind } from './engine-messages.ts';

/** The part of a Worker the client uses (a real Worker, or a stand-in in tests). */
export interface WorkerPort {
  postMessage(message: EngineRequest): void;
  addEventListener(type: 'message', listener: (event: { data: EngineResponse }) => void): void;
  terminate?(): void;
}

interface Waiting {
  id: number;
  settle: (outcome: EngineOutcome<JobKind>) => void;
}

export class EngineClient {
  private nextId = 1;
  private readonly latest = new Map<string, Waiting>();

  constructor(private readonly worker: WorkerPort) {
    worker.addEventListener('message', (event) => this.receive(event.data));
  }

  run<K extends JobKind>(kind: K, input: JobInput<K>, lane: string = kind): Promise<EngineOutcome<K>> {
    const id = this.nextId++;
    this.latest.get(lane)?.settle({ status: 'superseded' });
    return new Promise<EngineOutcome<K>>((resolve) => {
      this.latest.set(lane, { id, settle: resolve as (o: EngineOutcome<JobKind>) => void });
      this.worker.postMessage({ type: 'run', id, lane, kind, input } as EngineRequest);
    });
  }

  /** Drops a waiting request of the lane (a running job finishes, but its answer is ignored). */
  cancel(lane: string): void {
    const waiting = this.latest.get(lane);
    if (!waiting) return;
    this.latest.delete(lane);
    waiting.settle({ status: 'superseded' });
    this.worker.postMessage({ type: 'cancel', lane });
  }

  dispose(): void {
    for (const lane of [...this.latest.keys()]) this.cancel(lane);
    this.worker.terminate?.();
  }

  private receive(response: EngineResponse): void {
    const waiting = this.latest.get(response.lane);
    if (!waiting || waiting.id !== response.id) return; // an answer to a request that has been replaced
    this.latest.delete(response.lane);
    if (response.status === 'done') waiting.settle({ status: 'done', output: response.output, elapsedMs: response.elapsedMs });
    else if (response.status === 'error') waiting.settle({ status: 'error', error: response.error });
    else waiting.settle({ status: 'superseded' });
  }
}

/** Starts an engine worker (a module worker bundled by Vite) and returns its client; `name` shows in the browser's tools. */
export function startEngineWorker(name = 'wattledger-engine'): EngineClient {
  const worker = new Worker(new URL('./engine-worker.ts', import.meta.url), { type: 'module', name });
  return new EngineClient(worker as unknown as WorkerPort);
}
