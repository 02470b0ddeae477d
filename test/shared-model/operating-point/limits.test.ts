import { describe, expect, it } from 'vitest';
import { solveOperatingPoint, type OperatingPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { IDEAL, METHODS_BUCK, conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';
import type { DesignSketch } from '../../helpers/designs.ts';

const codes = (op: OperatingPoint) => op.warnings.map((w) => w.code);

describe('solveOperatingPoint — duty limit', () => {
  it('holds D at maxDuty and reports the output actually reached, never the target', () => {
    const s: DesignSketch = { ...METHODS_BUCK, voutV: 11.5, maxDuty: 0.9 };
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), IDEAL);
    expect(op.dutyCycle).toBe(0.9); // issue 2 §3: the maximum-duty limit is honoured
    closeTo(op.voutV, 0.9 * 12, 1e-10); // docs/methods.md §1: ideal buck M = D at the limit
    expect(op.regulated).toBe(false); // issue 2 §3: a warning, not a wrong number
    expect(op.targetVoutV).toBe(11.5); // the specified target stays in the record
    closeTo(op.outputPowerW, 0.9 * 12 * 3, 1e-10); // Pout at the reached voltage and the stated load current
    expect(codes(op)).toEqual(['duty-limit', 'cannot-regulate']); // brief: both typed warnings
    expect(op.warnings[0].path).toBe('spec.maxDuty'); // brief rule 6: names the field
  });

  it('with drops the reached output follows the METHODS volt-second balance at D = maxDuty', () => {
    const s: DesignSketch = { ...METHODS_BUCK, voutV: 11.5, maxDuty: 0.9 };
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), conduction({ switchOnOhm: 0.01, rectifierOnOhm: 0.01, inductorDcrOhm: 0.02 }));
    closeTo(op.voutV, 0.9 * (12 - 3 * 0.01 + 3 * 0.01) - 3 * 0.01 - 3 * 0.02, 1e-10); // docs/methods.md §1 sync buck formula solved for Vo
  });
});

describe('solveOperatingPoint — ratings and saturation', () => {
  const c = conditionsOf(METHODS_BUCK);
  it('inductor peak against Isat at the ambient temperature', () => {
    const near = solveOperatingPoint(designOf({ ...METHODS_BUCK, isatA: 3.3 }), c, IDEAL);
    expect(codes(near)).not.toContain('saturation'); // Ipk 3.291667 A (docs/methods.md §1) < 3.3 A
    const hot = solveOperatingPoint(designOf({ ...METHODS_BUCK, isatA: 3.3 }), { ...c, ambientC: 75 }, IDEAL);
    const w = hot.warnings.find((x) => x.code === 'saturation');
    expect(w?.severity).toBe('danger'); // Isat(75 °C) = 3.3·(1 − 0.002·50) = 2.97 A < Ipk (test part's coefficient)
    expect(w?.path).toBe('parts.inductor.isatA'); // brief rule 6: names the field
  });

  it('blocking voltage against the rating and its derating; peak and mean current against ratings', () => {
    const caution = solveOperatingPoint(designOf({ ...METHODS_BUCK, vdsRatingV: 14 }), c, IDEAL);
    expect(caution.warnings.filter((w) => w.code === 'over-voltage-rating').map((w) => w.severity)).toEqual(['caution', 'caution']); // 12 V > 0.8·14 V
    const danger = solveOperatingPoint(designOf({ ...METHODS_BUCK, vdsRatingV: 10 }), c, IDEAL);
    expect(danger.warnings.filter((w) => w.code === 'over-voltage-rating').map((w) => w.severity)).toEqual(['danger', 'danger']); // 12 V > 10 V
    const amps = solveOperatingPoint(designOf({ ...METHODS_BUCK, idRatingA: 3 }), c, IDEAL);
    expect(amps.warnings.filter((w) => w.code === 'over-current-rating').map((w) => w.part)).toEqual(['switch', 'rectifier']); // Ipk 3.29 A > 3 A
    const diode = solveOperatingPoint(designOf({ ...METHODS_BUCK, rectifier: 'diode', ifRatingA: 1.5 }), c, IDEAL);
    expect(diode.warnings.find((w) => w.code === 'over-current-rating')?.path).toBe('parts.rectifier.ifRatingA'); // mean 1.75 A (docs/methods.md §1) > 1.5 A
  });
});

describe('solveOperatingPoint — inductance roll-off', () => {
  it('uses L at the mean current, linear between 0 A and the roll-off point, held beyond it', () => {
    const s: DesignSketch = { ...METHODS_BUCK, rolloff: { currentA: 6, inductanceH: 5e-6 } };
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), IDEAL);
    closeTo(op.inductanceH, 7.5e-6, 1e-12); // linear interpolation at 3 A between (0, 10 µH) and (6 A, 5 µH)
    closeTo(op.inductor.rippleA, (7 * (5 / 12)) / (7.5e-6 * 500e3), 1e-12); // docs/methods.md §1 ΔI with that L
    const beyond = solveOperatingPoint(designOf(s), conditionsOf(s, { loadA: 8 }), IDEAL);
    expect(beyond.inductanceH).toBe(5e-6); // held at the last stated point (schema: linear between 0 A and the point)
    expect(codes(beyond)).toContain('model-limit'); // the extrapolation is said, not hidden
  });
});

describe('solveOperatingPoint — robustness', () => {
  const families: DesignSketch[] = (['buck', 'boost'] as const).flatMap((kind) =>
    (['diode', 'synchronous'] as const).flatMap((rectifier) =>
      (['forced-pwm', 'diode-emulation'] as const).map((lightLoad) => ({
        kind, rectifier, lightLoad, vinV: kind === 'buck' ? 24 : 8, voutV: 12, loadA: 2, fsHz: 300e3, inductanceH: 8e-6,
        vinMinV: kind === 'buck' ? 13 : 4, vinMaxV: kind === 'buck' ? 40 : 11.5, maxDuty: 0.92,
      })),
    ),
  );
  const allFinite = (x: unknown): boolean =>
    typeof x === 'number' ? Number.isFinite(x) : x && typeof x === 'object' ? Object.values(x).every(allFinite) : true;

  it('returns finite numbers for every load from 0 to 10× rated and Vin over the range, never throwing', () => {
    const cp = conduction({ switchOnOhm: 0.02, rectifierOnOhm: 0.015, diodeVf0V: 0.45, diodeRdOhm: 0.02, inductorDcrOhm: 0.03, outputCapacitorEsrOhm: 0.01 });
    let count = 0;
    for (const s of families) {
      const design = designOf(s);
      for (const vin of [s.vinMinV!, s.vinV, s.vinMaxV!]) {
        for (const load of [0, 1e-6, 0.01, 0.1, 0.5, 1, 2, 5, 10, 20]) {
          const op = solveOperatingPoint(design, conditionsOf(s, { vinV: vin, loadA: load }), cp);
          expect(allFinite(op), JSON.stringify({ s, vin, load })).toBe(true); // brief rule: never NaN
          expect(op.dutyCycle).toBeGreaterThanOrEqual(0); // a duty cycle is a fraction
          expect(op.dutyCycle).toBeLessThanOrEqual(0.92); // issue 2 §3: spec.maxDuty of these designs honoured
          if (!op.regulated) expect(codes(op)).toContain('cannot-regulate'); // issue 2 §3: never silently unregulated
          count++;
        }
      }
    }
    expect(count).toBe(8 * 3 * 10); // every family × Vin × load combination ran
  });

  it('impossible conditions are a programmer error and throw a RangeError naming the field', () => {
    const d = designOf(METHODS_BUCK);
    expect(() => solveOperatingPoint(d, conditionsOf(METHODS_BUCK, { vinV: 0 }), IDEAL)).toThrow(/conditions\.vinV/); // brief: programmer errors throw
    expect(() => solveOperatingPoint(d, conditionsOf(METHODS_BUCK, { loadA: -1 }), IDEAL)).toThrow(RangeError); // brief: programmer errors throw
    expect(() => solveOperatingPoint(d, conditionsOf(METHODS_BUCK, { switchingFrequencyHz: Number.NaN }), IDEAL)).toThrow(/switchingFrequencyHz/); // names the field
    expect(() => solveOperatingPoint(d, conditionsOf(METHODS_BUCK), conduction({ inductorDcrOhm: -0.1 }))).toThrow(/inductorDcrOhm/); // names the field
  });
});
