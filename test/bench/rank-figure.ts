/**
 * `rank-10k-parts-s`: ranking a library of 10⁴ switch candidates, each over a 200-point load sweep —
 * the work of "which MOSFET from our stock runs this design best". The candidates are invented: the demo
 * design's own switch with RDS(on) spread over 0.5–2× and its gate charges over the opposite trade
 * (Qg ∝ RDS(on)^-0.8, a rough figure-of-merit trade, common practice), drawn from a seeded generator.
 * Each candidate: substitutePart into the switch role, sweepLoad (200 points, full electro-thermal
 * solution per point), score = mean efficiency over the converged points. One thread (no worker pool yet).
 * With --quick, 1 000 candidates are timed and the time scaled ×10 (said in the figure).
 */
import { partInRole, substitutePart, sweepLoad } from '../../shared-model/index.ts';
import type { Part } from '../../shared-model/index.ts';
import { BENCH_DESIGN_ID, demoDesign } from './engine-figures.ts';
import { figureOf, type Figure } from './figures.ts';

/** Mulberry32: a small seeded generator (public-domain algorithm), so the library is the same every run. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function inventedSwitchLibrary(base: Part, count: number, seed = 14): Part[] {
  if (base.kind !== 'mosfet') throw new Error('bench: the switch role must hold a MOSFET');
  const random = seeded(seed);
  return Array.from({ length: count }, (_, i) => {
    const r = 0.5 * 4 ** random(); // 0.5–2× RDS(on)
    const q = r ** -0.8;
    return {
      ...base,
      id: `bench-switch-${String(i + 1).padStart(5, '0')}`,
      name: `Invented bench switch ${i + 1}`,
      rdsOn25Ohm: base.rdsOn25Ohm * r,
      qgC: base.qgC * q,
      qgdC: base.qgdC * q,
      ...(base.qgs2C === undefined ? {} : { qgs2C: base.qgs2C * q }),
      ...(base.qgsC === undefined ? {} : { qgsC: base.qgsC * q }),
    };
  });
}

export function rankFigure(quick: boolean): Figure {
  const design = demoDesign(BENCH_DESIGN_ID);
  const base = partInRole(design, 'switch');
  if (!base) throw new Error('bench: the demo design has no switch');
  const count = quick ? 1000 : 10000;
  const library = inventedSwitchLibrary(base, count);
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  let best = { id: '', score: -Infinity };
  let points = 0;
  for (const part of library) {
    const sub = substitutePart(design, 'switch', part);
    if (!sub.ok) continue;
    const sweep = sweepLoad(sub.design);
    let sum = 0;
    let n = 0;
    for (const p of sweep.points) {
      points++;
      if (!p.converged) continue;
      sum += p.efficiency;
      n++;
    }
    const score = n > 0 ? sum / n : -Infinity;
    if (score > best.score) best = { id: part.id, score };
  }
  const wallS = (performance.now() - t0) / 1000;
  const c = process.cpuUsage(c0);
  const cpuS = (c.user + c.system) / 1e6;
  const k = 10000 / count;
  return figureOf({
    name: 'rank-10k-parts-s',
    unit: 's',
    goal: 5,
    samples: [wallS * k],
    what: `rank 10⁴ invented switch candidates × 200-point electro-thermal load sweeps (${BENCH_DESIGN_ID}), one thread, wall time${quick ? ` (${count} timed, scaled ×${k})` : ''}; the goal is for all cores`,
    detail: [`CPU ${(cpuS * k).toFixed(2)} s; ${points} points evaluated; best ${best.id} at mean efficiency ${(best.score * 100).toFixed(2)} %`],
  });
}
