import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatEngineering, parseEngineering } from '../../../shared-model/index.ts';

// Units a design field can have (design/key-units.ts) and the magnitudes worth covering for each.
const UNITS_WITH_RANGE: readonly (readonly [string, number, number])[] = [
  ['V', 1e-3, 1e4],
  ['A', 1e-6, 1e3],
  ['Ω', 1e-5, 1e7],
  ['H', 1e-9, 1],
  ['F', 1e-13, 1],
  ['Hz', 1, 1e9],
  ['W', 1e-6, 1e3],
  ['s', 1e-12, 1e-3],
  ['C', 1e-12, 1e-4],
  ['J', 1e-12, 1e-3],
  ['T', 1e-4, 2],
  ['W/m³', 1, 1e8],
  ['V/K', 1e-5, 0.1],
  ['°C', 1e-2, 1000],
  ['K', 1e-2, 200],
  ['K/W', 1e-2, 1000],
  ['/K', 1e-6, 0.05],
  ['h', 1, 1e7],
  ['m', 1e-6, 0.5],
  ['m²', 1e-8, 0.5],
  ['m³', 1e-10, 0.5],
  ['', 1e-4, 1e4],
];

const SEED = 20240611;

describe('formatEngineering then parseEngineering returns the value within display precision', () => {
  it('holds for every field unit, both signs, 1 to 6 significant digits (fast-check, seeded)', () => {
    const arbitrary = fc
      .record({
        index: fc.integer({ min: 0, max: UNITS_WITH_RANGE.length - 1 }),
        position: fc.double({ min: 0, max: 1, noNaN: true }),
        negative: fc.boolean(),
        digits: fc.integer({ min: 1, max: 6 }),
      })
      .map(({ index, position, negative, digits }) => {
        const [unit, lo, hi] = UNITS_WITH_RANGE[index] ?? ['', 1, 1];
        const magnitude = lo * (hi / lo) ** position; // log-uniform across the range
        return { unit, value: negative ? -magnitude : magnitude, digits };
      });
    fc.assert(
      fc.property(arbitrary, ({ unit, value, digits }) => {
        const text = formatEngineering(value, unit, digits);
        const back = parseEngineering(text, unit);
        if (!back.ok) throw new Error(`"${text}" (from ${value} ${unit}) did not parse: ${back.message}`);
        // Rounding to d significant digits moves a value by at most half a unit in the last place:
        // |error| ≤ 0.5 · 10^(1−d) · |value| (IEEE 754 round-to-nearest of a decimal mantissa), plus 1e-12 for binary noise.
        const allowed = 0.5 * 10 ** (1 - digits) * Math.abs(value) * (1 + 1e-12);
        expect(Math.abs(back.value - value), `${value} ${unit} → "${text}" → ${back.value}`).toBeLessThanOrEqual(allowed);
      }),
      { seed: SEED, numRuns: 3000 },
    );
  });

  it('holds for exact zero', () => {
    for (const [unit] of UNITS_WITH_RANGE) {
      const back = parseEngineering(formatEngineering(0, unit), unit);
      expect(back.ok && back.value === 0, unit).toBe(true); // zero formats as "0 <unit>" and reads back exactly
    }
  });
});
