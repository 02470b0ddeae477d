/**
 * The report's Web Worker: builds the ReportModel (a few hundred electro-thermal evaluations) off the
 * interface thread. Errors travel back as data.
 */
import { buildReport } from '../../shared-model/index.ts';
import type { BuildRequest, BuildResponse } from './report-client.ts';

interface WorkerScope {
  postMessage(message: BuildResponse): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<BuildRequest>) => void): void;
}

const scope = globalThis as unknown as WorkerScope;
scope.addEventListener('message', (event) => {
  const { id, input } = event.data;
  try {
    scope.postMessage({ id, ok: true, model: buildReport(input) });
  } catch (error) {
    scope.postMessage({ id, ok: false, message: `The engine could not build the report: ${error instanceof Error ? error.message : String(error)}` });
  }
});
