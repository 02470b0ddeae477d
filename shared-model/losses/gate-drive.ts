/**
 * Gate-drive loss inside a FET: the share of the gate-charge energy burnt in the FET's internal gate
 * resistance.
 *
 * Formula: the driver delivers Qg·Vdrv per cycle; half is dissipated while charging (through Rpull-up + Rg)
 * and half while discharging (through Rpull-down + Rg), split in proportion to the resistances:
 *   P = Qg · Vdrv · fs · ½ · (Rg/(Rg + Rpull-up) + Rg/(Rg + Rpull-down)).
 * The rest (and, for a linear rail made from Vin, (Vin − Vdrv)·Qg·fs) heats the controller — see
 * driver-supply.ts. Assumptions: Qg at the drive voltage (datasheet); the even charge/discharge split is
 * exact for a linear gate capacitance; a zero Rg puts nothing inside the FET.
 * Source: docs/methods.md §4 (Qg·Vdrv·fs, share Rg/(Rg + Rdrv)); Erickson & Maksimović 2nd ed. ch. 4 [memory].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface GateDriveInputs {
  qgC: number;
  driveV: number;
  frequencyHz: number;
  gateOhm: number;
  pullUpOhm: number;
  pullDownOhm: number;
}

/** Fraction of Qg·Vdrv·fs dissipated in the FET's internal gate resistance. */
export function insideShare(gateOhm: number, pullUpOhm: number, pullDownOhm: number): number {
  if (!(gateOhm > 0)) return 0;
  return 0.5 * (gateOhm / (gateOhm + pullUpOhm) + gateOhm / (gateOhm + pullDownOhm));
}

export const gateDrive: LossModel<GateDriveInputs> = {
  mechanism: 'gate drive',
  heats: 'own',
  payer: 'source',
  thermal: false,
  drop: false,
  formula: 'Qg · Vdrv · fs · ½ · (Rg/(Rg + Rpull-up) + Rg/(Rg + Rpull-down))',
  watts: (x) =>
    nonNegativeFinite(x.qgC * x.driveV * x.frequencyHz * insideShare(x.gateOhm, x.pullUpOhm, x.pullDownOhm)),
  describe: (x) => [
    input('Qg', x.qgC, 'C'),
    input('Vdrv', x.driveV, 'V'),
    input('fs', x.frequencyHz, 'Hz'),
    input('Rg', x.gateOhm, 'Ω'),
    input('Rpull-up', x.pullUpOhm, 'Ω'),
    input('Rpull-down', x.pullDownOhm, 'Ω'),
    input('share inside the FET', insideShare(x.gateOhm, x.pullUpOhm, x.pullDownOhm), ''),
  ],
};
