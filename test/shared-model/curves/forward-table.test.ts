/**
 * Diode VF(IF, Tj) tables (issue 13 §2): the forward-drop loss is the mean of VF·i over the rectifier's
 * current, integrated over the digitised curves. Checked against the closed form of the straight-line
 * diode model (docs/methods.md §6) on the §1 and §2 waveforms, a hand integration of a kinked curve, the
 * interpolation between temperatures, the table's rules and the warnings outside the table.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign } from '../../../shared-model/index.ts';
import type { Design, Segment, VfPoint } from '../../../shared-model/index.ts';
import { forwardLossW, forwardTangentAt, forwardVoltageAt } from '../../../shared-model/curves/forward-table.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { inventedDiode, makeDesign } from '../../helpers/designs.ts';
import { valid } from '../../helpers/ledger-designs.ts';

const falling = (s: Segment) => s.i1A < s.i0A;

/** Samples of the straight line VF = v0 + rd·IF at the given currents, at each temperature (v0 per temperature). */
const lineTable = (rows: [tjC: number, v0: number][], rd: number, currents: number[]): VfPoint[] =>
  rows.flatMap(([tjC, v0]) => currents.map((ifA) => ({ tjC, ifA, vfV: v0 + rd * ifA })));

// docs/methods.md §1 buck (12 V → 5 V, 3 A, 10 µH, 500 kHz): D 5/12, ΔI 0.583333 A, the rectifier's
// current falls from 3.291667 A to 2.708333 A over D'·Ts = 1.166667 µs.
const TS = 2e-6;
const DP = 7 / 12;
const CCM_OFF: Segment[] = [
  { durationS: (5 / 12) * TS, i0A: 3 - 0.58333333333 / 2, i1A: 3 + 0.58333333333 / 2 },
  { durationS: DP * TS, i0A: 3 + 0.58333333333 / 2, i1A: 3 - 0.58333333333 / 2 },
];

describe('forward-drop loss from VF(IF) curves (the mean of VF·i; docs/methods.md §6 closed form for a straight-line diode)', () => {
  it('reproduces Vf0·Iavg + Rd·Irms² = 0.717831 W for a table that samples the line 0.35 V + 20 mΩ·IF (docs/methods.md §6 check)', () => {
    const table = lineTable([[25, 0.35], [125, 0.35]], 0.02, [0, 1, 2.5, 5]);
    closeTo(forwardLossW(table, CCM_OFF, TS, 25, falling), 0.717831, 1e-6); // docs/methods.md §6: 0.717831 W
  });

  it('integrates a kinked curve exactly across its breakpoint (hand integration)', () => {
    // VF = 0.30 + 0.04·i up to 3 A, then 0.42 + 0.06·(i − 3): the falling current crosses 3 A.
    // ∫VF·i di = [0.15 i² + 0.04 i³/3] from 2.708333 to 3  +  [0.12 i² + 0.02 i³] from 3 to 3.291667
    //          = 0.7383791 V·A²;  P = fs·(D'·Ts/ΔI)·∫ = (7/12)/(0.583333 A) · 0.7383791 V·A² = 0.7383791 W (hand, by calculator).
    const kinked: VfPoint[] = [0, 25].flatMap((tjC) => [
      { tjC, ifA: 0, vfV: 0.3 },
      { tjC, ifA: 3, vfV: 0.42 },
      { tjC, ifA: 6, vfV: 0.6 },
    ]);
    closeTo(forwardLossW(kinked, CCM_OFF, TS, 25, falling), 0.7383791474, 1e-8); // hand integration above
  });

  it('integrates a DCM triangle to Vf0·Iavg + Rd·Irms², not VF at the mean current (docs/methods.md §2 and §6)', () => {
    // docs/methods.md §2 check: Ipk 0.372565 A falling to 0 over D2 = 0.321699 of Ts; Irms 0.122002 A.
    const ipk = 0.372565;
    const d2 = 0.321699;
    const tri: Segment[] = [{ durationS: d2 * TS, i0A: ipk, i1A: 0 }];
    const table = lineTable([[25, 0.35], [100, 0.35]], 0.02, [0, 0.1, 0.5, 1]);
    const iavg = (ipk * d2) / 2;
    const exact = 0.35 * iavg + 0.02 * 0.122002 ** 2; // §6 closed form with the §2 RMS
    const p = forwardLossW(table, tri, TS, 25, falling);
    closeTo(p, exact, 1e-5); // the §2 RMS is given to 6 digits
    const atMean = (0.35 + 0.02 * (ipk / 2)) * iavg; // VF at the conduction-mean current: the shortcut we do not take
    expect(Math.abs(p - atMean) / exact).toBeGreaterThan(1e-3);
  });

  it('interpolates between temperatures: curves 100 K apart with VF0 falling 1 mV/K give Vf0(75 °C) = 0.30 V (common practice drift; docs/methods.md §6)', () => {
    const table = lineTable([[25, 0.35], [125, 0.25]], 0.02, [0, 2, 4, 8]);
    closeTo(forwardLossW(table, CCM_OFF, TS, 75, falling), 0.30 * 1.75 + 0.02 * 2.294895 ** 2, 1e-6); // §6 form: 0.630331 W
    closeTo(forwardVoltageAt(table, 2, 75), 0.34, 1e-12); // 0.30 + 0.02·2 (hand)
    closeTo(forwardVoltageAt(table, 2, 150), 0.29, 1e-12); // the 125 °C curve held above it (hand)
  });

  it('continues the last segment above the table and gives the tangent for the volt-second equation (hand)', () => {
    const table = lineTable([[25, 0.35], [125, 0.25]], 0.02, [0, 1, 2]);
    closeTo(forwardVoltageAt(table, 5, 25), 0.45, 1e-12); // 0.35 + 0.02·5 along the last segment (hand)
    const t = forwardTangentAt(table, 1.5, 25);
    closeTo(t.rdOhm, 0.02, 1e-12); // slope of the sampled line
    closeTo(t.vf0V, 0.35, 1e-12); // its intercept
  });
});

/** The §1 buck with a diode rectifier (invented diode), optionally with VF curves. */
function diodeBuck(vfCurves?: VfPoint[]): Design {
  const d = makeDesign({ kind: 'buck', rectifier: 'diode', vinV: 12, voutV: 5, loadA: 3, fsHz: 500e3, inductanceH: 10e-6 });
  d.parts.rectifier = { ...inventedDiode(0.35, 0.02), ...(vfCurves ? { vfCurves: { points: vfCurves } } : {}) };
  return d;
}

const STATED: VfPoint[] = [
  { tjC: 25, ifA: 0.1, vfV: 0.3 },
  { tjC: 25, ifA: 1, vfV: 0.38 },
  { tjC: 25, ifA: 4, vfV: 0.5 },
  { tjC: 25, ifA: 10, vfV: 0.68 },
  { tjC: 125, ifA: 0.1, vfV: 0.2 },
  { tjC: 125, ifA: 1, vfV: 0.29 },
  { tjC: 125, ifA: 4, vfV: 0.43 },
  { tjC: 125, ifA: 10, vfV: 0.64 },
];

describe('the ledger with VF(IF, Tj) curves', () => {
  it('charges the rectifier the curve loss at its converged junction temperature (hand: both curves straight on 1–4 A)', () => {
    const e = evaluate(valid(diodeBuck(STATED)));
    const term = e.losses.find((t) => t.part === 'rectifier' && t.mechanism === 'forward drop')!;
    expect(term.formula).toMatch(/VF\(IF, Tj\) curves/);
    const tj = e.temperatures.find((t) => t.part === 'rectifier')!.celsius;
    expect(tj).toBeGreaterThan(25);
    expect(tj).toBeLessThan(125);
    const op = e.operatingPoint;
    expect(op.inductor.valleyA).toBeGreaterThan(1);
    expect(op.inductor.peakA).toBeLessThan(4);
    // On 1–4 A both curves are straight: 25 °C 0.34 V + 0.04 Ω·i, 125 °C 0.243333 V + 0.046667 Ω·i; mixed
    // linearly at Tj, the §6 closed form V0·Iavg + Rd·Irms² holds exactly.
    const w = (tj - 25) / 100;
    const v0 = (1 - w) * 0.34 + w * (0.29 - 0.14 / 3);
    const rd = (1 - w) * 0.04 + w * (0.14 / 3);
    const r = op.stats.rectifier;
    closeTo(term.watts, v0 * r.averageA + rd * r.rmsA ** 2, 1e-6, 0, { tj, r }); // docs/methods.md §6 form (the reported Tj is within 1e-4 K of the loss's)
  });

  it('warns when the peak current passes the end of the curves', () => {
    const short = STATED.filter((p) => p.ifA <= 1); // curves end at 1 A; the current runs 2.7–3.3 A
    const e = evaluate(valid(diodeBuck(short)));
    expect(e.warnings.some((w) => w.path === 'parts.rectifier.vfCurves.points' && /beyond its VF\(IF, Tj\) table/.test(w.message))).toBe(true);
  });

  it('warns when the junction lies outside the curves\' temperatures', () => {
    const cold = STATED.map((p) => ({ ...p, tjC: p.tjC === 25 ? -40 : 0 }));
    const e = evaluate(valid(diodeBuck(cold)));
    expect(e.warnings.some((w) => w.path === 'parts.rectifier.vfCurves.points' && /outside the temperatures/.test(w.message))).toBe(true);
  });
});

describe('VF(IF, Tj) table rules (forward current grows with voltage: Sze & Ng, 3rd ed., §2.3 [memory])', () => {
  const problems = (curves: VfPoint[]) => {
    const r = validateDesign(diodeBuck(curves));
    return r.ok ? [] : r.problems;
  };
  it('refuses VF that falls as IF rises, naming the point', () => {
    const bad = STATED.map((p, i) => (i === 2 ? { ...p, vfV: 0.3 } : p));
    const p = problems(bad).find((x) => x.path === 'parts.rectifier.vfCurves.points[2].vfV');
    expect(p?.message).toMatch(/^Point 3 \(25 °C, 4 A, 300 mV\) after .* must not fall/);
  });
  it('refuses curves out of temperature order and a single temperature', () => {
    const swapped = [...STATED.slice(4), ...STATED.slice(0, 4)];
    expect(problems(swapped).some((x) => x.path === 'parts.rectifier.vfCurves.points[4].tjC')).toBe(true);
    const one = STATED.slice(0, 4);
    expect(problems(one).some((x) => x.path === 'parts.rectifier.vfCurves.points' && /one temperature only/.test(x.message))).toBe(true);
  });
  it('refuses a curve of a single point', () => {
    const lone = [...STATED.slice(0, 4), { tjC: 75, ifA: 1, vfV: 0.33 }, ...STATED.slice(4)];
    expect(problems(lone).some((x) => x.path === 'parts.rectifier.vfCurves.points[4].tjC' && /single point/.test(x.message))).toBe(true);
  });
});
