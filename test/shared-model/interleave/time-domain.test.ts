/**
 * Interleaved phases against the project's time-domain reference (issue 13 §1 "Done when"): the engine's
 * shared-node currents — a buck's output ripple current (Σ iLk peak to peak) and input-capacitor RMS, a
 * boost's input ripple current and output-capacitor RMS — are sums of phase-shifted straight segments
 * (shared-model/interleave/phase-shift.ts); test/reference/interleaved.ts integrates the N-inductor circuit
 * with one shared output bank exactly (matrix exponentials) to periodic steady state at the engine's duty
 * and part temperatures. Switching, core and AC-winding losses are made negligible (as in
 * test/shared-model/ledger/time-domain.test.ts) so the engine's duty is the circuit's volt-second duty.
 * Tolerance: 0.5 % of the one-phase value (issue 3's reference tolerance) — relative to one phase because at
 * the cancellation points D = k/N the summed ripple is nearly zero.
 */
import { describe, expect, it } from 'vitest';
import { conductionParameters, esrAt, evaluatePhases, validateDesign, type Design } from '../../../shared-model/index.ts';
import { makeDesign, type DesignSketch } from '../../helpers/designs.ts';
import { allDirect, conductionOnly } from '../../helpers/ledger-designs.ts';
import { interleavedSteadyState, type InterleavedResult } from '../../reference/interleaved.ts';

const TOLERANCE = 0.005;


/** Invented stages: a 12 V synchronous buck at 8 A per phase, and a 5 V → 12 V diode boost at 1.5 A per phase. */
const BUCK: DesignSketch = {
  kind: 'buck', rectifier: 'synchronous', lightLoad: 'forced-pwm', vinV: 12, voutV: 3, loadA: 8, fsHz: 500e3, inductanceH: 2.2e-6,
  switchOhm: 0.006, rectifierOhm: 0.004, dcr20Ohm: 0.003, idRatingA: 100, outputCapacitanceF: 200e-6, outputEsrOhm: 0.002,
};
const BOOST: DesignSketch = {
  kind: 'boost', rectifier: 'diode', vinV: 5, voutV: 12, loadA: 1.5, fsHz: 400e3, inductanceH: 6.8e-6, vinMinV: 4, vinMaxV: 6,
  switchOhm: 0.01, dcr20Ohm: 0.01, vf0V: 0.3, rdOhm: 0.02, idRatingA: 60, ifRatingA: 30, outputCapacitanceF: 100e-6, outputEsrOhm: 0.005,
};

interface Case {
  label: string;
  design: Design;
  loadA: number;
}

function phased(sketch: DesignSketch, phases: number, voutV: number): Case {
  const d = conductionOnly(makeDesign({ ...sketch, voutV, loadA: sketch.loadA * phases }));
  d.topology.phases = phases;
  allDirect(d, 0.5);
  const v = validateDesign(d);
  if (!v.ok) throw new Error(v.problems.map((p) => p.message).join('\n'));
  return { label: `${sketch.kind} N = ${phases}, Vout ${voutV} V`, design: v.design, loadA: sketch.loadA * phases };
}

function compare(c: Case): { engine: Record<string, number>; reference: InterleavedResult; onePhase: Record<string, number>; duty: number } {
  const r = evaluatePhases(c.design, { loadA: c.loadA });
  expect(r.converged && r.regulated).toBe(true);
  expect(r.conductionMode).toBe('CCM');
  const one = r.phaseRecords[0]!;
  const t = (part: string) => one.temperatures.find((x) => x.part === part)?.celsius ?? one.conditions.ambientC;
  const cp = conductionParameters(c.design, { switchC: t('switch'), rectifierC: t('rectifier'), inductorC: t('inductor'), senseC: t('senseResistor') });
  const bank = c.design.parts.outputCapacitor;
  const bankC = r.temperatures.find((x) => x.part === 'outputCapacitor')?.celsius ?? one.conditions.ambientC;
  const synchronous = c.design.parts.rectifier.kind === 'mosfet';
  const reference = interleavedSteadyState({
    boost: c.design.topology.kind === 'boost',
    phases: r.activePhases,
    dutyCycle: r.dutyCycle,
    periodS: 1 / r.conditions.switchingFrequencyHz,
    vinV: r.conditions.vinV,
    loadA: c.loadA,
    inductanceH: c.design.parts.inductor.inductanceH,
    dcrOhm: cp.inductorDcrOhm,
    switchOhm: cp.switchOnOhm,
    rectifierOhm: synchronous ? cp.rectifierOnOhm : cp.diodeRdOhm,
    vf0V: synchronous ? 0 : cp.diodeVf0V,
    capacitanceF: bank.part.capacitanceF * bank.count,
    esrOhm: esrAt(bank.part, bankC) / bank.count,
  });
  expect(reference.minInductorA).toBeGreaterThan(0); // CCM in the circuit too
  return {
    engine: {
      ripple: r.shared.inductors.peakToPeakA,
      inputRms: r.shared.inputCapacitor.rmsA,
      outputRms: r.shared.outputCapacitor.rmsA,
      vout: one.operatingPoint.voutV,
    },
    onePhase: {
      ripple: r.shared.inductors.onePhasePeakToPeakA,
      inputRms: r.shared.inputCapacitor.onePhaseRmsA,
      outputRms: r.shared.outputCapacitor.onePhaseRmsA,
    },
    reference,
    duty: r.dutyCycle,
  };
}

const within = (engine: number, reference: number, scale: number, what: string) =>
  expect(Math.abs(engine - reference) / scale, `${what}: engine ${engine}, reference ${reference}`).toBeLessThanOrEqual(TOLERANCE);

// Buck: Vout 1.8, 3 and 5 V from 12 V, D ≈ 0.15, 0.25 (the N = 4 cancellation point), 0.42; the boost's Σ iL
// is its input ripple current. Each: output voltage at the engine's duty, Σ iL peak to peak, both banks' RMS.
const FAMILIES = [
  { name: 'buck', cases: [1, 2, 3, 4].flatMap((N) => [1.8, 3, 5].map((v) => phased(BUCK, N, v))) },
  { name: 'boost', cases: [1, 2, 3, 4].map((N) => phased(BOOST, N, 12)) },
];

for (const family of FAMILIES)
  describe(`interleaved ${family.name} against the N-inductor time-domain reference, N = 1 … 4`, () => {
    it.each(family.cases.map((c) => [c.label, c] as const))('%s', (_label, c) => {
      const { engine, reference, onePhase } = compare(c);
      within(engine.vout, reference.voutV, reference.voutV, 'output voltage at the engine duty');
      within(engine.ripple, reference.inductorSumPeakToPeakA, onePhase.ripple, 'Σ iL, peak to peak');
      within(engine.inputRms, reference.inputCapacitorRmsA, onePhase.inputRms, 'input-capacitor RMS');
      within(engine.outputRms, reference.outputCapacitorRmsA, onePhase.outputRms, 'output-capacitor RMS');
    });
  });

describe('the reference itself at the published 2-phase point', () => {
  it('gives K(2, 0.25) = 2/3 of one phase’s ripple and Io·√((D − m/N)((m + 1)/N − D)) = 5 A input RMS at 20 A, within 1 %', () => {
    // An ideal (lossless) 2-phase buck at D = 0.25 with a large inductance (flat-topped phase currents) and
    // a stiff output: docs/methods.md §15 (Zhou, Wong, Xu, Lee & Huang, IEEE TPEL 15(6) 2000 — from memory).
    const base = { boost: false, dutyCycle: 0.25, periodS: 2e-6, vinV: 12, loadA: 20, dcrOhm: 0, switchOhm: 0, rectifierOhm: 0, vf0V: 0, capacitanceF: 1, esrOhm: 0 };
    const two = interleavedSteadyState({ ...base, phases: 2, inductanceH: 1e-3 });
    expect(Math.abs(two.inputCapacitorRmsA - 5) / 5).toBeLessThan(0.01); // docs/methods.md §15 check: N = 2, D = 0.25, Io 20 A → 5 A
    const one = interleavedSteadyState({ ...base, phases: 1, inductanceH: 1e-3, loadA: 20 });
    expect(Math.abs(one.inputCapacitorRmsA - 8.660) / 8.660).toBeLessThan(0.01); // one phase Io·√(D(1 − D)) = 8.660 A, docs/methods.md §15
    const rippled = interleavedSteadyState({ ...base, phases: 2, inductanceH: 4.7e-6 });
    expect(Math.abs(rippled.inductorSumPeakToPeakA / rippled.inductorPeakToPeakA - 2 / 3)).toBeLessThan(0.01 * (2 / 3)); // K(2, 0.25), docs/methods.md §15
  });
});
