/**
 * Each thermal node's tangent ∂P_i/∂T_i for the electro-thermal Newton step (thermal/fixed-point.ts), exact
 * and without another loss pass: with the electrical point held, a temperature moves a loss only through
 * the one input of a thermal model that follows its part's temperature (RDS(on), Vf0, IR, DCR, ESR, R), so
 *   ∂P_i/∂T_i = Σ over the thermal slots heating node i of  model.sensitivity(inputs) · d(that input)/dT,
 * the first factor from the loss model (losses/*.ts), the second the exact slope of its temperature law
 * (physics/temperature-slopes.ts). Every thermal slot heats the part whose temperature it reads
 * (losses/model.ts `heats: 'own'`), so there are no cross terms. A layered winding's Dowell factor is held,
 * as the loss's slope through the skin depth is negligible next to DCR's.
 * Reads the slot inputs of the last kernel fill (kernel.ts), which must be at temperatures T.
 * Source: plain differentiation of the loss formulas and laws (docs/methods.md §5, §6, §8, §9, §10).
 */
import type { LedgerContext } from './context.ts';
import {
  copperResistanceSlopeAt,
  coreLossFactorSlopeAt,
  diodeVf0SlopeAt,
  esrRatioSlopeAt,
  leakageSlopeAt,
  rdsOnSlopeAt,
  resistorSlopeAt,
} from '../physics/temperature-slopes.ts';

/** Writes ∂P_i/∂T_i (W/K) of every node into G (see header). */
export function nodeSlopesInto(ctx: LedgerContext, T: Float64Array, G: Float64Array): void {
  const s = ctx.slots;
  const parts = ctx.design.parts;
  const idx = ctx.net.index;
  G.fill(0);
  const tSw = T[idx.switch]!;
  G[idx.switch] = s.swConduction.model.sensitivity!(s.swConduction.inputs) * rdsOnSlopeAt(parts.switch, tSw);
  const rect = parts.rectifier;
  const tR = T[idx.rectifier]!;
  const rc = s.rectConduction;
  if (rc && rect.kind === 'mosfet') G[idx.rectifier] += rc.model.sensitivity!(rc.inputs) * rdsOnSlopeAt(rect, tR);
  const df = s.diodeForward;
  // Datasheet VF(IF, Tj) curves: the model's sensitivity is dP/dTj itself (losses/diode-forward-curve.ts).
  if (df && rect.kind === 'diode') G[idx.rectifier] += df.model.sensitivity!(df.inputs) * (rect.vfCurves ? 1 : diodeVf0SlopeAt(rect, tR));
  const dl = s.diodeLeakage;
  if (dl && rect.kind === 'diode') G[idx.rectifier] += dl.model.sensitivity!(dl.inputs) * leakageSlopeAt(rect, tR);
  const dcrSlope = copperResistanceSlopeAt(parts.inductor.dcr20Ohm, T[idx.inductor]!);
  let inductorPerOhm = s.windingDc.model.sensitivity!(s.windingDc.inputs);
  const ac = s.windingAc;
  if (ac) inductorPerOhm += ac.model.sensitivity!(ac.inputs);
  G[idx.inductor] += inductorPerOhm * dcrSlope;
  // A core-loss-vs-temperature curve: ∂P/∂T = P(Steinmetz) · dfactor/dT (0 without one).
  G[idx.inductor] += s.core.model.sensitivity!(s.core.inputs) * coreLossFactorSlopeAt(parts.inductor, T[idx.inductor]!);
  const ci = s.inputEsr;
  // ESR(T) = ESR25 · ratio(T), ESR25 the part's ESR or its ESR(f) table met by the current's spectrum.
  G[idx.inputCapacitor] += ci.model.sensitivity!(ci.inputs) * ci.inputs.esr25Ohm * esrRatioSlopeAt(parts.inputCapacitor.part, T[idx.inputCapacitor]!);
  const co = s.outputEsr;
  G[idx.outputCapacitor] += co.model.sensitivity!(co.inputs) * co.inputs.esr25Ohm * esrRatioSlopeAt(parts.outputCapacitor.part, T[idx.outputCapacitor]!);
  const r = s.sense;
  const sense = parts.senseResistor;
  if (r && sense) G[idx.senseResistor] += r.model.sensitivity!(r.inputs) * resistorSlopeAt(sense, T[idx.senseResistor]!);
}
