/**
 * The engine's share of a keystroke: one 200-point load sweep plus all its landmarks refined on the engine
 * (`sweepWithLandmarks`, the call the app makes on every edit of the design).
 *   - time in the bench's own process (default young generation) and in a child process started with
 *     `node --max-semi-space-size=1` (a 1 MB semi-space), which reproduced the garbage-collection cost
 *     measured in headless Chromium before the sweep was made lean;
 *   - allocation, from V8's sampling heap profiler (node:inspector, HeapProfiler.startSampling, 64-byte
 *     sampling interval, objects later collected by minor and major GC included): a statistical estimate
 *     of the bytes allocated, per swept point (a 200-point sweep alone) and per sweep+landmarks.
 */
import { spawnSync } from 'node:child_process';
import { Session } from 'node:inspector/promises';

/** The flag that makes the bench run only the sweep+landmarks timing (in the small-young-generation child). */
export const YOUNG_CHILD_FLAG = '--young-generation-child';

/** Semi-space of the child, MB. */
export const CHILD_SEMI_SPACE_MB = 1;

/** Bytes allocated per call of `fn` (mean over `calls`), by the sampling heap profiler; fn is warmed up first. */
export async function sampledBytesPerCall(fn: () => void, calls: number): Promise<number> {
  for (let i = 0; i < 3 * calls; i++) fn();
  const session = new Session();
  session.connect();
  try {
    await session.post('HeapProfiler.enable');
    await session.post('HeapProfiler.startSampling', {
      samplingInterval: 64,
      includeObjectsCollectedByMinorGC: true,
      includeObjectsCollectedByMajorGC: true,
    });
    for (let i = 0; i < calls; i++) fn();
    const { profile } = await session.post('HeapProfiler.stopSampling');
    let bytes = 0;
    const stack = [profile.head];
    while (stack.length > 0) {
      const node = stack.pop()!;
      bytes += node.selfSize;
      stack.push(...node.children);
    }
    return bytes / calls;
  } finally {
    session.disconnect();
  }
}

export interface ChildTiming {
  /** ms per call, one value per run. */
  cpuMs: number[];
  wallMs: number[];
}

/**
 * Runs this bench script again in a child `node --max-semi-space-size=1 <script> YOUNG_CHILD_FLAG`, which
 * prints one `young-child:{json}` line; returns its timing, or the reason it failed.
 */
export function timeInSmallYoungGeneration(script: string, extraArgs: string[]): ChildTiming | string {
  const r = spawnSync(process.execPath, [`--max-semi-space-size=${CHILD_SEMI_SPACE_MB}`, script, YOUNG_CHILD_FLAG, ...extraArgs], {
    encoding: 'utf8',
    timeout: 180_000,
  });
  const found = /^young-child:(.*)$/m.exec(r.stdout ?? '');
  if (r.status !== 0 || !found) return `child failed (status ${r.status}): ${(r.stderr ?? '').trim().slice(0, 300)}`;
  return JSON.parse(found[1]!) as ChildTiming;
}
