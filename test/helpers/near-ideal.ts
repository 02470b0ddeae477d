/**
 * A test design with every loss pushed to the bottom of its range: the engine's solved points then meet
 * the ideal textbook formulas (Erickson & Maksimović ch. 2), so sizing and checks can be held against
 * hand calculations. Parts are invented (test/helpers/designs.ts).
 */
import type { Design } from '../../shared-model/index.ts';
import { makeDesign, type DesignSketch } from './designs.ts';

export function nearIdealDesign(sketch: DesignSketch): Design {
  const d = makeDesign({ ...sketch, rectifier: 'synchronous', switchOhm: 1e-5, rectifierOhm: 1e-5, dcr20Ohm: 1e-5, outputEsrOhm: 0, inputEsrOhm: 0 });
  d.topology.deadTimeBeforeOnS = 0;
  d.topology.deadTimeAfterOffS = 0;
  for (const fet of [d.parts.switch, d.parts.rectifier]) {
    if (fet.kind !== 'mosfet') continue;
    Object.assign(fet, { qgC: 1e-11, qgs2C: 1e-12, qgdC: 1e-12, bodyDiodeQrrC: 0, outputCapacitance: { kind: 'capacitance', cossF: 0, atV: 12 } });
  }
  d.parts.inductor.coreLoss = { kind: 'steinmetz', k: 1e-6, alpha: 1.4, beta: 2.7 };
  d.parts.controller.quiescentA = 0;
  return d;
}
