import { describe, expect, it } from 'vitest';
import { solveOperatingPoint, type ConductionParameters, type OperatingPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, METHODS_BUCK, conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';
import type { DesignSketch } from '../../helpers/designs.ts';

/** A loss that depends on the operating point the way the ledger's does: I²R of every element plus overlap. */
function lossModel(cp: ConductionParameters) {
  let calls = 0;
  const lossOf = (op: OperatingPoint) => {
    calls++;
    const overlap = 0.5 * op.edges.turnOff.voltageV * op.edges.turnOff.currentA * 10e-9 * op.conditions.switchingFrequencyHz; // docs/methods.md §4 shape, 10 ns
    return (
      op.stats.switch.rmsA ** 2 * cp.switchOnOhm +
      op.stats.rectifier.rmsA ** 2 * cp.rectifierOnOhm +
      cp.diodeVf0V * op.stats.rectifier.averageA +
      op.inductor.rmsA ** 2 * cp.inductorDcrOhm +
      overlap
    );
  };
  return { lossOf, calls: () => calls };
}

describe('solveOperatingPoint with lossOf (power balance)', () => {
  it('a loss of Pout·(1/η − 1) with η = 0.9 gives D = Vo/(η·Vin) = 0.462963', () => {
    const op = solveOperatingPoint(designOf(METHODS_BUCK), conditionsOf(METHODS_BUCK), IDEAL, {
      lossOf: (p) => p.outputPowerW * (1 / 0.9 - 1),
    });
    closeTo(op.dutyCycle, 0.462963, 0, 5e-7); // docs/methods.md §1 check: D from η = 0.9
    expect(op.dutyMethod).toBe('power-balance'); // the record says how D was found
    closeTo(12 * op.waveforms.inputA, 15 / 0.9, 1e-12); // Pin = Pout/η
  });

  const cases: [string, DesignSketch, Partial<ConductionParameters>][] = [
    ['sync buck CCM', METHODS_BUCK, { switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02 }],
    ['diode buck DCM', { ...METHODS_BUCK, rectifier: 'diode', loadA: 0.1 }, { switchOnOhm: 0.02, diodeVf0V: 0.4, inductorDcrOhm: 0.02 }],
    ['diode boost CCM', { kind: 'boost', rectifier: 'diode', vinV: 12, voutV: 24, loadA: 1, fsHz: 400e3, inductanceH: 22e-6 }, { switchOnOhm: 0.03, diodeVf0V: 0.5, inductorDcrOhm: 0.05 }],
    ['sync boost DCM (diode emulation)', { kind: 'boost', rectifier: 'synchronous', lightLoad: 'diode-emulation', vinV: 12, voutV: 24, loadA: 0.05, fsHz: 400e3, inductanceH: 22e-6 }, { switchOnOhm: 0.03, rectifierOnOhm: 0.03, inductorDcrOhm: 0.05 }],
  ];
  for (const [name, sketch, drops] of cases) {
    it(`balances Vin·Iin = Pout + loss to 1e-12 with a duty-dependent loss: ${name}`, () => {
      const cp = conduction(drops);
      const model = lossModel(cp);
      const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), cp, { lossOf: model.lossOf });
      const pin = sketch.vinV * op.waveforms.inputA;
      closeTo(pin, op.outputPowerW + model.lossOf(op), 1e-12); // conservation of energy over one period
      expect(model.calls()).toBeLessThanOrEqual(9); // speed budget of the brief (≤ 20 µs per converged point): few loss calls
      const vs = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), cp);
      expect(op.dutyCycle).toBeGreaterThan(vs.dutyCycle); // the overlap loss needs more duty than the drops alone
      expect(op.mode).toBe(vs.mode); // a few % of duty does not cross the mode boundary here
    });
  }

  it('with only the conduction losses of its own drops the power balance lands on the volt-second duty', () => {
    const cp = conduction({ switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02 });
    const conductionOnly = (op: OperatingPoint) =>
      op.stats.switch.averageA * 3 * 0.01 + op.stats.rectifier.averageA * 3 * 0.01 + 9 * 0.02; // Io·R drops at the mean current
    const pb = solveOperatingPoint(designOf(METHODS_BUCK), conditionsOf(METHODS_BUCK), cp, { lossOf: conductionOnly });
    closeTo(pb.dutyCycle, 0.424167, 0, 5e-7); // docs/methods.md §1 check (the drops the formula is built on)
  });

  it('light-load fallback: a loss the load current cannot carry keeps the volt-second duty and says so', () => {
    const s: DesignSketch = { ...METHODS_BUCK, lightLoad: 'diode-emulation' };
    const op = solveOperatingPoint(designOf(s), conditionsOf(s, { loadA: 0 }), IDEAL, { lossOf: () => 0.12 });
    expect(op.dutyCycle).toBe(0); // volt-second duty at zero load in DCM (docs/methods.md §2 limit K → 0)
    closeTo(op.waveforms.inputA * 12, 0.12, 1e-12); // the source still pays the loss
    expect(op.warnings.find((w) => w.code === 'model-limit')?.severity).toBe('caution'); // the model limit is said, not hidden
    expect(op.regulated).toBe(true); // the volt-second point itself regulates
  });

  it('sourceLossOf adds to the input current but not to the duty', () => {
    const base = solveOperatingPoint(designOf(METHODS_BUCK), conditionsOf(METHODS_BUCK), IDEAL);
    const op = solveOperatingPoint(designOf(METHODS_BUCK), conditionsOf(METHODS_BUCK), IDEAL, { sourceLossOf: () => 0.06 });
    expect(op.dutyCycle).toBe(base.dutyCycle); // SolveOptions contract: source losses do not move D
    closeTo(op.waveforms.inputA, base.waveforms.inputA + 0.06 / 12, 1e-12); // extra source power over Vin
  });

  it('a non-finite loss is a programmer error', () => {
    expect(() => // brief: programmer errors throw
      solveOperatingPoint(designOf(METHODS_BUCK), conditionsOf(METHODS_BUCK), IDEAL, { lossOf: () => Number.NaN }),
    ).toThrow(/lossOf/);
  });
});
