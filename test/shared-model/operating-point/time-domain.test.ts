/**
 * The analytic operating point against an independent time-domain reference (test/reference/):
 * the switched circuit integrated exactly interval by interval, periodic steady state by shooting,
 * load a resistor R = Vo/Io, every resistive element included.
 */
import { describe, expect, it } from 'vitest';
import {
  conductionParameters,
  nominalConditions,
  solveOperatingPoint,
  uniformTemps,
  validateDesign,
} from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, METHODS_BUCK, conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';
import { compareWithReference, type Discrepancy } from '../../reference/compare.ts';
import { FAMILIES, LAMBDA_MAX, randomCases } from '../../reference/random-designs.ts';
import { referenceSteadyState } from '../../reference/steady-state.ts';
import { intervalSystem, monomialSystem } from '../../reference/switched-circuit.ts';
import { applyTo, expm } from '../../reference/matrix.ts';
import { odexSolver } from '../../reference/odex.ts';

const TOLERANCE = 0.005; // issue 2 §4: within 0.5 % (and issue 3: conduction losses within 0.5 %)
const SEED = 20240601; // any seed; fixed so the set is reproducible
const PER_FAMILY = 5; // 12 families × 5 = 60 designs (issue 2 §4: at least 50)

describe('time-domain reference: checks of the reference itself', () => {
  it('its interval integration agrees with the ODEX integrator on states and ∫i² (odex, Hairer & Wanner)', () => {
    const values = { boost: false, inductanceH: 10e-6, capacitanceF: 22e-6, esrOhm: 0.01, loadLoopOhm: 5 / 3, onLoopOhm: 0.05, offLoopOhm: 0.04, vf0V: 0.4 };
    const sys = intervalSystem(values, 'on', 12);
    const t = 0.9e-6;
    const x0 = [2.7, 4.95];
    const e = expm(monomialSystem(sys, 1), 12, t);
    const m = applyTo(e, Float64Array.from([1, x0[0], x0[1], x0[0] ** 2, x0[0] * x0[1], x0[1] ** 2, 0, 0, 0, 0, 0, 0]), 12);
    const solver = odexSolver(3);
    solver.relativeTolerance = 1e-13;
    solver.absoluteTolerance = 1e-15;
    const [a00, a01, a10, a11] = sys.a;
    const res = solver.solve((_x, y) => [a00 * y[0] + a01 * y[1] + sys.b[0], a10 * y[0] + a11 * y[1] + sys.b[1], y[0] * y[0]], 0, [x0[0], x0[1], 0], t);
    expect(res.outcome).toBe(0); // odex: 0 = converged
    closeTo(m[1], res.y[0], 1e-10); // iL(t): matrix exponential vs ODEX (independent integrators)
    closeTo(m[2], res.y[1], 1e-10); // vC(t)
    closeTo(m[9], res.y[2], 1e-9); // ∫iL² dt: monomial moments vs ODEX quadrature state
  });

  it('reproduces the docs/methods.md §1 closed forms for ideal parts and a stiff output', () => {
    const s = { ...METHODS_BUCK, outputCapacitanceF: 1 }; // 1 F: output ripple negligible, as the closed forms assume
    const ref = referenceSteadyState(designOf(s), conditionsOf(s), 5 / 12, conduction({ outputCapacitorEsrOhm: 0 }));
    closeTo(ref.voutV, 5, 1e-6); // docs/methods.md §1: M = D
    closeTo(ref.branches.inductor.rmsA, 3.004722, 1e-6); // docs/methods.md §1 check IL,rms
    closeTo(ref.branches.switch.rmsA, 1.93954, 1e-6); // docs/methods.md §1 check Isw,rms
    closeTo(ref.branches.rectifier.rmsA, 2.294895, 1e-6); // docs/methods.md §1 check Id,rms
    closeTo(ref.branches.inputCapacitor.rmsA, 1.483009, 1e-6); // docs/methods.md §1 check ICin,rms
    closeTo(ref.branches.outputCapacitor.rmsA, 0.168394, 1e-5); // docs/methods.md §1 check ICo,rms
  });

  it('reproduces the docs/methods.md §2 DCM check with a blocking diode', () => {
    const k = 0.2;
    const vo = 12 * (2 / (1 + Math.sqrt(1 + (4 * k) / 0.09))); // docs/methods.md §2: M at K 0.2, D 0.3
    const s = { ...METHODS_BUCK, rectifier: 'diode' as const, voutV: vo, loadA: vo / 50, outputCapacitanceF: 1 };
    const ref = referenceSteadyState(designOf(s), conditionsOf(s), 0.3, IDEAL);
    expect(ref.mode).toBe('DCM'); // docs/methods.md §2: K 0.2 < Kcrit 0.7
    closeTo(ref.voutV, 5.790583, 1e-6); // docs/methods.md §2 check Vo
    closeTo(ref.rectifierFraction, 0.321699, 2e-6); // docs/methods.md §2 check D2
    closeTo(ref.inductorPeakA, 0.372565, 2e-6); // docs/methods.md §2 check Ipk
    closeTo(ref.branches.rectifier.rmsA, 0.122002, 5e-6); // docs/methods.md §2 check RMS diode
  });
});

describe('analytic operating point vs time-domain reference over seeded random designs', () => {
  const cases = randomCases(SEED, PER_FAMILY);

  it(`covers buck/boost × diode/synchronous × CCM/DCM/reverse current with ≥ 50 designs`, () => {
    expect(cases.length).toBe(FAMILIES.length * PER_FAMILY); // every family drawn PER_FAMILY times
    expect(cases.length).toBeGreaterThanOrEqual(50); // issue 2 §4
    expect(new Set(cases.map((c) => c.label.split(' ')[1].split('/').slice(0, 4).join('/'))).size).toBe(FAMILIES.length); // issue 2 §4 coverage
  });

  it('every drawn design is a valid design document', () => {
    const invalid = cases.filter((c) => !validateDesign(c.design).ok).map((c) => c.label);
    expect(invalid).toEqual([]); // the project's own validator (shared-model/design/validate.ts)
    expect(Math.max(...cases.map((c) => c.lambda))).toBeLessThanOrEqual(LAMBDA_MAX * (1 + 1e-12)); // the stated design space
  });

  const violations: { label: string; d: Discrepancy }[] = [];
  const worst = new Map<string, number>();
  for (const c of cases) {
    it(`${c.label} agrees within 0.5 %`, () => {
      const conditions = nominalConditions(c.design, { loadA: c.loadA });
      const cp = conductionParameters(c.design, uniformTemps(c.design.spec.ambientC));
      const op = solveOperatingPoint(c.design, conditions, cp);
      const ref = referenceSteadyState(c.design, conditions, op.dutyCycle, cp);
      expect(ref.mode).toBe(op.mode); // independent reference decides the conduction mode itself
      if (c.regime === 'dcm') expect(op.mode).toBe('DCM'); // drawn below the docs/methods.md §2 boundary
      if (c.regime === 'reverse') expect(op.inductor.valleyA).toBeLessThan(0); // forced PWM below the boundary (docs/methods.md §2)
      const found = compareWithReference(c.design, op, cp, ref);
      for (const d of found) {
        const key = d.quantity.replace(/ \(÷.*\)/, '');
        worst.set(key, Math.max(worst.get(key) ?? 0, d.error));
        if (!(d.error <= TOLERANCE)) violations.push({ label: c.label, d });
      }
      expect(found.filter((d) => !(d.error <= TOLERANCE))).toEqual([]); // time-domain reference, tolerance 0.5 % (issue 2 §4)
    });
  }

  it('summary: largest relative discrepancy per quantity stays within 0.5 %', () => {
    const table = [...worst.entries()].map(([q, e]) => `${q.padEnd(34)} ${(100 * e).toFixed(3)} %`).join('\n');
    console.info(`largest discrepancy per quantity over ${cases.length} designs:\n${table}`);
    expect(worst.size).toBeGreaterThan(15); // every compared quantity was seen
    expect(violations).toEqual([]); // time-domain reference, tolerance 0.5 % (issue 2 §4)
  });
});

describe('known limit: straight-line currents when resistive drops bend them (λ unbounded)', () => {
  // Measured over 240 designs (seed 99): the branch mean/RMS discrepancy stays below about 0.055·λ and
  // levels off near 1 % (test/reference/random-designs.ts header). This asserts that documented bound
  // on a fresh seeded set, so a regression of the model shows here too.
  const cases = randomCases(SEED + 1, 3, Infinity);
  it('branch means and RMS stay within 0.06·λ + 0.1 % and never beyond 1.5 %', () => {
    const over: string[] = [];
    for (const c of cases) {
      const conditions = nominalConditions(c.design, { loadA: c.loadA });
      const cp = conductionParameters(c.design, uniformTemps(c.design.spec.ambientC));
      const op = solveOperatingPoint(c.design, conditions, cp);
      const ref = referenceSteadyState(c.design, conditions, op.dutyCycle, cp);
      for (const d of compareWithReference(c.design, op, cp, ref)) {
        if (!/^(inductor|switch|rectifier) (RMS|mean)/.test(d.quantity)) continue;
        const bound = Math.min(0.06 * c.lambda + 0.001, 0.015); // measured bound (header of random-designs.ts)
        if (!(d.error <= bound)) over.push(`${c.label} λ ${c.lambda.toFixed(3)} ${d.quantity} ${(100 * d.error).toFixed(3)} %`);
      }
    }
    expect(Math.max(...cases.map((c) => c.lambda))).toBeGreaterThan(0.2); // the set does reach the bent regime
    expect(over).toEqual([]); // time-domain reference, measured bound (header of random-designs.ts)
  });
});
