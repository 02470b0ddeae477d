import { describe, expect, it } from 'vitest';
import { evaluate, type Evaluation } from '../../../shared-model/index.ts';
import { DIODE_BOOST, SYNC_BUCK, allDirect, design, sharedSink, valid } from '../../helpers/ledger-designs.ts';
import { closeTo } from '../../helpers/close-to.ts';

const term = (e: Evaluation, part: string, mechanism: string) => e.losses.find((t) => t.part === part && t.mechanism === mechanism);

describe('evaluate: the record', () => {
  const e = evaluate(valid(design(SYNC_BUCK)));
  it('has exactly the documented keys (issue 3 contract; ledger/types.ts)', () => {
    expect(Object.keys(e).sort()).toEqual(
      ['checks', 'conditions', 'conductionMode', 'converged', 'dutyCycle', 'efficiency', 'hazards', 'heatsinks', 'inputPower',
        'iterations', 'losses', 'operatingPoint', 'outputPower', 'regulated', 'temperatures', 'totalLoss', 'warnings'].sort(),
    );
    for (const t of e.losses) expect(Object.keys(t).sort()).toEqual(['formula', 'inputs', 'mechanism', 'part', 'partName', 'watts']);
    for (const t of e.temperatures) {
      expect(Object.keys(t).sort()).toEqual(['celsius', 'dissipationW', 'kind', 'limit', 'marginK', 'part', 'partName', 'path', 'surfaceC']);
    }
  });
  it('balances power: input = output + Σ terms = Vin · source current (1e-9 relative)', () => {
    const sum = e.losses.reduce((a, t) => a + t.watts, 0);
    closeTo(e.totalLoss, sum, 1e-12); // the total is the sum of the terms
    closeTo(e.inputPower, e.outputPower + sum, 1e-9); // issue 3: input = output + Σ terms to 1e-9
    closeTo(e.inputPower, e.conditions.vinV * e.operatingPoint.waveforms.inputA, 1e-9); // and it is what the source delivers
    closeTo(e.efficiency, e.outputPower / e.inputPower, 1e-12);
    expect(e.converged).toBe(true);
    expect(e.iterations).toBeGreaterThan(0);
  });
  it('names part, mechanism, formula and the inputs of every term; all terms finite and ≥ 0', () => {
    for (const t of e.losses) {
      expect(t.watts).toBeGreaterThanOrEqual(0);
      expect(Number.isFinite(t.watts)).toBe(true);
      expect(t.formula.length).toBeGreaterThan(0);
      expect(t.inputs.length).toBeGreaterThan(0);
      for (const i of t.inputs) expect(Number.isFinite(i.value)).toBe(true);
    }
  });
  it('books no overlap loss to a synchronous rectifier (it switches at zero voltage)', () => {
    expect(e.losses.filter((t) => t.part === 'rectifier').map((t) => t.mechanism).sort()).toEqual(['conduction', 'dead-time diode', 'gate drive']); // docs/methods.md §4
  });
  it('reports temperatures that are exactly Ta + θ·P of the losses shown', () => {
    const sw = e.temperatures.find((t) => t.part === 'switch')!;
    const p = e.losses.filter((t) => t.part === 'switch').reduce((a, t) => a + t.watts, 0);
    closeTo(sw.dissipationW, p, 1e-12);
    closeTo(sw.celsius, e.conditions.ambientC + 40 * p, 1e-12); // direct θJA 40 K/W of the test design (docs/methods.md §10)
    closeTo(sw.marginK, sw.limit - 10 - sw.celsius, 1e-12); // margin 10 K in the test design
  });
  it('splits the gate drive between the FETs and the driver so that it adds up to ΣQg·Vdrv·fs', () => {
    const d = valid(design(SYNC_BUCK));
    const gate = e.losses.filter((t) => t.mechanism === 'gate drive').reduce((a, t) => a + t.watts, 0);
    const qg = d.parts.switch.qgC + (d.parts.rectifier.kind === 'mosfet' ? d.parts.rectifier.qgC : 0);
    closeTo(gate, qg * d.parts.controller.driveV * d.spec.switchingFrequencyHz, 1e-12); // docs/methods.md §4: Qg·Vdrv·fs
  });
});

describe('evaluate: conduction modes and edges', () => {
  it('in DCM has no turn-on overlap and no reverse recovery, and says the idle ringing is not modelled', () => {
    const d = valid(design({ ...DIODE_BOOST }, (x) => {
      if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, technology: 'pn', qrrC: 40e-9 };
    }));
    const e = evaluate(d, { loadA: 0.05 });
    expect(e.conductionMode).toBe('DCM');
    expect(term(e, 'switch', 'turn-on overlap')!.watts).toBe(0); // issue 3: no turn-on overlap at zero current
    expect(term(e, 'switch', 'reverse recovery')!.watts).toBe(0); // the diode stopped on its own: nothing to recover
    expect(term(e, 'switch', 'turn-off overlap')!.watts).toBeGreaterThan(0);
    expect(e.warnings.some((w) => w.code === 'model-limit' && w.message.includes('ringing'))).toBe(true);
    closeTo(e.inputPower, e.outputPower + e.totalLoss, 1e-9); // power balance holds in DCM too
  });
  it('in CCM charges the PN diode’s recovery to the switch as Qrr·(IF/Itest)·Vsw·fs', () => {
    const d = valid(design({ ...DIODE_BOOST }, (x) => {
      if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, technology: 'pn', qrrC: 40e-9, qrrTestA: 2 };
    }));
    const e = evaluate(d);
    expect(e.conductionMode).toBe('CCM');
    const rr = term(e, 'switch', 'reverse recovery')!;
    const on = e.operatingPoint.edges.turnOn; // the diode's forward current when the switch turns on is the valley current
    // docs/methods.md §4 Qrr·Vsw·fs with the charge scaled from its 2 A test current (charge-control model Q ∝ IF, Mohan et al. [from memory])
    closeTo(rr.watts, 40e-9 * (on.currentA / 2) * on.voltageV * d.spec.switchingFrequencyHz, 1e-12);
    expect(e.warnings.some((w) => w.path === 'parts.rectifier.qrrTestA')).toBe(false); // a stated test current needs no note
  });
  it('takes the rated load current as the Qrr test current when none is stated, and says so', () => {
    const d = valid(design({ ...DIODE_BOOST }, (x) => {
      if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, technology: 'pn', qrrC: 40e-9, qrrTestA: undefined };
    }));
    const e = evaluate(d);
    const on = e.operatingPoint.edges.turnOn;
    const rr = term(e, 'switch', 'reverse recovery')!;
    // docs/methods.md §4 Qrr·Vsw·fs, Itest = rated load (our stated default; losses/reverse-recovery.ts header)
    closeTo(rr.watts, 40e-9 * (on.currentA / d.spec.ratedLoadA) * on.voltageV * d.spec.switchingFrequencyHz, 1e-12);
    expect(rr.inputs.find((i) => i.name.startsWith('Itest'))?.value).toBe(d.spec.ratedLoadA); // the ledger shows the current it assumed
    expect(e.warnings.some((w) => w.code === 'model-limit' && w.path === 'parts.rectifier.qrrTestA')).toBe(true); // and a model-limit note names the field
  });
  it('books a Schottky rectifier’s junction capacitance as ½·Cj·V²·fs', () => {
    const d = valid(design(DIODE_BOOST));
    const e = evaluate(d);
    const cj = d.parts.rectifier.kind === 'diode' ? d.parts.rectifier.cjF : 0;
    const v = e.operatingPoint.edges.turnOn.voltageV;
    closeTo(term(e, 'switch', 'junction capacitance')!.watts, 0.5 * cj * v * v * d.spec.switchingFrequencyHz, 1e-12); // docs/methods.md §6
  });
  it('notes an estimated Qgs2', () => {
    const d = valid(design(SYNC_BUCK, (x) => {
      x.parts.switch = { ...x.parts.switch, qgs2C: undefined, qgsC: 4e-9 };
    }));
    const e = evaluate(d);
    expect(e.warnings.some((w) => w.code === 'model-limit' && w.path === 'parts.switch.qgs2C')).toBe(true);
  });
});

describe('evaluate: thermal runaway', () => {
  it('says which part runs away, returns converged false and keeps every number finite', () => {
    // A leaky Schottky (5 mA at 25 °C, doubling every 10 K) behind 120 K/W: no fixed point.
    const d = valid(design({ ...SYNC_BUCK, rectifier: 'diode' }, (x) => {
      allDirect(x, 30);
      x.thermal.paths.rectifier = { kind: 'direct', thetaJaKPerW: 120 };
      if (x.parts.rectifier.kind === 'diode') x.parts.rectifier = { ...x.parts.rectifier, leakageA: 5e-3, leakageAtC: 25, leakageDoublingK: 10 };
    }));
    const e = evaluate(d);
    expect(e.converged).toBe(false);
    const w = e.warnings.find((x) => x.code === 'thermal-runaway')!;
    expect(w.part).toBe('rectifier');
    expect(w.severity).toBe('danger');
    const json = JSON.stringify(e, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? 'NON-FINITE' : v));
    expect(json).not.toContain('NON-FINITE');
    const rect = e.temperatures.find((t) => t.part === 'rectifier')!;
    expect(rect.celsius).toBe(rect.limit + 100); // capped at limit + 100 K (documented choice)
    closeTo(e.inputPower, e.conditions.vinV * e.operatingPoint.waveforms.inputA, 1e-9); // still power-balanced at those losses
  });
});

describe('evaluate: heatsinks, hazards and checks', () => {
  it('shares a heatsink, reports it, and checks the touchable sink against the strictest metal row', () => {
    const d = valid(design(SYNC_BUCK, (x) => {
      sharedSink(x, 8, 0.5);
      x.thermal.touch = { switch: { touchable: true, surface: 'plastic' } };
      x.thermal.contact = 'held';
    }));
    const e = evaluate(d);
    const sink = e.heatsinks[0]!;
    const pSw = e.temperatures.find((t) => t.part === 'switch')!.dissipationW;
    const pRect = e.temperatures.find((t) => t.part === 'rectifier')!.dissipationW;
    closeTo(sink.dissipationW, pSw + pRect, 1e-12);
    closeTo(sink.celsius, e.conditions.ambientC + 8 * (pSw + pRect), 1e-12); // docs/methods.md §10: Ts = Ta + θSA·ΣP
    const h = e.hazards.find((x) => x.part === 'switch')!;
    expect(h.surfaceC).toBe(sink.celsius); // the surface of a sink-mounted part is the sink
    expect(h.row.material).toBe('metal'); // the sink's own surface material
    expect(h.row.limitC).toBe(55); // strictest 'held' metal row (docs/methods.md §11, IEC 60950-1 Table 4C)
    closeTo(h.marginK, 55 - sink.celsius, 1e-12);
  });
  it('warns of a burn hazard when the surface is above the limit', () => {
    const d = valid(design(SYNC_BUCK, (x) => {
      allDirect(x, 60);
      x.thermal.touch = { inductor: { touchable: true, surface: 'metal' } };
      x.thermal.contact = 'surface-8h';
    }));
    const e = evaluate(d);
    const h = e.hazards.find((x) => x.part === 'inductor')!;
    expect(h.exceeded).toBe(h.surfaceC > 43); // docs/methods.md §11: metal 43 °C at 8 h
    if (h.exceeded) expect(e.warnings.some((w) => w.code === 'burn-hazard' && w.part === 'inductor')).toBe(true);
  });
  it('checks Isat at the hot winding temperature and electrolytic life against the requirement', () => {
    const d = valid(design(SYNC_BUCK, (x) => {
      x.parts.inductor.isatA = 3.3;
      x.parts.inductor.isatTempCoPerK = -0.004;
      const cap = x.parts.outputCapacitor.part;
      x.parts.outputCapacitor.part = { ...cap, dielectric: 'electrolytic', life: { ratedHours: 2000, ratedC: 105 } };
      x.margins.requiredLifeHours = 1e7; // far beyond what 2000 h at 105 °C gives near ambient
    }));
    const e = evaluate(d);
    const sat = e.checks.find((c) => c.check === 'saturation')!;
    const tL = e.temperatures.find((t) => t.part === 'inductor')!.celsius;
    closeTo(sat.limit, 3.3 * (1 + -0.004 * (tL - 25)), 1e-12); // Isat at the hot spot (ratings.ts)
    expect(sat.ok).toBe(sat.value <= sat.limit);
    const life = e.checks.find((c) => c.check === 'capacitor-life')!;
    const tC = e.temperatures.find((t) => t.part === 'outputCapacitor')!.celsius;
    closeTo(life.value, 2000 * 2 ** ((105 - tC) / 10), 1e-12); // docs/methods.md §9: 10 K rule [common practice]
    expect(life.ok).toBe(false);
    expect(e.warnings.some((w) => w.code === 'capacitor-life')).toBe(true);
  });
  it('evaluates a point at zero load without NaN', () => {
    const e = evaluate(valid(design(SYNC_BUCK)), { loadA: 0 });
    expect(e.outputPower).toBe(0);
    expect(e.efficiency).toBe(0);
    expect(e.totalLoss).toBeGreaterThan(0);
  });
});
