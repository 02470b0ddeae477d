/**
 * sizeDesign on solved operating points. A near-lossless design must reproduce the ideal textbook
 * formulas; a lossy one must obey charge and power balance, and the assumed-efficiency hand method must
 * differ from it exactly as its efficiency does. Sources on each check line.
 */
import { describe, expect, test } from 'vitest';
import { chargeAboveMean, cornerVoltages, evaluate, handSizing, sizeDesign } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign, type DesignSketch } from '../../helpers/designs.ts';
import { nearIdealDesign } from '../../helpers/near-ideal.ts';

const nearIdeal = nearIdealDesign;

const seedSketch: DesignSketch = { kind: 'boost', rectifier: 'diode', vinV: 5, voutV: 12, loadA: 2, fsHz: 120e3, inductanceH: 15.4e-6, outputCapacitanceF: 100e-6, senseLocation: 'switch', senseOhm: 0.01 };

describe('near-lossless boost reproduces the ideal formulas', () => {
  const d = nearIdeal({ ...seedSketch, outputCapacitanceF: 100e-6, senseOhm: 1e-5 });
  d.spec.targets = { outputRippleV: 0.12, inductorRippleRatio: 0.3 };
  const s = sizeDesign(d);
  const ideal = handSizing({ kind: 'boost', vinV: 5, voutV: 12, loadA: 2, switchingFrequencyHz: 120e3, efficiency: 1, rippleRatio: 0.3, outputRippleV: 0.12, senseOhm: 0.01 });
  test('duty and rated inductor current', () => {
    closeTo(s.duty.max.value, 7 / 12, 1e-3); // D = 1 − Vin/Vo, Erickson & Maksimović ch. 2
    closeTo(s.inductor.ratedCurrentA.value, 2 / (5 / 12), 1e-3); // IL = Io/D′, charge balance, Erickson & Maksimović ch. 2
  });
  test('inductance for the ripple target, peak and RMS', () => {
    closeTo(s.inductor.requiredInductanceH.value, ideal.inductanceH, 2e-3); // L = Vin·D/(r·IL·fs), Erickson & Maksimović ch. 2
    closeTo(s.inductor.requiredIsatA.value, ideal.peakA, 2e-3); // Ipk = IL + ΔI/2, Erickson & Maksimović ch. 2
    closeTo(s.inductor.requiredRmsA.value, Math.sqrt(ideal.inductorA ** 2 + ideal.rippleA ** 2 / 12), 2e-3); // docs/methods.md §1
  });
  test('output capacitance and ESR from the ripple target', () => {
    closeTo(s.outputCapacitor.chargeC.value, (2 * (7 / 12)) / 120e3, 2e-3); // Q = Io·D·Ts, charge balance, Erickson & Maksimović ch. 2
    closeTo(s.outputCapacitor.minCapacitanceF!.value, ideal.outputCapacitanceF, 2e-3); // C = Io·D/(fs·ΔV), Erickson & Maksimović ch. 2
    // With the design's 15.4 µH the swing is IL + ΔI/2 of that inductor: ESR = ΔV/Ipk (common practice)
    const ripple = (5 * (7 / 12)) / (15.4e-6 * 120e3);
    closeTo(s.outputCapacitor.maxEsrOhm!.value, 0.12 / (2 / (5 / 12) + ripple / 2), 2e-3); // common practice
  });
  test('RHP zero and the crossover it binds', () => {
    const rhp = ((5 / 12) ** 2 * 6) / (2 * Math.PI * 15.4e-6);
    closeTo(s.loop.rhpZeroHz!.value, rhp, 3e-3); // fz = D′²R/(2πL), Erickson & Maksimović ch. 8 (from memory)
    expect(s.loop.limits[0]!.id).toBe('rhp-zero'); // fz/5 < fs/10 here (common practice rules)
    closeTo(s.loop.crossoverHz, rhp / 5, 3e-3); // common practice
    closeTo(s.loop.outputPoleHz.value, 2 / (2 * Math.PI * 6 * 100e-6), 1e-9); // docs/methods.md §13
  });
  test('slope compensation above D = 0.5 with the sense resistor', () => {
    expect(s.slope.needed).toBe(true); // Ridley 1991 (from memory): D > 0.5
    closeTo(s.slope.downSlopeAPerS.value, 7 / 15.4e-6, 2e-3); // m2 = (Vo − Vin)/L, docs/methods.md §17
    closeTo(s.slope.minSlopeVPerS!, (7 / 15.4e-6 / 2) * 1e-5, 2e-3); // m_a ≥ m2/2 · Ri, docs/methods.md §17
  });
});

describe('which corner drives each result', () => {
  test('a boost whose range contains Vo/2 sizes its inductor there, its currents at Vin min', () => {
    const d = nearIdeal({ kind: 'boost', rectifier: 'synchronous', vinV: 8, vinMinV: 4, vinMaxV: 10, voutV: 12, loadA: 1, fsHz: 200e3, inductanceH: 22e-6 });
    expect(cornerVoltages(d).map((c) => c.id)).toContain('vin-ripple'); // Vin·(1 − Vin/Vo) peaks at Vo/2 (worked here)
    const s = sizeDesign(d);
    expect(s.inductor.requiredInductanceH.corner).toBe('vin-ripple'); // worked here: 6 V·0.5 > 4 V·0.667 > 10 V·0.167
    expect(s.inductor.ratedCurrentA.corner).toBe('vin-min'); // IL = Io/D′ largest at Vin min (Erickson & Maksimović ch. 2)
    expect(s.loop.rhpZeroHz!.corner).toBe('vin-min'); // D′ smallest at Vin min, Erickson & Maksimović ch. 8 (from memory)
    expect(s.duty.max.corner).toBe('vin-min');
    closeTo(s.inductor.requiredInductanceH.value, (6 * 0.5) / (0.3 * 3 * 200e3), 3e-3); // L = Vin·D/(r·IL,rated·fs), IL,rated 3 A at 4 V
  });
  test('a buck sizes its inductor and its output charge at Vin max', () => {
    const d = nearIdeal({ kind: 'buck', rectifier: 'synchronous', vinV: 12, vinMinV: 8, vinMaxV: 16, voutV: 5, loadA: 3, fsHz: 500e3, inductanceH: 10e-6, outputCapacitanceF: 47e-6 });
    d.spec.targets = { outputRippleV: 0.02 };
    const s = sizeDesign(d);
    expect(s.inductor.requiredInductanceH.corner).toBe('vin-max'); // (Vin − Vo)·D grows with Vin (Erickson & Maksimović ch. 2)
    const rippleAtMax = ((16 - 5) * (5 / 16)) / (10e-6 * 500e3);
    closeTo(s.outputCapacitor.chargeC.value, rippleAtMax / (8 * 500e3), 3e-3); // Q = ΔI·Ts/8, Erickson & Maksimović ch. 2
    closeTo(s.inductor.requiredInductanceH.value, ((16 - 5) * (5 / 16)) / (0.3 * 3 * 500e3), 3e-3); // L = (Vin − Vo)D/(r·Io·fs)
    closeTo(s.loop.lcDoublePoleHz!, 1 / (2 * Math.PI * Math.sqrt(10e-6 * 47e-6)), 1e-9); // docs/methods.md §13
    expect(s.slope.needed).toBe(true); // D = 5/8 at Vin min is above 0.5 (Ridley 1991, from memory)
    expect(s.duty.max.corner).toBe('vin-min');
    expect(s.loop.limits[0]!.id).toBe('switching'); // fs/10 (common practice)
  });
});

describe('the solved efficiency changes the hand results', () => {
  const d = makeDesign({ ...seedSketch, switchOhm: 0.01, dcr20Ohm: 0.01, vf0V: 0.45 });
  d.spec.targets = { outputRippleV: 0.12, inductorRippleRatio: 0.3 };
  const s = sizeDesign(d);
  const e = evaluate(d, { vinV: 5, loadA: 2 });
  const op = e.operatingPoint;
  const etaPath = (12 * 2) / (5 * op.inductor.averageA);
  test('charge balance: IL·(1 − D) = Io at the solved duty', () => {
    closeTo(s.inductor.ratedCurrentA.value * (1 - s.duty.max.value), 2, 1e-3); // capacitor charge balance, Erickson & Maksimović ch. 2
  });
  test('the hand method at the solved efficiency gives the solved duty; at 80 % it does not', () => {
    const atSolved = handSizing({ kind: 'boost', vinV: 5, voutV: 12, loadA: 2, switchingFrequencyHz: 120e3, efficiency: etaPath, rippleRatio: 0.3, outputRippleV: 0.12, senseOhm: 0.01 });
    closeTo(s.duty.max.value, atSolved.dutyCycle, 1e-3); // power balance Vin·IL = Pout/η (Erickson & Maksimović ch. 3)
    closeTo(s.inductor.ratedCurrentA.value, atSolved.inductorA, 1e-3); // same
    // The on-interval voltage is Vin less the switch, shunt and winding drops IL·ΣR (Erickson & Maksimović ch. 3):
    // L is smaller than the hand Vin·D/(ΔI·fs) by that fraction; ΣR = 30 mΩ at 25 °C, at most doubled when hot.
    const ratio = s.inductor.requiredInductanceH.value / atSolved.inductanceH;
    expect(ratio).toBeLessThan(1);
    expect(ratio).toBeGreaterThan(1 - (op.inductor.averageA * 0.06) / 5);
    const assumed = handSizing({ kind: 'boost', vinV: 5, voutV: 12, loadA: 2, switchingFrequencyHz: 120e3, efficiency: 0.8, rippleRatio: 0.3, outputRippleV: 0.12, senseOhm: 0.01 });
    expect(e.efficiency).toBeGreaterThan(0.8);
    expect(s.duty.max.value).toBeLessThan(assumed.dutyCycle); // a better efficiency needs less duty: D = 1 − η·Vin/Vo
    expect(s.inductor.ratedCurrentA.value).toBeLessThan(assumed.inductorA);
  });
  test('the duty limit is reported as reached when the worst corner needs more', () => {
    const tight = structuredClone(d);
    tight.spec.maxDuty = 0.55;
    const t = sizeDesign(tight);
    expect(t.duty.limitReached).toBe(true); // D ≈ 0.6 needed > 0.55 (D = 1 − η·Vin/Vo)
    expect(t.notes.some((n) => n.includes('does not regulate'))).toBe(true);
  });
});

describe('edges', () => {
  test('the charge above the mean of a symmetric triangle is ΔI·T/8', () => {
    const q = chargeAboveMean({ segments: [{ durationS: 0.5, i0A: -1, i1A: 1 }, { durationS: 0.5, i0A: 1, i1A: -1 }] });
    closeTo(q, 2 / 8, 1e-12); // Erickson & Maksimović ch. 2: buck output-capacitor charge ΔI·Ts/8
  });
  test('a boost in DCM at rated load says the ripple ratio is only indicative', () => {
    const d = makeDesign({ kind: 'boost', rectifier: 'diode', vinV: 5, voutV: 12, loadA: 0.05, fsHz: 120e3, inductanceH: 2e-6 });
    const s = sizeDesign(d);
    expect(s.corners[0]!.mode).toBe('DCM'); // K = 2L/(R·Ts) below D·D′² (docs/methods.md §2)
    expect(s.notes.some((n) => n.includes('discontinuous'))).toBe(true);
  });
  test('without a ripple target the capacitance is not sized and a note says which field is missing', () => {
    const d = makeDesign(seedSketch);
    const s = sizeDesign(d);
    expect(s.outputCapacitor.minCapacitanceF).toBeUndefined();
    expect(s.notes.join(' ')).toContain('spec.targets.outputRippleV');
  });
  test('an ESR that uses the whole ripple budget leaves no capacitance that meets it', () => {
    const d = makeDesign({ ...seedSketch, outputEsrOhm: 0.05 });
    d.spec.targets = { outputRippleV: 0.12 };
    const s = sizeDesign(d);
    expect(s.outputCapacitor.capacitanceWithBankEsrF).toBeUndefined(); // 0.05 Ω × ~6 A > 0.12 V (common practice)
    expect(s.notes.some((n) => n.includes('lower the ESR'))).toBe(true);
  });
});
