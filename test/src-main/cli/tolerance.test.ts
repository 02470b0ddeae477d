import { describe, expect, it } from 'vitest';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { memoryIo } from './memory-io.ts';
import { demoText } from '../../helpers/demo.ts';

describe('wattledger tolerance', () => {
  it('reproduces the Monte Carlo exactly for the same seed and shows the seed', async () => {
    const run = async (seed: string) => {
      const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
      expect(await runCli(['tolerance', 'd.json', '--json', '--samples', '100', '--seed', seed], io)).toBe(EXIT.ok); // exit 0 (EXIT.ok)
      return JSON.parse(io.stdout);
    };
    const a = await run('42');
    const b = await run('42');
    const c = await run('43');
    expect(b.monteCarlo).toEqual(a.monteCarlo); // issue 4: the same seed reproduces exactly (MT19937, prng.ts)
    expect(c.monteCarlo.efficiency).not.toEqual(a.monteCarlo.efficiency); // another seed, other samples
    expect(a.monteCarlo.seed).toBe(42); // issue 4: the seed is visible
    expect(a.worstCase.cornerCount).toBe(128); // 2⁷ corners of seven two-level tolerances
    expect(a.worstCase.worstEfficiency.label).toMatch(/RDS\(on\) \+20 %/); // docs/methods.md §1: conduction loss rises with RDS(on)
    expect(a.cautions.join(' ')).toMatch(/Estimates only/); // team brief rule 4
  });

  it('prints corners, distributions, the seed and the cautions as tables', async () => {
    const io = memoryIo({ 'd.json': demoText('hot-fin-buck') });
    expect(await runCli(['tolerance', 'd.json', '--samples', '50', '--seed', '9'], io)).toBe(EXIT.ok); // exit 0
    expect(io.stdout).toMatch(/worst efficiency/); // issue 4: corner of worst efficiency named
    expect(io.stdout).toMatch(/worst temperature/); // issue 4: corner of worst temperature named
    expect(io.stdout).toMatch(/seed 9/); // the seed the user can see
    expect(io.stdout).toMatch(/Over touch limit/); // issue 4: fraction of samples over a limit
    expect(io.stdout).toMatch(/Caution: Estimates only/); // team brief rule 4
  });

  it('exits 2 for a bad seed or sample count', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['tolerance', 'd.json', '--seed', '-1'], io)).toBe(EXIT.usage); // exit codes as the other commands
    expect(io.stderr).toContain('"--seed" is -1; allowed: a whole number, 0 ≤ --seed ≤ 4294967295.'); // team brief rule 6: name the option and the range
    expect(await runCli(['tolerance', 'd.json', '--samples', '1.5'], io)).toBe(EXIT.usage); // samples must be a whole number: usage error
  });
});
