/**
 * Sweeps reuse one evaluator set-up per design (sweep/evaluator.ts, ledgerEvaluator). The reference here is
 * independent of that reuse: the ledger's own `evaluate`, called from scratch for every point. Results must
 * be identical to the last bit (toStrictEqual), in any order of points and across modes, input voltages,
 * frequencies and thermal runaway.
 */
import { describe, expect, it } from 'vitest';
import { compareParts, DEMO_DESIGNS, DEMO_PARTS_LIBRARY, evaluate, evaluatorFor, figuresOfMerit, ledgerEvaluator, monteCarlo, rankLibrary, sweepFamilies, sweepFrequency, sweepGrid, sweepLoad, validatePartsLibrary, worstCase } from '../../../shared-model/index.ts';
import type { Design, PointEvaluator } from '../../../shared-model/index.ts';
import { SYNC_BUCK, allDirect, design as sketch, valid } from '../../helpers/ledger-designs.ts';
import { demoDesign as demo } from '../../helpers/demo.ts';

/** The reference: a fresh `evaluate` (full set-up) for every point, as the sweeps did before the reuse. */
const fromScratch: PointEvaluator = (d, c) => evaluate(d, c);

/** The runaway design of test/shared-model/ledger/evaluate.test.ts: a leaky Schottky behind 120 K/W. */
function runawayDesign(): Design {
  return valid(sketch({ ...SYNC_BUCK, rectifier: 'diode' }, (x) => {
    allDirect(x, 30);
    x.thermal.paths.rectifier = { kind: 'direct', thetaJaKPerW: 120 };
    if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, leakageA: 5e-3, leakageAtC: 25, leakageDoublingK: 10 };
  }));
}

describe('ledgerEvaluator reused over many points equals evaluate from scratch', () => {
  for (const id of DEMO_DESIGNS.map((d) => d.id)) {
    it(`${id}: any order of loads, input voltages, frequencies and ambients`, () => {
      const d = demo(id);
      const s = d.spec;
      const ev = ledgerEvaluator(d);
      // Heavy, light (DCM where the design has it), back again, other Vin, fs and ambient, in a jumbled order.
      const points = [
        { loadA: 1.2 * s.ratedLoadA }, { loadA: 0.01 * s.ratedLoadA }, { loadA: s.ratedLoadA, vinV: s.vinMinV },
        { loadA: 0.3 * s.ratedLoadA, switchingFrequencyHz: 2 * s.switchingFrequencyHz }, { loadA: 0.05 * s.ratedLoadA },
        { loadA: s.ratedLoadA, vinV: s.vinMaxV, ambientC: s.ambientC + 20 }, { loadA: 1.2 * s.ratedLoadA },
      ];
      for (const c of points) expect(ev.evaluate(c), JSON.stringify(c)).toStrictEqual(evaluate(d, c)); // same engine, same inputs: identical
    });
  }
  it('a runaway point between converged points changes nothing for the points after it', () => {
    const d = runawayDesign();
    const ev = ledgerEvaluator(d);
    for (const loadA of [0.5, d.spec.ratedLoadA, 0.5, 0.1]) {
      const e = ev.evaluate({ loadA });
      expect(e).toStrictEqual(evaluate(d, { loadA })); // identical records, runaway or not
    }
    expect(ev.evaluate().converged).toBe(false); // the rated point does run away (evaluate.test.ts, same design)
  });
});

describe('sweeps, comparison and tolerance analysis give identical results with the reused set-up', () => {
  const sync = demo('synchronous-buck');
  const boost = demo('diode-boost');

  it('sweepLoad equals the point-by-point evaluate sweep on every one-phase demo design', () => {
    // A multiphase demo sweeps the whole interleaved converter (test/shared-model/interleave/multiphase-callers.test.ts).
    for (const id of DEMO_DESIGNS.map((d) => d.id).filter((id) => (demo(id).topology.phases ?? 1) === 1)) {
      const d = demo(id);
      expect(sweepLoad(d), id).toStrictEqual(sweepLoad(d, { evaluator: fromScratch }));
    }
  });

  it('sweepFamilies (with landmark refinement), sweepFrequency, sweepGrid and figuresOfMerit', () => {
    const small = { points: 40 };
    expect(sweepFamilies(sync, small)).toStrictEqual(sweepFamilies(sync, { ...small, evaluator: fromScratch }));
    expect(sweepFrequency(boost, { points: 15 })).toStrictEqual(sweepFrequency(boost, { points: 15, evaluator: fromScratch }));
    const grid = { load: { points: 8 }, second: { points: 5 } };
    expect(sweepGrid(sync, grid)).toStrictEqual(sweepGrid(sync, { ...grid, evaluator: fromScratch }));
    expect(sweepGrid(sync, { ...grid, axis: 'frequency' })).toStrictEqual(sweepGrid(sync, { ...grid, axis: 'frequency', evaluator: fromScratch }));
    expect(figuresOfMerit(boost)).toStrictEqual(figuresOfMerit(boost, { evaluator: fromScratch }));
  });

  it('compareParts and rankLibrary', () => {
    const lib = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    if (!lib.ok) throw new Error('the parts library is invalid');
    const fets = lib.library.parts.filter((p) => p.kind === 'mosfet' && p.vdsRatingV === 30);
    const options = { role: 'rectifier' as const, parts: fets.slice(0, 3), sweep: { points: 30 } };
    expect(compareParts(sync, options)).toStrictEqual(compareParts(sync, { ...options, evaluator: fromScratch }));
    const rank = { role: 'switch' as const, library: lib.library.parts, by: 'weighted-efficiency' as const };
    expect(rankLibrary(sync, rank)).toStrictEqual(rankLibrary(sync, { ...rank, evaluator: fromScratch }));
  });

  it('worstCase and a zero-tolerance Monte Carlo', () => {
    expect(worstCase(boost)).toStrictEqual(worstCase(boost, { evaluator: fromScratch }));
    const zero = { rdsOnFraction: 0, dcrFraction: 0, esrFraction: 0, inductanceFraction: 0, frequencyFraction: 0 };
    const mc = { seed: 7, samples: 20, tolerances: zero, spreadConditions: true, keepSamples: true };
    expect(monteCarlo(sync, mc)).toStrictEqual(monteCarlo(sync, { ...mc, evaluator: fromScratch }));
    const spread = { seed: 7, samples: 10, keepSamples: true };
    expect(monteCarlo(sync, spread)).toStrictEqual(monteCarlo(sync, { ...spread, evaluator: fromScratch }));
  });

  it('evaluatorFor hands any other design to evaluate, and a given evaluator back unchanged', () => {
    const ev = evaluatorFor(sync);
    const c = { vinV: boost.spec.vinNomV, loadA: boost.spec.ratedLoadA, switchingFrequencyHz: boost.spec.switchingFrequencyHz, ambientC: boost.spec.ambientC };
    expect(ev(boost, c)).toStrictEqual(evaluate(boost, c)); // not the set-up of `sync`
    expect(evaluatorFor(sync, fromScratch)).toBe(fromScratch); // a stand-in evaluator is used as given
  });
});
