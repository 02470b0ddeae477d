import { describe, expect, it } from 'vitest';
import { solveOperatingPoint, TOPOLOGIES, topologyOf } from '../../../shared-model/index.ts';
import type { ConverterTopology } from '../../../shared-model/index.ts';
import { circuitOf } from '../../../shared-model/operating-point/circuit.ts';
import { newShape } from '../../../shared-model/operating-point/shape.ts';
import { solveVoltSecond } from '../../../shared-model/operating-point/duty.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { conditionsOf, designOf, IDEAL } from '../../helpers/operating-point.ts';
import type { DesignSketch } from '../../helpers/designs.ts';

/**
 * Ideal inductor voltages of the two intervals as a textbook writes them from the circuit diagram,
 * derived here from nothing but the record's interval flags (from input: +Vin; to output: −Vout).
 */
function idealIntervalVolts(t: ConverterTopology, vin: number, vout: number): { on: number; off: number } {
  const v = (i: ConverterTopology['intervals']['on' | 'off']) => (i.fromInput ? vin : 0) - (i.toOutput ? vout : 0);
  return { on: v(t.intervals.on), off: v(t.intervals.off) };
}

describe('topology records against the textbook', () => {
  it('ideal conversion ratios', () => {
    closeTo(TOPOLOGIES.buck.idealRatio(0.4), 0.4, 1e-15); // Erickson & Maksimović 2nd ed. ch. 2: buck M(D) = D [memory for chapter]
    closeTo(TOPOLOGIES.boost.idealRatio(0.75), 4, 1e-15); // Erickson & Maksimović 2nd ed. ch. 2: boost M(D) = 1/(1 − D) [memory for chapter]
    closeTo(TOPOLOGIES.buck.idealDuty(12, 3), 0.25, 1e-15); // Erickson & Maksimović 2nd ed. ch. 2: D = Vout/Vin
    closeTo(TOPOLOGIES.boost.idealDuty(12, 48), 0.75, 1e-15); // Erickson & Maksimović 2nd ed. ch. 2: D = 1 − Vin/Vout
  });

  it('the interval flags give the textbook inductor voltages and balance the volt-seconds at the ideal duty', () => {
    const buck = idealIntervalVolts(TOPOLOGIES.buck, 12, 3);
    expect(buck).toEqual({ on: 9, off: -3 }); // Erickson & Maksimović 2nd ed. ch. 2: buck vL = Vin − V on, −V off
    const boost = idealIntervalVolts(TOPOLOGIES.boost, 12, 48);
    expect(boost).toEqual({ on: 12, off: -36 }); // Erickson & Maksimović 2nd ed. ch. 2: boost vL = Vg on, Vg − V off
    closeTo(0.25 * buck.on + 0.75 * buck.off, 0, 0, 1e-12); // volt-second balance at D = 0.25 (ch. 2)
    closeTo(0.75 * boost.on + 0.25 * boost.off, 0, 0, 1e-12); // volt-second balance at D = 0.75 (ch. 2)
    closeTo(TOPOLOGIES.buck.idealOnVoltsV(12, 3), buck.on, 1e-15); // the ripple's on-voltage is the same interval voltage
    closeTo(TOPOLOGIES.boost.idealOnVoltsV(12, 48), boost.on, 1e-15); // idem
  });

  it('blocking voltages: buck switch and rectifier Vin, boost Vout; DCM idle rectifier buck Vout, boost Vout − Vin', () => {
    const at = (k: { input: number; output: number }, vin: number, vout: number) => k.input * vin + k.output * vout;
    expect(at(TOPOLOGIES.buck.switchBlocks, 12, 3)).toBe(12); // Erickson & Maksimović 2nd ed. ch. 2 (switch node between Vin and 0)
    expect(at(TOPOLOGIES.buck.rectifierBlocks, 12, 3)).toBe(12); // idem
    expect(at(TOPOLOGIES.boost.switchBlocks, 12, 48)).toBe(48); // idem (switch node between 0 and Vout)
    expect(at(TOPOLOGIES.boost.rectifierBlocks, 12, 48)).toBe(48); // idem
    expect(at(TOPOLOGIES.buck.rectifierIdleBlocks, 12, 3)).toBe(3); // Erickson & Maksimović 2nd ed. ch. 5: idle node rests at Vout (buck)
    expect(at(TOPOLOGIES.boost.rectifierIdleBlocks, 12, 48)).toBe(36); // ch. 5: idle node rests at Vin (boost)
  });

  it('topologyOf maps every design kind to its record', () => {
    for (const kind of ['buck', 'boost'] as const) expect(topologyOf({ topology: { kind } } as never).kind).toBe(kind); // the registry's contract
  });
});

describe('the engine reads the record: ideal circuits give the textbook waveform', () => {
  const cases: { sketch: DesignSketch; duty: number; il: number; ripple: number }[] = [
    // Erickson & Maksimović 2nd ed. ch. 2: buck IL = Io, ΔI = (Vin − V)·D·T/L.
    { sketch: { kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 3, loadA: 2, fsHz: 400e3, inductanceH: 10e-6, outputCapacitanceF: 100e-6 },
      duty: 0.25, il: 2, ripple: (9 * 0.25) / 400e3 / 10e-6 },
    // Erickson & Maksimović 2nd ed. ch. 2: boost IL = Io/D', ΔI = Vg·D·T/L.
    { sketch: { kind: 'boost', rectifier: 'synchronous', vinV: 12, voutV: 48, loadA: 0.5, fsHz: 400e3, inductanceH: 47e-6, outputCapacitanceF: 100e-6, maxDuty: 0.95 },
      duty: 0.75, il: 2, ripple: (12 * 0.75) / 400e3 / 47e-6 },
  ];
  for (const k of cases) {
    it(`${k.sketch.kind}: duty, mean inductor current and ripple`, () => {
      const op = solveOperatingPoint(designOf(k.sketch), conditionsOf(k.sketch), IDEAL);
      closeTo(op.dutyCycle, k.duty, 1e-12); // Erickson & Maksimović 2nd ed. ch. 2 (see the case)
      closeTo(op.inductor.averageA, k.il, 1e-12); // idem, charge balance
      closeTo(op.inductor.rippleA, k.ripple, 1e-12); // idem, ΔI
    });
  }
});

describe('a third topology needs no change in the engine', () => {
  // The inverting buck-boost as a record (not shipped): on draws from the input only, off delivers to the
  // output only. Erickson & Maksimović 2nd ed. ch. 6: M(D) = −D/(1 − D), IL = Io/D', ΔI = Vg·D·T/L.
  it('an interval table with neither shared interval gives the buck-boost duty, current and ripple', () => {
    const sketch: DesignSketch = { kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 8, loadA: 1, fsHz: 400e3, inductanceH: 22e-6, outputCapacitanceF: 100e-6, maxDuty: 0.95 };
    const c = circuitOf(designOf(sketch), conditionsOf({ ...sketch, voutV: 24 }), IDEAL);
    c.targetVoutV = 24; // |Vout| = 24 V from 12 V
    c.onToOutput = false; // the record's on interval: from input, not to output
    c.offFromInput = false; // the record's off interval: to output, not from input
    const s = newShape();
    const vs = solveVoltSecond(c, 0.95, s);
    const d = 24 / (24 + 12); // ch. 6: D/(1 − D) = |V|/Vg
    closeTo(vs.d, d, 1e-12); // Erickson & Maksimović 2nd ed. ch. 6: M = −D/D'
    closeTo(s.il, 1 / (1 - d), 1e-12); // ch. 6: IL = Io/D' (capacitor charge balance)
    closeTo(s.ripple, (12 * d) / 400e3 / 22e-6, 1e-12); // ch. 6: ΔI = Vg·D·T/L
    closeTo(s.iin, d * s.il, 1e-12); // ch. 6: the source supplies IL during D·T only
  });
});
