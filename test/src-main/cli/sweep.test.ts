import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, findLandmarks, sweepLoad, validateDesign } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { memoryIo } from './memory-io.ts';
import { demoPath, wattledger } from './spawn.ts';
import { demoText } from '../../helpers/demo.ts';

function design(id: string): Design {
  const r = validateDesign(DEMO_DESIGNS.find((d) => d.id === id)?.json);
  if (!r.ok) throw new Error(id);
  return r.design;
}
const roundTrip = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

describe('wattledger sweep', () => {
  it('prints points and landmarks as documented JSON, equal to the engine', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['sweep', 'd.json', '--json', '--points', '60'], io)).toBe(EXIT.ok); // exit 0 (src-main/cli/io.ts EXIT, as the other commands)
    const out = JSON.parse(io.stdout);
    expect(out.points).toHaveLength(60); // --points
    for (const key of ['load', 'regulated', 'efficiency', 'totalLoss', 'temperatures']) expect(out.points[0]).toHaveProperty(key); // issue 4 and issue 10 §4 command-line contract
    for (const name of ['peak', 'knee', 'thermalCeiling']) {
      const l = out.landmarks[name];
      expect(typeof l.found).toBe('boolean'); // issue 10 §4: found or not, never a null
      if (!l.found) {
        expect(typeof l.reason).toBe('string'); // … not found: a reason
        expect(l).not.toHaveProperty('load'); // … and no load at all
      } else {
        expect(typeof l.load).toBe('number'); // issue 4: a found landmark has a load …
        expect(typeof l.value).toBe('number'); // … and its value
      }
    }
    const d = design('synchronous-buck');
    const sweep = sweepLoad(d, { points: 60 });
    expect(out.points.map((p: { efficiency: number }) => p.efficiency)).toEqual(sweep.points.map((p) => p.efficiency)); // the CLI adds nothing to the engine
    const engine = roundTrip(findLandmarks(sweep, { design: d }));
    expect(out.landmarks.peak.load).toBe(engine.peak.load); // landmarks are the engine's own
    expect(out.landmarks.knee.value).toBe(engine.knee.value);
    expect(out.landmarks.thermalCeiling.reason ?? null).toBe(engine.thermalCeiling.reason);
    expect(JSON.stringify(out.landmarks)).not.toMatch(/null/); // issue 10 §4: no null in the landmarks
    expect(out.landmarks.knee.definition).toMatch(/lightest load at which efficiency comes within 2 percentage points/); // the knee's definition travels with it (issue 4)
    expect(out.cautions.join(' ')).toMatch(/Estimates only/); // team brief rule 4
  });

  it('applies --from, --to, --vin and linear spacing', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['sweep', 'd.json', '--json', '--from', '500m', '--to', '5', '--points', '10', '--spacing', 'linear', '--vin', '12V'], io)).toBe(EXIT.ok); // exit 0
    const out = JSON.parse(io.stdout);
    expect(out.points.map((p: { load: number }) => p.load)).toEqual([0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5]); // linear 0.5 … 5 A in 10 points, by hand
    expect(out.conditions.vinV).toBe(12); // --vin 12V
  });

  it('prints CSV with unit-suffixed columns on stdout and the cautions on stderr', async () => {
    const io = memoryIo({ 'd.json': demoText('diode-boost') });
    expect(await runCli(['sweep', 'd.json', '--csv', '--points', '20'], io)).toBe(EXIT.ok); // exit 0
    const lines = io.stdout.trim().split('\n');
    expect(lines).toHaveLength(21); // header + 20 points
    expect(lines[0]).toMatch(/^load_A,efficiency,total_loss_W,/); // units in the column names (team brief: units are part of the name)
    expect(lines[0]).toMatch(/T_switch_C/); // a temperature column per part, unit in the name
    expect(io.stderr).toMatch(/Caution: Estimates only/); // team brief rule 4, kept out of the CSV
  });

  it('prints the landmarks, the knee definition and the cautions in the table', async () => {
    const io = memoryIo({ 'd.json': demoText('hot-fin-buck') });
    expect(await runCli(['sweep', 'd.json', '--points', '40'], io)).toBe(EXIT.ok); // exit 0
    expect(io.stdout).toMatch(/Peak efficiency/); // issue 4: landmarks shown
    expect(io.stdout).toMatch(/Thermal ceiling/); // issue 4: thermal ceiling shown
    expect(io.stdout).toMatch(/WattLedger's own definition/); // issue 4: state the knee definition wherever it is shown
    expect(io.stdout).toMatch(/Caution: Estimates only/); // team brief rule 4
  });

  it('exits 2 with the flag, value and range for bad options, 1 for a bad design', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck'), 'bad.json': '{"format": "wattledger.design"}' });
    expect(await runCli(['sweep', 'd.json', '--from', '3', '--to', '1'], io)).toBe(EXIT.usage); // exit codes as the other commands
    expect(io.stderr).toMatch(/--to 1 is not allowed \(allowed: > from \(3\)\)/); // team brief rule 6
    expect(await runCli(['sweep', 'd.json', '--csv', '--json'], io)).toBe(EXIT.usage); // --csv and --json exclude each other: usage error
    expect(await runCli(['sweep', 'd.json', '--spacing', 'cubic'], io)).toBe(EXIT.usage); // spacing is linear or log: usage error
    expect(await runCli(['sweep', 'bad.json'], io)).toBe(EXIT.invalidDesign); // exit 1 for an invalid design (EXIT.invalidDesign)
  });

  it('runs as a real process with exit code 0', async () => {
    const run = await wattledger('sweep', demoPath('synchronous-buck'), '--json', '--points', '20');
    expect(run.code).toBe(0); // exit codes as the other commands
    expect(JSON.parse(run.stdout).points).toHaveLength(20); // --points 20 in a real process
  });
});
