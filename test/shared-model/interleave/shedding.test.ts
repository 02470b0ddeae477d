import { describe, expect, it } from 'vitest';
import { evaluatePhases, findCrossover, phasedEvaluator, phaseShedding, sweepWithLandmarks, type Design } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { allDirect } from '../../helpers/ledger-designs.ts';

/** An invented 4-phase 12 V → 1.8 V synchronous buck, 60 A, 400 kHz, 1 µH per phase. */
function fourPhase(edit?: (d: Design) => void): Design {
  const d = makeDesign({
    kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 1.8, loadA: 60, fsHz: 400e3, inductanceH: 1e-6,
    switchOhm: 0.004, rectifierOhm: 0.002, dcr20Ohm: 0.0005, idRatingA: 100, outputCapacitanceF: 100e-6, outputCount: 6,
  });
  d.topology.phases = 4;
  allDirect(d, 5);
  edit?.(d);
  return d;
}

describe('findCrossover', () => {
  it('finds I* = √(P0·n(n − 1)/b) of the loss model n·P0 + b·I²/n', () => {
    const P0 = 0.35;
    const b = 0.004;
    const loads = Array.from({ length: 50 }, (_, j) => 0.5 * 1.12 ** j);
    for (let n = 2; n <= 6; n++) {
      const loss = (k: number, I: number) => k * P0 + (b * I * I) / k;
      const found = findCrossover((I) => loss(n, I) - loss(n - 1, I), loads);
      closeTo(found!, Math.sqrt((P0 * n * (n - 1)) / b), 1e-6, 0, { n }); // docs/methods.md §12 loss model, §15 (worked here)
    }
  });

  it('returns null when the difference never changes sign, and skips unusable grid points', () => {
    const loads = [1, 2, 3, 4, 5];
    expect(findCrossover(() => -1, loads)).toBeNull();
    expect(findCrossover(() => 1, loads)).toBeNull();
    expect(findCrossover((I) => (I === 3 ? null : 2.5 - I), loads)).toBeNull();
  });
});

describe('phaseShedding on a 4-phase buck', () => {
  const d = fourPhase();
  const s = phaseShedding(d);
  const cross = (n: number) => s.landmarks.find((l) => l.fromPhases === n)!.crossoverA!;

  it('finds a crossover for 4 → 3, 3 → 2 and 2 → 1, spaced as the fixed-plus-I² model says', () => {
    expect(s.landmarks.map((l) => [l.fromPhases, l.found])).toEqual([[4, true], [3, true], [2, true]]);
    // Per-phase loss P0 + a·(I/n) + b·(I/n)²: the a·I part is the same for every n, so I*(n → n − 1) ∝ √(n(n − 1))
    // (docs/methods.md §12 model, §15 worked here); the engine's losses are close to that form (ripple and
    // temperature make them only close), hence 3 %.
    closeTo(cross(3) / cross(2), Math.sqrt(3), 0.03);
    closeTo(cross(4) / cross(2), Math.sqrt(6), 0.03);
  });

  it('at each crossover both counts lose the same; below it one phase fewer loses less, above it more', () => {
    for (const l of s.landmarks) {
      const at = (n: number, loadA: number) => evaluatePhases(d, { loadA }, { activePhases: n }).totalLoss;
      const c = l.crossoverA!;
      closeTo(at(l.fromPhases, c), at(l.toPhases, c), 1e-5, 0, l); // definition of the crossover (our own, docs/methods.md §15)
      expect(at(l.fromPhases, 0.8 * c)).toBeGreaterThan(at(l.toPhases, 0.8 * c));
      expect(at(l.fromPhases, 1.25 * c)).toBeLessThan(at(l.toPhases, 1.25 * c));
      expect(l.lossSavedAtShedW!).toBeGreaterThan(0);
    }
  });

  it('suggests a 10 % band when the design sets none, and uses the design’s own band otherwise', () => {
    expect(s.hysteresisSuggested).toBe(true);
    closeTo(s.landmarks[0]!.addAboveA! / s.landmarks[0]!.shedBelowA!, 1.05 / 0.95, 1e-12);
    const own = phaseShedding(fourPhase((x) => { x.topology.phaseShedding = { hysteresisFraction: 0.2 }; }), { points: 20 });
    expect(own.enabled && !own.hysteresisSuggested).toBe(true);
    closeTo(own.landmarks[0]!.addAboveA! / own.landmarks[0]!.shedBelowA!, 1.1 / 0.9, 1e-12);
  });

  it('the envelope runs one phase at light load, all four at full load, and is never below the all-phase curve', () => {
    // Not monotonic in between: in forced PWM a phase's turn-on becomes hard-switched once its valley
    // current turns positive (docs/methods.md §4), a step in its loss that can make the curves cross twice.
    const counts = s.envelope.map((e) => e.activePhases);
    expect(counts[0]).toBe(1);
    expect(counts[counts.length - 1]).toBe(4);
    s.envelope.forEach((e, j) => expect(e.efficiency).toBeGreaterThanOrEqual(s.curves[3]!.points[j]!.efficiency));
  });

  it('says why when shedding never pays: a one-phase loss without fixed part', () => {
    // Gate charge and Coss tiny and no core: nearly no fixed loss, so more phases always lose less.
    const lean = fourPhase((x) => {
      x.topology.phases = 2;
      x.spec.switchingFrequencyHz = 50e3;
      x.parts.inductor.inductanceH = 20e-6;
    });
    const r = phaseShedding(lean, { fromA: 20, toA: 70, points: 12 });
    const l = r.landmarks[0]!;
    expect(l.found).toBe(false);
    expect(l.reason).toMatch(/never saves loss/);
  });
});

describe('sweeps of a multiphase design through the evaluator seam', () => {
  it('the load sweep with every phase gives evaluatePhases’ efficiency, and optimal shedding beats it at light load', () => {
    const d = fourPhase();
    const all = sweepWithLandmarks(d, { fromA: 2, toA: 60, points: 8, evaluator: phasedEvaluator(d, 'all') });
    const best = sweepWithLandmarks(d, { fromA: 2, toA: 60, points: 8, evaluator: phasedEvaluator(d, 'optimal') });
    closeTo(all.sweep.points[7]!.efficiency, evaluatePhases(d, { loadA: 60 }).efficiency, 1e-12);
    expect(best.sweep.points[0]!.efficiency).toBeGreaterThan(all.sweep.points[0]!.efficiency + 0.01);
    expect(all.landmarks.peak.load).not.toBeNull();
  });
});
