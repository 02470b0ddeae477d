import { describe, expect, it } from 'vitest';
import { assembleRanking, checkRankOptions, evaluate, judgeChunk, libraryChunks, profileFromWeighting, rankLibrary, substitutePart } from '../../../shared-model/index.ts';
import type { Design, Part } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';

function substituted(design: Design, role: 'switch' | 'inductor', part: Part): Design {
  const s = substitutePart(design, role, part);
  if (!s.ok) throw new Error(s.problem.message);
  return s.design;
}

describe('rankLibrary', () => {
  it('ranks every fitting MOSFET by total loss at rated load, lowest first, and counts the parts of other kinds', () => {
    const design = demoDesign('synchronous-buck');
    const library = demoParts();
    const r = rankLibrary(design, { role: 'switch', library, by: 'loss-at-rated' });
    const mosfets = library.filter((p) => p.kind === 'mosfet');
    expect(r.ranking.length + r.inadmissible.length).toBe(mosfets.length); // every MOSFET is ranked or turned down with reasons
    expect(r.notFitting).toBe(library.length - mosfets.length); // the switch role takes only a MOSFET (issue 11 §3: parts that fit the role)
    for (const p of r.ranking) {
      expect(p.score).toBe(evaluate(substituted(design, 'switch', mosfets.find((m) => m.id === p.partId)!)).totalLoss); // loss at nominal Vin, rated load (issue 11 §3)
    }
    const scores = r.ranking.map((p) => p.score);
    expect(scores).toEqual([...scores].sort((a, b) => a - b)); // lower loss ranks first
    expect(r.basis).toBe('rated-point'); // the demo has no mission profile
    expect(r.ranking[0]!.pareto).toBe(true); // the best score is always on the front (definition of a Pareto front)
  });

  it('turns down a MOSFET whose voltage rating, derated, is below the switch stress, and a part whose surface is too hot to touch', () => {
    // Hot-fin buck: Vin max 30 V; a 30 V part derated by the design's 0.8 allows 24 V < 30 V.
    const design = demoDesign('hot-fin-buck');
    const r = rankLibrary(design, { role: 'switch', library: demoParts(), by: 'loss-at-rated' });
    const v30 = r.inadmissible.find((x) => x.partId === 'nfet-30v-8m');
    expect(v30?.reasons.join(' ')).toMatch(/Blocking voltage 30\.\d+ V exceeds the allowed 24 V/); // buck switch blocks Vin plus the diode drop (docs/methods.md §4: Vsw = Vin), limit 0.8 × 30 V
    // The demo's rectifier fin is too hot to touch whatever switch is used (assets/designs/hot-fin-buck.json notes).
    const v60 = r.inadmissible.find((x) => x.partId === 'nfet-60v-15m');
    expect(v60?.reasons.join(' ')).toMatch(/rectifier surface reaches .* over its touch limit/);
    expect(r.ranking).toHaveLength(0);
  });

  it('weighted efficiency over a four-point profile: each score is the mean of four evaluations, highest first', () => {
    const demo = demoDesign('synchronous-buck');
    const design = { ...demo, missionProfile: profileFromWeighting(demo, 'four-point') };
    const inductors = demoParts().filter((p) => p.kind === 'inductor');
    const r = rankLibrary(design, { role: 'inductor', library: inductors, by: 'weighted-efficiency' });
    expect(r.ranking.length).toBeGreaterThan(0);
    for (const p of r.ranking) {
      const d = substituted(design, 'inductor', inductors.find((m) => m.id === p.partId)!);
      const mean = [1.25, 2.5, 3.75, 5].reduce((s, loadA) => s + evaluate(d, { loadA }).efficiency, 0) / 4; // 10 CFR 430 Appendix Z: average at 25/50/75/100 %
      closeTo(p.score, mean, 1e-12);
    }
    const scores = r.ranking.map((p) => p.score);
    expect(scores).toEqual([...scores].sort((a, b) => b - a)); // higher efficiency first
    expect(r.basis).toBe('profile');
  });

  it('energy per day over a hand profile, by hand from two evaluations', () => {
    const demo = demoDesign('synchronous-buck');
    const design = { ...demo, missionProfile: { name: 'field', rows: [{ vinV: 14.4, loadA: 0.5, fraction: 0.9 }, { vinV: 12, loadA: 5, fraction: 0.1 }], hoursPerDay: 10 } };
    const part = demoParts().find((p) => p.id === 'nfet-30v-4m5')!;
    const r = rankLibrary(design, { role: 'switch', library: [part], by: 'energy' });
    const d = substituted(design, 'switch', part);
    const wh = (0.9 * evaluate(d, { vinV: 14.4, loadA: 0.5 }).totalLoss + 0.1 * evaluate(d, { vinV: 12, loadA: 5 }).totalLoss) * 10; // Σ fᵢ·Pᵢ × hours (definition)
    closeTo(r.ranking[0]!.score, wh, 1e-12);
    expect(r.unit).toBe('Wh');
  });

  it('names the inductor peak against Isat as the binding constraint when Isat barely covers it', () => {
    const design = demoDesign('synchronous-buck'); // 10.8–16.8 V → 3.3 V, 5 A, 450 kHz
    const own = design.parts.inductor;
    // Ripple is largest at Vin max (docs/methods.md §1: ΔI = (Vin − Vo)·D/(L·fs)); ideal D = Vo/Vin.
    const d = 3.3 / 16.8;
    const peak = 5 + ((16.8 - 3.3) * d) / (own.inductanceH * 450e3) / 2;
    const tight: Part = { ...own, id: 'tight', name: 'Invented tight choke', isatA: peak * 1.02, isatTempCoPerK: 0, irmsRatingA: 50 };
    const r = rankLibrary(design, { role: 'inductor', library: [tight], by: 'loss-at-rated' });
    const b = r.ranking[0]?.binding;
    expect(b?.kind).toBe('rating');
    expect(b?.what).toMatch(/Isat/);
    closeTo(b!.value, peak, 0.02); // the solved peak is within 2 % of the ideal one (losses move D a little: docs/methods.md §1)
    const tooSmall = { ...tight, id: 'small', isatA: peak * 0.95 };
    expect(rankLibrary(design, { role: 'inductor', library: [tooSmall] }).inadmissible[0]?.reasons[0]).toMatch(/Peak current .* exceeds/);
  });

  it('turns down a part with which a mission row does not regulate or runs over its derated limit', () => {
    const demo = demoDesign('synchronous-buck');
    const capped = { ...demo, spec: { ...demo.spec, maxDuty: 0.28 }, missionProfile: { name: 'x', rows: [{ vinV: 10.8, loadA: 5, fraction: 1 }], hoursPerDay: 24 } };
    const part = demoParts().find((p) => p.id === 'nfet-30v-4m5')!;
    // 3.3 V from 10.8 V needs D ≥ 0.306 (docs/methods.md §1: buck M = D), above the 0.28 limit.
    expect(rankLibrary(capped, { role: 'switch', library: [part] }).inadmissible[0]?.reasons.join(' ')).toMatch(/not regulated/);
    const hot = { ...demo, missionProfile: { name: 'x', rows: [{ label: 'oven', vinV: 12, loadA: 5, ambientC: 180, fraction: 1 }], hoursPerDay: 24 } };
    const reasons = rankLibrary(hot, { role: 'switch', library: [part] }).inadmissible[0]?.reasons.join(' ') ?? '';
    expect(reasons).toMatch(/mission row "oven"/); // 180 °C ambient is past every part's limit (assets/parts: limits 125–150 °C)
  });
});

describe('checkRankOptions', () => {
  it('a role no library part fits is named with the library, the role and what it takes', () => {
    const design = demoDesign('synchronous-buck');
    const p = checkRankOptions(design, { role: 'switch', library: demoParts().filter((x) => x.kind === 'inductor') });
    expect(p[0]?.path).toBe('library');
    expect(p[0]?.message).toMatch(/No part in the library fits the control switch role \(it takes a mosfet/);
  });

  it('refuses an unknown score and a derating outside 0.1 … 1', () => {
    const design = demoDesign('synchronous-buck');
    const p = checkRankOptions(design, { role: 'switch', library: demoParts(), by: 'cheapest' as never, currentDerating: 1.5 });
    expect(p.map((x) => x.path)).toEqual(['by', 'currentDerating']);
    expect(p[1]?.message).toMatch(/1\.5 is outside 0\.1 … 1/);
  });
});

describe('ranking in chunks', () => {
  it('any split of the library, assembled in any order, gives the one-thread ranking', () => {
    const design = demoDesign('synchronous-buck');
    const options = { role: 'inductor' as const, library: demoParts(), by: 'energy' as const };
    const whole = rankLibrary(design, options);
    const chunks = libraryChunks(options.library.length, 5);
    expect(chunks.flat()[0]).toBe(0);
    expect(chunks[chunks.length - 1]![1]).toBe(options.library.length);
    const verdicts = chunks.reverse().flatMap(([from, to]) => judgeChunk(design, options, from, to));
    expect(assembleRanking(design, options, verdicts)).toStrictEqual(whole);
  });
});
