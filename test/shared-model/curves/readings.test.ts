/**
 * The report's list of what each datasheet curve gave at the evaluated point (shared-model/curves/readings.ts):
 * each value against a hand reading of the stated table at the evaluation's own temperature, frequency or
 * current, and the outside flag where the point leaves the table (extrapolation).
 */
import { describe, expect, it } from 'vitest';
import { curveReadings, evaluate } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { METHODS_BUCK } from '../../helpers/operating-point.ts';
import { valid } from '../../helpers/ledger-designs.ts';

function buck(edit: (d: Design) => void): Design {
  const d = makeDesign({ ...METHODS_BUCK, outputEsrOhm: 0.02 });
  edit(d);
  return valid(d);
}

describe('curve readings at the evaluated point', () => {
  it('read each table where the evaluation sits (hand interpolation of the stated points)', () => {
    const d = buck((x) => {
      x.parts.outputCapacitor.part.esrFrequencyCurve = { points: [{ frequencyHz: 100e3, esrOhm: 0.03 }, { frequencyHz: 1e6, esrOhm: 0.012 }, { frequencyHz: 1e7, esrOhm: 0.01 }] };
      x.parts.outputCapacitor.part.esrTemperatureCurve = { points: [{ tC: -40, ratio: 3 }, { tC: 25, ratio: 1 }, { tC: 105, ratio: 0.6 }] };
      x.parts.inductor.coreLossTemperatureCurve = { points: [{ tC: 25, factor: 2 }, { tC: 90, factor: 1 }, { tC: 140, factor: 1.6 }] };
    });
    const e = evaluate(d);
    const r = curveReadings(d, e);
    const t = (role: string) => e.temperatures.find((x) => x.part === role)!.celsius;
    const esrF = r.find((x) => x.gives === 'ESR at fs, 25 °C')!;
    closeTo(esrF.value, 0.03 - (0.018 * 400e3) / 900e3, 1e-12); // 500 kHz on the 100 kHz → 1 MHz segment (hand)
    expect(esrF.outside).toBe(false);
    const ratio = r.find((x) => x.curve === 'ESR(T) table')!;
    closeTo(ratio.value, 1 - (0.4 * (t('outputCapacitor') - 25)) / 80, 1e-12); // hand, 25 → 105 °C segment
    const core = r.find((x) => x.curve === 'core loss (T) table')!;
    closeTo(core.value, 2 - (t('inductor') - 25) / 65, 1e-12); // hand, 25 → 90 °C segment
    const weighted = r.find((x) => x.gives.startsWith('ESR weighted'))!;
    const term = e.losses.find((l) => l.part === 'outputCapacitor' && l.mechanism === 'ESR')!;
    closeTo(term.watts, weighted.value * ratio.value * (e.operatingPoint.inductor.rippleA ** 2 / 12), 1e-9); // P = ESR25·ratio(T)·ΔI²/12 (docs/methods.md §1, §9)
  });
  it('flag a reading outside its table', () => {
    const d = buck((x) => {
      x.parts.outputCapacitor.part.esrFrequencyCurve = { points: [{ frequencyHz: 1e3, esrOhm: 0.05 }, { frequencyHz: 1e4, esrOhm: 0.03 }, { frequencyHz: 1e5, esrOhm: 0.02 }] };
    });
    const r = curveReadings(d, evaluate(d));
    const esrF = r.find((x) => x.gives === 'ESR at fs, 25 °C')!;
    expect(esrF.outside).toBe(true);
    closeTo(esrF.value, 0.02, 1e-12); // the last point held above 100 kHz
  });
  it('list nothing for a design without tables', () => {
    const d = buck(() => {});
    expect(curveReadings(d, evaluate(d))).toEqual([]);
  });
});
