import { describe, expect, it } from 'vitest';
import type { Problem } from '../../../shared-model/index.ts';
import { DEMO_DESIGNS, validateDesign } from '../../../shared-model/index.ts';
import { demo, demoWith, setPath } from './fixtures.ts';

function problemsOf(json: unknown): Problem[] {
  const r = validateDesign(json);
  if (r.ok) throw new Error('expected problems, the design was accepted');
  return r.problems;
}

function problemAt(json: unknown, path: string): Problem {
  const all = problemsOf(json);
  const found = all.find((p) => p.path === path);
  if (!found) throw new Error(`no problem at ${path}; got ${JSON.stringify(all.map((p) => p.path))}`);
  return found;
}

describe('validateDesign accepts the shipped demos', () => {
  it.each(DEMO_DESIGNS.map((d) => [d.id, d.json] as const))('accepts %s without problems or notices', (_id, json) => {
    const r = validateDesign(json);
    expect(r.ok ? r.warnings ?? [] : r.problems).toEqual([]); // each demo is a complete, consistent design
  });
});

describe('validateDesign refuses what is not a design, with one sentence', () => {
  it.each([null, undefined, 42, 'design', true, [], [1, 2]])('refuses %j', (json) => {
    const [p, ...rest] = problemsOf(json);
    expect(rest).toEqual([]);
    expect(p?.path).toBe('');
    expect(p?.allowed).toBe('a JSON object');
    expect(p?.message).toMatch(/^The design document is .*; it must be a JSON object\.$/);
  });

  it('refuses a wrong format tag and says which one it expects', () => {
    const p = problemAt(demoWith('synchronous-buck', { format: 'some.other.tool' }), 'format');
    expect(p.value).toBe('some.other.tool');
    expect(p.message).toContain('"format": "wattledger.design"');
  });

  it('refuses a newer version with the agreed sentence', () => {
    const p = problemAt(demoWith('synchronous-buck', { version: 2 }), 'version');
    expect(p.message).toContain('made by a newer WattLedger: version 2, this build reads up to 1'); // team brief, version handling
  });
});

describe('validateDesign checks each field against its range, naming path, value and allowed range', () => {
  it.each([
    ['spec.vinMaxV', -5, '200 mV ≤ vinMaxV ≤ 2 kV'], // a voltage magnitude is positive (range: our own sanity rule, design/numbers.ts)
    ['spec.maxDuty', 1, '0.05 ≤ maxDuty < 1'], // duty D = ton/Ts lies in [0, 1]; D = 1 never turns off (Erickson & Maksimović 2nd ed. ch. 2 [from memory])
    ['spec.maxDuty', 0, '0.05 ≤ maxDuty < 1'], // D = 0 never turns on
    ['parts.inductor.inductanceH', 0, '1 nH ≤ inductanceH ≤ 1 H'], // issue 2: zero or negative L is physically impossible
    ['parts.outputCapacitor.part.capacitanceF', -1e-6, '100 pF ≤ capacitanceF ≤ 1 F'], // issue 2: zero or negative C
    ['spec.switchingFrequencyHz', -500e3, '1 kHz ≤ switchingFrequencyHz ≤ 20 MHz'], // issue 2: zero or negative fs
    ['spec.ambientC', -300, '-100 °C ≤ ambientC ≤ 200 °C'], // below absolute zero −273.15 °C (SI Brochure 9th ed. §2.3.1) and outside our ambient range
    ['parts.switch.tjMaxC', -273.15, '40 °C ≤ tjMaxC ≤ 300 °C'], // absolute zero itself is unreachable (third law of thermodynamics), and no power part is limited below 40 °C (common practice)
    ['margins.voltageDerating', 1.2, '0.1 ≤ voltageDerating ≤ 1'], // a derating uses at most the whole rating
    ['parts.inputCapacitor.count', 2.5, 'a whole number, 1 ≤ count ≤ 100'], // a count of parts is a whole number
  ])('refuses %s = %j, allowed %s', (path, value, allowed) => {
    const p = problemAt(demoWith('synchronous-buck', { [path]: value }), path);
    expect(p.value).toBe(value);
    expect(p.allowed).toBe(allowed);
    expect(p.message).toContain(path);
    expect(p.message).toContain(allowed);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])('refuses the non-finite number %s', (bad) => {
    const p = problemAt(demoWith('diode-boost', { 'parts.rectifier.vf0V': bad }), 'parts.rectifier.vf0V');
    expect(p.message).toMatch(/NaN \(not a number\)|Infinity \(not a finite number\)/); // issue 2: non-finite numbers are refused on load
  });

  it('refuses wrong types and missing fields with what was found', () => {
    const doc = demoWith('synchronous-buck', { 'spec.voutV': '3.3', 'topology.kind': 'flyback', 'parts.switch.qgC': undefined });
    expect(problemAt(doc, 'spec.voutV').message).toBe('Output voltage (spec.voutV) is the text "3.3"; allowed: 200 mV ≤ voutV ≤ 2 kV.');
    expect(problemAt(doc, 'topology.kind').allowed).toBe('one of "buck", "boost"');
    expect(problemAt(doc, 'parts.switch.qgC').message).toBe('Control switch — Total gate charge Qg (parts.switch.qgC) is missing; allowed: 10 pC ≤ qgC ≤ 10 µC.');
  });

  it('refuses unknown touch roles and names the allowed ones', () => {
    const p = problemAt(demoWith('synchronous-buck', { 'thermal.touch.heatsink': { touchable: true, surface: 'metal' } }), 'thermal.touch.heatsink');
    expect(p.allowed).toContain('"switch"');
  });
});

describe('validateDesign applies the cross-field physics rules', () => {
  it('a buck needs Vout below the lowest input and says so', () => {
    const p = problemAt(demoWith('synchronous-buck', { 'spec.voutV': 11 }), 'spec.voutV'); // buck M = D < 1 (Erickson & Maksimović 2nd ed. ch. 2 [from memory])
    expect(p.message).toContain('A buck only steps down');
    expect(p.message).toContain('Input voltage, lowest (spec.vinMinV) (10.8 V)');
  });

  it('a boost needs Vout above the highest input and says so', () => {
    const p = problemAt(demoWith('diode-boost', { 'spec.voutV': 4 }), 'spec.voutV'); // boost M = 1/(1 − D) > 1 (Erickson & Maksimović 2nd ed. ch. 2 [from memory])
    expect(p.message).toContain('A boost only steps up');
    expect(p.message).toContain('Input voltage, highest (spec.vinMaxV) (4.2 V)');
  });

  it('orders the input voltages min ≤ nom ≤ max', () => {
    expect(problemAt(demoWith('synchronous-buck', { 'spec.vinNomV': 20 }), 'spec.vinNomV').allowed).toBe('10.8 V ≤ vinNomV ≤ 16.8 V');
    expect(problemAt(demoWith('synchronous-buck', { 'spec.vinMaxV': 9 }), 'spec.vinMaxV').message).toContain('below Input voltage, lowest (spec.vinMinV)');
  });

  it('requires the rectifier part to match topology.rectifier', () => {
    const doc = demo('diode-boost');
    setPath(doc, 'topology.rectifier', 'synchronous');
    expect(problemAt(doc, 'parts.rectifier.kind').allowed).toBe('"mosfet"');
  });

  it('requires a sense resistor and its thermal path when a sense location is set', () => {
    const doc = demoWith('hot-fin-buck', { 'topology.senseLocation': 'input' });
    expect(problemAt(doc, 'parts.senseResistor').message).toContain('Current-sense resistor (topology.senseLocation) is "input"');
    expect(problemAt(doc, 'thermal.paths.senseResistor').allowed).toContain('thermal path');
  });

  it('requires heatsink ids to exist and to be unique', () => {
    const doc = demo('synchronous-buck');
    setPath(doc, 'thermal.paths.rectifier.heatsinkId', 'no-such-sink');
    (doc.thermal as { heatsinks: unknown[] }).heatsinks.push({ id: 'case-wall', name: 'copy', thetaSaKPerW: 5, surface: 'metal' });
    expect(problemAt(doc, 'thermal.paths.rectifier.heatsinkId').allowed).toContain('"case-wall"');
    expect(problemAt(doc, 'thermal.heatsinks[1].id').message).toContain('unique');
  });

  it('puts only parts with a θJC on a heatsink', () => {
    const doc = demoWith('synchronous-buck', { 'thermal.paths.inductor': { kind: 'heatsink', heatsinkId: 'case-wall', thetaCsKPerW: 1 } });
    expect(problemAt(doc, 'thermal.paths.inductor.kind').message).toContain('θJC'); // JEDEC JESD51-14 defines θJC for packaged semiconductors [from memory]
  });

  it('keeps the gate-charge numbers consistent', () => {
    const low = problemAt(demoWith('synchronous-buck', { 'parts.switch.qgC': 3e-9 }), 'parts.switch.qgC'); // Qg ≥ Qgs + Qgd: the gate-charge curve is cumulative (docs/methods.md §4, Mohan et al. [from memory])
    expect(low.allowed).toBe('qgC ≥ qgsC + qgdC (3.7 nC)');
    const plateau = problemAt(demoWith('synchronous-buck', { 'parts.switch.plateauV': 5 }), 'parts.switch.plateauV'); // Ig,on = (Vdrv − Vpl)/R must be > 0 (docs/methods.md §4)
    expect(plateau.message).toContain('Controller and gate driver — Gate drive voltage (parts.controller.driveV) (5 V)');
    const both = demoWith('synchronous-buck', { 'parts.switch.qgsC': undefined, 'parts.switch.qgs2C': undefined });
    expect(problemAt(both, 'parts.switch.qgs2C').allowed).toBe('qgs2C or qgsC (one of them)');
  });

  it('refuses a drive rail a linear regulator cannot make from the lowest input', () => {
    const p = problemAt(demoWith('diode-boost', { 'parts.controller.driveFromVinLinear': true }), 'parts.controller.driveV'); // a linear regulator drops voltage, never raises it (Horowitz & Hill, The Art of Electronics 3rd ed. ch. 9 [from memory])
    expect(p.allowed).toBe('driveV < spec.vinMinV (3 V)');
  });

  it('refuses an inductance roll-off above the zero-current inductance and an impossible core path length', () => {
    expect(problemAt(demoWith('synchronous-buck', { 'parts.inductor.rolloff.inductanceH': 5e-6 }), 'parts.inductor.rolloff.inductanceH').allowed).toContain('4.7 µH');
    // le = Ve/Ae (IEC 60205 effective core parameters [from memory]); 5e-7 m³ / 20e-6 m² = 25 mm in the demo, 1e-8 m³ gives 0.5 mm
    expect(problemAt(demoWith('synchronous-buck', { 'parts.inductor.veM3': 1e-8 }), 'parts.inductor.veM3').allowed).toBe('1 mm ≤ veM3 / aeM2 ≤ 1 m');
  });

  it('refuses part limits at or below the ambient temperature', () => {
    expect(problemAt(demoWith('synchronous-buck', { 'parts.controller.tjMaxC': 40 }), 'parts.controller.tjMaxC').allowed).toBe('tjMaxC > spec.ambientC (40 °C)');
  });

  it('refuses dead times that do not fit in the off time', () => {
    // Buck at 10.8 V: D = 3.3/10.8 = 0.30556 → off time (1 − D)/450 kHz = 1.54321 µs (docs/methods.md §1: buck D = Vo/Vin)
    const p = problemAt(demoWith('synchronous-buck', { 'topology.deadTimeBeforeOnS': 1e-6, 'topology.deadTimeAfterOffS': 0.6e-6 }), 'topology.deadTimeBeforeOnS');
    expect(p.allowed).toBe('deadTimeBeforeOnS + deadTimeAfterOffS < 1.54321 µs');
    const fits = validateDesign(demoWith('synchronous-buck', { 'topology.deadTimeBeforeOnS': 1e-6, 'topology.deadTimeAfterOffS': 0.5e-6 }));
    expect(fits.ok).toBe(true); // 1.5 µs fits in 1.54321 µs
  });

  it('checks custom touch-limit rows: sane limits, unique ids, a row for every touchable surface', () => {
    const row = { id: 'r1', standard: 'ISO 13732-1:2006', clause: '', material: 'metal', contact: 'held', limitC: 51, recalled: true, note: '' }; // docs/methods.md §11 [memory]: metal 51 °C at 1 min
    const dup = demoWith('synchronous-buck', { 'thermal.customTouchLimits': [row, { ...row, limitC: 400 }] });
    expect(problemAt(dup, 'thermal.customTouchLimits[1].limitC').allowed).toBe('25 °C < limitC ≤ 150 °C');
    expect(problemAt(dup, 'thermal.customTouchLimits[1].id').message).toContain('unique');
    const missing = demoWith('synchronous-buck', { 'thermal.customTouchLimits': [{ ...row, contact: 'brief' }] });
    expect(problemAt(missing, 'thermal.customTouchLimits').message).toContain('no row for metal touched with contact "held"');
  });
});

describe('validateDesign returns every problem at once', () => {
  it('reports independent faults together, and no rule reasons from a refused value', () => {
    const doc = demoWith('synchronous-buck', {
      'spec.vinMaxV': -5,
      'spec.maxDuty': 1.5,
      'parts.inductor.dcr20Ohm': 'twelve milliohm',
      'thermal.paths.switch.heatsinkId': 'nope',
      'margins.temperatureMarginK': Number.NaN,
    });
    const paths = problemsOf(doc).map((p) => p.path);
    expect(paths).toEqual(
      expect.arrayContaining(['spec.vinMaxV', 'spec.maxDuty', 'parts.inductor.dcr20Ohm', 'thermal.paths.switch.heatsinkId', 'margins.temperatureMarginK']),
    );
    expect(paths.filter((p) => p === 'spec.vinMaxV')).toHaveLength(1); // −5 V is refused once, not also as "below vinMinV"
  });

  it('does not add follow-on problems for a refused list or part', () => {
    const sinks = demoWith('synchronous-buck', { 'thermal.heatsinks': 'case-wall' });
    expect(problemsOf(sinks).map((p) => p.path)).toEqual(['thermal.heatsinks']); // not also "heatsinkId names no heatsink"
    const sense = demoWith('synchronous-buck', { 'parts.senseResistor': null });
    expect(problemsOf(sense).map((p) => p.path)).toEqual(['parts.senseResistor']); // once: "is null", not also "is needed"
  });
});

describe('validateDesign gives notices on a valid design', () => {
  it('names keys it ignored (often a misspelling)', () => {
    const doc = demoWith('synchronous-buck', { 'spec.vinMaxv': 17 });
    const r = validateDesign(doc);
    expect(r.ok && r.warnings?.map((w) => w.path)).toEqual(['spec.vinMaxv']);
  });

  it('names a sense resistor that the topology leaves out', () => {
    const r = validateDesign(demoWith('synchronous-buck', { 'topology.senseLocation': 'none' }));
    expect(r.ok && r.warnings?.some((w) => w.path === 'parts.senseResistor')).toBe(true);
  });
});
