/**
 * Random valid designs for the property tests, reaching the edges (issue 10 §7): the ledger-test designs
 * (test/helpers/ledger-designs.ts: buck or boost, diode or synchronous, every thermal path kind, heatsinks,
 * touchable parts, winding models) plus what the load is (spec.loadKind), pulse skipping, a low duty limit
 * (points past the regulation limit), hot ambients and large θ (runaway). Every part is invented.
 * The designs are drawn once into a pool and validated (validation costs about as much as an evaluation);
 * each property run then draws a pool member and the conditions it is evaluated at.
 */
import fc from 'fast-check';
import { validateDesign, type Design } from '../../shared-model/index.ts';
import { arbitraryDesign } from '../helpers/ledger-designs.ts';

export const arbitraryEdgeDesign: fc.Arbitrary<Design> = fc
  .record({
    base: arbitraryDesign,
    loadKind: fc.constantFrom('constant-current', 'resistive', 'constant-power') as fc.Arbitrary<NonNullable<Design['spec']['loadKind']>>,
    pulseSkipping: fc.boolean(),
    minPeakFraction: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
    maxDuty: fc.oneof(fc.constant(0.95), fc.double({ min: 0.2, max: 0.9, noNaN: true })),
    hot: fc.boolean(),
    thetaScale: fc.oneof(fc.constant(1), fc.double({ min: 1, max: 8, noNaN: true })),
  })
  .map((r) => {
    const d = structuredClone(r.base);
    d.spec.loadKind = r.loadKind;
    d.spec.maxDuty = r.maxDuty;
    if (r.hot) d.spec.ambientC = Math.min(d.spec.ambientC + 60, 120);
    if (r.pulseSkipping) {
      d.topology.lightLoad = 'pulse-skipping';
      d.topology.pulseSkipping = { minPeakCurrentA: r.minPeakFraction * d.spec.ratedLoadA, sleepCurrentA: 20e-6 };
    }
    for (const p of Object.values(d.thermal.paths)) {
      if (p?.kind === 'direct') p.thetaJaKPerW *= r.thetaScale;
    }
    for (const h of d.thermal.heatsinks) h.thetaSaKPerW *= r.thetaScale;
    return d;
  });

export interface Pool {
  designs: Design[];
  drawn: number;
}

/** `count` drawn designs, keeping those the validator accepts (the validator's own design, defaults applied). */
export function designPool(seed: number, count: number): Pool {
  const designs: Design[] = [];
  const drawn = fc.sample(arbitraryEdgeDesign, { numRuns: count, seed });
  for (const d of drawn) {
    const v = validateDesign(d);
    if (v.ok) designs.push(v.design);
  }
  return { designs, drawn: drawn.length };
}
