/**
 * `wattledger report` argument handling: each mistake is a usage error (exit 2) or an invalid-design
 * error (exit 1) with a sentence naming the option or the field; nothing is written.
 */
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../src-main/cli/main.ts';
import { memoryIo } from '../cli/memory-io.ts';
import { demoText } from '../../helpers/demo.ts';

describe('wattledger report, usage', () => {
  it('asks for the output file when -o is missing', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['report', 'd.json'], io)).toBe(2);
    expect(io.stderr).toMatch(/-o FILE/);
  });

  it('refuses a paper size other than A4 or Letter, naming the option', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['report', 'd.json', '-o', 'x.html', '--page', 'A5'], io)).toBe(2);
    expect(io.stderr).toMatch(/--page" must be A4 or Letter; got "A5"/);
  });

  it('refuses a date not written YYYY-MM-DD', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['report', 'd.json', '-o', 'x.html', '--date', '2/12/2026'], io)).toBe(2);
    expect(io.stderr).toMatch(/--date" must be a date written YYYY-MM-DD/);
  });

  it('needs both the role and two parts for a comparison', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['report', 'd.json', '-o', 'x.html', '--compare-role', 'switch'], io)).toBe(2);
    expect(io.stderr).toMatch(/--compare-role ROLE and --compare-parts/);
  });

  it('lists every problem of an invalid design with its path and writes nothing', async () => {
    const broken = JSON.parse(demoText('synchronous-buck')) as { spec: { voutV: number } };
    broken.spec.voutV = -3;
    const io = memoryIo({ 'd.json': JSON.stringify(broken) });
    expect(await runCli(['report', 'd.json', '-o', 'x.html'], io)).toBe(1);
    expect(io.stderr).toMatch(/path: spec\.voutV/);
    expect(io.stdout).not.toMatch(/Wrote/);
  });

  it('shows -o in its help', async () => {
    const io = memoryIo();
    expect(await runCli(['report', '--help'], io)).toBe(0);
    expect(io.stdout).toMatch(/-o, --output FILE/);
  });
});
