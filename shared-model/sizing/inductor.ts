/**
 * Inductor sizing from the ripple target, on solved operating points.
 *
 * At each corner the solved point gives the inductor's volt-seconds per period λ = L·ΔI (the on-interval
 * voltage, with the resistive drops, times the solved on time: Vin·D·Ts for an ideal boost,
 * (Vin − Vo)·D·Ts for an ideal buck). The ripple target is ΔI* = r · IL,rated with r the target ratio
 * (spec.targets.inductorRippleRatio, default 0.3 — common practice: 20–40 %) and IL,rated the largest mean
 * inductor current at rated load (boost: Vin min, where IL = Iin is largest; buck: IL = Io at every Vin).
 * Then L ≥ max λ/ΔI*; with that L the peak current is max(IL + λ/(2L)) and the RMS current
 * max √(IL² + (λ/L)²/12) (exact for a triangle ripple on a mean, docs/methods.md §1).
 * Assumptions: CCM at rated load (in DCM λ = L·Ipk still holds, the ratio loses its meaning — noted);
 * inductance taken at its operating current when it rolls off.
 * Source: Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2 (inductor ripple,
 * from memory for the chapter); docs/methods.md §1, §23.
 */
import type { Design } from '../design/schema.ts';
import { topologyOf } from '../topology/registry.ts';
import type { SolvedCorner } from './corners.ts';
import { sized } from './sized.ts';
import type { InductorSizing } from './types.ts';

export const DEFAULT_RIPPLE_RATIO = 0.3;
const ERICKSON = 'Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2 (from memory for the chapter); docs/methods.md §23';

const voltSeconds = (c: SolvedCorner) => c.evaluation.operatingPoint.inductanceH * c.evaluation.operatingPoint.inductor.rippleA;
const meanA = (c: SolvedCorner) => c.evaluation.operatingPoint.inductor.averageA;

export function sizeInductor(design: Design, corners: readonly SolvedCorner[]): InductorSizing {
  const r = design.spec.targets?.inductorRippleRatio ?? DEFAULT_RIPPLE_RATIO;
  const words = topologyOf(design).sizingWords;
  const ratedCurrentA = sized(corners, meanA, {
    unit: 'A',
    ...words.inductorCurrent,
    source: ERICKSON,
  });
  const targetRippleA = r * ratedCurrentA.value;
  const lambda = sized(corners, voltSeconds, { unit: 'V·s', formula: '', reason: '' });
  const lReq = lambda.value / targetRippleA;
  const requiredInductanceH = sized(corners, voltSeconds, {
    unit: 'H',
    formula: 'L ≥ max(L·ΔI)/(r·IL,rated), L·ΔI = on-interval voltage × solved on time',
    reason: words.inductorVoltSecondsReason,
    source: ERICKSON,
  });
  requiredInductanceH.value = lReq;
  const chosenInductanceH = design.parts.inductor.inductanceH;
  const chosenRippleRatio = sized(corners, (c) => c.evaluation.operatingPoint.inductor.rippleA / ratedCurrentA.value, {
    unit: '',
    formula: 'ΔI/IL,rated with the design inductor',
    reason: 'The largest ripple of the design inductor over the range is at {corner}.',
    source: ERICKSON,
  });
  const requiredIsatA = sized(corners, (c) => meanA(c) + voltSeconds(c) / (2 * lReq), {
    unit: 'A',
    formula: 'Ipk = IL + (L·ΔI)/(2·Lreq)',
    reason: 'The peak inductor current (mean plus half the ripple with the required inductance) is largest at {corner}; the inductor needs this saturation current at its hot-spot temperature.',
    source: ERICKSON,
  });
  const requiredRmsA = sized(corners, (c) => {
    const ripple = voltSeconds(c) / lReq;
    return Math.sqrt(meanA(c) ** 2 + (ripple * ripple) / 12);
  }, {
    unit: 'A',
    formula: 'IL,rms = √(IL² + ΔI²/12), ΔI = (L·ΔI)/Lreq',
    reason: 'The inductor RMS current is largest at {corner}.',
    source: 'docs/methods.md §1',
  });
  const chosenPeakA = sized(corners, (c) => c.evaluation.operatingPoint.inductor.peakA, {
    unit: 'A',
    formula: 'Ipk = IL + ΔI/2 with the design inductor (solved)',
    reason: 'The design inductor peaks highest at {corner}.',
    source: ERICKSON,
  });
  return { targetRippleRatio: r, ratedCurrentA, targetRippleA, requiredInductanceH, chosenInductanceH, chosenRippleRatio, requiredIsatA, requiredRmsA, chosenPeakA };
}
