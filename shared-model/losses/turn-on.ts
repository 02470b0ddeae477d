/**
 * Turn-on overlap loss of the control switch by the gate-charge method.
 *
 * Formula: Ig = (Vdrv − Vpl)/(Rpull-up + Rg); t_ir = Qgs2/Ig (current rise); t_vf = Qgd/Ig (voltage fall);
 * Eon = ½ · Vsw · Ion · (t_ir + t_vf); P = Eon · fs. Ion is the current at turn-on (valley in CCM).
 * Assumptions: linear current and voltage ramps; constant plateau; no common-source inductance, ringing or
 * non-linear Crss; the transition time is capped at half a period (a drive that cannot pass the plateau).
 * Zero or negative current at turn-on (DCM, or a soft edge) gives no overlap loss — the caller passes 0.
 * Source: Erickson & Maksimović 2nd ed. ch. 4; Mohan, Undeland & Robbins ch. 22 [memory]; docs/methods.md §4.
 */
import { turnOnGateCurrentA } from './gate-charge.ts';
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface TurnOnInputs {
  /** Voltage across the switch before it turns on, V. */
  voltageV: number;
  /** Current the switch takes over at turn-on, A (≤ 0: no overlap loss). */
  currentA: number;
  frequencyHz: number;
  driveV: number;
  plateauV: number;
  pullUpOhm: number;
  gateOhm: number;
  qgs2C: number;
  qgdC: number;
}

/** Total transition time t_ir + t_vf, s, capped at half a period (no allocation: used in the loop). */
function turnOnTotalS(x: TurnOnInputs): number {
  const gateA = turnOnGateCurrentA(x.driveV, x.plateauV, x.pullUpOhm, x.gateOhm);
  const t = gateA > 0 ? (x.qgs2C + x.qgdC) / gateA : Infinity;
  const capS = x.frequencyHz > 0 ? 0.5 / x.frequencyHz : 0;
  return t <= capS ? t : capS;
}

/** Current-rise and voltage-fall times, s (sum capped at half a period). */
export function turnOnTimes(x: TurnOnInputs): { gateA: number; riseS: number; fallS: number } {
  const gateA = turnOnGateCurrentA(x.driveV, x.plateauV, x.pullUpOhm, x.gateOhm);
  let riseS = gateA > 0 ? x.qgs2C / gateA : Infinity;
  let fallS = gateA > 0 ? x.qgdC / gateA : Infinity;
  const capS = x.frequencyHz > 0 ? 0.5 / x.frequencyHz : 0;
  if (!(riseS + fallS <= capS)) {
    const total = x.qgs2C + x.qgdC;
    riseS = total > 0 ? (capS * x.qgs2C) / total : 0;
    fallS = capS - riseS;
  }
  return { gateA, riseS, fallS };
}

export const turnOn: LossModel<TurnOnInputs> = {
  mechanism: 'turn-on overlap',
  heats: 'own',
  payer: 'path',
  thermal: false,
  drop: false,
  formula: '½ · Vsw · Ion · (Qgs2 + Qgd) / ((Vdrv − Vpl)/(Rpull-up + Rg)) · fs',
  watts: (x) => (x.currentA > 0 ? nonNegativeFinite(0.5 * x.voltageV * x.currentA * turnOnTotalS(x) * x.frequencyHz) : 0),
  describe: (x) => {
    const t = turnOnTimes(x);
    return [
      input('Vsw', x.voltageV, 'V'),
      input('Ion', x.currentA, 'A'),
      input('fs', x.frequencyHz, 'Hz'),
      input('Vdrv', x.driveV, 'V'),
      input('Vpl', x.plateauV, 'V'),
      input('Rpull-up', x.pullUpOhm, 'Ω'),
      input('Rg', x.gateOhm, 'Ω'),
      input('Qgs2', x.qgs2C, 'C'),
      input('Qgd', x.qgdC, 'C'),
      input('Ig', Number.isFinite(t.gateA) ? t.gateA : 0, 'A'),
      input('t_ir', t.riseS, 's'),
      input('t_vf', t.fallS, 's'),
    ];
  },
};
