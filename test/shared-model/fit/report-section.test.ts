/**
 * The report's calibration section: it says whether the design's adopted values were fitted to exactly
 * the measurement it carries (SHA-256, FIPS 180-4), and its residuals are those of the design as it
 * stands — for a freshly adopted calibration, the fit's own "after" residuals.
 */
import { demoDesign } from '../../helpers/demo.ts';
import { describe, expect, it } from 'vitest';
import { calibrate, calibrationSection } from '../../../shared-model/index.ts';

import { closeTo } from '../../helpers/close-to.ts';
import { benchPoints, syntheticMeasurement } from './synthetic.ts';

const design = demoDesign('synchronous-buck');
const m = syntheticMeasurement(design, { truth: { switchCharge: 1.3 }, points: benchPoints(design, 10), seed: 2, lossNoiseW: 0.005 });

describe('calibrationSection', () => {
  it('is absent for a design without a measurement', () => {
    expect(calibrationSection(design)).toBeNull();
  });

  it('reports the adopted values and the residuals after the fit, against exactly this measurement', () => {
    const out = calibrate(design, m, { parameters: ['switchCharge'] });
    if (!out.ok) throw new Error('fit refused');
    const c = out.calibration;
    const s = calibrationSection(c.calibratedDesign);
    if (!s) throw new Error('no section');
    expect(s.calibratedAgainstThis).toBe(true);
    expect(s.parameters.map((p) => [p.name, p.fitted])).toEqual([['switchCharge', c.parameters[0].fitted]]);
    closeTo(s.residualRms.lossW, c.residualRms.after.lossW, 1e-9); // the design as adopted is the fit's "after" model
    expect(s.caution).toMatch(/only as good as the measurements/);
  });

  it('says when the carried measurement is not the one the values were fitted to', () => {
    const out = calibrate(design, m, { parameters: ['switchCharge'] });
    if (!out.ok) throw new Error('fit refused');
    const edited = { ...out.calibration.calibratedDesign, measurements: { ...m, points: m.points.slice(1) } };
    expect(calibrationSection(edited)?.calibratedAgainstThis).toBe(false);
  });
});
