/**
 * `rank-10k-parts-s`: the ranking room (shared-model/ranking) on the worker pool (src-main/pool
 * rankOnPool, the code behind `wattledger rank`) ranking 10⁴ invented switch candidates for the
 * synchronous-buck demo. Each candidate is judged at 200 load points: the two Vin corners at rated load
 * (ratings with derating), the rated point, and a generated 197-row mission profile (loads 5–110 % of
 * rated across the input range, equal time shares), scored by energy per day. The candidates are the demo
 * design's own switch with RDS(on) spread over 0.5–2× and its gate charges over the opposite trade
 * (Qg ∝ RDS(on)^-0.8, a rough figure-of-merit trade, common practice), drawn from a seeded generator.
 * The profile has more rows than a design document may hold (MAX_MISSION_ROWS): it is a load on the
 * engine, built in code, never a document.
 * Two figures, both wall time: `rank-10k-parts-s` on every core (the goal is for all cores) and
 * `rank-10k-parts-one-core-s` (one worker: the pool runs the chunks on this thread). The bench checks the
 * two rankings are equal and says so in the detail. `rank-demo-library-ms`: the demo library for the
 * switch role, all cores. With --quick, 1 000 candidates are timed and the times scaled ×10 (said in the
 * figure). The worker script is out/bench/pool-worker.mjs (package.json "bench" builds it).
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { DEMO_PARTS_LIBRARY, partInRole, validatePartsLibrary } from '../../shared-model/index.ts';
import type { Design, LibraryRanking, Part } from '../../shared-model/index.ts';
import { rankOnPool } from '../../src-main/pool/rank-pool.ts';
import { coreCount } from '../../src-main/pool/worker-pool.ts';
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

/** The 197 mission rows: loads 5–110 % of rated, Vin cycling minimum, nominal, maximum; equal time shares. */
export function benchMissionRows(design: Design, count = 197): NonNullable<Design['missionProfile']>['rows'] {
  const s = design.spec;
  const vins = [s.vinMinV, s.vinNomV, s.vinMaxV];
  return Array.from({ length: count }, (_, i) => ({
    label: `load ${i + 1}`,
    vinV: vins[i % 3]!,
    loadA: s.ratedLoadA * (0.05 + (1.05 * i) / (count - 1)),
    fraction: 1 / count,
  }));
}

/** The pool's worker script built beside the bench bundle, or undefined (the pool then runs on this thread). */
function benchWorker(): URL | undefined {
  if (!import.meta.url.startsWith('file:')) return undefined;
  const url = new URL('./pool-worker.mjs', import.meta.url);
  return existsSync(fileURLToPath(url)) ? url : undefined;
}

async function timedRank(design: Design, library: Part[], workers: number, script: URL | undefined): Promise<{ wallS: number; cpuS: number; ranking: LibraryRanking }> {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const ranking = await rankOnPool(design, { role: 'switch', library, by: 'energy' }, { workers, ...(script ? { script } : {}) });
  const wallS = (performance.now() - t0) / 1000;
  const c = process.cpuUsage(c0);
  return { wallS, cpuS: (c.user + c.system) / 1e6, ranking };
}

export async function rankFigures(quick: boolean): Promise<Figure[]> {
  const base = demoDesign(BENCH_DESIGN_ID);
  const design: Design = { ...base, missionProfile: { name: 'bench: 197 generated load rows', rows: benchMissionRows(base), hoursPerDay: 24 } };
  const own = partInRole(design, 'switch');
  if (!own) throw new Error('bench: the demo design has no switch');
  const count = quick ? 1000 : 10000;
  const library = inventedSwitchLibrary(own, count);
  const script = benchWorker();
  const cores = coreCount();
  const k = 10000 / count;
  const scaledNote = quick ? ` (${count} timed, scaled ×${k})` : '';
  const all = await timedRank(design, library, cores, script);
  const one = await timedRank(design, library, 1, script);
  const same = JSON.stringify(all.ranking) === JSON.stringify(one.ranking);
  const best = all.ranking.ranking[0];
  const facts = [
    `${all.ranking.ranking.length} admissible, ${all.ranking.inadmissible.length} inadmissible; best ${best ? `${best.partId} at ${best.score.toFixed(4)} Wh/day` : 'none'}`,
    `all-cores ranking ${same ? 'equals' : 'DIFFERS FROM'} the one-worker ranking (JSON of the whole record)`,
  ];
  const threads = script ? cores : 1;
  // The demo library is ranked on the demo design itself (its own mission, or the rated point).
  const shipped = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  if (!shipped.ok) throw new Error('bench: the shipped parts library is invalid');
  const demoParts = shipped.library.parts;
  const t0 = performance.now();
  const demoRanking = await rankOnPool(base, { role: 'switch', library: demoParts, by: 'energy' }, { workers: cores, ...(script ? { script } : {}) });
  const demoMs = performance.now() - t0;
  return [
    figureOf({
      name: 'rank-10k-parts-s',
      unit: 's',
      goal: 5,
      samples: [all.wallS * k],
      what: `rank 10⁴ invented switch candidates × 200 load points each (ranking room, rankOnPool), ${BENCH_DESIGN_ID}, ${threads} worker thread${threads === 1 ? '' : 's'} (every core), wall time${scaledNote}`,
      detail: [`CPU of every thread ${(all.cpuS * k).toFixed(2)} s${script ? '' : '; no worker script built: the pool ran on this thread'}`, ...facts],
    }),
    figureOf({
      name: 'rank-10k-parts-one-core-s',
      unit: 's',
      goal: null,
      samples: [one.wallS * k],
      what: `the same ranking on one core (rankOnPool with one worker runs the chunks on this thread), wall time${scaledNote}`,
      detail: [`CPU ${(one.cpuS * k).toFixed(2)} s; speed-up on ${threads} threads ×${(one.wallS / all.wallS).toFixed(2)}`],
    }),
    figureOf({
      name: 'rank-demo-library-ms',
      unit: 'ms',
      goal: null,
      samples: [demoMs],
      what: `rank the demo part library (${demoParts.length} parts) for the switch role of ${BENCH_DESIGN_ID} by energy, every core, wall time including starting the workers`,
      detail: [`${demoRanking.ranking.length} admissible, ${demoRanking.inadmissible.length} inadmissible, ${demoRanking.notFitting} of other kinds`],
    }),
  ];
}
