/**
 * Tolerance comparison for published check values: passes when
 * |actual − expected| ≤ atol + rtol · |expected|, and prints every input on failure.
 */
import { expect } from 'vitest';

export function closeTo(actual: number, expected: number, rtol = 1e-6, atol = 0, context?: unknown): void {
  const error = Math.abs(actual - expected);
  const allowed = atol + rtol * Math.abs(expected);
  const ok = Number.isFinite(actual) && error <= allowed;
  if (!ok) {
    const detail = context === undefined ? '' : `\n  context: ${JSON.stringify(context)}`;
    expect.fail(
      `expected ${actual} to be within ${allowed} of ${expected} (|error| ${error}, rtol ${rtol}, atol ${atol})${detail}`,
    );
  }
  expect(ok).toBe(true);
}
