import { describe, expect, it } from 'vitest';
import { compareParts } from '../../../shared-model/index.ts';
import { candidatesFor, compareRows, crossoverMarkers, differenceText, winnerAtLoad } from '../../../src-renderer/compare/compare-data.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';

describe('comparison tables and curves', () => {
  const design = demoDesign();
  const fets = demoParts().filter((p) => p.kind === 'mosfet');
  const outcome = compareParts(design, { role: 'switch', parts: fets.slice(0, 2), sweep: { points: 30 }, refine: false });
  if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join(' '));
  const comparison = outcome.comparison;

  it('lists the design part first, then the library parts of the same kind', () => {
    const list = candidatesFor(design.parts.switch, 'mosfet', demoParts());
    expect(list[0]).toMatchObject({ id: design.parts.switch.id, inDesign: true }); // the design's own part leads
    expect(list.filter((c) => c.id === design.parts.switch.id)).toHaveLength(1); // not listed twice
    expect(list.every((c) => c.part.kind === 'mosfet')).toBe(true); // only parts that fit the role's kind (ROLE_KINDS)
  });

  it('keeps each part ledger whole in its column', () => {
    const rows = compareRows(comparison);
    comparison.alternatives.forEach((alt, k) => {
      closeTo(rows.reduce((s, r) => s + r.watts[k], 0), alt.evaluation.totalLoss, 1e-9, 1e-12, { part: alt.partId }); // energy balance: total = Σ terms
    });
    for (const r of rows) expect(r.difference[0]).toBe(0); // the first part is the reference of the differences
  });

  it('names the lowest-loss part at the chosen load and marks every crossover', () => {
    const losses = comparison.alternatives.map((a) => a.evaluation.totalLoss);
    expect(winnerAtLoad(comparison)).toBe(losses.indexOf(Math.min(...losses))); // the minimum of the engine totals
    expect(crossoverMarkers(comparison).map((m) => m.value)).toEqual(comparison.crossovers.map((c) => c.load)); // engine crossovers, unchanged
  });

  it('prints a difference below 0.01 % of the total loss as "≈ 0" and a real one with its sign', () => {
    expect(differenceText(-534e-9, 1.2)).toBe('≈ 0'); // issue 16 §4: −534 nW against a 1.2 W total is solver noise
    expect(differenceText(0.012, 1.2)).toBe('+12.0 mW'); // 1 % of the total is a real difference (SI prefix milli, BIPM SI Brochure 9th ed.)
    expect(differenceText(-0.012, 1.2)).toBe('\u221212.0 mW'); // minus sign U+2212 (ISO 80000-1)
  });
});
