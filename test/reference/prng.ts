/**
 * A small seeded pseudo-random generator for reproducible test designs (test-only).
 * mulberry32: 32-bit state, additive constant 0x6D2B79F5, then an xorshift-multiply mix.
 * Source: T. Ettinger's public-domain mulberry32 (2017) [memory]; quality is ample for drawing test
 * parameters, it is not used for statistics.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Uniform on [lo, hi). */
export function uniform(rand: () => number, lo: number, hi: number): number {
  return lo + (hi - lo) * rand();
}

/** Log-uniform on [lo, hi). */
export function logUniform(rand: () => number, lo: number, hi: number): number {
  return Math.exp(uniform(rand, Math.log(lo), Math.log(hi)));
}

export function pick<T>(rand: () => number, items: readonly T[]): T {
  return items[Math.floor(rand() * items.length) % items.length];
}
