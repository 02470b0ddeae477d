/**
 * Where the live load sweep runs (src-renderer/results/sweep-pace.ts): a median-of-three rule with a
 * gap between the thresholds. The rule is ours (no outside source); these checks hold it to what its
 * header says.
 */
import { describe, expect, it } from 'vitest';
import { SweepPace } from '../../../src-renderer/results/sweep-pace.ts';

describe('SweepPace', () => {
  it('starts here, on the page thread', () => {
    expect(new SweepPace(40).here()).toBe(true); // sweep-pace.ts header: our own rule (no outside source)
  });

  it('one slow sweep among fast ones does not move the sweep to the worker (median of three)', () => {
    const pace = new SweepPace(40);
    for (const ms of [10, 120, 12, 11, 300, 9]) pace.record(ms, 'here');
    expect(pace.place).toBe('here'); // sweep-pace.ts header: our own rule (no outside source)
  });

  it('moves to the worker when the median of the last three sweeps here exceeds the budget', () => {
    const pace = new SweepPace(40);
    pace.record(45, 'here');
    pace.record(50, 'here');
    expect(pace.place).toBe('here'); // two samples are not yet a median of three
    pace.record(44, 'here');
    expect(pace.place).toBe('worker'); // median of 45, 50, 44 = 45 > 40
  });

  it('stays here while the median of the last three is within the budget', () => {
    const pace = new SweepPace(40);
    for (const ms of [45, 10, 12, 50]) pace.record(ms, 'here');
    expect(pace.place).toBe('here'); // medians 12 and 12: within 40
    pace.record(60, 'here');
    expect(pace.place).toBe('worker'); // median of 12, 50, 60 = 50 > 40
  });

  it('comes back only when the worker is clearly fast (≤ 3/4 of the budget), not just under it', () => {
    const pace = new SweepPace(40);
    for (const ms of [80, 80, 80]) pace.record(ms, 'here');
    expect(pace.place).toBe('worker'); // sweep-pace.ts header: our own rule (no outside source)
    pace.record(35, 'worker');
    expect(pace.place).toBe('worker'); // under the budget but inside the gap
    pace.record(20, 'worker');
    pace.record(25, 'worker');
    expect(pace.place).toBe('here'); // median of 35, 20, 25 = 25 ≤ 30
  });

  it('ignores late answers from the other place and nonsense times', () => {
    const pace = new SweepPace(40);
    pace.record(5, 'worker'); // a worker answer while sweeping here says nothing about here
    for (const ms of [Number.NaN, -1, Number.POSITIVE_INFINITY]) pace.record(ms, 'here');
    expect(pace.place).toBe('here'); // sweep-pace.ts header: our own rule (no outside source)
    for (const ms of [90, 90, 90]) pace.record(ms, 'here');
    expect(pace.place).toBe('worker'); // sweep-pace.ts header: our own rule (no outside source)
    pace.record(1, 'here'); // a sweep that finished here after the move
    expect(pace.place).toBe('worker'); // sweep-pace.ts header: our own rule (no outside source)
  });
});
