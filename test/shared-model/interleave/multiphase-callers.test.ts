/**
 * Issue 13 §1: sweep, frequency sweep, comparison, ranking, tolerance and the report read a multiphase design
 * as the whole interleaved converter — never silently as one stage carrying the whole load. The check that can
 * fail: N stages at I/N each lose far less in conduction than one stage at I (I²R per stage, Σ = I²R/N —
 * textbook), so a caller that fell back to one stage would show a much larger loss than `evaluateDesign`.
 */
import { describe, expect, it } from 'vitest';
import {
  buildReport, compareParts, evaluate, evaluateDesign, judgeChunk, sweepFrequency, sweepLoad, worstCase, type Design, type Part,
} from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign, demoText } from '../../helpers/demo.ts';

const design: Design = demoDesign('multiphase-buck'); // invented: 12 → 1.8 V, 60 A, 4 phases, sheds phases
const whole = evaluateDesign(design).evaluation;
const oneStage = evaluate(design); // the same parts as one stage at 60 A: what a silent fallback would give

describe('callers of a multiphase design use the whole converter', () => {
  it('the whole converter loses far less than one stage at the whole load (I²R over N stages, textbook)', () => {
    expect(oneStage.totalLoss).toBeGreaterThan(1.5 * whole.totalLoss);
  });

  it('load sweep: the rated point is the whole converter', () => {
    const sweep = sweepLoad(design, { points: 5, fromA: 30, toA: 60, spacing: 'linear' });
    closeTo(sweep.points[4]!.totalLoss, whole.totalLoss, 1e-9, 0);
  });

  it('frequency sweep: the point at the design frequency is the whole converter', () => {
    const fs = design.spec.switchingFrequencyHz;
    const f = sweepFrequency(design, { fromHz: fs / 2, toHz: fs * 2, points: 3, spacing: 'log' });
    const at = f.points.find((p) => Math.abs(p.switchingFrequencyHz - fs) < 1e-6 * fs)!;
    closeTo(at.totalLoss, whole.totalLoss, 1e-9, 0);
  });

  it('comparison: each alternative is evaluated as the whole converter', () => {
    const other: Part = { ...design.parts.switch, id: 'alt', name: 'Alternative switch', rdsOn25Ohm: design.parts.switch.rdsOn25Ohm * 2 } as Part;
    const outcome = compareParts(design, { role: 'switch', parts: [design.parts.switch as Part, other], sweep: { points: 5 }, refine: false });
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    closeTo(outcome.comparison.alternatives[0]!.evaluation.totalLoss, whole.totalLoss, 1e-9, 0);
    const alt = evaluateDesign(outcome.comparison.alternatives[1]!.design).evaluation.totalLoss;
    closeTo(outcome.comparison.alternatives[1]!.evaluation.totalLoss, alt, 1e-9, 0);
  });

  it('ranking: the loss at rated of the design’s own switch is the whole converter’s', () => {
    const [verdict] = judgeChunk(design, { role: 'switch', library: [design.parts.switch as Part], by: 'loss-at-rated' });
    const figures = verdict && 'figures' in verdict ? verdict.figures : undefined;
    expect(figures).toBeDefined();
    closeTo(figures!.lossAtRatedW, whole.totalLoss, 1e-9, 0);
  });

  it('tolerance: the nominal corner is the whole converter', () => {
    const w = worstCase(design, { tolerances: { inductanceFraction: 0.2 } });
    closeTo(w.nominal.totalLoss, whole.totalLoss, 1e-9, 0);
  });

  it('report: rated, the Vin cases and the sweep are the whole converter, with the per-phase section', () => {
    const model = buildReport({ design, documentText: demoText('multiphase-buck'), date: '2026-12-05', appVersion: '0.0.0', sweepPoints: 12, familyPoints: 6 });
    closeTo(model.rated.totalLoss, whole.totalLoss, 1e-9, 0);
    expect(model.phases).not.toBeNull();
    expect(model.phases!.atRated.activePhases).toBe(4);
    expect(model.phases!.shedding.curves.map((c) => c.activePhases)).toEqual([1, 2, 3, 4]);
    expect(buildReport({ design: demoDesign(), documentText: demoText(), date: '2026-12-05', appVersion: '0.0.0', sweepPoints: 12, familyPoints: 6 }).phases).toBeNull();
  });
});
