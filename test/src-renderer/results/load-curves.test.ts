import { describe, expect, it } from 'vitest';
import { findLandmarks, sweepLoad } from '../../../shared-model/index.ts';
import { efficiencyCurves, efficiencyFloor, lossStack } from '../../../src-renderer/results/load-curves.ts';
import { SHORT_ROLE, temperatureCurves } from '../../../src-renderer/results/temperature-curves.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { labelOf } from './demo.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('load-curve chart data of the demo design', () => {
  const design = demoDesign();
  const sweep = sweepLoad(design, { points: 40 });
  const landmarks = findLandmarks(sweep, { design });

  it('plots the sweep efficiency and marks the engine landmarks where they were found', () => {
    const curves = efficiencyCurves(sweep, landmarks);
    expect(curves.series[0].values).toEqual(sweep.points.map((p) => p.efficiency)); // engine sweep record (rendered, not recomputed)
    const peak = curves.points.find((p) => p.key === 'peak');
    expect(peak?.x).toBe(landmarks.peak.load); // engine landmark (findLandmarks)
    expect(peak?.y).toBe(landmarks.peak.value); // engine landmark (findLandmarks)
    expect(curves.markers.find((m) => m.key === 'rated')?.value).toBe(design.spec.ratedLoadA); // the design's rated load
    expect(curves.markers.some((m) => m.key === 'mode')).toBe(landmarks.modeBoundary.load !== null); // marked only when found
  });

  it('stacks the loss so that the top of the stack is the total loss at every load', () => {
    for (const by of ['mechanism', 'part'] as const) {
      const stack = lossStack(sweep, by, labelOf);
      sweep.points.forEach((p, i) => {
        const top = stack.series.reduce((s, series) => s + (series.values[i] ?? 0), 0);
        closeTo(top, p.totalLoss, 1e-9, 1e-12, { by, load: p.loadA }); // energy balance: the total loss is the sum of the terms (first law)
      });
    }
  });

  it('draws every part temperature and, for one part, its own limits', () => {
    const all = temperatureCurves(sweep, landmarks, null, labelOf);
    expect(all.series).toHaveLength(sweep.columns.temperatures.length); // one curve per part of the sweep
    const one = temperatureCurves(sweep, landmarks, 'switch', labelOf);
    const column = sweep.columns.temperatures.find((c) => c.part === 'switch');
    expect(one.markers.find((m) => m.key === 'derated')?.value).toBe(column?.deratedLimitC); // engine column: limit less the design margin
    const touch = sweep.columns.hazards.find((h) => h.part === 'switch');
    expect(one.markers.find((m) => m.key === 'touch')?.value).toBe(touch?.limitC); // engine column: touch limit of the surface
  });

  it('names the owner of every limit line when every part is shown', () => {
    const all = temperatureCurves(sweep, landmarks, null, labelOf);
    for (const c of sweep.columns.temperatures) {
      const line = all.markers.find((m) => m.axis === 'y' && m.value === c.deratedLimitC && !m.dashed);
      expect(line?.label, c.part).toContain(SHORT_ROLE[c.part]); // issue 16 §4: each limit says whose it is (engine column: limit less the design margin)
    }
    for (const h of sweep.columns.hazards) {
      const line = all.markers.find((m) => m.axis === 'y' && m.value === h.limitC && m.dashed);
      expect(line?.label, h.part).toContain(SHORT_ROLE[h.part]); // issue 16 §4: each touch limit names its surface's part (engine hazard column)
    }
  });

  it('zooms the efficiency axis to 20 points below the highest efficiency plotted', () => {
    const series = [{ key: 'e', label: 'e', values: [0.5, 0.93, 0.9551, null], tone: 0 }];
    expect(efficiencyFloor(series, 'whole')).toBeUndefined(); // the whole curve: Chart.js fits the axis to the data
    closeTo(efficiencyFloor(series, 'near-peak') ?? NaN, 0.75, 1e-12); // 95.51 % − 20 points = 75.51 %, rounded down to 75 % (our rule)
  });
});
