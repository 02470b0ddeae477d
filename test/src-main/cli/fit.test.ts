/**
 * `wattledger fit` (issue 12 §4): JSON with parameters (name, initial, fitted, lower95, upper95),
 * residualRms before and after and correlations; exit 1 with every problem for a bad CSV; exit 2 for a
 * parameter the design does not offer. The measurement is synthetic: the demo buck with its switching
 * charge ×1.3, evaluated by the engine, plus seeded noise — so the truth is known.
 */
import { demoDesign, demoText } from '../../helpers/demo.ts';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';

import { benchPoints, syntheticMeasurement } from '../../shared-model/fit/synthetic.ts';
import { memoryIo } from './memory-io.ts';

const design = demoDesign('synchronous-buck');
const measured = syntheticMeasurement(design, { truth: { switchCharge: 1.3 }, points: benchPoints(design, 16), seed: 3, lossNoiseW: 0.005 });
const csv = ['VinV,loadA,inputPowerW', ...measured.points.map((p) => `${p.vinV},${p.loadA},${p.inputPowerW}`)].join('\n');

describe('wattledger fit', () => {
  it('prints the fitted parameters with 95 % intervals, residual RMS before and after, and correlations as JSON', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck'), 'm.csv': csv });
    expect(await runCli(['fit', 'd.json', 'm.csv', '--params', 'switchCharge,quiescent', '--json'], io)).toBe(EXIT.ok); // exit 0 like the other commands
    const out = JSON.parse(io.stdout);
    expect(out.parameters.map((p: { name: string }) => p.name)).toEqual(['switchCharge', 'quiescent']);
    const q = out.parameters[0];
    expect(Object.keys(q)).toEqual(expect.arrayContaining(['name', 'initial', 'fitted', 'lower95', 'upper95'])); // issue 12 §4 keys
    expect(q.lower95).toBeLessThanOrEqual(1.3); // the truth set by the synthetic measurement lies inside the interval
    expect(q.upper95).toBeGreaterThanOrEqual(1.3);
    expect(out.residualRms.after.lossW).toBeLessThan(out.residualRms.before.lossW); // the fit explains the gap it was given
    expect(out.correlations.matrix).toHaveLength(2);
    expect(out.caution).toMatch(/only as good as the measurements/);
  });

  it('prints tables with the summary, the intervals and the caution', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck'), 'm.csv': csv });
    expect(await runCli(['fit', 'd.json', 'm.csv', '--params', 'switchCharge'], io)).toBe(EXIT.ok);
    expect(io.stdout).toMatch(/the gap is mostly switching loss/); // the charge scale moves switching loss (docs/methods.md §4)
    expect(io.stdout).toMatch(/95 % interval/);
    expect(io.stdout).toMatch(/Caution: Estimates only/); // team brief rule 4
  });

  it('exits 1 with every problem of a bad CSV, naming line, column and value', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck'), 'm.csv': 'vinV,loadA,efficiency\n12,1,1.2\n12,x,0.9\n' });
    expect(await runCli(['fit', 'd.json', 'm.csv'], io)).toBe(EXIT.invalidDesign); // issue 12 §4: exit 1 for a bad CSV
    expect(io.stderr).toContain('"m.csv" is not a usable measurement (2 problems)');
    expect(io.stderr).toContain('line: 2 | column: efficiency | value: 1.2');
    expect(io.stderr).toContain('line: 3 | column: loadA | value: x');
  });

  it('exits 2 for a parameter the design does not offer', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck'), 'm.csv': csv });
    expect(await runCli(['fit', 'd.json', 'm.csv', '--params', 'rectifierDrop'], io)).toBe(EXIT.usage); // a synchronous design has no diode drop
    expect(io.stderr).toContain('The parameter "rectifierDrop" cannot be fitted for this design');
  });
});
