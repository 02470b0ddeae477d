import { describe, expect, it } from 'vitest';
import { DEFAULT_KNEE_THRESHOLD_POINTS, findLandmarks, sweepLoad } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { evaluate } from './hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

const DEMOS = ['synchronous-buck.json', 'diode-boost.json', 'hot-fin-buck.json'];

describe.each(DEMOS)('landmarks of the demo design %s', (file) => {
  const design = demoDesign(file);
  const sweep = sweepLoad(design);
  const marks = findLandmarks(sweep, { design });
  const usable = sweep.points.filter((p) => p.converged && !p.warnings.some((w) => ['duty-limit', 'cannot-regulate', 'thermal-runaway'].includes(w.code)));

  it('peak: no usable swept point beats it, and its neighbours on the engine are lower', () => {
    expect(marks.peak.load).not.toBeNull(); // every demo regulates somewhere in 1–120 % of rated load (assets/designs, invented scenarios)
    const load = marks.peak.load as number;
    const value = marks.peak.value as number;
    for (const p of usable) expect(p.efficiency).toBeLessThanOrEqual(value + 1e-12); // definition of a maximum
    closeTo(evaluate(design, { loadA: load }).efficiency, value, 1e-9); // the landmark is an engine point, not an interpolation
    if (marks.peak.note === null) {
      expect(evaluate(design, { loadA: load * 0.99 }).efficiency).toBeLessThan(value); // local maximum (docs/methods.md §12: fixed = I²R loss at the peak)
      expect(evaluate(design, { loadA: load * 1.01 }).efficiency).toBeLessThan(value); // local maximum, other side
    }
  });

  it('knee: efficiency there is the peak less the threshold, and lighter swept loads fall short of it', () => {
    expect(marks.knee.thresholdPoints).toBe(DEFAULT_KNEE_THRESHOLD_POINTS); // our documented default (knee.ts)
    if (marks.knee.load === null) {
      expect(marks.knee.reason).toMatch(/already within/); // null only when the range starts above the knee
      expect(usable[0].efficiency).toBeGreaterThanOrEqual((marks.peak.value as number) - 0.02); // consistent with that reason (knee.ts definition)
      return;
    }
    const target = (marks.peak.value as number) - DEFAULT_KNEE_THRESHOLD_POINTS / 100;
    closeTo(evaluate(design, { loadA: marks.knee.load }).efficiency, target, 0, 1e-7); // knee.ts definition: within X points of the peak
    for (const p of usable.filter((q) => q.loadA < (marks.knee.load as number))) expect(p.efficiency).toBeLessThan(target); // "lightest load" in the definition
  });

  it('CCM/DCM boundary: DCM just below, CCM just above, and Io = ΔI/2 there for a buck', () => {
    const b = marks.modeBoundary;
    if (b.load === null) {
      expect(sweep.points.every((p) => p.mode === sweep.points[0].mode)).toBe(true); // null only when the mode never changes
      return;
    }
    expect(evaluate(design, { loadA: b.load * 0.999 }).conductionMode).toBe('DCM'); // docs/methods.md §2: K < Kcrit below the boundary
    expect(evaluate(design, { loadA: b.load * 1.001 }).conductionMode).toBe('CCM'); // docs/methods.md §2: K > Kcrit above it
    if (design.topology.kind === 'buck') {
      const ripple = evaluate(design, { loadA: b.load }).operatingPoint.inductor.rippleA;
      closeTo(b.load, ripple / 2, 2e-3); // docs/methods.md §2: buck boundary where mean inductor current = ΔI/2 (K = Kcrit)
    }
  });

  it('thermal ceiling: the part named is at its limit there, or runs away just above it', () => {
    const c = marks.thermalCeiling;
    if (c.load === null) {
      for (const p of sweep.points) for (const m of [...p.marginsK, ...p.hazardMarginsK]) expect(m).toBeGreaterThan(0); // no limit reached in range
      return;
    }
    const at = evaluate(design, { loadA: c.load * (1 - 1e-6) });
    const above = evaluate(design, { loadA: c.load * (1 + 1e-4) });
    const margin =
      c.limitKind === 'touch'
        ? at.hazards.find((h) => h.part === c.part)?.marginK
        : at.temperatures.find((x) => x.part === c.part)?.marginK;
    const runaway = above.warnings.some((w) => w.code === 'thermal-runaway');
    if (!runaway) closeTo(margin ?? NaN, 0, 0, 0.05); // definition: margin to the derated (or touch) limit is zero at the ceiling
    else expect(at.warnings.some((w) => w.code === 'thermal-runaway')).toBe(false); // docs/methods.md §10: runaway starts at the ceiling
  });

  it('regulation limit: the named cause appears just above the load and not below it', () => {
    const r = marks.regulationLimit;
    if (r.load === null) {
      expect(r.reason).toMatch(/regulates up to|cannot regulate even/); // null only with one of the documented reasons (regulation-limit.ts)
      return;
    }
    const has = (load: number) => evaluate(design, { loadA: load }).warnings.some((w) => w.code === r.cause);
    expect(has(r.load * (1 - 1e-4))).toBe(false); // definition: the lightest load with the cause
    expect(has(r.load * (1 + 1e-4))).toBe(true); // definition: the cause holds just above
  });
});
