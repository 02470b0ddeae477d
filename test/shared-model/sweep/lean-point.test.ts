/**
 * Sweeps and landmark probes take the ledger's lean evaluation (ledger/lean-evaluate.ts) instead of the
 * full Evaluation record. The independent check here is the full `evaluate`, called from scratch (a new
 * set-up for every point) at the same conditions and reduced to a sweep point by the same ColumnBook:
 * every SweepPoint, every landmark and every warning must be identical to the last bit (toStrictEqual),
 * on every demo design, on seeded random designs (fast-check) and on designs built to reach the slow
 * paths (runaway, duty limit, boost ratio limit, hot parts, burn hazards, saturation).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEMO_DESIGNS,
  evaluate,
  findLandmarks,
  loadProbe,
  sweepFrequency,
  sweepGrid,
  sweepLoad,
  validateDesign,
} from '../../../shared-model/index.ts';
import type { Design, PointEvaluator } from '../../../shared-model/index.ts';
import { ledgerContext } from '../../../shared-model/ledger/kernel.ts';
import { slotWatts } from '../../../shared-model/ledger/slots.ts';
import { newShape } from '../../../shared-model/operating-point/shape.ts';
import { dutyLimitOf, solveVoltSecond } from '../../../shared-model/operating-point/duty.ts';
import { circuitOf } from '../../../shared-model/operating-point/circuit.ts';
import { conductionParameters, nominalConditions, uniformTemps } from '../../../shared-model/operating-point/conditions.ts';
import { DIODE_BOOST, SYNC_BUCK, allDirect, arbitraryDesign, design as sketch, valid } from '../../helpers/ledger-designs.ts';
import { demoDesign as demo } from '../../helpers/demo.ts';

const SEED = 42;

/** The independent side: a full `evaluate` from scratch for every point (no reused set-up, no lean path). */
const fullFromScratch: PointEvaluator = (d, c) => evaluate(d, c);

/** Designs built to take the paths a demo rarely takes (invented parts, round numbers). */
function edgeDesigns(): { label: string; design: Design }[] {
  return [
    {
      label: 'runaway (leaky Schottky behind 120 K/W)',
      design: valid(sketch({ ...SYNC_BUCK, rectifier: 'diode' }, (x) => {
        allDirect(x, 30);
        x.thermal.paths.rectifier = { kind: 'direct', thetaJaKPerW: 120 };
        if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, leakageA: 5e-3, leakageAtC: 25, leakageDoublingK: 10 };
      })),
    },
    {
      label: 'hot parts, touchable, low Isat (over-temperature, burn-hazard and saturation warnings)',
      design: valid(sketch(SYNC_BUCK, (x) => {
        allDirect(x, 45);
        x.parts.inductor = { ...x.parts.inductor, isatA: 3.2 };
        x.thermal.touch = { switch: { touchable: true, surface: 'plastic' }, inductor: { touchable: true, surface: 'metal' } };
      })),
    },
    {
      label: 'boost at its duty limit (slow path, unregulated points)',
      design: valid(sketch(DIODE_BOOST, (x) => {
        x.spec.maxDuty = 0.6;
      })),
    },
  ];
}

/** Sweep, landmarks (refined on the engine) and a frequency sweep: lean against the full record. */
function expectLeanEqualsFull(label: string, d: Design, points: number): void {
  const s = d.spec;
  const options = { points, fromA: 0.003 * s.ratedLoadA, toA: 3 * s.ratedLoadA };
  const lean = sweepLoad(d, options);
  const full = sweepLoad(d, { ...options, evaluator: fullFromScratch });
  expect(lean, label).toStrictEqual(full); // independent check: full evaluate at each point, reduced by the same ColumnBook
  expect(findLandmarks(lean, { design: d }), label).toStrictEqual(findLandmarks(full, { design: d, evaluator: fullFromScratch })); // same independent check, landmark probes
}

describe('lean sweep points equal the points recorded from the full evaluate', () => {
  for (const { id } of DEMO_DESIGNS) {
    it(`${id}: default sweep and landmarks, a wide load range, another Vin and ambient, a frequency sweep`, () => {
      const d = demo(id);
      expect(sweepLoad(d)).toStrictEqual(sweepLoad(d, { evaluator: fullFromScratch })); // independent check: full evaluate per point
      expectLeanEqualsFull(id, d, 60);
      const hot = { points: 40, conditions: { vinV: d.spec.vinMaxV, ambientC: d.spec.ambientC + 30 } };
      expect(sweepLoad(d, hot)).toStrictEqual(sweepLoad(d, { ...hot, evaluator: fullFromScratch })); // independent check: full evaluate per point
      expect(sweepFrequency(d, { points: 12 })).toStrictEqual(sweepFrequency(d, { points: 12, evaluator: fullFromScratch })); // independent check: full evaluate per point
      const grid = { load: { points: 6 }, second: { points: 3 }, axis: 'frequency' as const };
      expect(sweepGrid(d, grid)).toStrictEqual(sweepGrid(d, { ...grid, evaluator: fullFromScratch })); // independent check: full evaluate per cell
    });
  }

  for (const { label, design } of edgeDesigns()) {
    it(`${label}`, () => {
      expectLeanEqualsFull(label, design, 50);
    });
  }

  it('the edge designs do reach the paths they are built for', () => {
    const [runaway, hot, limited] = edgeDesigns().map((e) => e.design);
    const codes = (d: Design) =>
      new Set(sweepLoad(d, { points: 50, fromA: 0.003 * d.spec.ratedLoadA, toA: 3 * d.spec.ratedLoadA }).points.flatMap((p) => p.warnings.map((w) => w.code)));
    expect(codes(runaway!).has('thermal-runaway')).toBe(true); // the rated point of this design runs away (evaluate.test.ts, same design)
    const hotCodes = codes(hot!);
    for (const code of ['over-temperature', 'burn-hazard', 'saturation'] as const) expect(hotCodes.has(code), code).toBe(true); // 45 K/W everywhere and Isat 3.2 A at up to 9 A: each check fails somewhere
    expect(codes(limited!).has('cannot-regulate')).toBe(true); // ideal boost D = 1 − 5/12 ≈ 0.583 (docs/methods.md §1): with the losses under load the 0.6 limit is reached
  });

  it('on seeded random designs (fast-check), over light to heavy loads', () => {
    fc.assert(
      fc.property(arbitraryDesign, (d0) => {
        const v = validateDesign(d0);
        if (!v.ok) return;
        expectLeanEqualsFull('random design', v.design, 24);
      }),
      { seed: SEED, numRuns: 40 },
    );
  });

  it('a load probe made without an evaluator gives the full record’s points', () => {
    const d = demo('diode-boost');
    const sweep = sweepLoad(d, { points: 20 });
    const lean = loadProbe(d, sweep);
    const full = loadProbe(d, sweep, fullFromScratch);
    for (const f of [0.004, 0.3, 1, 1.7]) expect(lean(f * d.spec.ratedLoadA)).toStrictEqual(full(f * d.spec.ratedLoadA)); // independent check: full evaluate at the same load
  });
});

describe('the parts of the lean path', () => {
  it('slotWatts sets the watts of every slot of the ledger but the driver', () => {
    const designs = [...DEMO_DESIGNS.map((x) => demo(x.id)), ...edgeDesigns().map((e) => e.design)];
    fc.sample(arbitraryDesign, { seed: SEED, numRuns: 40 }).forEach((d0) => {
      const v = validateDesign(d0);
      if (v.ok) designs.push(v.design);
    });
    for (const d of designs) {
      const s = ledgerContext(d).slots;
      for (const slot of s.all) slot.watts = NaN;
      slotWatts(s);
      const missed = s.all.filter((slot) => slot !== s.driver && Number.isNaN(slot.watts)).map((slot) => `${slot.role}/${slot.model.mechanism}`);
      expect(missed).toEqual([]); // every loss model returns a finite number for any finite input (losses/model.ts): NaN means the slot was skipped
    }
  });

  it('slotWatts(path only) leaves exactly the source-paid slots for the completion pass', () => {
    for (const d of [...DEMO_DESIGNS.map((x) => demo(x.id)), ...edgeDesigns().map((e) => e.design)]) {
      const s = ledgerContext(d).slots;
      for (const slot of s.all) slot.watts = NaN;
      slotWatts(s, true, false);
      const pathSet = s.all.filter((slot) => slot !== s.driver && !Number.isNaN(slot.watts));
      expect(pathSet.every((slot) => !slot.source)).toBe(true); // the duty balance must see every path loss (slots.ts): a source slot here would be computed twice
      expect(s.all.filter((slot) => !slot.source).every((slot) => pathSet.includes(slot))).toBe(true); // a path slot left out would give the duty balance a stale loss
      slotWatts(s, false, true);
      expect(s.all.filter((slot) => slot !== s.driver && Number.isNaN(slot.watts))).toEqual([]); // the two passes together cover the ledger (NaN: a slot skipped by both)
    }
  });

  it('dutyLimitOf gives the limit of solveVoltSecond without solving for the duty', () => {
    fc.assert(
      fc.property(arbitraryDesign, fc.double({ min: 0.002, max: 3, noNaN: true }), fc.double({ min: 0.3, max: 1.6, noNaN: true }), (d0, lf, vf) => {
        const v = validateDesign(d0);
        if (!v.ok) return;
        const d = v.design;
        const c = circuitOf(d, nominalConditions(d, { loadA: d.spec.ratedLoadA * lf, vinV: d.spec.vinNomV * vf }), conductionParameters(d, uniformTemps(80)));
        expect(dutyLimitOf(c, d.spec.maxDuty, newShape())).toBe(solveVoltSecond(c, d.spec.maxDuty, newShape()).limit); // independent check: the full volt-second solution
      }),
      { seed: SEED, numRuns: 300 },
    );
  });
});
