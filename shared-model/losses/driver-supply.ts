/**
 * Gate-drive loss in the controller (driver and, where present, the linear regulator that makes the drive
 * rail from Vin).
 *
 * Formula: P = ΣQg · Vsupply · fs − P(inside the FETs), with Vsupply = Vin when the drive rail comes from
 * Vin through a linear regulator (the input pays Vin·Qg·fs), otherwise Vdrv (the rail is assumed to be made
 * from the input without further loss, so the input pays Qg·Vdrv·fs).
 * Source: docs/methods.md §4 (gate drive 30 mW, 72 mW from a 12 V linear rail — check values).
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface DriverSupplyInputs {
  /** Sum of the gate charges of the FETs driven each cycle, C. */
  qgTotalC: number;
  /** Voltage the input pays the gate charge at (Vin for a linear rail, else Vdrv), V. */
  supplyV: number;
  frequencyHz: number;
  /** Part of the gate-drive energy dissipated inside the FETs' own Rg, W. */
  insideFetsW: number;
}

/** Power the input supplies for gate drive, W. */
export function gateSupplyW(x: DriverSupplyInputs): number {
  return nonNegativeFinite(x.qgTotalC * x.supplyV * x.frequencyHz);
}

export const driverSupply: LossModel<DriverSupplyInputs> = {
  mechanism: 'gate drive',
  heats: 'controller',
  payer: 'source',
  thermal: false,
  drop: false,
  formula: 'ΣQg · Vsupply · fs − P(inside the FETs)',
  watts: (x) => nonNegativeFinite(gateSupplyW(x) - x.insideFetsW),
  describe: (x) => [
    input('ΣQg', x.qgTotalC, 'C'),
    input('Vsupply', x.supplyV, 'V'),
    input('fs', x.frequencyHz, 'Hz'),
    input('P inside the FETs', x.insideFetsW, 'W'),
  ],
};
