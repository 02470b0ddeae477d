/**
 * `fit-30-points-4-params-ms`: one calibration (shared-model/fit, issue 12) of the demo buck against 30
 * measured points with 4 free parameters (switchRdsOn, switchCharge, coreLoss, quiescent). The measurement
 * is synthetic: the demo with its switching charge ×1.3 and core loss ×0.7, evaluated by the engine, plus
 * 10 mW of seeded noise on the input power (test/shared-model/fit/synthetic.ts). Goal: under 1 s (issue 12,
 * "well under a second"). Value: median CPU time (user + system) per fit after a 1 s warm-up; the lead
 * wires it into bench.ts. Run alone: `npx tsx test/bench/fit-figure.ts`.
 */
import { demoDesign } from '../helpers/demo.ts';
import { calibrate } from '../../shared-model/index.ts';

import { benchPoints, syntheticMeasurement } from '../shared-model/fit/synthetic.ts';
import { timeRuns } from './timing.ts';

export interface FitFigure {
  name: string;
  value: number;
  unit: string;
  goal: number | null;
  min: number;
  median: number;
  runs: number;
}

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

export async function fitFigure(runs = 15): Promise<FitFigure> {
  const design = demoDesign('synchronous-buck');
  const measurement = syntheticMeasurement(design, {
    truth: { switchCharge: 1.3, coreLoss: 0.7 },
    points: benchPoints(design, 30),
    seed: 12,
    lossNoiseW: 0.01,
  });
  const parameters = ['switchRdsOn', 'switchCharge', 'coreLoss', 'quiescent'];
  const once = () => {
    const out = calibrate(design, measurement, { parameters });
    if (!out.ok) throw new Error(`bench: the fit was refused: ${out.problems.map((p) => p.message).join(' ')}`);
  };
  const { cpuMs } = timeRuns(once, runs);
  const value = median(cpuMs);
  return { name: 'fit-30-points-4-params-ms', value, unit: 'ms', goal: 1000, min: Math.min(...cpuMs), median: value, runs };
}

if (import.meta.url === `file://${process.argv[1]}` && import.meta.url.endsWith('/fit-figure.ts')) {
  const f = await fitFigure();
  console.log(JSON.stringify(f));
}
