/**
 * The brute-force cycle-by-cycle reference (test/reference/cycle-by-cycle.ts: the switched circuit
 * integrated by ODEX until the cycles repeat) checked against published closed forms (docs/methods.md §1–2)
 * and against the independent shooting reference (test/reference/steady-state.ts: exact interval
 * integration by matrix exponentials, periodic state solved directly). Both references feed the bench
 * (test/bench/bench.ts); neither uses the analytic engine's waveform model (the engine only supplies
 * the duty cycle that both references are driven at).
 */
import { describe, expect, it } from 'vitest';
import {
  conductionParameters,
  DEMO_DESIGNS,
  nominalConditions,
  solveOperatingPoint,
  uniformTemps,
  validateDesign,
} from '../../../shared-model/index.ts';
import type { Conditions, ConductionParameters, Design } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, METHODS_BUCK, conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';
import { simulateCycles, type CycleResult } from '../../reference/cycle-by-cycle.ts';
import { randomCases } from '../../reference/random-designs.ts';
import { referenceSteadyState, type ReferenceResult } from '../../reference/steady-state.ts';

/** Agreement asked of the two references (relative); measured worst 6.9e-6 on the set below (DCM boost with slow settling). */
const AGREEMENT = 2e-5;
const SLOW = { timeout: 120_000 };

describe('cycle-by-cycle reference against docs/methods.md closed forms', () => {
  it('ideal buck, stiff output: currents of docs/methods.md §1', () => {
    // With C = 1 F the output is a near-ideal voltage source, as the closed forms assume; its LC resonance
    // lasts ~5000 periods and is barely damped, so this checks the integration and the measurement over
    // three cycles from the ideal start, not the settling (settling is checked by the next two tests).
    const s = { ...METHODS_BUCK, outputCapacitanceF: 1 };
    const r = simulateCycles(designOf(s), conditionsOf(s), 5 / 12, conduction({ outputCapacitorEsrOhm: 0 }), { maxCycles: 3 });
    expect(r.mode).toBe('CCM'); // docs/methods.md §2: K = 2L/(R·Ts) = 6 > Kcrit 7/12
    closeTo(r.voutV, 5, 1e-6); // docs/methods.md §1: M = D
    closeTo(r.inductorPeakA, 3.291667, 1e-6); // docs/methods.md §1 check Ipk
    closeTo(r.branches.inductor.rmsA, 3.004722, 1e-6); // docs/methods.md §1 check IL,rms
    closeTo(r.branches.switch.rmsA, 1.93954, 1e-6); // docs/methods.md §1 check Isw,rms
    closeTo(r.branches.switch.averageA, 1.25, 1e-6); // docs/methods.md §1 check Isw avg
    closeTo(r.branches.rectifier.rmsA, 2.294895, 1e-6); // docs/methods.md §1 check Id,rms
    closeTo(r.branches.rectifier.averageA, 1.75, 1e-6); // docs/methods.md §1 check Id avg
    closeTo(r.branches.inputCapacitor.rmsA, 1.483009, 1e-6); // docs/methods.md §1 check ICin,rms
    closeTo(r.branches.outputCapacitor.rmsA, 0.168394, 1e-5); // docs/methods.md §1 check ICo,rms (given to 6 digits)
  });

  it('synchronous buck settles at 5 V when driven at the docs/methods.md §1 duty with its drops', SLOW, () => {
    const s = METHODS_BUCK; // C 22 µF: the output really moves, so the simulation must settle by itself
    const d = (5 + 3 * 0.01 + 3 * 0.02) / (12 - 3 * 0.01 + 3 * 0.01); // docs/methods.md §1 synchronous-buck formula, R_HS = R_LS 10 mΩ, DCR 20 mΩ
    closeTo(d, 0.424167, 0, 5e-7); // docs/methods.md §1 check D 0.424167 (given to 6 decimals)
    const r = simulateCycles(designOf(s), conditionsOf(s), d, conduction({ switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02, outputCapacitorEsrOhm: 0 }), { startOutputV: 4.5 });
    expect(r.converged).toBe(true); // steady state reached from 10 % below target (cycle-by-cycle.ts criterion)
    expect(r.cycles).toBeGreaterThan(50); // it had to settle: 10 % off at the start (LC resonance ~47 periods, RC ~18 periods)
    closeTo(r.voutV, 5, 1e-6); // docs/methods.md §1 check: Vo 5 V at D 0.424167
  });

  it('diode buck settles at 5 V when driven at the docs/methods.md §1 duty with its drops', SLOW, () => {
    const s = { ...METHODS_BUCK, rectifier: 'diode' as const };
    const d = (5 + 0.45 + 3 * 0.02) / (12 - 3 * 0.02 + 0.45); // docs/methods.md §1 diode-buck formula, VF 0.45 V, Ron 20 mΩ, DCR 20 mΩ
    closeTo(d, 0.444713, 0, 5e-7); // docs/methods.md §1 check D 0.444713 (given to 6 decimals)
    const r = simulateCycles(designOf(s), conditionsOf(s), d, conduction({ switchOnOhm: 0.02, diodeVf0V: 0.45, inductorDcrOhm: 0.02, outputCapacitorEsrOhm: 0 }), { startOutputV: 4.5 });
    expect(r.converged).toBe(true); // steady state reached from 10 % below target
    expect(r.mode).toBe('CCM'); // docs/methods.md §2: K = 6 > Kcrit 1 − D
    closeTo(r.voutV, 5, 1e-6); // docs/methods.md §1 check: Vo 5 V at D 0.444713
  });

  it('DCM with a blocking diode: docs/methods.md §2 check', () => {
    // C = 1 F again (a stiff output as the closed forms assume); the inductor restarts from 0 every cycle,
    // so the rectifier stop, peak and RMS below come from the zero-crossing handling, not from the start.
    const k = 0.2;
    const vo = 12 * (2 / (1 + Math.sqrt(1 + (4 * k) / 0.09))); // docs/methods.md §2: M at K 0.2, D 0.3
    const s = { ...METHODS_BUCK, rectifier: 'diode' as const, voutV: vo, loadA: vo / 50, outputCapacitanceF: 1 };
    const r = simulateCycles(designOf(s), conditionsOf(s), 0.3, IDEAL);
    expect(r.mode).toBe('DCM'); // docs/methods.md §2: K 0.2 < Kcrit 0.7
    closeTo(r.voutV, 5.790583, 1e-6); // docs/methods.md §2 check Vo
    closeTo(r.rectifierFraction, 0.321699, 2e-6); // docs/methods.md §2 check D2
    closeTo(r.inductorPeakA, 0.372565, 2e-6); // docs/methods.md §2 check Ipk
    closeTo(r.branches.inductor.averageA, 0.115812, 5e-6); // docs/methods.md §2 check mean IL = Vo/R
    closeTo(r.branches.inductor.rmsA, 0.169602, 5e-6); // docs/methods.md §2 check RMS inductor
    closeTo(r.branches.switch.rmsA, 0.117815, 5e-6); // docs/methods.md §2 check RMS switch
    closeTo(r.branches.rectifier.rmsA, 0.122002, 5e-6); // docs/methods.md §2 check RMS diode
  });
});

interface Case {
  label: string;
  design: Design;
  conditions: Conditions;
  cp: ConductionParameters;
  start?: { startInductorA: number; startOutputV: number };
}

/** Relative differences between the two references, by quantity (means relative to the branch RMS). */
function differences(sim: CycleResult, ref: ReferenceResult): Record<string, number> {
  const out: Record<string, number> = {};
  const rel = (a: number, b: number, scale = Math.abs(b)) => (a === b ? 0 : Math.abs(a - b) / scale);
  for (const name of Object.keys(ref.branches) as (keyof ReferenceResult['branches'])[]) {
    const r = ref.branches[name];
    const c = sim.branches[name];
    if (r.rmsA === 0 && c.rmsA === 0) continue;
    out[`${name} mean (÷ RMS)`] = rel(c.averageA, r.averageA, r.rmsA);
    out[`${name} RMS`] = rel(c.rmsA, r.rmsA);
    out[`${name} conduction loss`] = rel(c.conductionLossW, r.conductionLossW);
  }
  const il = ref.branches.inductor.rmsA;
  out['output voltage'] = rel(sim.voutV, ref.voutV);
  out['input current'] = rel(sim.inputA, ref.inputA);
  out['inductor peak (÷ RMS)'] = rel(sim.inductorPeakA, ref.inductorPeakA, il);
  out['inductor valley (÷ RMS)'] = rel(sim.inductorValleyA, ref.inductorValleyA, il);
  out['rectifier fraction (absolute)'] = Math.abs(sim.rectifierFraction - ref.rectifierFraction);
  return out;
}

function demoCases(): Case[] {
  return DEMO_DESIGNS.map((d) => {
    const v = validateDesign(d.json);
    if (!v.ok) throw new Error(`demo design ${d.id} is invalid`);
    const conditions = nominalConditions(v.design);
    return { label: `demo ${d.id}`, design: v.design, conditions, cp: conductionParameters(v.design, uniformTemps(conditions.ambientC)) };
  });
}

describe('cycle-by-cycle reference against the shooting reference', () => {
  const demos = demoCases();
  const fromRest = demos.find((c) => c.label.endsWith('hot-fin-buck'));
  const cases: Case[] = [
    ...demos,
    ...(fromRest ? [{ ...fromRest, label: `${fromRest.label} started from rest (0 A, 0 V)`, start: { startInductorA: 0, startOutputV: 0 } }] : []),
    // One design of each of the 12 families (buck/boost × rectifier × light-load behaviour × CCM/DCM/reverse), every sense location.
    ...randomCases(20240601, 1).map((c) => { // the seed of time-domain.test.ts, one design per family
      const conditions = nominalConditions(c.design, { loadA: c.loadA });
      return { label: c.label, design: c.design, conditions, cp: conductionParameters(c.design, uniformTemps(conditions.ambientC)) };
    }),
  ];
  const worst = new Map<string, number>();

  it('covers the three demo designs, a start from rest and all twelve random families', () => {
    expect(demos.length).toBe(DEMO_DESIGNS.length); // every demo design is valid
    expect(cases.length).toBe(DEMO_DESIGNS.length + 1 + 12); // random-designs.ts FAMILIES: 12
  });

  for (const c of cases) {
    it(`${c.label}: agrees within ${AGREEMENT}`, SLOW, () => {
      const duty = solveOperatingPoint(c.design, c.conditions, c.cp).dutyCycle; // both references driven at the same duty
      const sim = simulateCycles(c.design, c.conditions, duty, c.cp, c.start ?? {});
      const ref = referenceSteadyState(c.design, c.conditions, duty, c.cp);
      expect(sim.converged).toBe(true); // cycle-by-cycle.ts: change < 1e-9 on 3 consecutive cycles within the cap
      expect(sim.mode).toBe(ref.mode); // each reference decides the conduction mode on its own
      const diff = differences(sim, ref);
      for (const [q, e] of Object.entries(diff)) worst.set(q, Math.max(worst.get(q) ?? 0, e));
      const over = Object.entries(diff).filter(([, e]) => !(e <= AGREEMENT));
      expect(over).toEqual([]); // shooting reference (test/reference/steady-state.ts), independent method
    });
  }

  it('summary: largest difference per quantity', () => {
    const table = [...worst.entries()].map(([q, e]) => `${q.padEnd(34)} ${e.toExponential(2)}`).join('\n');
    console.info(`cycle-by-cycle vs shooting, largest relative difference over ${cases.length} cases:\n${table}`);
    expect(worst.size).toBeGreaterThan(15); // every compared quantity was seen
    expect(Math.max(...worst.values())).toBeLessThanOrEqual(AGREEMENT); // shooting reference, independent method
  });
});
