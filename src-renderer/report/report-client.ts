/**
 * Builds a report in the report worker; the newest request wins (an older answer is dropped).
 * The promise always resolves: a model, or a sentence saying what went wrong.
 */
import type { ReportInput, ReportModel } from '../../shared-model/index.ts';

export interface BuildRequest {
  id: number;
  input: ReportInput;
}

export type BuildResponse = { id: number; ok: true; model: ReportModel } | { id: number; ok: false; message: string };

export type BuildOutcome = { ok: true; model: ReportModel } | { ok: false; message: string } | { ok: false; superseded: true; message: string };

export class ReportClient {
  private worker: Worker | null = null;
  private nextId = 1;
  private waiting: { id: number; settle: (o: BuildOutcome) => void } | null = null;

  build(input: ReportInput): Promise<BuildOutcome> {
    this.worker ??= this.start();
    this.waiting?.settle({ ok: false, superseded: true, message: 'superseded' });
    const id = this.nextId++;
    return new Promise((resolve) => {
      this.waiting = { id, settle: resolve };
      this.worker!.postMessage({ id, input } satisfies BuildRequest);
    });
  }

  dispose(): void {
    this.waiting?.settle({ ok: false, superseded: true, message: 'superseded' });
    this.waiting = null;
    this.worker?.terminate();
    this.worker = null;
  }

  private start(): Worker {
    const worker = new Worker(new URL('./report-worker.ts', import.meta.url), { type: 'module' });
    worker.addEventListener('message', (event: MessageEvent<BuildResponse>) => {
      const r = event.data;
      if (!this.waiting || this.waiting.id !== r.id) return;
      const settle = this.waiting.settle;
      this.waiting = null;
      settle(r.ok ? { ok: true, model: r.model } : { ok: false, message: r.message });
    });
    worker.addEventListener('error', (event) => {
      const settle = this.waiting?.settle;
      this.waiting = null;
      settle?.({ ok: false, message: `The report worker failed: ${event.message || 'unknown error'}` });
    });
    return worker;
  }
}

/** Today's date as YYYY-MM-DD in local time (the engine takes the date as an input). */
export function localDate(now: Date = new Date()): string {
  const pad = (n: number): string => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
