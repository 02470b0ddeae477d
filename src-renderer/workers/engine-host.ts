/**
 * The worker side of the engine protocol, free of browser APIs so it can be tested directly.
 * Requests wait in one slot per lane; a newer request in the same lane replaces the waiting one, which is
 * answered "superseded". Jobs run one at a time; between jobs the host yields (through `schedule`) so
 * messages that arrived during a long job are seen before the next job starts — the newest wins.
 */
import type { EngineRequest, EngineResponse } from './engine-messages.ts';
import type { JobResult } from './engine-jobs.ts';

type RunRequest = Extract<EngineRequest, { type: 'run' }>;

export interface EngineHost {
  receive(request: EngineRequest): void;
}

export function createEngineHost(
  post: (response: EngineResponse) => void,
  schedule: (task: () => void) => void,
  run: (request: RunRequest) => JobResult,
  now: () => number = () => 0,
): EngineHost {
  const waiting = new Map<string, RunRequest>();
  let scheduled = false;

  const supersede = (r: RunRequest) => post({ status: 'superseded', id: r.id, lane: r.lane, kind: r.kind });

  const wake = () => {
    if (!scheduled && waiting.size > 0) {
      scheduled = true;
      schedule(drain);
    }
  };

  const drain = () => {
    scheduled = false;
    const next = waiting.values().next();
    if (next.done) return;
    const request = next.value;
    waiting.delete(request.lane);
    const started = now();
    const result = run(request);
    if (result.ok) {
      post({ status: 'done', id: request.id, lane: request.lane, kind: request.kind, output: result.output, elapsedMs: now() - started } as EngineResponse);
    } else {
      post({ status: 'error', id: request.id, lane: request.lane, kind: request.kind, error: result.error });
    }
    wake();
  };

  return {
    receive(request) {
      if (request.type === 'cancel') {
        const old = waiting.get(request.lane);
        if (old) {
          waiting.delete(request.lane);
          supersede(old);
        }
        return;
      }
      const old = waiting.get(request.lane);
      if (old) supersede(old);
      waiting.set(request.lane, request);
      wake();
    },
  };
}
