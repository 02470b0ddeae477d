/**
 * L(I) roll-off tables (issue 13 §2): the current swing follows Faraday's law with the incremental
 * inductance, λ(i) = ∫L di and λ(peak) − λ(valley) = v·t (di/dt = v/L(i) integrated; Erickson &
 * Maksimović, 2nd ed., ch. 13 [memory for chapter]). Checked against hand integrations of stated curves,
 * the constant-L ripple of docs/methods.md §1, the segment slopes of the solved operating point, and the
 * saturation warnings at and past the table's end.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, solveOperatingPoint, validateDesign } from '../../../shared-model/index.ts';
import type { Design, InductancePoint } from '../../../shared-model/index.ts';
import { currentForFlux, fluxLinkage, swingForFlux } from '../../../shared-model/curves/inductance-table.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { conditionsOf, IDEAL, METHODS_BUCK } from '../../helpers/operating-point.ts';
import { valid } from '../../helpers/ledger-designs.ts';

const uH = 1e-6;
/** A stated curve: 10 µH flat to 2 A, 6 µH at 4 A, 3 µH at 6 A (straight lines between). */
const STATED: InductancePoint[] = [
  { currentA: 0, inductanceH: 10 * uH },
  { currentA: 2, inductanceH: 10 * uH },
  { currentA: 4, inductanceH: 6 * uH },
  { currentA: 6, inductanceH: 3 * uH },
];
/** Flat 10 µH to 3 A, then falling 2 µH per A to 4 µH at 6 A: a kink at the §1 buck's 3 A mean. */
const KINK: InductancePoint[] = [
  { currentA: 0, inductanceH: 10 * uH },
  { currentA: 3, inductanceH: 10 * uH },
  { currentA: 6, inductanceH: 4 * uH },
];

describe('flux linkage of an L(I) table (λ = ∫L di, trapezoids exact on straight lines)', () => {
  it('matches a hand integration of the stated curve', () => {
    closeTo(fluxLinkage(STATED, 2), 20 * uH, 1e-12); // 2 A · 10 µH (hand)
    closeTo(fluxLinkage(STATED, 3), 29 * uH, 1e-12); // 20 + 1·(10 + 8)/2 µV·s (hand)
    closeTo(fluxLinkage(STATED, 6), 45 * uH, 1e-12); // 20 + 2·(10 + 6)/2 + 2·(6 + 3)/2 = 45 µV·s (hand)
    closeTo(fluxLinkage(STATED, 7), 48 * uH, 1e-12); // the last 3 µH held above 6 A (hand)
    closeTo(fluxLinkage(STATED, -3), -29 * uH, 1e-12); // odd: the core does not care about the sign (common practice)
  });
  it('inverts it: the current a DCM on interval reaches from 0 A (hand)', () => {
    closeTo(currentForFlux(STATED, 29 * uH), 3, 1e-12);
    closeTo(currentForFlux(STATED, 45 * uH), 6, 1e-12);
  });
  it('gives the docs/methods.md §1 ripple 0.583333 A for a constant 10 µH', () => {
    const flat = STATED.map((p) => ({ ...p, inductanceH: 10 * uH }));
    closeTo(swingForFlux(flat, 3, 7 * (5 / 12) * 2e-6), 0.583333, 1e-6); // §1: (Vin − Vo)·D/(L·fs)
  });
  it('solves the swing across a kink: r² − 40r + 4·5.8333 = 0 in A and µV·s (hand)', () => {
    // λ(3 + r/2) − λ(3 − r/2) = 10·r/2 + [10·r/2 − (r/2)²] µV·s = 5.83333 µV·s → r = 20 − √(400 − 23.3333)
    closeTo(swingForFlux(KINK, 3, 7 * (5 / 12) * 2e-6), 20 - Math.sqrt(400 - 70 / 3), 1e-10); // 0.592098 A (hand)
  });
});

function buckWith(points?: InductancePoint[], edit?: (d: Design) => void): Design {
  const d = makeDesign({ ...METHODS_BUCK, isatA: 20 });
  if (points) d.parts.inductor = { ...d.parts.inductor, inductanceCurve: { points } };
  if (edit) edit(d);
  return valid(d);
}

describe('the operating point with an L(I) table (ideal drops: the textbook circuit)', () => {
  const cond = conditionsOf(METHODS_BUCK);
  it('rises faster where L has fallen: a higher peak than the same design at constant L (issue 13 Done when)', () => {
    const flat = solveOperatingPoint(buckWith(), cond, IDEAL);
    const curved = solveOperatingPoint(buckWith(KINK), cond, IDEAL);
    closeTo(flat.inductor.peakA, 3.291667, 1e-6); // docs/methods.md §1 Ipk
    closeTo(curved.inductor.peakA, 3 + (20 - Math.sqrt(400 - 70 / 3)) / 2, 1e-9); // the hand root above
    expect(curved.inductor.peakA).toBeGreaterThan(flat.inductor.peakA);
  });
  it('draws segments whose flux-linkage change is v·t and whose slope is v over the chord of L(i) (Faraday; hand λ)', () => {
    const op = solveOperatingPoint(buckWith(STATED), cond, IDEAL);
    closeTo(op.dutyCycle, 5 / 12, 1e-12); // ideal buck D = Vo/Vin (docs/methods.md §1)
    const [on, off] = op.waveforms.inductor.segments;
    // Hand λ of the stated curve on 2–4 A: λ(i) = 20 + 14(i − 2) − (i² − 4) µV·s (L = 14 − 2i µH).
    const lam = (i: number) => (20 + 14 * (i - 2) - (i * i - 4)) * uH;
    closeTo(lam(on!.i1A) - lam(on!.i0A), (12 - 5) * on!.durationS, 1e-9); // on: v = Vin − Vo
    closeTo(lam(off!.i0A) - lam(off!.i1A), 5 * off!.durationS, 1e-9); // off: v = −Vo
    const chord = (lam(on!.i1A) - lam(on!.i0A)) / (on!.i1A - on!.i0A);
    closeTo((on!.i1A - on!.i0A) / on!.durationS, 7 / chord, 1e-9); // slope = v / L_chord
    closeTo(chord, 8 * uH, 1e-9); // on a straight piece of L(i) the chord is L at the mean, 14 − 2·3 µH (hand)
  });
  it('in DCM reaches the peak whose flux linkage from 0 A is (Vin − Vo)·D·Ts', () => {
    const d = makeDesign({ ...METHODS_BUCK, rectifier: 'diode', loadA: 0.1, isatA: 20 });
    d.parts.inductor = { ...d.parts.inductor, inductanceCurve: { points: STATED } };
    const op = solveOperatingPoint(valid(d), conditionsOf(METHODS_BUCK, { loadA: 0.1 }), IDEAL);
    expect(op.mode).toBe('DCM');
    closeTo(fluxLinkage(STATED, op.inductor.peakA), (12 - op.voutV) * op.dutyCycle * 2e-6, 1e-9); // Faraday, from 0 A
  });
});

describe('saturation at the edge of an L(I) table', () => {
  it('warns (danger) when the peak passes the end of the table', () => {
    const short = [STATED[0]!, STATED[1]!, { currentA: 3, inductanceH: 8 * uH }];
    const e = evaluate(buckWith(short));
    expect(e.operatingPoint.inductor.peakA).toBeGreaterThan(3);
    const w = e.warnings.find((x) => x.path === 'parts.inductor.inductanceCurve.points' && x.severity === 'danger');
    expect(w?.message).toMatch(/beyond its L\(I\) table, which ends at 3 A/);
  });
  it('warns (caution) when L at the peak has fallen below 70 % of its first value, and not above it', () => {
    // 3 A mean on STATED: L(peak ≈ 3.4 A) ≈ 7.2 µH = 72 % → no warning; scaled to a 3.5 A knee it is below 70 %.
    const ok = evaluate(buckWith(STATED));
    expect(ok.warnings.some((x) => x.path === 'parts.inductor.inductanceCurve.points')).toBe(false);
    const steep = STATED.map((p) => ({ ...p, currentA: p.currentA * 0.75 }));
    const e = evaluate(buckWith(steep));
    expect(e.warnings.some((x) => x.path === 'parts.inductor.inductanceCurve.points' && /fallen to .* % of its first value/.test(x.message))).toBe(true);
  });
  it('refuses an inductance that rises with current, naming the point', () => {
    const d = makeDesign(METHODS_BUCK);
    d.parts.inductor = { ...d.parts.inductor, inductanceCurve: { points: [STATED[0]!, { currentA: 2, inductanceH: 12 * uH }, STATED[3]!] } };
    const r = validateDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.find((p) => p.path === 'parts.inductor.inductanceCurve.points[1].inductanceH')?.message).toMatch(/must not rise with current/);
  });
});
