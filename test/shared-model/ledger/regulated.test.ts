/**
 * Issue 10 §4: points past the regulation limit. The audit case: the synchronous-buck demo with a maximum
 * duty of 0.245 at Vin 10.8 V, where the output cannot reach 3.3 V above about 0.35 A.
 * Every point carries `regulated`; peak, knee, mode boundary and figures of merit use regulated, converged
 * points only. The checks compare the engine with the buck's ideal conversion ratio Vout = D·Vin
 * (Erickson & Maksimović 2nd ed. ch. 2 [memory]; docs/methods.md §1), which the drops only lower.
 */
import { describe, expect, it } from 'vitest';
import type { Design } from '../../../shared-model/index.ts';
import { DEMO_DESIGNS, evaluate, figuresOfMerit, sweepWithLandmarks, validateDesign } from '../../../shared-model/index.ts';

function auditDesign(): Design {
  const doc = structuredClone(DEMO_DESIGNS.find((d) => d.id === 'synchronous-buck')!.json) as { spec: { maxDuty: number } };
  doc.spec.maxDuty = 0.245; // issue 10 §4 audit case
  const r = validateDesign(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.design;
}

const VIN = 10.8;

describe('every evaluated point says whether it regulates (issue 10 §4)', () => {
  const design = auditDesign();

  it('at 5 A the output cannot reach 3.3 V: regulated false, and Vout reached is at most D·Vin', () => {
    const e = evaluate(design, { vinV: VIN, loadA: 5 });
    expect(e.regulated).toBe(false);
    expect(e.operatingPoint.voutV).toBeLessThanOrEqual(0.245 * VIN); // buck ideal ratio Vout = D·Vin, less the drops (docs/methods.md §1)
    expect(e.operatingPoint.voutV).toBeLessThan(3.3 * 0.99); // clearly short of the target
    expect(e.warnings.some((w) => w.code === 'cannot-regulate')).toBe(true); // the warning and the flag agree
  });

  it('at 0.1 A the output is held: regulated true, and the duty lies below the limit', () => {
    const e = evaluate(design, { vinV: VIN, loadA: 0.1 });
    expect(e.regulated).toBe(true);
    expect(Math.abs(e.operatingPoint.voutV - 3.3)).toBeLessThan(1e-6 * 3.3); // the target, to the flag's tolerance
    expect(e.dutyCycle).toBeLessThan(0.245); // below the limit it was asked to respect
  });

  it('the sweep flags every point consistently with its output; peak and knee lie at regulated loads', () => {
    const { sweep, landmarks } = sweepWithLandmarks(design, { points: 60, conditions: { vinV: VIN } });
    for (const p of sweep.points) {
      expect(p.regulated).toBe(Math.abs(p.voutV - 3.3) <= 1e-6 * 3.3); // flag ⇔ output at target
      expect(p.regulated).toBe(!p.warnings.some((w) => w.code === 'cannot-regulate')); // flag ⇔ no cannot-regulate warning
    }
    const limit = landmarks.regulationLimit.load;
    expect(limit).not.toBeNull();
    expect(limit!).toBeGreaterThan(0.2); // hand estimate: D·Vin = 2.65 V ideal; the drops reach 3.3 V − 2.65 V only at light load…
    expect(limit!).toBeLessThan(1); // … so the limit lies well below 1 A (issue 10 §4: 349 mA)
    expect(landmarks.peak.load!).toBeLessThanOrEqual(limit!); // issue 10 §4: the peak is no longer marked right of the limit
    const usable = sweep.points.filter((p) => p.regulated && p.converged);
    const best = Math.max(...usable.map((p) => p.efficiency));
    expect(landmarks.peak.value!).toBeGreaterThanOrEqual(best - 1e-12); // the peak is the best regulated point (or better, refined)
    const unregulatedBest = Math.max(...sweep.points.filter((p) => !p.regulated).map((p) => p.efficiency));
    expect(unregulatedBest).toBeGreaterThan(landmarks.peak.value!); // the audit's trap: the curve sits higher right of the limit
    if (landmarks.knee.load !== null) expect(landmarks.knee.load).toBeLessThanOrEqual(landmarks.peak.load!);
  });

  it('figures of merit that need unregulated points are not available, with the reason', () => {
    const f = figuresOfMerit(design, { conditions: { vinV: VIN } });
    expect(f.averageEfficiency.available).toBe(false); // 1.25…5 A all lie past the ~0.35 A limit
    if (!f.averageEfficiency.available) expect(f.averageEfficiency.reason).toMatch(/not regulated at 1\.250 A: the output reaches only \d\.\d+ V instead of 3\.300 V/);
    expect(f.lightLoadEfficiency.available).toBe(false); // 0.5 A lies past it too
    expect(JSON.stringify(f)).not.toMatch(/null/); // never a null (issue 10 §4)
  });

  it('at the nominal 14.4 V the same design regulates at rated load and its figures are available', () => {
    const f = figuresOfMerit(design); // 3.3/14.4 = 0.229 ideal duty, under 0.245 with the drops at 5 A
    expect(f.points.every((p) => p.regulated)).toBe(true);
    expect(f.averageEfficiency.available).toBe(true);
  });
});
