/**
 * Published weighting sets: efficiency at fractions of the rated load, each with its weight. A set
 * becomes a mission profile at the design's nominal input voltage and ambient (`profileFromWeighting`),
 * and its weighted efficiency Σ wᵢ·ηᵢ is then the published figure for this converter.
 * - "four-point": 25, 50, 75, 100 % of rated load, equal weights — the average efficiency of
 *   US 10 CFR 430 Subpart B, Appendix Z (external power supplies).
 * - "european": 5, 10, 20, 30, 50, 100 % with weights 0.03, 0.06, 0.13, 0.10, 0.48, 0.20 — the
 *   European weighted efficiency of photovoltaic inverters, EN 50530 (weights from memory).
 * - "californian": 10, 20, 30, 50, 75, 100 % with weights 0.04, 0.05, 0.12, 0.21, 0.53, 0.05 — the
 *   California Energy Commission weighted efficiency of inverters (weights from memory).
 * The two inverter sets weight by power at a fixed voltage; at a fixed output voltage load current is
 * proportional to output power, so the same fractions apply to the rated load current.
 * Each weight set adds up to exactly 1.
 */
import type { Design } from '../design/schema.ts';
import type { MissionProfile } from './schema.ts';

export type WeightingId = 'four-point' | 'european' | 'californian';

export interface WeightingSet {
  id: WeightingId;
  title: string;
  source: string;
  /** True where the weights were recalled and not confirmed against the printed text. */
  recalled: boolean;
  points: readonly { loadFraction: number; weight: number }[];
}

export const WEIGHTING_SETS: readonly WeightingSet[] = [
  {
    id: 'four-point',
    title: 'Average of 25, 50, 75 and 100 % load',
    source: 'US 10 CFR 430 Subpart B, Appendix Z',
    recalled: false,
    points: [0.25, 0.5, 0.75, 1].map((loadFraction) => ({ loadFraction, weight: 0.25 })),
  },
  {
    id: 'european',
    title: 'European weighted efficiency',
    source: 'EN 50530 (photovoltaic inverters)',
    recalled: true,
    points: [
      { loadFraction: 0.05, weight: 0.03 },
      { loadFraction: 0.1, weight: 0.06 },
      { loadFraction: 0.2, weight: 0.13 },
      { loadFraction: 0.3, weight: 0.1 },
      { loadFraction: 0.5, weight: 0.48 },
      { loadFraction: 1, weight: 0.2 },
    ],
  },
  {
    id: 'californian',
    title: 'California Energy Commission weighted efficiency',
    source: 'California Energy Commission inverter test protocol',
    recalled: true,
    points: [
      { loadFraction: 0.1, weight: 0.04 },
      { loadFraction: 0.2, weight: 0.05 },
      { loadFraction: 0.3, weight: 0.12 },
      { loadFraction: 0.5, weight: 0.21 },
      { loadFraction: 0.75, weight: 0.53 },
      { loadFraction: 1, weight: 0.05 },
    ],
  },
];

function weightingSet(id: WeightingId): WeightingSet {
  const set = WEIGHTING_SETS.find((w) => w.id === id);
  if (!set) throw new Error(`unknown weighting set ${String(id)}`);
  return set;
}

/** The weighting set as a mission profile of `design`: nominal Vin, the design's ambient, 24 h a day. */
export function profileFromWeighting(design: Design, id: WeightingId): MissionProfile {
  const set = weightingSet(id);
  return {
    name: `${set.title} (${set.source})`,
    rows: set.points.map((p) => ({
      label: `${Math.round(p.loadFraction * 100)} % load`,
      vinV: design.spec.vinNomV,
      loadA: p.loadFraction * design.spec.ratedLoadA,
      fraction: p.weight,
    })),
    hoursPerDay: 24,
  };
}

/** The profile used when a design has none: its rated point (nominal Vin, rated load) all the time. */
export function ratedPointProfile(design: Design): MissionProfile {
  return {
    name: 'Rated point (no mission profile)',
    rows: [{ label: 'rated load', vinV: design.spec.vinNomV, loadA: design.spec.ratedLoadA, fraction: 1 }],
    hoursPerDay: 24,
  };
}
