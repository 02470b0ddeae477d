/**
 * The loss a measured point implies: Pout = Vout · Iload (the measured Vout, else the design's), and
 * loss = Pin − Pout with Pin measured (inputPowerW, or vinV · inputCurrentA), or
 * loss = Pout · (1/η − 1) from a measured efficiency (docs/methods.md §18: efficiency residuals are
 * compared as loss in watts so light and heavy points weigh sensibly).
 */
import type { MeasuredPoint } from './schema.ts';
import { inputPowerOf } from './read.ts';

export interface MeasuredBalance {
  outputPowerW: number;
  inputPowerW: number;
  lossW: number;
  efficiency: number;
}

/** The measured power balance of a point; `designVoutV` stands in for a missing voutV. */
export function measuredBalance(p: MeasuredPoint, designVoutV: number): MeasuredBalance {
  const outputPowerW = (p.voutV ?? designVoutV) * p.loadA;
  const pin = inputPowerOf(p) ?? outputPowerW / (p.efficiency ?? 1);
  return { outputPowerW, inputPowerW: pin, lossW: pin - outputPowerW, efficiency: outputPowerW / pin };
}
