import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import nodePath from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { Design } from '../../../shared-model/index.ts';
import {
  conductionParameters,
  DEMO_DESIGNS,
  evaluate,
  formatEngineering,
  nominalConditions,
  solveOperatingPoint,
  validateDesign,
} from '../../../shared-model/index.ts';
import { demoPath, wattledger } from './spawn.ts';

const roundTrip = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

function design(id: string): Design {
  const r = validateDesign(DEMO_DESIGNS.find((d) => d.id === id)?.json);
  if (!r.ok) throw new Error(id);
  return r.design;
}

const folder = mkdtempSync(nodePath.join(tmpdir(), 'wattledger-cli-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('wattledger point (spawned)', () => {
  it.each(['synchronous-buck', 'diode-boost'])('prints the engine\'s own operating point of %s as JSON, exit 0', async (id) => {
    const run = await wattledger('point', demoPath(id), '--json');
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const out = JSON.parse(run.stdout) as Record<string, unknown>;
    const d = design(id);
    const conditions = nominalConditions(d);
    const t = conditions.ambientC;
    const temps = { switchC: t, rectifierC: t, inductorC: t, senseC: t };
    const expected = solveOperatingPoint(d, conditions, conductionParameters(d, temps));
    expect(out.operatingPoint).toEqual(roundTrip(expected)); // the CLI adds nothing to the engine's numbers
    expect(out.partTemperaturesC).toEqual(temps);
    expect(out.cautions).toEqual(expect.arrayContaining([expect.stringContaining('Estimates only')]));
  });

  it('prints a table with units and the cautions line', async () => {
    const run = await wattledger('point', demoPath('diode-boost'));
    expect(run.code).toBe(0);
    const d = design('diode-boost');
    const t = d.spec.ambientC;
    const op = solveOperatingPoint(d, nominalConditions(d), conductionParameters(d, { switchC: t, rectifierC: t, inductorC: t, senseC: t }));
    expect(run.stdout).toMatch(new RegExp(`Duty cycle\\s+${formatEngineering(op.dutyCycle, '', 4).replace('.', '\\.')}\\n`));
    expect(run.stdout).toContain(`right-half-plane zero     ${formatEngineering(op.smallSignal?.rhpZeroHz ?? 0, 'Hz', 4)}`);
    expect(run.stdout).toMatch(/Caution: Estimates only/);
  });
});

describe('wattledger evaluate (spawned)', () => {
  it.each(['synchronous-buck', 'diode-boost'])('prints the engine\'s own evaluation of %s with the documented keys', async (id) => {
    const run = await wattledger('evaluate', demoPath(id), '--json');
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const out = JSON.parse(run.stdout) as Record<string, unknown>;
    for (const key of ['efficiency', 'inputPower', 'outputPower', 'totalLoss', 'dutyCycle', 'conductionMode', 'losses', 'temperatures', 'hazards', 'warnings', 'converged'])
      expect(out, key).toHaveProperty(key); // issue 3, "Command line and contract"
    const expected = roundTrip(evaluate(design(id)));
    // The ledger's rating checks sit under ratingChecks; checks holds the design checks (src-main/cli/README.md, issue 11).
    for (const [key, value] of Object.entries(expected)) expect(out[key === 'checks' ? 'ratingChecks' : key], key).toEqual(value);
  });

  it('applies --vin, --load and --ambient with engineering entry', async () => {
    const run = await wattledger('evaluate', demoPath('synchronous-buck'), '--json', '--vin', '12V', '--load=750m', '--ambient', '55 °C');
    expect(run.code).toBe(0);
    const out = JSON.parse(run.stdout) as Record<string, unknown>;
    const expected = roundTrip(evaluate(design('synchronous-buck'), { vinV: 12, loadA: 0.75, ambientC: 55 }));
    expect(out.conditions).toEqual(expected.conditions);
    expect(out.losses).toEqual(expected.losses);
    expect(out.temperatures).toEqual(expected.temperatures);
  });

  it('reports the burn hazard of the hot-fin demo in the table, with the cautions', async () => {
    const run = await wattledger('evaluate', demoPath('hot-fin-buck'));
    expect(run.code).toBe(0);
    const hazard = evaluate(design('hot-fin-buck')).hazards.find((h) => h.exceeded);
    expect(hazard).toBeDefined();
    expect(run.stdout).toMatch(new RegExp(`${hazard?.part}\\s+${formatEngineering(hazard?.surfaceC ?? 0, '°C', 4)}.*TOO HOT TO TOUCH`));
    expect(run.stdout).toContain('Caution: Estimates only');
    expect(run.stdout).toContain('Confirm touch-temperature limits against the current edition of the standard');
  });
});

describe('wattledger refuses bad designs with every problem (exit 1)', () => {
  it('lists path, value and allowed range of every problem on stderr', async () => {
    const doc = structuredClone(DEMO_DESIGNS[0]?.json) as { spec: Record<string, unknown>; parts: { inductor: Record<string, unknown> } };
    doc.spec.vinMaxV = -5;
    doc.spec.maxDuty = 1;
    doc.parts.inductor.inductanceH = 'big';
    const file = nodePath.join(folder, 'bad.json');
    writeFileSync(file, JSON.stringify(doc));
    const run = await wattledger('evaluate', file);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr).toContain('(3 problems)');
    expect(run.stderr).toContain('path: spec.vinMaxV | value: -5 V | allowed: 200 mV ≤ vinMaxV ≤ 2 kV');
    expect(run.stderr).toContain('path: spec.maxDuty | value: 1 | allowed: 0.05 ≤ maxDuty < 1');
    expect(run.stderr).toContain('path: parts.inductor.inductanceH | value: the text "big" | allowed: 1 nH ≤ inductanceH ≤ 1 H');
  });

  it('names a missing file and a file that is not JSON (with line and column)', async () => {
    const missing = await wattledger('point', nodePath.join(folder, 'nope.json'));
    expect(missing.code).toBe(1);
    expect(missing.stderr).toContain('Could not open "nope.json"');
    const file = nodePath.join(folder, 'broken.json');
    writeFileSync(file, '{\n  "format": "wattledger.design",\n  "version": 1,,\n}\n');
    const broken = await wattledger('point', file);
    expect(broken.code).toBe(1);
    expect(broken.stderr).toContain('line 3, column 16');
  });
});

describe('wattledger refuses wrong usage with the usage text (exit 2)', () => {
  it.each([
    [[], /a command is needed/],
    [['simulate', 'x.json'], /unknown command "simulate"/],
    [['evaluate', 'a.json', '--load', 'lots'], /Option "--load": "lots" does not start with a number/],
  ])('%j', async (args, message) => {
    const run = await wattledger(...args);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr).toMatch(/Usage: wattledger/);
  });

  it('prints help on --help with exit 0', async () => {
    const run = await wattledger('evaluate', '--help');
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('Usage: wattledger evaluate DESIGN.json [options]');
    expect(run.stdout).toContain('--ambient °C');
  });
});
