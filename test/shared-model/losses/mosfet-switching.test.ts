import { describe, expect, it } from 'vitest';
import { turnOn, turnOnTimes } from '../../../shared-model/losses/turn-on.ts';
import { turnOff, turnOffTimes } from '../../../shared-model/losses/turn-off.ts';
import { gateDrive, insideShare } from '../../../shared-model/losses/gate-drive.ts';
import { driverSupply, gateSupplyW } from '../../../shared-model/losses/driver-supply.ts';
import { deadTime } from '../../../shared-model/losses/dead-time.ts';
import { cossAt, outputCapacitance } from '../../../shared-model/losses/output-capacitance.ts';
import { conduction } from '../../../shared-model/losses/conduction.ts';
import { qgs2Of } from '../../../shared-model/losses/gate-charge.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { inventedMosfet, SECTION_4_GATE } from '../../helpers/designs.ts';

// docs/methods.md §4 check case: Vin 12 V, Ion 8.5 A, Ioff 11.5 A, fs 500 kHz, Vdrv 5 V, Rup 1.5 Ω, Rdn 0.8 Ω,
// Rg 1.2 Ω, Vpl 2.8 V, Qgs2 2.5 nC, Qgd 3.0 nC, Qg 12 nC.
const M4 = { vin: 12, ion: 8.5, ioff: 11.5, fs: 500e3, vdrv: 5, rup: 1.5, rdn: 0.8, rg: 1.2, vpl: 2.8, qgs2: 2.5e-9, qgd: 3.0e-9, qg: 12e-9 };
const onInputs = {
  voltageV: M4.vin, currentA: M4.ion, frequencyHz: M4.fs, driveV: M4.vdrv, plateauV: M4.vpl,
  pullUpOhm: M4.rup, gateOhm: M4.rg, qgs2C: M4.qgs2, qgdC: M4.qgd,
};
const offInputs = {
  voltageV: M4.vin, currentA: M4.ioff, frequencyHz: M4.fs, plateauV: M4.vpl,
  pullDownOhm: M4.rdn, gateOhm: M4.rg, qgs2C: M4.qgs2, qgdC: M4.qgd,
};

describe('turn-on overlap (gate-charge method)', () => {
  it('matches the docs/methods.md §4 gate current, interval times and energy', () => {
    const t = turnOnTimes(onInputs);
    closeTo(t.gateA, 0.814815, 1e-6); // docs/methods.md §4: Ig,on 0.814815 A
    closeTo(t.riseS, 3.068182e-9, 1e-6); // docs/methods.md §4: t_ir 3.068182 ns
    closeTo(t.fallS, 3.681818e-9, 1e-6); // docs/methods.md §4: t_vf 3.681818 ns
    closeTo(turnOn.watts(onInputs), 0.172125, 1e-6); // docs/methods.md §4: Eon 344.25 nJ → 0.172125 W at 500 kHz
  });
  it('is zero when the switch turns on at zero current (DCM) or reverse current', () => {
    expect(turnOn.watts({ ...onInputs, currentA: 0 })).toBe(0); // docs/methods.md §4 / issue 3: no turn-on overlap at zero current
    expect(turnOn.watts({ ...onInputs, currentA: -2 })).toBe(0); // soft edge: reverse current discharges the node first (common practice)
  });
  it('stays finite and bounded when the drive cannot pass the plateau', () => {
    const w = turnOn.watts({ ...onInputs, driveV: 2 });
    expect(Number.isFinite(w)).toBe(true);
    // bounded by the cap at half a period: ½·V·I·(Ts/2)·fs = V·I/4 (the cap stated in turn-on.ts)
    expect(w).toBeLessThanOrEqual((M4.vin * M4.ion) / 4 + 1e-12);
  });
  it('lists every input it used', () => {
    const names = turnOn.describe(onInputs).map((i) => i.name);
    expect(names).toEqual(expect.arrayContaining(['Vsw', 'Ion', 'fs', 'Vdrv', 'Vpl', 'Rpull-up', 'Rg', 'Qgs2', 'Qgd', 'Ig', 't_ir', 't_vf']));
  });
});

describe('turn-off overlap (gate-charge method)', () => {
  it('matches the docs/methods.md §4 gate current and energy', () => {
    closeTo(turnOffTimes(offInputs).gateA, 1.4, 1e-9); // docs/methods.md §4: Ig,off 1.4 A
    closeTo(turnOff.watts(offInputs) / M4.fs, 271.0714e-9, 1e-6); // docs/methods.md §4: Eoff 271.0714 nJ
    closeTo(turnOff.watts(offInputs), 0.135536, 1e-5); // docs/methods.md §4: 0.135536 W
  });
});

describe('gate drive', () => {
  const x = { qgC: M4.qg, driveV: M4.vdrv, frequencyHz: M4.fs, gateOhm: M4.rg, pullUpOhm: M4.rup, pullDownOhm: M4.rdn };
  it('supplies Qg·Vdrv·fs = 30 mW, or Vin·Qg·fs = 72 mW from a 12 V linear rail', () => {
    closeTo(gateSupplyW({ qgTotalC: M4.qg, supplyV: M4.vdrv, frequencyHz: M4.fs, insideFetsW: 0 }), 0.030, 1e-9); // docs/methods.md §4: gate 30 mW
    closeTo(gateSupplyW({ qgTotalC: M4.qg, supplyV: 12, frequencyHz: M4.fs, insideFetsW: 0 }), 0.072, 1e-9); // docs/methods.md §4: 72 mW from a 12 V linear rail
  });
  it('puts the share Rg/(Rg + Rdrv) inside the FET and the rest in the driver', () => {
    // docs/methods.md §4: share Rg/(Rg + Rdrv), averaged over the pull-up (charge) and pull-down (discharge) halves
    const share = 0.5 * (1.2 / (1.2 + 1.5) + 1.2 / (1.2 + 0.8));
    closeTo(insideShare(M4.rg, M4.rup, M4.rdn), share, 1e-12); // docs/methods.md §4 split, each half ½·Qg·Vdrv (linear gate capacitance)
    const inside = gateDrive.watts(x);
    closeTo(inside, 0.030 * share, 1e-12); // docs/methods.md §4: 30 mW × share
    const rest = driverSupply.watts({ qgTotalC: M4.qg, supplyV: M4.vdrv, frequencyHz: M4.fs, insideFetsW: inside });
    closeTo(inside + rest, 0.030, 1e-12); // docs/methods.md §4: the two shares add up to Qg·Vdrv·fs
  });
  it('puts nothing inside the FET when it has no internal gate resistance', () => {
    expect(gateDrive.watts({ ...x, gateOhm: 0 })).toBe(0); // Rg/(Rg + Rdrv) = 0 (docs/methods.md §4)
  });
});

describe('dead-time body-diode conduction', () => {
  it('gives 0.16 W with VSD 0.8 V and 20 ns at each edge', () => {
    const w = deadTime.watts({ vsdV: 0.8, firstA: M4.ioff, firstS: 20e-9, secondA: M4.ion, secondS: 20e-9, frequencyHz: M4.fs });
    closeTo(w, 0.16, 1e-9); // docs/methods.md §4: dead time (VSD 0.8 V, 20 ns each edge) 0.16 W
  });
  it('ignores current flowing against the body diode', () => {
    const w = deadTime.watts({ vsdV: 0.8, firstA: M4.ioff, firstS: 20e-9, secondA: -3, secondS: 20e-9, frequencyHz: M4.fs });
    closeTo(w, 0.8 * M4.ioff * 20e-9 * M4.fs, 1e-12); // docs/methods.md §4 formula with I2 = 0
  });
});

// Reverse recovery (docs/methods.md §4, Qrr 20 nC → 0.12 W): test/shared-model/losses/reverse-recovery.test.ts.

describe('output capacitance', () => {
  it('uses the hard-switched half-bridge form: 120 nJ per cycle for two identical FETs', () => {
    const spec = { kind: 'charge-energy' as const, qossC: 10e-9, eossJ: 40e-9, atV: 12 };
    const c = cossAt(spec, 12);
    const w = outputCapacitance.watts({ voltageV: 12, frequencyHz: M4.fs, ctrlEossJ: c.eossJ, syncQossC: c.qossC, syncEossJ: c.eossJ });
    closeTo(w, 0.060, 1e-9); // docs/methods.md §4: 120 nJ per cycle (60 mW)
    const plain = outputCapacitance.watts({ voltageV: 12, frequencyHz: M4.fs, ctrlEossJ: c.eossJ, syncQossC: 0, syncEossJ: 0 });
    closeTo(plain, 0.020, 1e-9); // docs/methods.md §4: 20 mW from Eoss·fs
  });
  it('reduces to ½(C1 + C2)·V² for linear capacitances', () => {
    const c1 = cossAt({ kind: 'capacitance', cossF: 300e-12, atV: 20 }, 12);
    const c2 = cossAt({ kind: 'capacitance', cossF: 500e-12, atV: 20 }, 12);
    const w = outputCapacitance.watts({ voltageV: 12, frequencyHz: M4.fs, ctrlEossJ: c1.eossJ, syncQossC: c2.qossC, syncEossJ: c2.eossJ });
    closeTo(w, 0.5 * (300e-12 + 500e-12) * 144 * M4.fs, 1e-12); // docs/methods.md §4: ½(C1 + C2)·Vin² for linear capacitance
  });
  it('scales a charge/energy pair with constant equivalent capacitances (stated in the model header)', () => {
    const c = cossAt({ kind: 'charge-energy', qossC: 10e-9, eossJ: 40e-9, atV: 24 }, 12);
    closeTo(c.qossC, 5e-9, 1e-12); // Q ∝ V (constant charge-equivalent capacitance, output-capacitance.ts header)
    closeTo(c.eossJ, 10e-9, 1e-12); // E ∝ V² (constant energy-equivalent capacitance, output-capacitance.ts header)
  });
});

describe('conduction', () => {
  it('is Irms²·RDS(on) and rises with RDS(on)', () => {
    closeTo(conduction.watts({ irmsA: 1.939540, resistanceOhm: 0.01, temperatureC: 25 }), 1.939540 ** 2 * 0.01, 1e-12); // docs/methods.md §1: Isw,rms 1.939540 A
    expect(conduction.watts({ irmsA: 2, resistanceOhm: 0.02, temperatureC: 25 })).toBeGreaterThan(
      conduction.watts({ irmsA: 2, resistanceOhm: 0.01, temperatureC: 25 }),
    );
  });
});

describe('Qgs2 estimate', () => {
  it('takes the datasheet value when given, else Qgs·(Vpl − Vth)/Vpl', () => {
    const fet = inventedMosfet(0.01, 100, 100, SECTION_4_GATE);
    expect(qgs2Of(fet, 5).source).toBe('datasheet');
    const noQgs2 = { ...fet, qgs2C: undefined, qgsC: 4e-9, vthV: 1.4, plateauV: 2.8 };
    const est = qgs2Of(noQgs2, 5);
    expect(est.source).toBe('from Qgs');
    closeTo(est.qgs2C, 4e-9 * (2.8 - 1.4) / 2.8, 1e-12); // gate-charge.ts header: linear Cgs from 0 V to the plateau
  });
});
