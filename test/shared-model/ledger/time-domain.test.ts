/**
 * The ledger's conduction terms against the independent time-domain reference (test/reference/): the
 * switched circuit integrated exactly to periodic steady state at the ledger's own duty cycle and part
 * temperatures. Switching, core and leakage losses are made negligible so that the ledger's
 * self-consistent duty (power balance) must coincide with the duty that gives the target output in the
 * simulated circuit: the check then covers both the terms (Irms²·R of switch, synchronous rectifier, DCR,
 * sense resistor and both capacitor banks; VF0·Iavg + Rd·Irms² of a diode) and the power balance.
 * Tolerance: 0.5 % on each term and on the output voltage the simulation reaches at the ledger's duty.
 */
import { describe, expect, it } from 'vitest';
import { conductionParameters, esrAt, evaluate, validateDesign, type Design, type Evaluation } from '../../../shared-model/index.ts';
import { conductionOnly } from '../../helpers/ledger-designs.ts';
import { randomCases } from '../../reference/random-designs.ts';
import { referenceSteadyState, type ReferenceResult } from '../../reference/steady-state.ts';

const TOLERANCE = 0.005; // issue 3: conduction losses of every resistive element within 0.5 %
const SEED = 20250301; // any seed; fixed so the set is reproducible
const PER_FAMILY = 5; // 12 families × 5 = 60 designs


const pairs: [string, string, keyof ReferenceResult['branches']][] = [
  ['switch', 'conduction', 'switch'],
  ['rectifier', 'conduction', 'rectifier'],
  ['rectifier', 'forward drop', 'rectifier'],
  ['inductor', 'winding DC', 'inductor'],
  ['inputCapacitor', 'ESR', 'inputCapacitor'],
  ['outputCapacitor', 'ESR', 'outputCapacitor'],
  ['senseResistor', 'sense', 'sense'],
];

function compare(d: Design, e: Evaluation): { quantity: string; ledger: number; reference: number; error: number }[] {
  const t = (part: string) => e.temperatures.find((x) => x.part === part)?.celsius ?? e.conditions.ambientC;
  const cp = conductionParameters(d, { switchC: t('switch'), rectifierC: t('rectifier'), inductorC: t('inductor'), senseC: t('senseResistor') });
  cp.outputCapacitorEsrOhm = esrAt(d.parts.outputCapacitor.part, t('outputCapacitor')) / d.parts.outputCapacitor.count;
  const ref = referenceSteadyState(d, e.conditions, e.dutyCycle, cp);
  const scale = e.outputPower * 1e-6; // terms below a millionth of the output power are compared absolutely
  const out = [];
  for (const [part, mechanism, branch] of pairs) {
    const term = e.losses.find((x) => x.part === part && x.mechanism === mechanism);
    if (!term) continue;
    const r = ref.branches[branch].conductionLossW;
    out.push({ quantity: `${part} ${mechanism}`, ledger: term.watts, reference: r, error: Math.abs(term.watts - r) / Math.max(Math.abs(r), scale) });
  }
  out.push({ quantity: 'output voltage', ledger: e.operatingPoint.voutV, reference: ref.voutV, error: Math.abs(e.operatingPoint.voutV - ref.voutV) / ref.voutV });
  return out;
}

describe('ledger conduction terms against the time-domain reference (60 seeded random designs)', () => {
  const cases = randomCases(SEED, PER_FAMILY);
  it.each(cases.map((c) => [c.label, c] as const))('%s', (_label, c) => {
    const v = validateDesign(conductionOnly(c.design));
    expect(v.ok).toBe(true);
    if (!v.ok) return;
    const e = evaluate(v.design, { loadA: c.loadA });
    expect(e.converged).toBe(true);
    const bad = compare(v.design, e).filter((x) => !(x.error <= TOLERANCE));
    expect(bad).toEqual([]);
  });
});
