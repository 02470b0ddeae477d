import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, evaluate, validateDesign } from '../../../shared-model/index.ts';
import { COMMANDS } from '../../../src-main/cli/commands/index.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import versionZero from '../../shared-model/design/fixtures/synchronous-buck.v0.json';
import { memoryIo } from './memory-io.ts';
import { demoText } from '../../helpers/demo.ts';

describe('runCli dispatches through the command registry', () => {
  it('lists every registered command in the usage text', async () => {
    const io = memoryIo();
    expect(await runCli(['--help'], io)).toBe(EXIT.ok);
    for (const c of COMMANDS) expect(io.stdout).toContain(`${c.name} ${c.positionals.join(' ')}`);
    expect(io.stdout).toContain('Exit codes: 0 success; 1 invalid or unreadable design');
  });

  it('shows one command\'s options with "help <command>"', async () => {
    const io = memoryIo();
    expect(await runCli(['help', 'point'], io)).toBe(EXIT.ok);
    expect(io.stdout).toContain('Usage: wattledger point DESIGN.json [options]');
    expect(io.stdout).toContain('--json');
  });

  it.each([
    [['point'], /"point" needs DESIGN\.json/],
    [['point', 'a.json', 'b.json'], /takes 1 argument; unexpected "b\.json"/],
    [['point', 'a.json', '--watts', '3'], /Unknown option "--watts"/],
    [['point', 'a.json', '-x'], /Unknown option "-x"/],
    [['point', 'a.json', '--json=yes'], /"--json" takes no value/],
    [['evaluate', 'a.json', '--load'], /"--load" needs a value \(A\)/],
    [['evaluate', 'a.json', '--load', '1', '--load', '2'], /"--load" is given twice/],
    [['evaluate', 'a.json', '--vin', '-3'], /"--vin" \(Input voltage\) is -3 V; allowed: 200 mV ≤ --vin ≤ 2 kV \(the range of spec\.vinNomV in a design file\)/],
    [['evaluate', 'a.json', '--load', '-1'], /"--load" \(Load current\) is -1 A; allowed: 0 A ≤ --load ≤ 1 kA/],
    [['evaluate', 'a.json', '--ambient', '500'], /"--ambient" \(Ambient temperature\) is 500 °C; allowed: -100 °C ≤ --ambient ≤ 200 °C/],
    [['evaluate', 'a.json', '--ambient', '300 K'], /"--ambient": "300 K": "K" reads as kelvin here/],
    [['evaluate', 'a.json', '--vin', '12 A'], /"--vin": "12 A" is in A \(current\), but this field takes voltage \(V\)/],
  ])('refuses %j with exit 2 and the command usage', async (args, message) => {
    const io = memoryIo({ 'a.json': demoText('synchronous-buck') });
    expect(await runCli(args, io)).toBe(EXIT.usage);
    expect(io.stderr).toMatch(message);
    expect(io.stderr).toContain(`Usage: wattledger ${args[0]}`);
    expect(io.stdout).toBe('');
  });

  it('reads a negative number as a value, not as an option', async () => {
    const io = memoryIo({ 'a.json': demoText('synchronous-buck') });
    expect(await runCli(['evaluate', 'a.json', '--json', '--ambient', '-10'], io)).toBe(EXIT.ok);
    expect(JSON.parse(io.stdout).conditions.ambientC).toBe(-10);
  });

  it('opens a version 0 file and notes the migration', async () => {
    const io = memoryIo({ 'old.json': JSON.stringify(versionZero) });
    expect(await runCli(['point', 'old.json'], io)).toBe(EXIT.ok);
    expect(io.stdout).toContain('Migrated from version 0 to 1');
  });

  it('evaluates at a load given as "500m" exactly as the engine does at 0.5 A', async () => {
    const io = memoryIo({ 'b.json': demoText('diode-boost') });
    expect(await runCli(['evaluate', 'b.json', '--json', '--load', '500m'], io)).toBe(EXIT.ok);
    const d = validateDesign(DEMO_DESIGNS.find((x) => x.id === 'diode-boost')?.json);
    if (!d.ok) throw new Error('demo invalid');
    expect(JSON.parse(io.stdout).totalLoss).toBe(evaluate(d.design, { loadA: 0.5 }).totalLoss);
  });

  it('exits 0 for a point in thermal runaway, with converged false and a warning naming the part', async () => {
    const doc = structuredClone(DEMO_DESIGNS.find((d) => d.id === 'hot-fin-buck')?.json) as { thermal: { heatsinks: { thetaSaKPerW: number }[] } };
    (doc.thermal.heatsinks[0] as { thetaSaKPerW: number }).thetaSaKPerW = 400; // docs/methods.md §10: loop gain Rth·dP/dT reaches 1 → runaway
    const io = memoryIo({ 'r.json': JSON.stringify(doc) });
    expect(await runCli(['evaluate', 'r.json', '--json'], io)).toBe(EXIT.ok); // issue 3: a runaway point exits 0
    const out = JSON.parse(io.stdout) as { converged: boolean; warnings: { code: string; part?: string; message: string }[] };
    expect(out.converged).toBe(false);
    const runaway = out.warnings.find((w) => w.code === 'thermal-runaway');
    expect(runaway?.message).toContain('rectifier');
  });

  it('turns an unexpected exception into one sentence and exit 3, never a stack trace', async () => {
    const io = memoryIo();
    io.readText = async () => {
      throw new Error('disk on fire');
    };
    expect(await runCli(['point', 'a.json'], io)).toBe(EXIT.internal);
    expect(io.stderr).toBe('wattledger point: internal error, please report it: disk on fire\n');
  });
});
