/**
 * Coss(VDS) tables (issue 13 §2): output charge and energy by integration of a digitised curve, checked
 * against hand integrations and a closed-form junction law; the table's shape rules and the notice when
 * it ends below the switched voltage; and the ledger's output-capacitance term built from the integrals.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign } from '../../../shared-model/index.ts';
import type { CossPoint, Design, OutputCapacitance } from '../../../shared-model/index.ts';
import { cossTableAt } from '../../../shared-model/curves/coss-table.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { design, SYNC_BUCK, valid } from '../../helpers/ledger-designs.ts';

const nF = 1e-9;
/** A stated curve: 1 nF at 0 V, 0.5 nF at 10 V, 0.3 nF at 20 V, straight lines between. */
const STATED: CossPoint[] = [
  { vdsV: 0, cossF: 1 * nF },
  { vdsV: 10, cossF: 0.5 * nF },
  { vdsV: 20, cossF: 0.3 * nF },
];

describe('Qoss and Eoss of a Coss table (Q = ∫C dv, E = ∫v·C dv; circuit theory, from memory)', () => {
  it('matches a hand integration of the stated curve', () => {
    // Hand integration, segment by segment (C(v) = 1 − 0.05 v nF on 0–10 V, 0.7 − 0.02 v nF on 10–20 V):
    //   Qoss(20 V) = 10·(1 + 0.5)/2 + 10·(0.5 + 0.3)/2 = 7.5 + 4 = 11.5 nC
    //   Eoss(20 V) = [v²/2 − 0.05 v³/3]₀¹⁰ + [0.7 v²/2 − 0.02 v³/3]₁₀²⁰ = 33.333 + 58.333 = 91.667 nJ
    //   Qoss(15 V) = 7.5 + [0.7 v − 0.01 v²]₁₀¹⁵ = 7.5 + 2.25 = 9.75 nC
    //   Eoss(15 V) = 33.333 + [0.35 v² − 0.02 v³/3]₁₀¹⁵ = 33.333 + (78.75 − 22.5) − (35 − 6.667) = 61.25 nJ
    const at20 = cossTableAt(STATED, 20);
    closeTo(at20.qossC, 11.5 * nF, 1e-12); // hand integration above
    closeTo(at20.eossJ, (100 / 3 + 175 / 3) * nF, 1e-12); // hand integration above (33.333 + 58.333 nJ)
    const at15 = cossTableAt(STATED, 15);
    closeTo(at15.qossC, 9.75 * nF, 1e-12); // hand integration above
    closeTo(at15.eossJ, (100 / 3 + 56.25 - 85 / 3) * nF, 1e-12); // hand integration above (61.25 nJ)
  });

  it('holds the last Coss above the table and the first below it', () => {
    // Above 20 V the 0.3 nF is held: Qoss(30) = 11.5 + 0.3·10 = 14.5 nC; Eoss(30) = 91.667 + 0.3·(900 − 400)/2 = 166.667 nJ (hand)
    const at30 = cossTableAt(STATED, 30);
    closeTo(at30.qossC, 14.5 * nF, 1e-12);
    closeTo(at30.eossJ, (275 / 3 + 75) * nF, 1e-12);
    // A table starting at 5 V holds its first value down to 0 V: Qoss(5) = C·5, Eoss(5) = C·25/2 (hand)
    const late = [{ vdsV: 5, cossF: 2 * nF }, ...STATED.slice(1)];
    closeTo(cossTableAt(late, 5).qossC, 10 * nF, 1e-12);
    closeTo(cossTableAt(late, 5).eossJ, 25 * nF, 1e-12);
    expect(cossTableAt(STATED, 0)).toEqual({ qossC: 0, eossJ: 0 });
    expect(cossTableAt(STATED, -3)).toEqual({ qossC: 0, eossJ: 0 });
  });

  it('gives Q = C·V and E = C·V²/2 for a constant capacitance (linear capacitor, any circuit text)', () => {
    const flat = [0, 10, 40].map((vdsV) => ({ vdsV, cossF: 0.8 * nF }));
    for (const v of [3, 10, 27, 40, 55]) {
      closeTo(cossTableAt(flat, v).qossC, 0.8 * nF * v, 1e-12);
      closeTo(cossTableAt(flat, v).eossJ, 0.4 * nF * v * v, 1e-12);
    }
  });

  it('agrees with the closed form of an abrupt-junction law C0/√(1 + v/Vj) sampled at 150 points within 0.3 %', () => {
    // Abrupt junction: C(v) = C0 / √(1 + v/Vj) (Sze & Ng, Physics of Semiconductor Devices, 3rd ed., §2.3 [memory]).
    // Q(V) = 2·C0·Vj·(√(1+x) − 1); E(V) = C0·Vj²·(⅔(1+x)^{3/2} − 2(1+x)^{1/2} + 4/3), x = V/Vj (integrated by hand).
    const c0 = 2 * nF;
    const vj = 0.7;
    const vMax = 60;
    const table = Array.from({ length: 150 }, (_, i) => {
      const v = i === 0 ? 0 : vMax * ((Math.exp((4 * i) / 149) - 1) / (Math.exp(4) - 1));
      return { vdsV: v, cossF: c0 / Math.sqrt(1 + v / vj) };
    });
    for (const v of [1, 5, 12, 30, 60]) {
      const x = v / vj;
      const q = 2 * c0 * vj * (Math.sqrt(1 + x) - 1);
      const e = c0 * vj * vj * ((2 / 3) * (1 + x) ** 1.5 - 2 * Math.sqrt(1 + x) + 4 / 3);
      const got = cossTableAt(table, v);
      closeTo(got.qossC, q, 3e-3, 0, { v });
      closeTo(got.eossJ, e, 3e-3, 0, { v });
    }
  });
});

function withSwitchCoss(d: Design, outputCapacitance: OutputCapacitance): Design {
  if (d.parts.switch.kind !== 'mosfet') throw new Error('test design: switch is not a MOSFET');
  return { ...d, parts: { ...d.parts, switch: { ...d.parts.switch, outputCapacitance } } };
}

describe('Coss table rules (VDS rising, Coss positive and never rising: Sze & Ng §2.3 [memory])', () => {
  const base = valid(design(SYNC_BUCK));
  it('accepts the stated curve', () => {
    expect(validateDesign(withSwitchCoss(base, { kind: 'table', points: STATED })).ok).toBe(true);
  });
  it('refuses a Coss that rises with VDS, naming the point, the value and the rule', () => {
    const r = validateDesign(withSwitchCoss(base, { kind: 'table', points: [STATED[0]!, { vdsV: 10, cossF: 1.2 * nF }, STATED[2]!] }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const p = r.problems.find((x) => x.path === 'parts.switch.outputCapacitance.points[1].cossF');
    expect(p?.message).toMatch(/Point 2 \(10 V, 1\.2 nF\) after \(0 V, 1 nF\).*must not rise/);
    expect(p?.allowed).toBe('cossF ≤ 1 nF');
  });
  it('refuses voltages that do not rise, and too few points', () => {
    const r = validateDesign(withSwitchCoss(base, { kind: 'table', points: [STATED[0]!, STATED[2]!, { vdsV: 20, cossF: 0.2 * nF }] }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.some((x) => x.path === 'parts.switch.outputCapacitance.points[2].vdsV')).toBe(true);
    const short = validateDesign(withSwitchCoss(base, { kind: 'table', points: STATED.slice(0, 2) }));
    expect(short.ok).toBe(false);
    if (!short.ok) expect(short.problems[0]?.path).toMatch(/^parts\.switch\.outputCapacitance/);
  });
  it('gives a notice when the table ends below the switched voltage (12 V buck, table to 10 V)', () => {
    const r = validateDesign(withSwitchCoss(base, { kind: 'table', points: [...STATED.slice(0, 2), { vdsV: 10.5, cossF: 0.45 * nF }] }));
    expect(r.ok).toBe(true);
    if (r.ok) expect((r.warnings ?? []).map((n) => n.message).join('\n')).toMatch(/Coss\(VDS\) table of parts\.switch ends at 10\.5 V.*held at its last value/);
  });
});

describe('the ledger with a Coss table', () => {
  // The 12 V → 5 V synchronous buck of docs/methods.md §1 with invented parts; the rectifier keeps its Coss.
  const base = valid(design(SYNC_BUCK));
  const d = valid(withSwitchCoss(base, { kind: 'table', points: STATED }));
  const term = (e: ReturnType<typeof evaluate>) => e.losses.find((t) => t.part === 'switch' && t.mechanism === 'output capacitance');

  it('charges the switch with Eoss(V) integrated from the table (hand integration at the swing V)', () => {
    const e = evaluate(d);
    const t = term(e);
    expect(t).toBeDefined();
    const input = (name: string) => t!.inputs.find((i) => i.name === name)?.value ?? Number.NaN;
    const v = input('V');
    expect(v).toBeGreaterThan(10); // the swing lies on the table's second segment
    expect(v).toBeLessThan(20);
    // Exact integral of the stated straight lines (hand): Eoss(V) = 33.333 nJ + [0.35 v² − 0.02 v³/3]₁₀^V nJ
    const eossHand = (100 / 3 + (0.35 * v * v - (0.02 * v ** 3) / 3) - (35 - 20 / 3)) * nF;
    closeTo(input('Eoss,ctrl(V)'), eossHand, 1e-9);
    const fs = input('fs');
    closeTo(t!.watts, (eossHand + v * input('Qoss,sync(V)') - input('Eoss,sync(V)')) * fs, 1e-9); // docs/methods.md §4 half-bridge form
  });

  it('differs from a single 10 V capacitance scaled linearly by exactly the extra Eoss the curve holds (hand)', () => {
    const single = valid(withSwitchCoss(base, { kind: 'capacitance', cossF: 0.5 * nF, atV: 10 }));
    const withTable = term(evaluate(d))!;
    const v = withTable.inputs.find((i) => i.name === 'V')!.value;
    const fs = withTable.inputs.find((i) => i.name === 'fs')!.value;
    const eossHand = (100 / 3 + (0.35 * v * v - (0.02 * v ** 3) / 3) - (35 - 20 / 3)) * nF; // as above
    const eossLinear = 0.5 * 0.5 * nF * v * v; // ½·C·V² of a linear 0.5 nF (circuit theory)
    expect(eossHand).toBeGreaterThan(eossLinear * 1.15); // the curve holds more energy low down
    closeTo(withTable.watts - term(evaluate(single))!.watts, (eossHand - eossLinear) * fs, 1e-6);
  });
});
