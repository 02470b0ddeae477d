import { describe, expect, it } from 'vitest';
import { solveOperatingPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, METHODS_BUCK, conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';

const HALF = 5e-7; // docs/methods.md prints 6 decimals: half a unit of the last digit

describe('solveOperatingPoint — CCM buck (docs/methods.md §1)', () => {
  const design = designOf(METHODS_BUCK);
  const op = solveOperatingPoint(design, conditionsOf(METHODS_BUCK), IDEAL);

  it('ideal parts give D = Vo/Vin and the METHODS ripple and peak', () => {
    closeTo(op.dutyCycle, 0.416667, 0, HALF); // docs/methods.md §1 check D
    closeTo(op.inductor.rippleA, 0.583333, 0, HALF); // docs/methods.md §1 check ΔI
    closeTo(op.inductor.peakA, 3.291667, 0, HALF); // docs/methods.md §1 check Ipk
    expect(op.mode).toBe('CCM'); // docs/methods.md §2: K = 2L/(R·Ts) = 2·10µ/(1.667·2µ) = 6 > Kcrit 0.58
    expect(op.regulated).toBe(true); // D 0.416667 is below the 0.95 duty limit of the test design
    expect(op.warnings).toEqual([]); // CCM, within every rating of the test parts: nothing to warn
  });

  it('gives the exact RMS of every branch', () => {
    closeTo(op.inductor.rmsA, 3.004722, 0, HALF); // docs/methods.md §1 check IL,rms
    closeTo(op.stats.switch.rmsA, 1.93954, 0, HALF); // docs/methods.md §1 check Isw,rms 1.939540
    closeTo(op.stats.switch.averageA, 1.25, 1e-12); // docs/methods.md §1 check Isw,avg
    closeTo(op.stats.rectifier.rmsA, 2.294895, 0, HALF); // docs/methods.md §1 check Id,rms
    closeTo(op.stats.rectifier.averageA, 1.75, 1e-12); // docs/methods.md §1 check Id,avg
    closeTo(op.stats.inputCapacitor.rmsA, 1.483009, 0, HALF); // docs/methods.md §1 check ICin,rms
    closeTo(op.stats.outputCapacitor.rmsA, 0.168394, 0, HALF); // docs/methods.md §1 check ICo,rms
    const { dutyCycle: d, inductor } = op;
    const dI = inductor.rippleA;
    closeTo(op.stats.inputCapacitor.rmsA, Math.sqrt(d * (9 + dI ** 2 / 12) - d * d * 9), 1e-12); // docs/methods.md §1 buck input cap formula
    closeTo(op.stats.outputCapacitor.rmsA, dI / (2 * Math.sqrt(3)), 1e-12); // docs/methods.md §1 buck output cap ΔI/(2√3)
    closeTo(op.waveforms.inputA, d * 3, 1e-12); // charge balance: source DC = mean switch current = D·Io
  });

  it('reports the switching edges and the voltage stress', () => {
    closeTo(op.edges.turnOn.currentA, 3 - 0.583333 / 2, 0, HALF); // docs/methods.md §4: Ion = valley (IL − ΔI/2)
    closeTo(op.edges.turnOff.currentA, 3.291667, 0, HALF); // docs/methods.md §4: Ioff = peak
    expect(op.edges.turnOn.voltageV).toBe(12); // docs/methods.md §4: Vsw = Vin (buck), ideal rectifier
    expect(op.edges.turnOn.hard && op.edges.turnOff.hard).toBe(true); // docs/methods.md §4: CCM control switch is hard-switched
    expect(op.stress.switchV).toBe(12); // buck switch blocks Vin (ideal rectifier drop 0)
    expect(op.stress.rectifierV).toBe(12); // buck rectifier blocks Vin while the switch conducts (docs/methods.md §6 leakage example)
  });

  it('output ripple: capacitive ΔI/(8·fs·C) plus ESR, combined in time', () => {
    closeTo(op.outputRipple.capacitiveV, 0.583333 / (8 * 500e3 * 22e-6), 2e-6); // Erickson & Maksimović 2nd ed. ch. 2 [memory for chapter]
    expect(op.outputRipple.esrV).toBe(0); // no ESR in the ideal set
    const withEsr = solveOperatingPoint(design, conditionsOf(METHODS_BUCK), conduction({ outputCapacitorEsrOhm: 0.01 }));
    closeTo(withEsr.outputRipple.esrV, 0.01 * withEsr.inductor.rippleA, 1e-12); // ESR · ΔI (Ohm's law)
    expect(withEsr.outputRipple.totalV).toBeGreaterThan(withEsr.outputRipple.capacitiveV); // both add in time
    expect(withEsr.outputRipple.totalV).toBeLessThan(withEsr.outputRipple.capacitiveV + withEsr.outputRipple.esrV); // peaks are not aligned
  });
});

describe('solveOperatingPoint — duty with drops (docs/methods.md §1)', () => {
  const c = conditionsOf(METHODS_BUCK);
  it('synchronous buck: D = (Vo + Io·R_LS + Io·DCR)/(Vin − Io·R_HS + Io·R_LS)', () => {
    const cp = conduction({ switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02 });
    const op = solveOperatingPoint(designOf(METHODS_BUCK), c, cp);
    closeTo(op.dutyCycle, 0.424167, 0, HALF); // docs/methods.md §1 check
    closeTo(op.dutyCycle, (5 + 3 * 0.01 + 3 * 0.02) / (12 - 3 * 0.01 + 3 * 0.01), 1e-12); // docs/methods.md §1 formula
  });

  it('diode buck: D = (Vo + VF + Io·DCR)/(Vin − Io·Ron + VF)', () => {
    const sketch = { ...METHODS_BUCK, rectifier: 'diode' as const };
    const cp = conduction({ switchOnOhm: 0.02, diodeVf0V: 0.45, inductorDcrOhm: 0.02 });
    const op = solveOperatingPoint(designOf(sketch), c, cp);
    closeTo(op.dutyCycle, 0.444713, 0, HALF); // docs/methods.md §1 check
    closeTo(op.dutyCycle, (5 + 0.45 + 3 * 0.02) / (12 - 3 * 0.02 + 0.45), 1e-12); // docs/methods.md §1 formula
    const rd = solveOperatingPoint(designOf(sketch), c, conduction({ switchOnOhm: 0.02, diodeVf0V: 0.4, diodeRdOhm: 0.05 / 3, inductorDcrOhm: 0.02 }));
    closeTo(rd.dutyCycle, 0.444713, 0, HALF); // same VF = VF0 + Rd·Io = 0.45 V at 3 A (docs/methods.md §6 diode model)
  });

  it('output-capacitor ESR leaves the CCM buck duty unchanged (its current averages 0 in each interval)', () => {
    const cp = conduction({ switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02 });
    const a = solveOperatingPoint(designOf(METHODS_BUCK), c, cp).dutyCycle;
    const b = solveOperatingPoint(designOf(METHODS_BUCK), c, { ...cp, outputCapacitorEsrOhm: 0.05 }).dutyCycle;
    closeTo(b, a, 1e-13); // volt-second balance: ESR·(ī − Io) = 0 when each interval's mean is Io (docs/methods.md §1)
  });

  it('a sense resistor adds its drop to the path it sits in', () => {
    const base = { switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02, senseOhm: 0.015 };
    const solve = (senseLocation: 'input' | 'switch' | 'inductor' | 'output') =>
      solveOperatingPoint(designOf({ ...METHODS_BUCK, senseLocation, senseOhm: 0.015 }), c, conduction(base)).dutyCycle;
    const sync = (rHs: number, rLs: number, dcr: number, vo: number) => (vo + 3 * rLs + 3 * dcr) / (12 - 3 * rHs + 3 * rLs);
    closeTo(solve('switch'), sync(0.025, 0.01, 0.02, 5), 1e-12); // docs/methods.md §1 with R_HS + Rs (volt-second balance)
    closeTo(solve('inductor'), sync(0.01, 0.01, 0.035, 5), 1e-12); // docs/methods.md §1 with DCR + Rs
    closeTo(solve('output'), sync(0.01, 0.01, 0.02, 5 + 3 * 0.015), 1e-12); // docs/methods.md §1 with Vo + Io·Rs at the converter
    const d = solve('input'); // Vin' = Vin − Rs·D·Io: volt-second balance becomes quadratic in D
    closeTo(d * (12 - 0.015 * d * 3 - 3 * 0.01 + 3 * 0.01), 5 + 3 * 0.01 + 3 * 0.02, 1e-12); // docs/methods.md §1 with Vin − Rs·Iin
  });
});

describe('solveOperatingPoint — CCM boost (docs/methods.md §1)', () => {
  const sketch = { kind: 'boost' as const, rectifier: 'diode' as const, vinV: 12, voutV: 24, loadA: 1, fsHz: 400e3, inductanceH: 22e-6, outputCapacitanceF: 47e-6 };
  it('ideal parts: D = 1 − Vin/Vo, ΔI = Vin·D/(L·fs), exact capacitor RMS', () => {
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), IDEAL);
    closeTo(op.dutyCycle, 0.5, 1e-12); // docs/methods.md §1 boost M = 1/D'
    const dI = (12 * 0.5) / (22e-6 * 400e3);
    closeTo(op.inductor.rippleA, dI, 1e-12); // docs/methods.md §1 boost ΔI = Vin·D/(L·fs)
    closeTo(op.inductor.averageA, 2, 1e-12); // docs/methods.md §1: IL = Io/D'
    closeTo(op.stats.inputCapacitor.rmsA, dI / (2 * Math.sqrt(3)), 1e-12); // docs/methods.md §1 boost input cap ΔI/(2√3)
    closeTo(op.stats.outputCapacitor.rmsA, Math.sqrt(0.5 * (4 + dI ** 2 / 12) - 1), 1e-12); // docs/methods.md §1 boost output cap
    closeTo(op.stats.switch.rmsA, Math.sqrt(0.5 * (4 + dI ** 2 / 12)), 1e-12); // docs/methods.md §1: √(d(IL² + ΔI²/12)), d = D
    closeTo(op.edges.turnOff.voltageV, 24, 1e-12); // docs/methods.md §4: Vsw = Vo (boost)
  });

  it('diode boost: D solves Vin − IL(DCR + D·Ron) − D\'(Vo + VF) = 0 with IL = Io/D\'', () => {
    const cp = conduction({ switchOnOhm: 0.03, diodeVf0V: 0.5, inductorDcrOhm: 0.05 });
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), cp);
    const d = op.dutyCycle;
    const il = 1 / (1 - d);
    closeTo(12 - il * (0.05 + d * 0.03) - (1 - d) * (24 + 0.5), 0, 0, 1e-12); // docs/methods.md §1 boost volt-second root
    expect(d).toBeLessThan(0.6); // the root on the rising side (docs/methods.md §3: the other root lies beyond the maximum ratio)
  });

  it('synchronous boost: the same root with R_LS·IL in place of VF', () => {
    const s = { ...sketch, rectifier: 'synchronous' as const };
    const cp = conduction({ switchOnOhm: 0.03, rectifierOnOhm: 0.02, inductorDcrOhm: 0.05 });
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), cp);
    const d = op.dutyCycle;
    const il = 1 / (1 - d);
    closeTo(12 - il * (0.05 + d * 0.03) - (1 - d) * (24 + 0.02 * il), 0, 0, 1e-12); // docs/methods.md §1, synchronous analogue
  });
});
