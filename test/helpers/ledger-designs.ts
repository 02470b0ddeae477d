/**
 * Designs for the loss-ledger tests. Every part is invented (no real part is described); the values are
 * plain round numbers chosen for the tests, not a product. Built on the shared sketch builder
 * (designs.ts) and extended with what the ledger needs: heatsinks, touchable surfaces, electrolytic life,
 * layered windings, estimated Qgs2, a linear drive rail.
 */
import fc from 'fast-check';
import type { Design, ThermalPath } from '../../shared-model/index.ts';
import { validateDesign } from '../../shared-model/index.ts';
import { inventedMosfet, makeDesign, SECTION_4_GATE, type DesignSketch } from './designs.ts';

/** The docs/methods.md §1 buck (12 V → 5 V, 3 A, 10 µH, 500 kHz), synchronous, with invented parts. */
export const SYNC_BUCK: DesignSketch = {
  kind: 'buck',
  rectifier: 'synchronous',
  vinV: 12,
  voutV: 5,
  loadA: 3,
  fsHz: 500e3,
  inductanceH: 10e-6,
};

/** An invented diode boost: 5 V → 12 V at 1 A, 300 kHz. */
export const DIODE_BOOST: DesignSketch = {
  kind: 'boost',
  rectifier: 'diode',
  vinV: 5,
  voutV: 12,
  loadA: 1,
  fsHz: 300e3,
  inductanceH: 22e-6,
};

export function design(sketch: DesignSketch, edit?: (d: Design) => void): Design {
  const d = makeDesign(sketch);
  d.parts.switch = inventedMosfet(0.01, 100, 100, { ...SECTION_4_GATE, id: 'ledger-fet', name: 'Invented ledger-test MOSFET' });
  if (edit) edit(d);
  return d;
}

/** Every part on one direct path of θ K/W. */
export function allDirect(d: Design, thetaKPerW: number): void {
  const path: ThermalPath = { kind: 'direct', thetaJaKPerW: thetaKPerW };
  const p = d.thermal.paths;
  p.switch = path;
  p.rectifier = path;
  p.inductor = path;
  p.inputCapacitor = path;
  p.outputCapacitor = path;
  p.controller = path;
  if (d.parts.senseResistor) p.senseResistor = path;
}

/** Switch and rectifier on one shared heatsink. */
export function sharedSink(d: Design, thetaSaKPerW: number, thetaCsKPerW = 0.5): void {
  d.thermal.heatsinks = [{ id: 'sink', name: 'Invented shared sink', thetaSaKPerW, surface: 'metal' }];
  d.thermal.paths.switch = { kind: 'heatsink', heatsinkId: 'sink', thetaCsKPerW };
  d.thermal.paths.rectifier = { kind: 'heatsink', heatsinkId: 'sink', thetaCsKPerW };
}

/** Validates and returns the design (fails loudly in a test when a builder made an invalid one). */
export function valid(d: Design): Design {
  const v = validateDesign(d);
  if (!v.ok) throw new Error(`test design invalid: ${JSON.stringify(v.problems.slice(0, 3))}`);
  return v.design;
}

/**
 * Random valid designs for property tests: buck or boost, diode (Schottky or PN) or synchronous, forced
 * PWM or diode emulation, loads from light (DCM) to rated, every thermal path kind, heatsinks, touchable
 * parts, winding models, Qgs2 given or estimated, drive rail linear or not.
 */
export const arbitraryDesign: fc.Arbitrary<Design> = fc
  .record({
    boost: fc.boolean(),
    sync: fc.boolean(),
    pn: fc.boolean(),
    emulation: fc.boolean(),
    vin: fc.double({ min: 5, max: 48, noNaN: true }),
    ratio: fc.double({ min: 0.2, max: 0.7, noNaN: true }),
    load: fc.double({ min: 0.2, max: 8, noNaN: true }),
    fs: fc.double({ min: 100e3, max: 1e6, noNaN: true }),
    lFactor: fc.double({ min: 0.3, max: 3, noNaN: true }),
    rds: fc.double({ min: 0.002, max: 0.05, noNaN: true }),
    theta: fc.double({ min: 5, max: 60, noNaN: true }),
    ambient: fc.double({ min: -20, max: 60, noNaN: true }),
    sense: fc.constantFrom('none', 'input', 'switch', 'inductor', 'output') as fc.Arbitrary<DesignSketch['senseLocation']>,
    winding: fc.constantFrom('none', 'factor', 'dowell'),
    sink: fc.boolean(),
    touch: fc.boolean(),
    noQgs2: fc.boolean(),
    linearRail: fc.boolean(),
    electrolytic: fc.boolean(),
  })
  .map((r) => {
    const vout = r.boost ? r.vin / r.ratio : r.vin * r.ratio;
    // Inductance around the value giving 40 % ripple at this load, scaled.
    const d0 = r.boost ? 1 - r.vin / vout : vout / r.vin;
    const il = r.boost ? r.load / (1 - d0) : r.load;
    const lNominal = ((r.boost ? r.vin : r.vin - vout) * d0) / (r.fs * 0.4 * il);
    // DCR sized for about 0.5 % of the output power at this load (a plausible inductor for the job).
    const dcr = (0.005 * vout * r.load) / (il * il);
    const sketch: DesignSketch = {
      kind: r.boost ? 'boost' : 'buck',
      rectifier: r.sync ? 'synchronous' : 'diode',
      lightLoad: r.emulation ? 'diode-emulation' : 'forced-pwm',
      vinV: r.vin,
      voutV: vout,
      loadA: r.load,
      fsHz: r.fs,
      inductanceH: lNominal * r.lFactor,
      dcr20Ohm: dcr,
      switchOhm: r.rds,
      rectifierOhm: r.rds,
      senseLocation: r.sense,
      ambientC: r.ambient,
      vdsRatingV: 2 * Math.max(vout, r.vin) + 10,
      vrRatingV: 2 * Math.max(vout, r.vin) + 10,
      maxDuty: 0.95,
    };
    return design(sketch, (d) => {
      allDirect(d, r.theta);
      if (r.sink) sharedSink(d, r.theta / 4);
      if (!r.sync && r.pn && d.parts.rectifier.kind === 'diode') {
        d.parts.rectifier = { ...d.parts.rectifier, technology: 'pn', qrrC: 30e-9, cjF: 0, leakageA: 1e-7 };
      }
      if (r.winding === 'factor') d.parts.inductor.acWinding = { kind: 'factor', racOverRdc: 3 };
      if (r.winding === 'dowell') {
        d.parts.inductor.acWinding = { kind: 'dowell', layers: 3, conductorThicknessM: 0.3e-3, porosity: 0.8 };
      }
      if (r.touch) {
        d.thermal.touch = { switch: { touchable: true, surface: 'metal' }, inductor: { touchable: true, surface: 'plastic' } };
      }
      if (r.noQgs2) d.parts.switch = { ...d.parts.switch, qgs2C: undefined, qgsC: 4e-9 };
      d.parts.controller.driveFromVinLinear = r.linearRail && r.vin > 7;
      if (r.electrolytic) {
        const cap = d.parts.outputCapacitor.part;
        d.parts.outputCapacitor.part = { ...cap, dielectric: 'electrolytic', esrTempCoPerK: -0.01, life: { ratedHours: 2000, ratedC: 105 } };
        d.margins.requiredLifeHours = 20000;
      }
    });
  });

/** Removes every loss but conduction from the power path (switching, core, leakage, AC winding). */
export function conductionOnly(d: Design): Design {
  const c = structuredClone(d);
  for (const fet of [c.parts.switch, c.parts.rectifier]) {
    if (fet.kind !== 'mosfet') continue;
    fet.qgs2C = 1e-12; // the smallest gate charges the schema accepts (design/numbers.ts): switching losses ~1e-5 of the output
    fet.qgdC = 1e-12;
    fet.outputCapacitance = { kind: 'capacitance', cossF: 0, atV: 12 };
    fet.bodyDiodeQrrC = 0;
  }
  if (c.parts.rectifier.kind === 'diode') c.parts.rectifier = { ...c.parts.rectifier, qrrC: 0, cjF: 0, leakageA: 0 };
  c.topology.deadTimeAfterOffS = 0;
  c.topology.deadTimeBeforeOnS = 0;
  c.parts.inductor.coreLoss = { kind: 'steinmetz', k: 1e-12, alpha: 1.5, beta: 2.5 }; // the smallest k accepted: core loss ~nW
  c.parts.inductor.acWinding = { kind: 'none' };
  return c;
}
