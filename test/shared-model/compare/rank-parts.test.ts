import { describe, expect, it } from 'vitest';
import { DEMO_PARTS_LIBRARY, rankParts, substitutePart, validatePartsLibrary } from '../../../shared-model/index.ts';
import type { Part } from '../../../shared-model/index.ts';
import { evaluate } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

function library(): Part[] {
  const r = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  if (!r.ok) throw new Error('the shipped library is invalid');
  return r.library.parts;
}

describe('rankParts', () => {
  it('ranks every fitting MOSFET by total loss at rated load, lowest first', () => {
    const design = demoDesign('synchronous-buck.json');
    const r = rankParts(design, { role: 'switch', library: library(), criterion: 'loss-at-rated' });
    const mosfets = library().filter((p) => p.kind === 'mosfet');
    expect(r.ranked.length + r.rejected.filter((x) => mosfets.some((m) => m.id === x.partId)).length).toBe(mosfets.length); // every MOSFET is ranked or rejected with reasons
    for (const p of r.ranked) {
      const s = substitutePart(design, 'switch', mosfets.find((m) => m.id === p.partId)!);
      if (!s.ok) throw new Error(s.problem.message);
      expect(p.score).toBe(evaluate(s.design).totalLoss); // criterion = total loss at rated load, nominal Vin (issue 4)
    }
    const scores = r.ranked.map((p) => p.score);
    expect(scores).toEqual([...scores].sort((a, b) => a - b)); // lower loss ranks first
    expect(r.rejected.find((x) => x.partId === 'ind-4u7-9a')?.reasons[0]).toMatch(/takes a mosfet/); // an inductor cannot fill the switch role
  });

  it('rejects a MOSFET whose voltage rating, derated, is below the switch stress', () => {
    // Hot-fin buck: Vin max 30 V; a 30 V part derated by the design's 0.8 allows 24 V < 30 V (schema.ts margins.voltageDerating).
    const design = demoDesign('hot-fin-buck.json');
    expect(design.spec.vinMaxV).toBeGreaterThan(30 * design.margins.voltageDerating); // buck switch blocks Vin (docs/methods.md §4: Vsw = Vin)
    const r = rankParts(design, { role: 'switch', library: library(), criterion: 'hottest-junction' });
    expect(r.rejected.find((x) => x.partId === 'nfet-30v-8m')?.reasons.join(' ')).toMatch(/Blocking voltage/); // derated 30 V rating < Vin max
    expect(r.ranked.map((p) => p.partId)).toContain('nfet-60v-15m'); // 60 V × 0.8 = 48 V ≥ 30 V
  });

  it('orders by average efficiency highest first', () => {
    const design = demoDesign('synchronous-buck.json');
    const r = rankParts(design, { role: 'inductor', library: library(), criterion: 'average-efficiency' });
    const scores = r.ranked.map((p) => p.score);
    expect(scores).toEqual([...scores].sort((a, b) => b - a)); // higher average efficiency first (10 CFR 430 Appendix Z mean)
    expect(r.ranked.length).toBeGreaterThan(0); // the shipped library has inductors that fit this design (assets/parts/library.json, invented)
  });
});
