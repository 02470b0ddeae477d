/**
 * Turn-off overlap loss of the control switch by the gate-charge method.
 *
 * Formula: Ig = Vpl/(Rpull-down + Rg); t_vr = Qgd/Ig (voltage rise); t_if = Qgs2/Ig (current fall);
 * Eoff = ½ · Vsw · Ioff · (t_vr + t_if); P = Eoff · fs. Ioff is the current at turn-off (peak).
 * Assumptions: as for turn-on (linear ramps, constant plateau, no parasitic inductance or ringing); the
 * transition time is capped at half a period. Zero or negative current at turn-off: no overlap loss.
 * Source: Erickson & Maksimović 2nd ed. ch. 4; Mohan, Undeland & Robbins ch. 22 [memory]; docs/methods.md §4.
 */
import { turnOffGateCurrentA } from './gate-charge.ts';
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface TurnOffInputs {
  /** Voltage the switch blocks after turn-off, V. */
  voltageV: number;
  /** Current in the switch at turn-off, A (≤ 0: no overlap loss). */
  currentA: number;
  frequencyHz: number;
  plateauV: number;
  pullDownOhm: number;
  gateOhm: number;
  qgs2C: number;
  qgdC: number;
}

/** Total transition time t_vr + t_if, s, capped at half a period (no allocation: used in the loop). */
function turnOffTotalS(x: TurnOffInputs): number {
  const gateA = turnOffGateCurrentA(x.plateauV, x.pullDownOhm, x.gateOhm);
  const t = gateA > 0 ? (x.qgs2C + x.qgdC) / gateA : Infinity;
  const capS = x.frequencyHz > 0 ? 0.5 / x.frequencyHz : 0;
  return t <= capS ? t : capS;
}

/** Voltage-rise and current-fall times, s (sum capped at half a period). */
export function turnOffTimes(x: TurnOffInputs): { gateA: number; riseS: number; fallS: number } {
  const gateA = turnOffGateCurrentA(x.plateauV, x.pullDownOhm, x.gateOhm);
  let riseS = gateA > 0 ? x.qgdC / gateA : Infinity;
  let fallS = gateA > 0 ? x.qgs2C / gateA : Infinity;
  const capS = x.frequencyHz > 0 ? 0.5 / x.frequencyHz : 0;
  if (!(riseS + fallS <= capS)) {
    const total = x.qgs2C + x.qgdC;
    riseS = total > 0 ? (capS * x.qgdC) / total : 0;
    fallS = capS - riseS;
  }
  return { gateA, riseS, fallS };
}

export const turnOff: LossModel<TurnOffInputs> = {
  mechanism: 'turn-off overlap',
  heats: 'own',
  payer: 'path',
  thermal: false,
  drop: false,
  formula: '½ · Vsw · Ioff · (Qgd + Qgs2) / (Vpl/(Rpull-down + Rg)) · fs',
  watts: (x) => (x.currentA > 0 ? nonNegativeFinite(0.5 * x.voltageV * x.currentA * turnOffTotalS(x) * x.frequencyHz) : 0),
  describe: (x) => {
    const t = turnOffTimes(x);
    return [
      input('Vsw', x.voltageV, 'V'),
      input('Ioff', x.currentA, 'A'),
      input('fs', x.frequencyHz, 'Hz'),
      input('Vpl', x.plateauV, 'V'),
      input('Rpull-down', x.pullDownOhm, 'Ω'),
      input('Rg', x.gateOhm, 'Ω'),
      input('Qgs2', x.qgs2C, 'C'),
      input('Qgd', x.qgdC, 'C'),
      input('Ig', Number.isFinite(t.gateA) ? t.gateA : 0, 'A'),
      input('t_vr', t.riseS, 's'),
      input('t_if', t.fallS, 's'),
    ];
  },
};
