import { describe, expect, it } from 'vitest';
import { solveOperatingPoint } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { conditionsOf, conduction, designOf } from '../../helpers/operating-point.ts';
import type { DesignSketch } from '../../helpers/designs.ts';

// docs/methods.md §3 check: boost with inductor resistance RL, load R, D = 0.5, RL/R = 0.01.
const VIN = 10;
const R = 10;
const RL = 0.1;
const eta = 1 / (1 + RL / ((1 - 0.5) ** 2 * R)); // docs/methods.md §3: η = 1/(1 + RL/(D'²R))
const M = (1 / (1 - 0.5)) * eta; // docs/methods.md §3: Vo/Vin = (1/D')·η
const sketch: DesignSketch = {
  kind: 'boost', rectifier: 'synchronous', vinV: VIN, voutV: M * VIN, loadA: (M * VIN) / R, fsHz: 200e3,
  inductanceH: 47e-6, outputCapacitanceF: 100e-6, maxDuty: 0.95,
};
const cp = conduction({ inductorDcrOhm: RL });

describe('solveOperatingPoint — boost with inductor resistance (docs/methods.md §3)', () => {
  it('η and M of the check value', () => {
    closeTo(eta, 0.961538, 0, 5e-7); // docs/methods.md §3 check η
    closeTo(M, 1.923077, 0, 5e-7); // docs/methods.md §3 check M
  });

  it('the solver returns D = 0.5 for that ratio and the input power of that efficiency', () => {
    const op = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), cp);
    closeTo(op.dutyCycle, 0.5, 1e-10); // docs/methods.md §3 check D 0.5
    closeTo(op.outputPowerW / (VIN * op.waveforms.inputA), eta, 1e-10); // docs/methods.md §3: η = Pout/Pin with Pin = Vin·IL
  });

  it('small-signal landmarks of a resistive load: RHP zero D\'²R/L and current-mode pole 2/(RC), in Hz', () => {
    const s = { ...sketch, loadKind: 'resistive' as const }; // docs/methods.md §13 states the landmarks for a load resistor R
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), cp);
    const ss = op.smallSignal;
    expect(ss).toBeDefined(); // issue 2 §3: boost small-signal landmarks in CCM
    closeTo(ss!.rhpZeroHz, (0.25 * R) / 47e-6 / (2 * Math.PI), 1e-9); // docs/methods.md §13: ωz = D'²R/L
    closeTo(ss!.outputPoleHz, 2 / (R * 100e-6) / (2 * Math.PI), 1e-12); // docs/methods.md §13: ωp = 2/(RC)
  });

  it('the current-mode output pole follows the load: 1/(RC) for a current sink, at the origin for constant power', () => {
    // The power stage at a fixed peak current feeds about constant power (conductance 1/R at the output);
    // the load adds its own incremental conductance: 1/R resistive, 0 current sink, −1/R constant power
    // (Erickson & Maksimović 2nd ed. ch. 12, simple model of the current-programmed boost [memory]).
    const sink = solveOperatingPoint(designOf(sketch), conditionsOf(sketch), cp).smallSignal!;
    closeTo(sink.outputPoleHz, 1 / (R * 100e-6) / (2 * Math.PI), 1e-12); // ωp = (1/R + 0)/C, from memory (above)
    closeTo(sink.rhpZeroHz, (0.25 * R) / 47e-6 / (2 * Math.PI), 1e-9); // docs/methods.md §13: the RHP zero does not depend on the load kind
    const cpl = { ...sketch, loadKind: 'constant-power' as const };
    const power = solveOperatingPoint(designOf(cpl), conditionsOf(cpl), cp).smallSignal!;
    closeTo(power.outputPoleHz, 0, 0, 1e-9); // ωp = (1/R − 1/R)/C = 0, from memory (above)
  });

  it('beyond the maximum ratio it says so and reports the highest output instead', () => {
    // docs/methods.md §3: maximum ratio 1/(2√(RL/R)) at D' = √(RL/R). With the load current held at Io the
    // same ceiling reads Vo,max = Vin²/(4·Io·RL) at D' = 2·Io·RL/Vin (R = Vo,max/Io in the §3 formula).
    const io = 6;
    const voMax = (VIN * VIN) / (4 * io * RL);
    closeTo(voMax / VIN, 1 / (2 * Math.sqrt(RL / (voMax / io))), 1e-12); // docs/methods.md §3 max ratio at R = Vo,max/Io
    const over = { ...sketch, voutV: 1.2 * voMax, loadA: io };
    const op = solveOperatingPoint(designOf(over), conditionsOf(over), cp);
    expect(op.regulated).toBe(false); // issue 2 §3: a design that cannot regulate is flagged, not shown as regulated
    closeTo(op.voutV, voMax, 1e-7); // docs/methods.md §3 ceiling
    closeTo(1 - op.dutyCycle, (2 * io * RL) / VIN, 1e-5); // docs/methods.md §3: D' = √(RL/R) at the ceiling
    expect(op.warnings.map((w) => w.code)).toContain('cannot-regulate'); // issue 2 §3: typed warning
    expect(op.targetVoutV).toBe(1.2 * voMax); // the record keeps the specified target beside the reached value
    const under = { ...sketch, voutV: 0.98 * voMax, loadA: io };
    const ok = solveOperatingPoint(designOf(under), conditionsOf(under), cp);
    expect(ok.regulated).toBe(true); // below the ceiling the converter regulates
    expect(ok.dutyCycle).toBeLessThan(op.dutyCycle); // on the rising side of the ratio curve
  });

  it('a boost asked to step down cannot regulate: D = 0 and Vo = Vin − VF0 − Io·(DCR + Rd)', () => {
    const s: DesignSketch = { kind: 'boost', rectifier: 'diode', vinV: 15, voutV: 12, loadA: 1, fsHz: 200e3, inductanceH: 47e-6 };
    const op = solveOperatingPoint(designOf(s), conditionsOf(s), conduction({ diodeVf0V: 0.5, diodeRdOhm: 0.05, inductorDcrOhm: 0.1 }));
    expect(op.dutyCycle).toBe(0); // a boost cannot step down: the switch never turns on
    closeTo(op.voutV, 15 - 0.5 - 1 * (0.1 + 0.05), 1e-10); // KVL with the rectifier conducting DC (switch never on)
    expect(op.regulated).toBe(false); // issue 2 §3: not presented as regulated
    expect(op.warnings.find((w) => w.code === 'cannot-regulate')?.path).toBe('spec.voutV'); // brief rule 6: the warning names the field
  });
});
