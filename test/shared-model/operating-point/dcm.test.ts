import { describe, expect, it } from 'vitest';
import { solveOperatingPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, conditionsOf, designOf } from '../../helpers/operating-point.ts';
import type { DesignSketch } from '../../helpers/designs.ts';

const HALF = 5e-7; // docs/methods.md prints 6 decimals: half a unit of the last digit
const L = 10e-6;
const FS = 500e3;
const TS = 1 / FS;

/** docs/methods.md §2 buck conversion ratio in DCM: M = 2/(1 + √(1 + 4K/D²)), K = 2L/(R·Ts). */
const buckM = (k: number, d: number) => 2 / (1 + Math.sqrt(1 + (4 * k) / (d * d)));
/** docs/methods.md §2 boost conversion ratio in DCM: M = (1 + √(1 + 4D²/K))/2. */
const boostM = (k: number, d: number) => (1 + Math.sqrt(1 + (4 * d * d) / k)) / 2;

function buckAt(r: number, vo: number, extra: Partial<DesignSketch> = {}): DesignSketch {
  return { kind: 'buck', rectifier: 'diode', vinV: 12, voutV: vo, loadA: vo / r, fsHz: FS, inductanceH: L, ...extra };
}

describe('solveOperatingPoint — DCM buck (docs/methods.md §2 check)', () => {
  const k = (2 * L) / (50 * TS);
  const vo = 12 * buckM(k, 0.3);
  const sketch = buckAt(50, vo);
  const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), IDEAL);

  it('K, M and Vo match the check values', () => {
    closeTo(k, 0.2, 1e-12); // docs/methods.md §2 check K
    closeTo(vo / 12, 0.482549, 0, HALF); // docs/methods.md §2 check M
    closeTo(vo, 5.790583, 0, HALF); // docs/methods.md §2 check Vo
  });

  it('the solver finds D = 0.3 in DCM with D2, Ipk and mean current of the check', () => {
    expect(op.mode).toBe('DCM'); // docs/methods.md §2: K 0.2 < Kcrit 0.7
    closeTo(op.dutyCycle, 0.3, 1e-10); // docs/methods.md §2 check D
    closeTo(op.rectifierFraction, 0.321699, 0, HALF); // docs/methods.md §2 check D2
    closeTo(op.inductor.peakA, 0.372565, 0, HALF); // docs/methods.md §2 check Ipk
    closeTo(op.inductor.averageA, 0.115812, 0, HALF); // docs/methods.md §2 check mean IL = Vo/R
    closeTo(op.idleFraction, 1 - 0.3 - op.rectifierFraction, 1e-12); // definition of the idle interval
    expect(op.warnings.map((w) => w.code)).toEqual(['dcm']); // issue 2 §3: DCM is a typed warning
  });

  it('gives the triangle RMS values of the check', () => {
    closeTo(op.inductor.rmsA, 0.169602, 0, HALF); // docs/methods.md §2 check RMS inductor
    closeTo(op.stats.switch.rmsA, 0.117815, 0, HALF); // docs/methods.md §2 check RMS switch
    closeTo(op.stats.rectifier.rmsA, 0.122002, 0, HALF); // docs/methods.md §2 check RMS diode
    const ipk = op.inductor.peakA;
    closeTo(op.stats.switch.rmsA, ipk * Math.sqrt(0.3 / 3), 1e-12); // docs/methods.md §2: switch Ipk√(D/3)
    closeTo(op.inductor.rmsA, ipk * Math.sqrt((0.3 + op.rectifierFraction) / 3), 1e-12); // docs/methods.md §2: Ipk√((D + D2)/3)
  });

  it('DCM edges: turn-on at zero current (not hard), turn-off at the peak, full swing from the start of the idle interval', () => {
    expect(op.edges.turnOn.currentA).toBe(0); // docs/methods.md §2: DCM starts each period from zero current
    expect(op.edges.turnOn.hard).toBe(false); // zero-current turn-on: no overlap loss (docs/methods.md §4 needs Ion > 0)
    closeTo(op.edges.turnOff.currentA, 0.372565, 0, HALF); // docs/methods.md §2 check Ipk
    closeTo(op.edges.turnOn.voltageV, 12, 1e-12); // ideal parts: when the rectifier stops, the node is at 0 V and the switch blocks Vin (idle ringing not modelled: conservative, common practice)
  });
});

describe('solveOperatingPoint — the CCM/DCM boundary', () => {
  it('at K = Kcrit the DCM ratio equals the CCM ratio (buck, Kcrit = 1 − D)', () => {
    const d = 0.3;
    const r = (2 * L) / ((1 - d) * TS); // K = Kcrit
    closeTo(buckM((2 * L) / (r * TS), d), d, 1e-12); // docs/methods.md §2: at K = Kcrit the DCM ratio equals the CCM ratio
    const sketch = buckAt(r, 12 * d);
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), IDEAL);
    closeTo(op.dutyCycle, d, 1e-10); // docs/methods.md §2 boundary
    closeTo(op.inductor.valleyA, 0, 0, 1e-12); // docs/methods.md §2: valley reaches 0 at the boundary
    closeTo(op.rectifierFraction, 1 - d, 1e-9); // D2 = D' at the boundary
    const lighter = solveOperatingPoint(designOf(sketch), conditionsOf(sketch, { loadA: sketch.loadA * 0.999 }), IDEAL);
    const heavier = solveOperatingPoint(designOf(sketch), conditionsOf(sketch, { loadA: sketch.loadA * 1.001 }), IDEAL);
    expect([lighter.mode, heavier.mode]).toEqual(['DCM', 'CCM']); // docs/methods.md §2: DCM when K < Kcrit
    expect(Math.abs(lighter.dutyCycle - d)).toBeLessThan(1e-3); // continuity across the boundary
  });

  it('at K = Kcrit the boost DCM ratio equals 1/D\' (Kcrit = D·D\'²)', () => {
    const d = 0.4;
    const kcrit = d * (1 - d) ** 2;
    closeTo(boostM(kcrit, d), 1 / (1 - d), 1e-12); // docs/methods.md §2: at K = Kcrit the DCM ratio equals the CCM ratio
    const r = (2 * L) / (kcrit * TS);
    const vo = 12 / (1 - d);
    const sketch: DesignSketch = { kind: 'boost', rectifier: 'diode', vinV: 12, voutV: vo, loadA: vo / r, fsHz: FS, inductanceH: L };
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), IDEAL);
    closeTo(op.dutyCycle, d, 1e-9); // docs/methods.md §2 boundary
    closeTo(op.inductor.valleyA, 0, 0, 1e-9); // valley reaches 0 at the boundary
  });
});

describe('solveOperatingPoint — DCM boost (docs/methods.md §2 formulas)', () => {
  it('reproduces M, D2 = D/(M − 1) and Ipk = Vin·D·Ts/L', () => {
    const d = 0.3;
    const r = 200;
    const k = (2 * L) / (r * TS);
    const m = boostM(k, d);
    const sketch: DesignSketch = { kind: 'boost', rectifier: 'diode', vinV: 12, voutV: 12 * m, loadA: (12 * m) / r, fsHz: FS, inductanceH: L };
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), IDEAL);
    expect(op.mode).toBe('DCM'); // docs/methods.md §2: K 0.05 < Kcrit D·D'² = 0.147
    closeTo(op.dutyCycle, d, 1e-10); // docs/methods.md §2 boost M formula inverted by the solver
    closeTo(op.rectifierFraction, d / (m - 1), 1e-10); // docs/methods.md §2: D2 = D/(M − 1)
    const ipk = (12 * d * TS) / L;
    closeTo(op.inductor.peakA, ipk, 1e-10); // docs/methods.md §2: Ipk = Vin·D·Ts/L
    closeTo(op.stats.rectifier.rmsA, ipk * Math.sqrt(op.rectifierFraction / 3), 1e-10); // docs/methods.md §2: Ipk√(D2/3)
    closeTo(op.stats.rectifier.averageA, sketch.loadA, 1e-10); // output charge balance: mean diode current = Io
    closeTo(op.edges.turnOn.voltageV, sketch.voutV, 1e-9); // ideal parts: when the diode stops, the boost switch node is at Vo (idle ringing toward Vin not modelled: conservative, common practice)
  });
});

describe('solveOperatingPoint — light load of a synchronous rectifier', () => {
  const sketch: DesignSketch = { kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 5, loadA: 0.1, fsHz: FS, inductanceH: L };
  it('forced PWM stays in CCM and carries reverse inductor current', () => {
    const op = solveOperatingPoint(designOf({ ...sketch, lightLoad: 'forced-pwm' }), conditionsOf(sketch), IDEAL);
    expect(op.mode).toBe('CCM'); // docs/methods.md §2: forced PWM stays in CCM
    closeTo(op.dutyCycle, 5 / 12, 1e-12); // docs/methods.md §1: ideal CCM ratio holds at any load
    closeTo(op.inductor.valleyA, 0.1 - 0.583333 / 2, 0, HALF); // docs/methods.md §1 ΔI with IL = Io: valley below 0
    expect(op.inductor.valleyA).toBeLessThan(0); // docs/methods.md §2: forced PWM carries negative current
    expect(op.edges.turnOn.hard).toBe(false); // reverse current discharges the node before turn-on
    expect(op.stats.rectifier.minA).toBeLessThan(0); // the rectifier MOSFET conducts the reverse current
    expect(op.warnings.map((w) => [w.code, w.severity])).toEqual([['negative-current', 'info']]); // brief: warn 'negative-current' as info
  });

  it('diode emulation enters DCM', () => {
    const op = solveOperatingPoint(designOf({ ...sketch, lightLoad: 'diode-emulation' }), conditionsOf(sketch), IDEAL);
    expect(op.mode).toBe('DCM'); // docs/methods.md §2: diode emulation enters DCM
    expect(op.inductor.valleyA).toBe(0); // docs/methods.md §2: diode emulation stops at zero current
    expect(op.stats.rectifier.minA).toBe(0); // no reverse current through an emulated diode
    expect(op.dutyCycle).toBeLessThan(5 / 12); // docs/methods.md §2: DCM M > D, so D < M
  });

  it('zero load: diode emulation skips pulses (D = 0), forced PWM keeps D = Vo/Vin', () => {
    const de = solveOperatingPoint(designOf({ ...sketch, lightLoad: 'diode-emulation' }), conditionsOf(sketch, { loadA: 0 }), IDEAL);
    expect(de.dutyCycle).toBe(0); // docs/methods.md §2: M = 1 as K → 0 needs D → 0
    expect(de.inductor.rmsA).toBe(0); // no pulses, no current
    const fp = solveOperatingPoint(designOf(sketch), conditionsOf(sketch, { loadA: 0 }), IDEAL);
    closeTo(fp.dutyCycle, 5 / 12, 1e-12); // docs/methods.md §1 ideal CCM ratio
    closeTo(fp.inductor.averageA, 0, 0, 1e-12); // charge balance: mean IL = Io = 0
  });
});
