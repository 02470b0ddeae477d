/**
 * Continuity of the ledger across the CCM/DCM boundary of the demo synchronous buck (diode emulation at
 * light load). At the boundary the inductor valley current is 0, so the rectifier's body diode carries
 * no forward current when the switch turns on and stores no recovery charge (charge-control model
 * Q ≈ τ·IF, Mohan, Undeland & Robbins, Power Electronics, diodes chapter [from memory]): the reverse-
 * recovery loss must reach 0 there from the CCM side, and the ledger must not step.
 * The switch's output-capacitance term takes its turn-on swing from the start of the idle interval in DCM
 * (operating-point/assemble.ts), the same swing as CCM at zero current, so it must not step either.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, findLandmarks, sweepLoad } from '../../../shared-model/index.ts';
import type { Evaluation } from '../../../shared-model/index.ts';
import { demoDesign as demo } from '../../helpers/demo.ts';

const watts = (e: Evaluation, mechanism: string) =>
  e.losses.filter((t) => t.mechanism === mechanism).reduce((sum, t) => sum + t.watts, 0);

/** Relative distance from the boundary of the two probe loads (the boundary is placed to ~1e-8 A by bisection). */
const SIDE = 1e-5;
/**
 * Allowed step of the ledger across the boundary, W: 0.1 mW, 0.05 % of the ~0.2 W total there. The
 * smooth change of the losses over the 2·SIDE load interval is about 1e-6 W (slope ≈ 0.06 W/A × 1.2e-5 A);
 * before the charge scaling the step was the whole datasheet Qrr·Vsw·fs, 97 mW.
 */
const STEP_W = 1e-4;

describe('the ledger at the CCM/DCM boundary of the demo synchronous buck', () => {
  const design = demo('synchronous-buck');
  const marks = findLandmarks(sweepLoad(design), { design });
  const boundary = marks.modeBoundary.load as number;
  const below = evaluate(design, { loadA: boundary * (1 - SIDE) });
  const above = evaluate(design, { loadA: boundary * (1 + SIDE) });

  it('finds the boundary with DCM just below it and CCM just above it', () => {
    expect(marks.modeBoundary.method).toBe('refined'); // placed on the engine (landmarks/mode-boundary.ts)
    expect(below.conductionMode).toBe('DCM'); // docs/methods.md §2: DCM below the boundary
    expect(above.conductionMode).toBe('CCM');
  });

  it('has a reverse-recovery loss that goes to 0 at the boundary from the CCM side', () => {
    expect(watts(below, 'reverse recovery')).toBe(0); // DCM: the diode stopped on its own (charge-control model, [from memory])
    const on = above.operatingPoint.edges.turnOn;
    expect(on.currentA).toBeGreaterThan(0); // CCM side: a small positive valley current still flows in the body diode
    expect(on.currentA).toBeLessThan(1e-3); // ... and it is small next to the 0.6 A load (valley → 0 at the boundary, docs/methods.md §2)
    const rect = design.parts.rectifier;
    const qrr = rect.kind === 'mosfet' ? rect.bodyDiodeQrrC : 0;
    const testA = rect.kind === 'mosfet' ? (rect.bodyDiodeQrrTestA ?? design.spec.ratedLoadA) : 1;
    // docs/methods.md §4 Qrr·Vsw·fs with Q ∝ IF (charge-control model [from memory]), bounded by hand from the
    // design's own figures, not the engine's edge record: IF < 1 mA (above) and a buck's swing is Vin plus
    // the body diode's drop, under 1 V (common practice).
    const bound = qrr * (1e-3 / testA) * (above.conditions.vinV + 1) * design.spec.switchingFrequencyHz;
    expect(watts(above, 'reverse recovery')).toBeGreaterThan(0); // CCM side: some charge is still recovered
    expect(watts(above, 'reverse recovery')).toBeLessThanOrEqual(bound);
    expect(watts(above, 'reverse recovery')).toBeLessThan(STEP_W / 10); // far below the 97 mW the unscaled Qrr gave
  });

  it('is continuous within 0.1 mW, the output-capacitance term included', () => {
    const step = Math.abs(above.totalLoss - below.totalLoss);
    expect(step, `ledger: ${below.totalLoss} W below, ${above.totalLoss} W above`).toBeLessThan(STEP_W); // continuity (charge-control model; swing at the idle start)
    const coss = Math.abs(watts(above, 'output capacitance') - watts(below, 'output capacitance'));
    expect(coss).toBeLessThan(STEP_W / 10); // ½·Coss·V² with the same swing on both sides (docs/methods.md §4)
  });
});
