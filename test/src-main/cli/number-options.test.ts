import { describe, expect, it } from 'vitest';
import { CONDITION_RANGES, DEMO_DESIGNS, describeValue, evaluate, validateDesign } from '../../../shared-model/index.ts';
import { parseArgs } from '../../../src-main/cli/args.ts';
import type { Command, NumberFlag } from '../../../src-main/cli/command.ts';
import { COMMANDS } from '../../../src-main/cli/commands/index.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { optionRangeText } from '../../../src-main/cli/number-option.ts';
import { memoryIo } from './memory-io.ts';
import { demoText } from '../../helpers/demo.ts';

/** Every numeric option of every registered command (a new command or option is covered without an edit). */
const NUMBER_OPTIONS: [string, Command, NumberFlag][] = COMMANDS.flatMap((c) =>
  c.flags.filter((f): f is NumberFlag => f.kind === 'number').map((f) => [`${c.name} --${f.name}`, c, f] as [string, Command, NumberFlag]),
);

const step = (x: number): number => (x === 0 ? 1e-9 : Math.abs(x) * 1e-6);

/** Values just inside and just outside each end of an option's range. */
function edges(f: NumberFlag): { inside: number[]; outside: number[] } {
  const r = f.range;
  const whole = r.integer;
  const inside: number[] = [];
  const outside: number[] = [];
  if (r.min !== undefined) {
    inside.push(r.minInclusive ? r.min : r.min + (whole ? 1 : step(r.min)));
    outside.push(r.minInclusive ? r.min - (whole ? 1 : step(r.min)) : r.min);
  }
  if (r.max !== undefined) {
    inside.push(r.maxInclusive ? r.max : r.max - (whole ? 1 : step(r.max)));
    outside.push(r.maxInclusive ? r.max + (whole ? 1 : step(r.max)) : r.max);
  }
  return { inside, outside };
}

const argv = (c: Command, f: NumberFlag, v: number): string[] => [...c.positionals.map(() => 'd.json'), `--${f.name}`, String(v)];

describe('every numeric option of every command goes through one reader with a bounded range', () => {
  it('there are numeric options to check, including the condition overrides of each evaluating command', () => {
    const names = NUMBER_OPTIONS.map(([n]) => n);
    for (const c of ['point', 'evaluate', 'compare']) for (const o of ['vin', 'load', 'fs', 'ambient']) expect(names).toContain(`${c} --${o}`);
    for (const o of ['from', 'to', 'points', 'knee-points', 'vin', 'fs', 'ambient']) expect(names).toContain(`sweep --${o}`);
    for (const o of ['samples', 'seed', 'load']) expect(names).toContain(`tolerance --${o}`);
    for (const o of ['samples', 'seed']) expect(names).toContain(`report --${o}`);
  });

  it.each(NUMBER_OPTIONS)('%s: bounded below and above; just inside is read, just outside is refused naming option, value and range', (_n, c, f) => {
    expect(Number.isFinite(f.range.min) && Number.isFinite(f.range.max)).toBe(true);
    const { inside, outside } = edges(f);
    for (const v of inside) {
      const r = parseArgs(c, argv(c, f, v));
      expect(r.ok && r.args.numbers[f.name], `--${f.name} ${v}`).toBe(v);
    }
    for (const v of outside) {
      const r = parseArgs(c, argv(c, f, v));
      expect(r.ok, `--${f.name} ${v}`).toBe(false);
      if (r.ok) continue;
      expect(r.message).toContain(`"--${f.name}"${f.range.label === undefined ? '' : ` (${f.range.label})`} is ${describeValue(v, f.unit)}`); // team rules, Tests: the option (its on-screen label where it has one) and the value…
      expect(r.message).toContain(`allowed: ${optionRangeText(f.name, f.unit, f.range)}`); // …and the allowed range
    }
  });

  it('the condition options have the ranges of the design fields they stand for, and say so', () => {
    const evaluateCommand = COMMANDS.find((c) => c.name === 'evaluate');
    const flag = (name: string) => evaluateCommand?.flags.find((f) => f.name === name) as NumberFlag;
    expect(flag('vin').range).toEqual(CONDITION_RANGES.vinV);
    expect(flag('load').range).toEqual(CONDITION_RANGES.loadA);
    expect(flag('fs').range).toEqual(CONDITION_RANGES.switchingFrequencyHz);
    expect(flag('ambient').range).toEqual(CONDITION_RANGES.ambientC);
  });
});

describe('the audit cases of issue 10 §6: overrides from another universe are refused (exit 2), never printed as nulls', () => {
  it.each([
    [['evaluate', 'd.json', '--json', '--vin', '1e308'], 'wattledger evaluate: Option "--vin" (Input voltage) is 1e+308 V; allowed: 200 mV ≤ --vin ≤ 2 kV (the range of spec.vinNomV in a design file).'],
    [['evaluate', 'd.json', '--json', '--load', '1e300'], 'wattledger evaluate: Option "--load" (Load current) is 1e+300 A; allowed: 0 A ≤ --load ≤ 1 kA (the range of spec.ratedLoadA in a design file).'],
    [['sweep', 'd.json', '--json', '--vin', '1e308'], 'wattledger sweep: Option "--vin" (Input voltage) is 1e+308 V; allowed: 200 mV ≤ --vin ≤ 2 kV (the range of spec.vinNomV in a design file).'],
    [['point', 'd.json', '--json', '--load', '1e300'], 'wattledger point: Option "--load" (Load current) is 1e+300 A; allowed: 0 A ≤ --load ≤ 1 kA (the range of spec.ratedLoadA in a design file).'],
  ])('%j', async (args, first) => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(args, io)).toBe(EXIT.usage);
    expect(io.stdout).toBe('');
    expect(io.stderr.split('\n')[0]).toBe(first);
  });
});

describe('--fs overrides the switching frequency through the design\'s own validity rules', () => {
  const design = validateDesign(DEMO_DESIGNS.find((d) => d.id === 'synchronous-buck')?.json);

  it('evaluates at 600 kHz exactly as the engine does with that override', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['evaluate', 'd.json', '--json', '--fs', '600k'], io)).toBe(EXIT.ok);
    if (!design.ok) throw new Error('demo invalid');
    const out = JSON.parse(io.stdout) as { conditions: { switchingFrequencyHz: number }; totalLoss: number };
    expect(out.conditions.switchingFrequencyHz).toBe(600e3);
    expect(out.totalLoss).toBe(evaluate(design.design, { switchingFrequencyHz: 600e3 }).totalLoss);
  });

  it('refuses 1 kHz for this design (a 4.7 µH inductor would ripple by 541 A), naming --fs and the lowest valid frequency', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['evaluate', 'd.json', '--fs', '1k'], io)).toBe(EXIT.usage);
    expect(io.stdout).toBe('');
    expect(io.stderr).toContain('wattledger evaluate: the options do not fit this design:');
    expect(io.stderr).toContain('Switching frequency (--fs) (1 kHz) takes this design where the models mean nothing');
    expect(io.stderr).toContain('the inductor ripple would be 541.223 A peak to peak'); // 11.1 V·0.2291667/(4.7 µH·1 kHz), docs/methods.md §1
    expect(io.stderr).toMatch(/option: --fs \| value: 1000 Hz \(1 kHz\) \| allowed: --fs ≥ [\d.]+ kHz for this design/);
  });

  it('refuses a frequency for sweep and compare the same way', async () => {
    for (const args of [['sweep', 'd.json', '--fs', '19M'], ['compare', 'd.json', '--role', 'switch', '--parts', 'nfet-30v-8m,nfet-30v-4m5', '--fs', '19M']]) {
      const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
      expect(await runCli(args, io)).toBe(EXIT.usage);
      expect(io.stderr).toContain('allowed: --fs ≤ 17.3611 MHz for this design'); // dead times 40 ns in (1 − 3.3/10.8)/fs (docs/methods.md §1, worked here)
    }
  });
});
