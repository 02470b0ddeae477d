import { describe, expect, it } from 'vitest';
import { EngineClient } from '../../../src-renderer/workers/engine-client.ts';
import type { WorkerPort } from '../../../src-renderer/workers/engine-client.ts';
import { createEngineHost } from '../../../src-renderer/workers/engine-host.ts';
import type { JobResult } from '../../../src-renderer/workers/engine-jobs.ts';
import { runJob } from '../../../src-renderer/workers/engine-jobs.ts';
import type { EngineRequest, EngineResponse } from '../../../src-renderer/workers/engine-messages.ts';
import type { Design } from '../../../shared-model/index.ts';
import { demoDesign, demoText } from '../../helpers/demo.ts';

type Run = Extract<EngineRequest, { type: 'run' }>;

/** Client and host joined in-process; the host's scheduler runs tasks only when `flush` is called. */
function rig(run: (r: Run) => JobResult) {
  const tasks: (() => void)[] = [];
  const listeners: ((e: { data: EngineResponse }) => void)[] = [];
  const ran: number[] = [];
  const host = createEngineHost(
    (response) => listeners.forEach((l) => l({ data: response })),
    (task) => tasks.push(task),
    (r) => {
      ran.push(r.id);
      return run(r);
    },
  );
  const port: WorkerPort = {
    postMessage: (m) => host.receive(m),
    addEventListener: (_type, l) => listeners.push(l),
  };
  const flush = () => {
    while (tasks.length > 0) tasks.shift()?.();
  };
  return { client: new EngineClient(port), flush, ran };
}

const design = { name: 'stand-in' } as unknown as Design;
const done = (value: number): JobResult => ({ ok: true, output: value as never });

describe('engine worker protocol', () => {
  it('answers a job with its output', async () => {
    const { client, flush } = rig(() => done(42));
    const p = client.run('figures', { design });
    flush();
    expect(await p).toMatchObject({ status: 'done', output: 42 }); // issue 4: heavy work runs behind the worker; result returned as data
  });

  it('lets the newest request in a lane win: the older one is superseded and never run', async () => {
    const { client, flush, ran } = rig((r) => done(r.id));
    const first = client.run('monte-carlo', { design, options: { seed: 1 } });
    const second = client.run('monte-carlo', { design, options: { seed: 2 } });
    flush();
    expect(await first).toEqual({ status: 'superseded' }); // team brief: newest request wins
    expect(await second).toMatchObject({ status: 'done', output: 2 }); // the second request (id 2) is the one computed
    expect(ran).toEqual([2]); // the superseded job never ran (team brief: newest request wins)
  });

  it('keeps lanes independent', async () => {
    const { client, flush } = rig((r) => done(r.id));
    const grid = client.run('grid', { design });
    const mc = client.run('monte-carlo', { design, options: { seed: 3 } });
    flush();
    expect((await grid).status).toBe('done'); // separate lanes do not supersede each other (engine-messages.ts contract)
    expect((await mc).status).toBe('done'); // separate lanes do not supersede each other
  });

  it('delivers errors as data, never as a rejected promise', async () => {
    const { client, flush } = rig(() => ({ ok: false, error: { message: 'seed must be a whole number', problems: [] } }));
    const p = client.run('monte-carlo', { design, options: { seed: -1 } });
    flush();
    expect(await p).toMatchObject({ status: 'error', error: { message: 'seed must be a whole number' } }); // team brief: errors travel as data
  });

  it('refuses invalid options with problems naming the field (real job runner)', () => {
    const result = runJob({ type: 'run', id: 1, lane: 'mc', kind: 'monte-carlo', input: { design, options: { seed: 1.5, samples: 0 } } });
    expect(result.ok).toBe(false); // refused before running (team brief rule 6)
    if (!result.ok) expect(result.error.problems.map((p) => p.path)).toEqual(['seed', 'samples']); // team brief rule 6: name the field, value and range
  });

  it('turns an engine exception into an error outcome', () => {
    const broken = { name: 'no spec' } as unknown as Design;
    const result = runJob({ type: 'run', id: 1, lane: 'f', kind: 'figures', input: { design: broken } });
    expect(result.ok).toBe(false); // team brief: errors travel as data, the worker stays alive
  });

  it('builds the report through the same protocol, and a failure comes back as data naming the job', () => {
    const built = runJob({ type: 'run', id: 1, lane: 'report', kind: 'report', input: { design: demoDesign(), documentText: demoText(), date: '2026-01-02', appVersion: '0.0.0' } });
    expect(built.ok && 'title' in built.output ? built.output.title.date : null).toBe('2026-01-02'); // the date is the caller's (report/build.ts: the engine reads no clock)
    const broken = runJob({ type: 'run', id: 2, lane: 'report', kind: 'report', input: { design: { name: 'no spec' } as unknown as Design, documentText: '', date: '2026-01-02', appVersion: '0.0.0' } });
    expect(broken.ok ? '' : broken.error.message).toMatch(/report job/); // team brief: errors travel as data, the worker stays alive
  });

  it('runs the phase-shedding job of a multiphase design at the given Vin (issue 13 §1)', () => {
    const result = runJob({ type: 'run', id: 1, lane: 'shed', kind: 'shedding', input: { design: demoDesign('multiphase-buck'), vinV: 12 } });
    expect(result.ok).toBe(true);
    if (!result.ok || !('curves' in result.output)) return;
    expect(result.output.curves.map((c) => c.activePhases)).toEqual([1, 2, 3, 4]); // the demo's 4 phases, one curve per active count
    const broken = runJob({ type: 'run', id: 2, lane: 'shed', kind: 'shedding', input: { design: { name: 'no spec' } as unknown as Design, vinV: 12 } });
    expect(broken.ok).toBe(false); // errors travel as data, the worker stays alive
  });

  it('settles a cancelled request as superseded', async () => {
    const { client, flush, ran } = rig((r) => done(r.id));
    const p = client.run('grid', { design }, 'map');
    client.cancel('map');
    flush();
    expect(await p).toEqual({ status: 'superseded' }); // engine-client.ts contract: cancel drops the waiting request
    expect(ran).toEqual([]); // and it never runs
  });
});
