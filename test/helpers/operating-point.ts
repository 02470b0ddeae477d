/** Shared set-ups for operating-point tests (invented values; the docs/methods.md §1 check circuit). */
import type { ConductionParameters, Conditions } from '../../shared-model/index.ts';
import { makeDesign, type DesignSketch } from './designs.ts';

/** All drops zero: the ideal converter of the textbook formulas. */
export const IDEAL: ConductionParameters = {
  switchOnOhm: 0,
  rectifierOnOhm: 0,
  diodeVf0V: 0,
  diodeRdOhm: 0,
  inductorDcrOhm: 0,
  senseOhm: 0,
  outputCapacitorEsrOhm: 0,
};

/** docs/methods.md §1 check circuit: buck Vin 12 V, Vo 5 V, Io 3 A, L 10 µH, fs 500 kHz. */
export const METHODS_BUCK: DesignSketch = {
  kind: 'buck',
  rectifier: 'synchronous',
  vinV: 12,
  voutV: 5,
  loadA: 3,
  fsHz: 500e3,
  inductanceH: 10e-6,
  outputCapacitanceF: 22e-6,
};

export function conditionsOf(s: DesignSketch, overrides: Partial<Conditions> = {}): Conditions {
  return { vinV: s.vinV, loadA: s.loadA, switchingFrequencyHz: s.fsHz, ambientC: 25, ...overrides };
}

export function designOf(s: DesignSketch) {
  return makeDesign(s);
}

export function conduction(overrides: Partial<ConductionParameters>): ConductionParameters {
  return { ...IDEAL, ...overrides };
}
