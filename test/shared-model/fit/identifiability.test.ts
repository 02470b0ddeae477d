/**
 * Identifiability: when the data cannot separate two parameters the calibration says so.
 * At one input voltage the two MOSFETs of a synchronous buck carry the same current shape in fixed
 * shares D and 1 − D, so the RDS(on) of the switch and of the rectifier both add loss ∝ I²: only their
 * weighted sum shows in the measured loss (Erickson & Maksimović, Fundamentals of Power Electronics,
 * 2nd ed., ch. 3: conduction loss D·Rs·I² + D'·Rr·I² [memory]); the parts' different temperatures break
 * the tie only slightly.
 */
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../../shared-model/index.ts';

import { benchPoints, syntheticMeasurement } from './synthetic.ts';
import { demoDesign } from '../../helpers/demo.ts';

const design = demoDesign('synchronous-buck');

describe('calibration identifiability warning', () => {
  it('fires for the two RDS(on) scales measured at a single input voltage', () => {
    const points = benchPoints(design).map((p) => ({ ...p, vinV: design.spec.vinNomV }));
    const m = syntheticMeasurement(design, { truth: { switchRdsOn: 1.2 }, points, seed: 7, lossNoiseW: 0.01 });
    const out = calibrate(design, m, { parameters: ['switchRdsOn', 'rectifierRdsOn'] });
    if (!out.ok) throw new Error(out.problems.map((p) => p.message).join(' '));
    const warning = out.calibration.warnings.find((w) => w.code === 'not-identifiable' || w.code === 'correlated');
    expect(warning?.parameters.sort()).toEqual(['rectifierRdsOn', 'switchRdsOn']);
    expect(warning?.message).toMatch(/separate/);
  });

  it('stays quiet for the switch RDS(on) and the quiescent current measured over load', () => {
    const m = syntheticMeasurement(design, { truth: { switchRdsOn: 1.3, quiescent: 0.004 }, points: benchPoints(design), seed: 7, lossNoiseW: 0.01 });
    const out = calibrate(design, m, { parameters: ['switchRdsOn', 'quiescent'] });
    if (!out.ok) throw new Error(out.problems.map((p) => p.message).join(' '));
    // conduction loss grows as I², the quiescent draw Vin·Iq does not change with load (docs/methods.md §1, §12): separable.
    expect(out.calibration.warnings).toEqual([]);
  });

  it('says when nothing measured depends on a parameter', () => {
    const m = syntheticMeasurement(design, { truth: {}, points: benchPoints(design), seed: 7, lossNoiseW: 0.01 });
    const out = calibrate(design, m, { parameters: ['switchCharge', 'thermal.controller'] });
    if (!out.ok) throw new Error(out.problems.map((p) => p.message).join(' '));
    // No temperature was measured and the controller's losses (quiescent draw, gate drive: docs/methods.md §4)
    // do not depend on its temperature, so its thermal resistance changes no residual.
    const w = out.calibration.warnings.find((x) => x.code === 'no-sensitivity');
    expect(w?.parameters).toEqual(['thermal.controller']);
    expect(out.calibration.parameters[1].intervalKnown).toBe(false);
  });
});
