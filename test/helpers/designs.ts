/**
 * Minimal valid design documents for engine tests, built from a short sketch. Every part is invented
 * (no real part is described); the values are plain round numbers chosen for the tests, not a product.
 */
import type { Capacitor, Design, Diode, Inductor, Mosfet, Resistor, Topology } from '../../shared-model/index.ts';
import { DESIGN_FORMAT, DESIGN_VERSION } from '../../shared-model/index.ts';

export interface DesignSketch {
  kind: 'buck' | 'boost';
  rectifier: 'diode' | 'synchronous';
  lightLoad?: Topology['lightLoad'];
  /** spec.loadKind (absent: left out of the document, a constant-current sink). */
  loadKind?: Design['spec']['loadKind'];
  vinV: number;
  voutV: number;
  loadA: number;
  fsHz: number;
  inductanceH: number;
  vinMinV?: number;
  vinMaxV?: number;
  maxDuty?: number;
  dcr20Ohm?: number;
  rolloff?: { currentA: number; inductanceH: number };
  isatA?: number;
  switchOhm?: number;
  rectifierOhm?: number;
  vf0V?: number;
  rdOhm?: number;
  outputCapacitanceF?: number;
  outputEsrOhm?: number;
  outputCount?: number;
  inputEsrOhm?: number;
  senseLocation?: Topology['senseLocation'];
  senseOhm?: number;
  vdsRatingV?: number;
  idRatingA?: number;
  vrRatingV?: number;
  ifRatingA?: number;
  ambientC?: number;
}

const ids = { id: 'x', name: 'x', invented: true };

/** The docs/methods.md §4 gate-charge check figures (Qg 12 nC, Qgs2 2.5 nC, Qgd 3 nC, Vpl 2.8 V, Rg 1.2 Ω). */
export const SECTION_4_GATE = { qgC: 12e-9, qgs2C: 2.5e-9, qgdC: 3e-9, plateauV: 2.8, vthV: 1.6, rgInternalOhm: 1.2 } as const;

/** The one invented MOSFET of the tests: round numbers, any RDS(on), optional other fields replaced. */
export function inventedMosfet(rdsOn25Ohm: number, vdsRatingV = 100, idRatingA = 100, changes: Partial<Mosfet> = {}): Mosfet {
  return {
    kind: 'mosfet',
    ...ids,
    id: 'test-fet',
    name: 'Invented test MOSFET',
    vdsRatingV,
    idRatingA,
    rdsOn25Ohm,
    rdsTemperatureLaw: { law: 'linear', alphaPerK: 0.005 },
    qgC: 10e-9,
    qgs2C: 2e-9,
    qgdC: 3e-9,
    vthV: 2,
    plateauV: 3,
    rgInternalOhm: 1,
    outputCapacitance: { kind: 'capacitance', cossF: 200e-12, atV: 12 },
    bodyDiodeVsdV: 0.8,
    bodyDiodeQrrC: 10e-9,
    tjMaxC: 150,
    thetaJcKPerW: 2,
    ...changes,
  };
}

export function inventedDiode(vf0V: number, rdOhm: number, vrRatingV = 100, ifRatingA = 100): Diode {
  return {
    kind: 'diode',
    ...ids,
    id: 'test-diode',
    name: 'Invented test diode',
    technology: 'schottky',
    vf0V,
    rdOhm,
    vfTempCoVPerK: -0.0015,
    qrrC: 0,
    cjF: 300e-12,
    leakageA: 50e-6,
    leakageAtC: 25,
    leakageDoublingK: 10,
    vrRatingV,
    ifRatingA,
    tjMaxC: 150,
    thetaJcKPerW: 3,
  };
}

function inventedCapacitor(capacitanceF: number, esrOhm: number): Capacitor {
  return {
    kind: 'capacitor',
    ...ids,
    id: 'test-cap',
    name: 'Invented test capacitor',
    dielectric: 'ceramic',
    capacitanceF,
    esrOhm,
    esrTempCoPerK: 0,
    rippleRatingA: 5,
    voltageRatingV: 200,
    tMaxC: 125,
  };
}

function inventedInductor(s: DesignSketch): Inductor {
  return {
    kind: 'inductor',
    ...ids,
    id: 'test-inductor',
    name: 'Invented test inductor',
    inductanceH: s.inductanceH,
    ...(s.rolloff ? { rolloff: s.rolloff } : {}),
    dcr20Ohm: s.dcr20Ohm ?? 0.02,
    isatA: s.isatA ?? 1000,
    isatAtC: 25,
    isatTempCoPerK: -0.002,
    irmsRatingA: 1000,
    turns: 10,
    aeM2: 20e-6,
    veM3: 1e-6,
    coreLoss: { kind: 'steinmetz', k: 8, alpha: 1.4, beta: 2.7 },
    acWinding: { kind: 'none' },
    tMaxC: 125,
  };
}

function inventedResistor(ohm: number): Resistor {
  return {
    kind: 'resistor',
    ...ids,
    id: 'test-sense',
    name: 'Invented test sense resistor',
    resistanceOhm: ohm,
    tempCoPerK: 0.0001,
    powerRatingW: 1,
    deratingStartC: 70,
    zeroPowerC: 155,
  };
}

/** A complete, schema-valid design from a sketch (defaults are round invented values). */
export function makeDesign(s: DesignSketch): Design {
  const sense = s.senseLocation && s.senseLocation !== 'none' ? s.senseLocation : 'none';
  const rectifier =
    s.rectifier === 'synchronous'
      ? inventedMosfet(s.rectifierOhm ?? 0.01, s.vdsRatingV, s.idRatingA)
      : inventedDiode(s.vf0V ?? 0.4, s.rdOhm ?? 0.01, s.vrRatingV, s.ifRatingA);
  const path = { kind: 'direct' as const, thetaJaKPerW: 40 };
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: 'Invented test design',
    revision: 'A',
    author: 'test',
    notes: '',
    spec: {
      vinMinV: s.vinMinV ?? s.vinV,
      vinNomV: s.vinV,
      vinMaxV: s.vinMaxV ?? s.vinV,
      voutV: s.voutV,
      ratedLoadA: s.loadA > 0 ? s.loadA : 1,
      switchingFrequencyHz: s.fsHz,
      ambientC: s.ambientC ?? 25,
      maxDuty: s.maxDuty ?? 0.95,
      ...(s.loadKind ? { loadKind: s.loadKind } : {}),
    },
    topology: {
      kind: s.kind,
      rectifier: s.rectifier,
      lightLoad: s.lightLoad ?? 'forced-pwm',
      deadTimeBeforeOnS: 20e-9,
      deadTimeAfterOffS: 20e-9,
      senseLocation: sense,
    },
    parts: {
      switch: inventedMosfet(s.switchOhm ?? 0.01, s.vdsRatingV, s.idRatingA),
      rectifier,
      inductor: inventedInductor(s),
      inputCapacitor: { part: inventedCapacitor(10e-6, s.inputEsrOhm ?? 0.005), count: 2 },
      outputCapacitor: {
        part: inventedCapacitor(s.outputCapacitanceF ?? 22e-6, s.outputEsrOhm ?? 0.005),
        count: s.outputCount ?? 1,
      },
      ...(sense !== 'none' ? { senseResistor: inventedResistor(s.senseOhm ?? 0.01) } : {}),
      controller: {
        kind: 'controller',
        ...ids,
        id: 'test-controller',
        name: 'Invented test controller',
        quiescentA: 1e-3,
        driveV: 5,
        pullUpOhm: 1.5,
        pullDownOhm: 0.8,
        driveFromVinLinear: false,
        tjMaxC: 125,
      },
    },
    thermal: {
      heatsinks: [],
      paths: {
        switch: path,
        rectifier: path,
        inductor: path,
        inputCapacitor: path,
        outputCapacitor: path,
        ...(sense !== 'none' ? { senseResistor: path } : {}),
        controller: path,
      },
      touch: {},
      contact: 'held',
      customTouchLimits: [],
    },
    margins: {
      temperatureMarginK: 10,
      rippleCurrentDerating: 0.8,
      resistorPowerDerating: 0.8,
      voltageDerating: 0.8,
    },
  };
}

/** Conduction parameters taken straight from a sketch (bypassing the temperature laws). */
export function sketchConduction(s: DesignSketch) {
  const sync = s.rectifier === 'synchronous';
  return {
    switchOnOhm: s.switchOhm ?? 0.01,
    rectifierOnOhm: sync ? (s.rectifierOhm ?? 0.01) : 0,
    diodeVf0V: sync ? 0.8 : (s.vf0V ?? 0.4),
    diodeRdOhm: sync ? 0 : (s.rdOhm ?? 0.01),
    inductorDcrOhm: s.dcr20Ohm ?? 0.02,
    senseOhm: s.senseLocation && s.senseLocation !== 'none' ? (s.senseOhm ?? 0.01) : 0,
  };
}
