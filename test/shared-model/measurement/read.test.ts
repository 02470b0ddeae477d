/**
 * Reading a bench measurement (issue 12 §1): the columns by quantity and unit, and a message naming the
 * line, the column, the value and what was expected for every bad cell; nothing half-imports.
 * The arithmetic checked here (percent to fraction, Pin = Vin·Iin, loss = Pout·(1/η − 1)) is the
 * definition of efficiency (docs/methods.md §18).
 */
import { describe, expect, it } from 'vitest';
import { measuredBalance, readMeasurement, type MeasurementProblem } from '../../../shared-model/index.ts';

import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign } from '../../helpers/demo.ts';

const design = demoDesign('synchronous-buck');

function problemsOf(text: string): MeasurementProblem[] {
  const read = readMeasurement(text, { design });
  if (read.ok) throw new Error('expected problems');
  return read.problems;
}

describe('readMeasurement', () => {
  it('reads efficiency, percent, input power and input current columns, headers in any case', () => {
    const a = readMeasurement('VinV,LOADA,efficiency,switchC\n12,1,0.9,45.5\n12,2,91.5 %,50\n', { design });
    expect(a.ok && a.measurement.points).toEqual([
      { vinV: 12, loadA: 1, efficiency: 0.9, temperaturesC: { switch: 45.5 } },
      { vinV: 12, loadA: 2, efficiency: 0.915, temperaturesC: { switch: 50 } },
    ]);
    const b = readMeasurement('vinV;loadA;efficiencyPct\n12;1;90\n', { design });
    expect(b.ok && b.measurement.points[0].efficiency).toBe(0.9);
    const c = readMeasurement('vinV\tloadA\tinputCurrentA\n12\t1\t0.3\n', { design }); // pasted from a spreadsheet: tabs
    expect(c.ok && c.measurement.points[0].inputCurrentA).toBe(0.3);
  });

  it('turns a measured point into its loss: Pout = Vout·I, loss = Pin − Pout', () => {
    const read = readMeasurement('vinV,loadA,inputCurrentA,voutV\n12,2,0.6,3.3\n', { design });
    if (!read.ok) throw new Error('read failed');
    const b = measuredBalance(read.measurement.points[0], design.spec.voutV);
    closeTo(b.inputPowerW, 7.2, 1e-12); // 12 V × 0.6 A
    closeTo(b.lossW, 7.2 - 6.6, 1e-12); // minus 3.3 V × 2 A
    const e = measuredBalance({ vinV: 12, loadA: 2, efficiency: 0.88 }, 3.3);
    closeTo(e.lossW, 6.6 * (1 / 0.88 - 1), 1e-12); // Pout·(1/η − 1), the design's Vout
  });

  it('names the line, column, value and the allowed range for an efficiency above 1', () => {
    const [p] = problemsOf('vinV,loadA,efficiency\n12,1,0.9\n12,2,91.5\n');
    expect(p).toMatchObject({ line: 3, column: 'efficiency', value: '91.5' });
    expect(p.message).toBe('Line 3, column efficiency: 91.5 is outside 0 < efficiency < 1 (a percentage needs a % sign, or use the column efficiencyPct).');
  });

  it('reports every problem at once and imports nothing', () => {
    const problems = problemsOf('vinV,loadA,efficiency\n12,abc,0.9\n12,1,0.9\n12,1,0.91\n-3,2,0.9\n12,2000,0.9\n');
    expect(problems.map((p) => [p.line, p.column])).toEqual([
      [2, 'loadA'],
      [4, 'loadA'],
      [5, 'vinV'],
      [6, 'loadA'],
    ]);
    expect(problems[0].message).toContain('"abc" is not a number');
    expect(problems[1].message).toContain('already given on line 3');
    expect(problems[2].message).toMatch(/-3 is outside 200 mV ≤ vinV ≤ 2 kV/);
    expect(problems[3].message).toMatch(/2000 is outside 0 A < loadA ≤ 1 kA/);
  });

  it('refuses unknown, repeated and missing columns by name', () => {
    const problems = problemsOf('vin,loadA,efficiency,Efficiency,notes\n12,1,0.9,0.9,x\n');
    const text = problems.map((p) => p.message).join('\n');
    expect(text).toContain('the column "vin" is not one WattLedger knows');
    expect(text).toContain('the column "notes" is not one WattLedger knows');
    expect(text).toContain('the column efficiency appears twice');
    expect(text).toContain('the column vinV is missing');
  });

  it('needs exactly one source of the input side', () => {
    expect(problemsOf('vinV,loadA\n12,1\n')[0].message).toContain('give exactly one of efficiency, efficiencyPct, inputPowerW, inputCurrentA');
    expect(problemsOf('vinV,loadA,efficiency,inputPowerW\n12,1,0.9,4\n')[0].message).toContain('found efficiency and inputPowerW');
  });

  it('refuses an input power not above the output power, and a temperature of a part the design lacks', () => {
    const [p] = problemsOf('vinV,loadA,inputPowerW\n12,2,6.5\n'); // 6.5 W in, 3.3 V × 2 A = 6.6 W out
    expect(p.message).toBe('Line 2: the input power 6.5 W is not above the output power 6.6 W (3.3 V × 2 A); check the columns and units.');
    const noSense = readMeasurement('vinV,loadA,efficiency,senseResistorC\n12,1,0.9,40\n', { design: demoDesign('hot-fin-buck') });
    const [q] = noSense.ok ? [] : noSense.problems;
    expect(q?.message).toContain('senseResistorC is a temperature of the senseResistor, which this design does not have');
  });
});
