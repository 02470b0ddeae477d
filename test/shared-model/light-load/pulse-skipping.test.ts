/**
 * Pulse skipping (PFM) at light load (light-load/pulse-skipping.ts): one pulse against the hand working of
 * docs/methods.md §14, the engine's pulse-skipping point against the independent time-domain reference
 * (test/reference/steady-state.ts, driven at the engine's duty over the pulse period), losses scaling with
 * the pulse rate, the sleep current, the zero-load boost, and the mode-change landmark.
 */
import { describe, expect, it } from 'vitest';
import {
  conductionParameters,
  evaluate,
  sweepLoad,
  findLandmarks,
  nominalConditions,
  solveOperatingPoint,
  uniformTemps,
  validateDesign,
  type Design,
} from '../../../shared-model/index.ts';
import { circuitOf } from '../../../shared-model/operating-point/circuit.ts';
import { pulseOf, pulseSkippingAt, solveConditions } from '../../../shared-model/light-load/pulse-skipping.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL } from '../../helpers/operating-point.ts';
import { makeDesign, type DesignSketch } from '../../helpers/designs.ts';
import { compareWithReference } from '../../reference/compare.ts';
import { referenceSteadyState } from '../../reference/steady-state.ts';

const PFM = { minPeakCurrentA: 0.5, sleepCurrentA: 20e-6 };

function pfmDesign(s: DesignSketch, pfm = PFM): Design {
  const d = makeDesign({ ...s, lightLoad: 'pulse-skipping' });
  const v = validateDesign({ ...d, topology: { ...d.topology, pulseSkipping: pfm } });
  if (!v.ok) throw new Error(v.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return v.design;
}

// docs/methods.md §14 check circuit: buck 12 V → 3.3 V, L 4.7 µH, Ipk 0.5 A (fs 500 kHz chosen here).
const BUCK: DesignSketch = { kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 3.3, loadA: 1, fsHz: 500e3, inductanceH: 4.7e-6, outputCapacitanceF: 47e-6 };
// A boost worked here: 5 V → 12 V, L 10 µH, Ipk 0.4 A, fs 400 kHz.
const BOOST: DesignSketch = { kind: 'boost', rectifier: 'diode', vinV: 5, voutV: 12, loadA: 0.5, fsHz: 400e3, inductanceH: 10e-6, outputCapacitanceF: 47e-6 };

describe('one pulse against the hand working (docs/methods.md §14)', () => {
  it('buck: t_on, t_off, charge per pulse and the pulse rate at 10 mA', () => {
    const d = pfmDesign(BUCK);
    const cond = nominalConditions(d, { loadA: 0.01 });
    const p = pulseOf(circuitOf(d, cond, IDEAL), 0.5, 3.3)!;
    closeTo(p.onS, 270.11e-9, 2e-5); // docs/methods.md §14: t_on = L·Ipk/(Vin − Vo) = 270.11 ns
    closeTo(p.offS, 712.12e-9, 2e-5); // docs/methods.md §14: t_off = L·Ipk/Vo = 712.12 ns
    closeTo(p.outputChargeC, 245.559e-9, 2e-6); // docs/methods.md §14: Q = Ipk·(t_on + t_off)/2
    const state = pulseSkippingAt(d, cond, IDEAL)!;
    expect(state.active).toBe(true); // 10 mA < Q·fs = 122.8 mA
    closeTo(state.pulseRateHz, 40.723e3, 2e-5); // docs/methods.md §14: 40.723 kHz at 10 mA
    closeTo(state.modeChangeLoadA!, 245.559e-9 * 500e3, 2e-6); // I_change = Q·fs (docs/methods.md §14, worked here)
    closeTo(state.awakeFraction, (270.11e-9 + 712.12e-9) * 40.723e3, 1e-4); // awake while a pulse runs (worked here)
  });

  it('boost: charge to the output only while the rectifier conducts', () => {
    const d = pfmDesign({ ...BOOST }, { minPeakCurrentA: 0.4, sleepCurrentA: 20e-6 });
    const cond = nominalConditions(d, { loadA: 5e-3 });
    const p = pulseOf(circuitOf(d, cond, IDEAL), 0.4, 12)!;
    closeTo(p.onS, (10e-6 * 0.4) / 5, 1e-12); // docs/methods.md §14: t_on = L·Ipk/Vin = 0.8 µs
    closeTo(p.offS, (10e-6 * 0.4) / 7, 1e-12); // docs/methods.md §14: t_off = L·Ipk/(Vo − Vin) = 0.571429 µs
    closeTo(p.outputChargeC, 0.2 * (4e-6 / 7), 1e-12); // docs/methods.md §14: Q = Ipk·t_off/2 = 114.286 nC
    closeTo(pulseSkippingAt(d, cond, IDEAL)!.pulseRateHz, 5e-3 / (0.2 * (4e-6 / 7)), 1e-12); // f = Io/Q = 43.75 kHz (worked here)
  });
});

describe('the pulse-skipping point against the time-domain reference', () => {
  const cases: [string, DesignSketch, number][] = [
    ['synchronous buck at 20 mA', { ...BUCK, switchOhm: 0.02, rectifierOhm: 0.015, dcr20Ohm: 0.03, outputEsrOhm: 0.005 }, 0.02],
    ['diode buck at 50 mA', { ...BUCK, rectifier: 'diode', vf0V: 0.35, rdOhm: 0.03, switchOhm: 0.03, dcr20Ohm: 0.03, outputEsrOhm: 0.005 }, 0.05],
    ['diode boost at 10 mA', { ...BOOST, vf0V: 0.35, rdOhm: 0.03, switchOhm: 0.03, dcr20Ohm: 0.03, outputEsrOhm: 0.005 }, 0.01],
    ['synchronous boost at 30 mA', { ...BOOST, rectifier: 'synchronous', switchOhm: 0.02, rectifierOhm: 0.02, dcr20Ohm: 0.03, outputEsrOhm: 0.005 }, 0.03],
  ];
  for (const [label, sketch, loadA] of cases) {
    it(`${label}: peak at the minimum, currents, packet ripple and output within 0.5 %`, () => {
      const d = pfmDesign(sketch, { minPeakCurrentA: sketch.kind === 'buck' ? 0.5 : 0.4, sleepCurrentA: 20e-6 });
      const cond = nominalConditions(d, { loadA });
      const cp = conductionParameters(d, uniformTemps(cond.ambientC));
      const state = pulseSkippingAt(d, cond, cp)!;
      expect(state.active).toBe(true); // drawn below the mode-change load
      const at = solveConditions(cond, state);
      const op = solveOperatingPoint(d, at, cp); // volt-second point at the pulse period
      const ref = referenceSteadyState(d, at, op.dutyCycle, cp);
      expect(ref.mode).toBe('DCM'); // time-domain reference: the inductor rests between pulses
      closeTo(ref.inductorPeakA, state.minPeakA, 5e-3); // time-domain reference: the pulse reaches the minimum peak
      const over = compareWithReference(d, op, cp, ref).filter((x) => !(x.error <= 0.005));
      expect(over).toEqual([]); // time-domain reference, tolerance 0.5 % (issue 2 §4)
    });
  }
});

describe('the ledger in pulse skipping', () => {
  const sketch: DesignSketch = { ...BUCK, switchOhm: 0.02, rectifierOhm: 0.015, dcr20Ohm: 0.03, outputEsrOhm: 0.005 };
  const d = pfmDesign(sketch);

  it('per-pulse losses scale with the pulse rate: turn-off loss at 40 mA is twice that at 20 mA', () => {
    const loss = (load: number) => evaluate(d, { loadA: load }).losses.filter((t) => t.mechanism === 'turn-off overlap').reduce((a, t) => a + t.watts, 0);
    const a = loss(0.02);
    const b = loss(0.04);
    expect(a).toBeGreaterThan(0);
    closeTo(b / a, 2, 0.02); // docs/methods.md §14: losses scale with the pulse rate (the peak moves < 1 % with the power balance)
  });

  it('the controller sleeps between pulses: quiescent loss Vin·(Iq·a + I_sleep·(1 − a))', () => {
    const e = evaluate(d, { loadA: 0.01 });
    const q = e.losses.find((t) => t.mechanism === 'quiescent')!;
    const cond = nominalConditions(d, { loadA: 0.01 });
    const state = pulseSkippingAt(d, cond, conductionParameters(d, uniformTemps(cond.ambientC)))!;
    const iq = d.parts.controller.quiescentA;
    closeTo(q.watts, 12 * (iq * state.awakeFraction + 20e-6 * (1 - state.awakeFraction)), 1e-9); // docs/methods.md §14: sleep current between packets (worked here)
    expect(e.warnings.some((w) => w.code === 'pulse-skipping')).toBe(true); // says so
    expect(e.operatingPoint.conditions.switchingFrequencyHz).toBeCloseTo(state.pulseRateHz, 6); // the equivalent switching frequency
  });

  it('is more efficient at 10 mA than diode emulation at the switching frequency', () => {
    const emul = { ...d, topology: { ...d.topology, lightLoad: 'diode-emulation' as const } };
    expect(evaluate(d, { loadA: 0.01 }).efficiency).toBeGreaterThan(evaluate(emul, { loadA: 0.01 }).efficiency); // common practice: the reason controllers skip pulses
  });

  it('the mode-change load is a landmark of the sweep, at Q·fs', () => {
    const sweep = sweepLoad(d, { points: 24, fromA: 0.01 });
    const marks = findLandmarks(sweep, { design: d });
    const cond = nominalConditions(d);
    const state = pulseSkippingAt(d, { ...cond, loadA: marks.pulseSkipping.load! }, conductionParameters(d, uniformTemps(cond.ambientC)))!;
    closeTo(marks.pulseSkipping.load!, state.modeChangeLoadA!, 1e-6); // I_change = Q·fs (docs/methods.md §14)
    expect(marks.pulseSkipping.value).toBeGreaterThan(0); // efficiency there
  });
});

describe('zero load on a boost with pulse skipping: one consistent story', () => {
  it('no pulses carry current, the output is held, the controller sleeps, nothing contradicts', () => {
    const d = pfmDesign({ ...BOOST, vf0V: 0.35, rdOhm: 0.03, switchOhm: 0.03, dcr20Ohm: 0.03 }, { minPeakCurrentA: 0.4, sleepCurrentA: 20e-6 });
    const e = evaluate(d, { loadA: 0 });
    expect(e.converged).toBe(true); // a fixed point exists
    expect(e.operatingPoint.regulated).toBe(true); // the output is held at its target
    closeTo(e.operatingPoint.voutV, 12, 1e-12);
    expect(e.warnings.some((w) => w.code === 'pulse-skipping')).toBe(true); // the story: pulse skipping
    expect(e.warnings.some((w) => w.code === 'not-converged' || w.code === 'cannot-regulate')).toBe(false); // nothing contradicts it
    expect(e.efficiency).toBe(0); // no output power
    for (const t of e.losses) expect(Number.isFinite(t.watts) && t.watts >= 0).toBe(true);
    closeTo(e.losses.find((t) => t.mechanism === 'quiescent')!.watts, 5 * 20e-6, 1e-12); // only the sleep current: Vin·I_sleep (worked here)
  });
});

describe('every sweep point says the rate the converter switches at (issue 10 §2, equivalent switching frequency)', () => {
  it('below the mode change it is the pulse rate Io/Q, above it the switching frequency', () => {
    const d = pfmDesign(BUCK);
    const sweep = sweepLoad(d, { fromA: 0.01, toA: 1, points: 7 });
    const first = sweep.points[0]!;
    expect(first.loadA).toBe(0.01);
    closeTo(first.equivalentSwitchingHz, 40.723e3, 0.02); // docs/methods.md §14: 40.723 kHz at 10 mA (ideal parts; the sketch's drops move it by under 2 %)
    expect(first.switchingFrequencyHz).toBe(500e3); // the design's own frequency stays in its column
    const last = sweep.points.at(-1)!;
    expect(last.loadA).toBeGreaterThan(245.559e-9 * 500e3); // above the mode change Q·fs = 122.8 mA (docs/methods.md §14)
    expect(last.equivalentSwitchingHz).toBe(500e3); // switching every period
    for (let i = 1; i < sweep.points.length; i++)
      expect(sweep.points[i]!.equivalentSwitchingHz).toBeGreaterThanOrEqual(sweep.points[i - 1]!.equivalentSwitchingHz); // f = Io/Q rises with the load (docs/methods.md §14)
  });
});
