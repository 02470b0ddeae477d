import { describe, expect, it } from 'vitest';
import { compareParts, DEMO_PARTS_LIBRARY, validatePartsLibrary } from '../../../shared-model/index.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { memoryIo } from './memory-io.ts';
import { demoDesign as design, demoText } from '../../helpers/demo.ts';

describe('wattledger compare', () => {
  it('compares library parts in a role as JSON equal to the engine', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['compare', 'd.json', '--role', 'switch', '--parts', 'nfet-30v-8m,nfet-30v-2m6', '--json'], io)).toBe(EXIT.ok); // exit 0 (EXIT.ok)
    const out = JSON.parse(io.stdout);
    expect(out.alternatives.map((a: { partId: string }) => a.partId)).toEqual(['nfet-30v-8m', 'nfet-30v-2m6']); // in the order given
    const lib = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    if (!lib.ok) throw new Error('library');
    const parts = ['nfet-30v-8m', 'nfet-30v-2m6'].map((id) => lib.library.parts.find((p) => p.id === id)!);
    const engine = compareParts(design('synchronous-buck'), { role: 'switch', parts });
    if (!engine.ok) throw new Error('engine refused');
    expect(out.crossovers).toEqual(JSON.parse(JSON.stringify(engine.comparison.crossovers))); // the CLI adds nothing to the engine
    expect(out.alternatives[1].atLoad.totalLoss).toBe(engine.comparison.alternatives[1].evaluation.totalLoss); // the CLI adds nothing to the engine
    expect(out.cautions.join(' ')).toMatch(/Estimates only/); // team brief rule 4
  });

  it('prints side-by-side ledgers and the crossover section', async () => {
    const io = memoryIo({ 'd.json': demoText('diode-boost') });
    expect(await runCli(['compare', 'd.json', '--role', 'rectifier', '--parts', 'schottky-40v-3a,schottky-60v-5a', '--load', '500m'], io)).toBe(EXIT.ok); // exit 0
    expect(io.stdout).toMatch(/Loss ledger at 500 mA/); // --load with engineering entry
    expect(io.stdout).toMatch(/Crossover loads/); // issue 4: crossover load where the winner changes
    expect(io.stdout).toMatch(/Caution: Estimates only/); // team brief rule 4
  });

  it('exits 2 naming the unknown part and the parts that fit, or a wrong role', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['compare', 'd.json', '--role', 'switch', '--parts', 'nfet-30v-8m,no-such-part'], io)).toBe(EXIT.usage); // exit codes as the other commands
    expect(io.stderr).toMatch(/no part "no-such-part".*nfet-30v-4m5/); // team brief rule 6: the value and what is allowed
    expect(await runCli(['compare', 'd.json', '--role', 'heater', '--parts', 'a,b'], io)).toBe(EXIT.usage); // an unknown role is a usage error
    expect(io.stderr).toMatch(/must be one of switch, rectifier/); // team brief rule 6: the allowed values
    expect(await runCli(['compare', 'd.json', '--role', 'switch', '--parts', 'nfet-30v-8m'], io)).toBe(EXIT.usage); // two or more parts
    expect(await runCli(['compare', 'd.json', '--role', 'switch', '--parts', 'nfet-30v-8m,ind-4u7-9a'], io)).toBe(EXIT.usage); // an inductor cannot be the switch
    expect(io.stderr).toMatch(/allowed: mosfet/); // team brief rule 6: the allowed values
  });
});
