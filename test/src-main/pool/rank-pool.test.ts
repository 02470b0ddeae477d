import { describe, expect, it } from 'vitest';
import { monteCarlo, profileFromWeighting, rankLibrary } from '../../../shared-model/index.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';
import { demoPath, ROOT, wattledger } from '../cli/spawn.ts';
import { memoryIo } from '../cli/memory-io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import nodePath from 'node:path';

/** The shipped library file with only its inductors left. */
function inductorsOnly(): string {
  const doc = JSON.parse(readFileSync(nodePath.join(ROOT, 'assets/parts/library.json'), 'utf8')) as { parts: { kind: string }[] };
  return JSON.stringify({ ...doc, parts: doc.parts.filter((p) => p.kind === 'inductor') });
}

/** The engine's record as JSON carries it (doubles survive JSON exactly: ECMA-262 shortest round trip). */
const asJson = (x: unknown): unknown => JSON.parse(JSON.stringify(x));

describe('worker pools give the one-thread results exactly', () => {
  it('rank on two worker threads (the built command line) equals rankLibrary on this thread', async () => {
    const run = await wattledger('rank', demoPath('synchronous-buck'), '--role', 'inductor', '--by', 'loss-at-rated', '--workers', '2', '--json');
    expect(run.code, run.stderr).toBe(0);
    const out = JSON.parse(run.stdout);
    expect(out.workers).toBe(2); // the pool really started two threads
    const one = rankLibrary(demoDesign('synchronous-buck'), { role: 'inductor', library: demoParts(), by: 'loss-at-rated' });
    expect({ ranking: out.ranking, inadmissible: out.inadmissible, notFitting: out.notFitting }).toEqual(asJson({ ranking: one.ranking, inadmissible: one.inadmissible, notFitting: one.notFitting }));
  });

  it('rank over a mission profile with three threads equals the one-thread ranking', async () => {
    const demo = demoDesign('synchronous-buck');
    const design = { ...demo, missionProfile: profileFromWeighting(demo, 'european') };
    const dir = mkdtempSync(nodePath.join(tmpdir(), 'wl-rank-'));
    writeFileSync(nodePath.join(dir, 'd.json'), JSON.stringify(design));
    const run = await wattledger('rank', nodePath.join(dir, 'd.json'), '--role', 'switch', '--by', 'weighted-efficiency', '--workers', '3', '--json');
    expect(run.code, run.stderr).toBe(0);
    const out = JSON.parse(run.stdout);
    const one = rankLibrary(design, { role: 'switch', library: demoParts(), by: 'weighted-efficiency' });
    expect(out.basis).toBe('profile');
    expect(out.ranking).toEqual(asJson(one.ranking));
  });

  it('the Monte Carlo on two worker threads (tolerance command) equals monteCarlo on this thread', async () => {
    const run = await wattledger('tolerance', demoPath('diode-boost'), '--samples', '300', '--seed', '11', '--normal', '--workers', '2', '--json');
    expect(run.code, run.stderr).toBe(0);
    const out = JSON.parse(run.stdout);
    const one = monteCarlo(demoDesign('diode-boost'), { seed: 11, samples: 300, distribution: 'normal', spreadConditions: false });
    expect(JSON.stringify(out)).toContain(JSON.stringify(one.efficiency.summary)); // every statistic to the last bit
    for (const t of one.temperatures) expect(JSON.stringify(out)).toContain(JSON.stringify(t.summary));
  });

  it('a role no part fits is refused naming the library and the role', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(demoDesign('synchronous-buck')), 'lib.json': inductorsOnly() });
    expect(await runCli(['rank', 'd.json', '--role', 'switch', '--library', 'lib.json'], io)).toBe(EXIT.usage);
    expect(io.stderr).toMatch(/No part in the library fits the control switch role/);
  });
});
