/**
 * Monte Carlo samples run on the lean path with one set-up, the parts varied in place in one copy of the
 * design (tolerance/sample-evaluator.ts). The independent check is the path the samples took before: a
 * new varied design per sample (varyDesign), evaluated from scratch by the full `evaluate`. Every
 * distribution, fraction and kept sample must be identical to the last bit (toStrictEqual), on every demo
 * design and on designs built to reach runaway, touch limits and the duty limit.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, evaluate, monteCarlo, worstCase } from '../../../shared-model/index.ts';
import type { Design, MonteCarloOptions, PointEvaluator } from '../../../shared-model/index.ts';
import { sampleEvaluator } from '../../../shared-model/tolerance/sample-evaluator.ts';
import { nominalVariation, ownPartsCopy, varyDesign } from '../../../shared-model/tolerance/variation.ts';
import { DIODE_BOOST, SYNC_BUCK, allDirect, design as sketch, valid } from '../../helpers/ledger-designs.ts';
import { demoDesign as demo } from '../../helpers/demo.ts';

/** The independent side: each sample a new design, evaluated from scratch with the full record. */
const fullFromScratch: PointEvaluator = (d, c) => evaluate(d, c);

const wide = { rdsOnFraction: 0.4, dcrFraction: 0.4, esrFraction: 0.5, inductanceFraction: 0.3, frequencyFraction: 0.2 };

function edgeDesigns(): { label: string; design: Design }[] {
  return [
    {
      label: 'near runaway (leaky Schottky behind 120 K/W)',
      design: valid(sketch({ ...SYNC_BUCK, rectifier: 'diode' }, (x) => {
        allDirect(x, 30);
        x.thermal.paths.rectifier = { kind: 'direct', thetaJaKPerW: 120 };
        if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, leakageA: 5e-3, leakageAtC: 25, leakageDoublingK: 10 };
      })),
    },
    {
      label: 'hot touchable parts',
      design: valid(sketch(SYNC_BUCK, (x) => {
        allDirect(x, 45);
        x.thermal.touch = { switch: { touchable: true, surface: 'plastic' }, inductor: { touchable: true, surface: 'metal' } };
      })),
    },
    { label: 'boost at its duty limit', design: valid(sketch(DIODE_BOOST, (x) => void (x.spec.maxDuty = 0.6))) },
  ];
}

function expectSameAsFromScratch(label: string, d: Design, options: MonteCarloOptions): void {
  const lean = monteCarlo(d, { ...options, keepSamples: true });
  const full = monteCarlo(d, { ...options, keepSamples: true, evaluator: fullFromScratch });
  expect(lean, label).toStrictEqual(full); // independent check: a new varied design per sample, full evaluate from scratch
}

describe('Monte Carlo on the lean path with parts varied in place', () => {
  for (const { id } of DEMO_DESIGNS) {
    it(`${id}: default tolerances, and wide ones with Vin and ambient spread`, () => {
      const d = demo(id);
      expectSameAsFromScratch(id, d, { seed: 3, samples: 120 });
      expectSameAsFromScratch(id, d, { seed: 4, samples: 120, tolerances: wide, spreadConditions: true, distribution: 'normal' });
    });
  }
  for (const { label, design } of edgeDesigns()) {
    it(`${label}: wide tolerances at 1.5 × rated load`, () => {
      const options = { seed: 11, samples: 150, tolerances: wide, spreadConditions: true, loadA: 1.5 * design.spec.ratedLoadA };
      const lean = monteCarlo(design, { ...options, keepSamples: true });
      expect(lean).toStrictEqual(monteCarlo(design, { ...options, keepSamples: true, evaluator: fullFromScratch })); // independent check: full evaluate per sample
      if (label.startsWith('near runaway')) expect(lean.fractionNotRegulating).toBeGreaterThan(0); // the wide spread reaches runaway, so the runaway branch is compared too
    });
  }

  it('worst-case corners equal the corners evaluated alone, each a new varied design', () => {
    for (const d of [...DEMO_DESIGNS.map((x) => demo(x.id)), ...edgeDesigns().map((e) => e.design)]) {
      const options = { tolerances: wide, loadA: 1.2 * d.spec.ratedLoadA };
      expect(worstCase(d, options)).toStrictEqual(worstCase(d, { ...options, evaluator: fullFromScratch })); // independent check: full evaluate of a new varied design per corner
    }
  });

  it('a sample leaves the design it was given unchanged, and a later nominal sample is the nominal point', () => {
    const d = demo('synchronous-buck');
    const before = structuredClone(d);
    const run = sampleEvaluator(d);
    const cond = { vinV: d.spec.vinNomV, loadA: d.spec.ratedLoadA, switchingFrequencyHz: d.spec.switchingFrequencyHz, ambientC: d.spec.ambientC };
    run({ ...nominalVariation(cond), switchRdsOnScale: 1.3, dcrScale: 0.8, inductanceScale: 1.2 }, cond);
    expect(d).toStrictEqual(before); // varied in the sampler's own copy only
    expect(run(nominalVariation(cond), cond).efficiency).toBe(evaluate(d, cond).efficiency); // independent check: full evaluate of the untouched design
    const v = { ...nominalVariation(cond), outputEsrScale: 1.5 };
    expect(varyDesign(d, v)).toStrictEqual(varyDesign(ownPartsCopy(d), v)); // the copy carries the same values
  });
});
