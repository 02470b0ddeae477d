/**
 * Timing of in-process work: per-call CPU time (process.cpuUsage, user + system — other work on the
 * shared machine inflates it little) and wall time, per run, after a warm-up long enough for V8 to
 * optimise the engine as a long interactive session would have.
 */
export interface Runs {
  /** ms per call, one value per run. */
  cpuMs: number[];
  wallMs: number[];
}

export function timeRuns(fn: () => void, runs: number, repeat = 1, warmMs = 1000): Runs {
  const warmUntil = performance.now() + warmMs;
  for (let n = 0; n < 5000 && performance.now() < warmUntil; n++) fn();
  const cpuMs: number[] = [];
  const wallMs: number[] = [];
  for (let r = 0; r < runs; r++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < repeat; i++) fn();
    wallMs.push((performance.now() - t0) / repeat);
    const c = process.cpuUsage(c0);
    cpuMs.push((c.user + c.system) / 1000 / repeat);
  }
  return { cpuMs, wallMs };
}

export const scaled = (values: readonly number[], k: number): number[] => values.map((v) => v * k);
