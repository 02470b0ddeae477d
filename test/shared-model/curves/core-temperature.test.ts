/**
 * Core loss against temperature (issue 13 §2): a multiplier curve on the Steinmetz loss, read at the
 * inductor temperature inside the electro-thermal solve. Checked against the docs/methods.md §7 iGSE hand
 * figures times the hand-interpolated factor, the direct thermal law T = Ta + θ·P, and the runaway edge
 * where a loss rising steeply with temperature has no fixed point.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign } from '../../../shared-model/index.ts';
import type { CoreLossTemperaturePoint, Design } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { METHODS_BUCK } from '../../helpers/operating-point.ts';
import { valid } from '../../helpers/ledger-designs.ts';

/** An invented ferrite-like curve: 2× at 25 °C, minimum 1× at 90 °C, 1.6× at 140 °C. */
const U_CURVE: CoreLossTemperaturePoint[] = [
  { tC: 25, factor: 2 },
  { tC: 90, factor: 1 },
  { tC: 140, factor: 1.6 },
];

/** The §1 buck with the docs/methods.md §7 material (α 1.46, β 2.75, k 8.455149). */
function buck(edit: (d: Design) => void = () => {}): Design {
  const d = makeDesign(METHODS_BUCK);
  d.parts.inductor.coreLoss = { kind: 'steinmetz', k: 8.455149, alpha: 1.46, beta: 2.75 };
  edit(d);
  return valid(d);
}

function hand(t: number): number {
  // Straight lines between the stated points (hand).
  return t <= 90 ? 2 - (t - 25) / 65 : 1 + (0.6 * (t - 90)) / 50;
}

function coreTerm(d: Design) {
  const e = evaluate(d);
  const term = e.losses.find((l) => l.part === 'inductor' && l.mechanism === 'core')!;
  return { e, term, input: (name: string) => term.inputs.find((x) => x.name === name)!.value };
}

describe('core loss with a loss-vs-temperature curve', () => {
  it('is the iGSE loss of docs/methods.md §7 times the factor at the inductor temperature', () => {
    const r = coreTerm(buck((d) => { d.parts.inductor.coreLossTemperatureCurve = { points: U_CURVE }; }));
    const op = r.e.operatingPoint;
    const D = op.dutyCycle;
    const dB = (op.inductanceH * op.inductor.rippleA) / (10 * 20e-6); // B = L·i/(N·Ae), N 10, Ae 20 mm²
    // CCM triangle: Pv = ki·ΔB^β·f^α·(D^(1−α) + D'^(1−α)), ki 0.420616 (docs/methods.md §7).
    const pv = 0.420616 * dB ** 2.75 * 500e3 ** 1.46 * (D ** (1 - 1.46) + (1 - D) ** (1 - 1.46));
    const t = r.input('T');
    closeTo(r.input('factor(T)'), hand(t), 1e-12);
    closeTo(r.term.watts, hand(t) * pv * 1e-6, 1e-5); // Ve 1 cm³
  });
  it('feeds the thermal solve: the inductor sits at Ta + θ·(all its losses), the core share included', () => {
    const e = evaluate(buck((d) => { d.parts.inductor.coreLossTemperatureCurve = { points: U_CURVE }; }));
    const p = e.losses.filter((l) => l.part === 'inductor').reduce((s, l) => s + l.watts, 0);
    const t = e.temperatures.find((x) => x.part === 'inductor')!.celsius;
    closeTo(t, 25 + 40 * p, 1e-6); // direct path θJA 40 K/W (docs/methods.md §10 thermal law)
  });
  it('at a hot ambient reads the hot branch (a warmer core loses more past the minimum)', () => {
    const cool = coreTerm(buck((d) => { d.spec.ambientC = 85; d.parts.inductor.coreLossTemperatureCurve = { points: U_CURVE }; }));
    const hot = coreTerm(buck((d) => { d.spec.ambientC = 110; d.parts.inductor.coreLossTemperatureCurve = { points: U_CURVE }; }));
    expect(hot.input('T')).toBeGreaterThan(110);
    closeTo(hot.input('factor(T)'), hand(hot.input('T')), 1e-12);
    expect(hot.term.watts).toBeGreaterThan(cool.term.watts);
  });
  it('runs away when the loss climbs faster than the path can shed it (edge: no fixed point)', () => {
    // k × 20 gives P0 ≈ 20 × 15 mW = 0.3 W at factor 1 (Pv of the first test); loop gain θ·P0·dfactor/dT
    // = 40 K/W × 0.3 W × 19/100 K⁻¹ ≈ 2.3 ≥ 1 from 25 °C on, and the held end (20 × 0.3 W → +240 K) lies past
    // the inductor's 125 °C limit: no fixed point below it (hand).
    const steep: CoreLossTemperaturePoint[] = [
      { tC: 0, factor: 1 },
      { tC: 25, factor: 1 },
      { tC: 125, factor: 20 },
    ];
    const e = evaluate(buck((d) => {
      d.parts.inductor.coreLoss = { kind: 'steinmetz', k: 8.455149 * 20, alpha: 1.46, beta: 2.75 };
      d.parts.inductor.coreLossTemperatureCurve = { points: steep };
    }));
    expect(e.converged).toBe(false);
    expect(e.warnings.find((w) => w.code === 'thermal-runaway')?.part).toBe('inductor');
  });
  it('warns when the inductor temperature lies outside the table (the end factor held)', () => {
    const e = evaluate(buck((d) => { d.parts.inductor.coreLossTemperatureCurve = { points: [{ tC: 60, factor: 1.2 }, { tC: 90, factor: 1 }, { tC: 140, factor: 1.6 }] }; }));
    expect(e.warnings.find((w) => w.path === 'parts.inductor.coreLossTemperatureCurve.points')?.message).toMatch(/outside its core loss \(T\) table \(60 … 140 °C\)/);
    const inside = evaluate(buck((d) => { d.parts.inductor.coreLossTemperatureCurve = { points: U_CURVE }; }));
    expect(inside.warnings.some((w) => w.path === 'parts.inductor.coreLossTemperatureCurve.points')).toBe(false);
  });
  it('refuses a factor of zero, naming the point and the table', () => {
    const d = makeDesign(METHODS_BUCK);
    d.parts.inductor.coreLossTemperatureCurve = { points: [U_CURVE[0]!, { tC: 90, factor: 0 }, U_CURVE[2]!] };
    const r = validateDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.some((p) => p.path === 'parts.inductor.coreLossTemperatureCurve.points[1].factor')).toBe(true);
  });
});
