/**
 * The ledger's numeric kernel: every loss of one operating point at given part temperatures, written into
 * reused input records (slots.ts) without building any result objects. The electro-thermal loop and the
 * duty solver call it many times; the ledger records are built once at the end (terms.ts).
 *
 * Where each mechanism's numbers come from (op = the solved operating point, T = node temperatures):
 *   switch: Irms and RDS(on)(Tj); turn-on at the valley current if the edge is hard (not in DCM, not with
 *     reverse current); turn-off at the peak; Coss at the turn-on swing when the turn-on is hard or in DCM
 *     (capacitive turn-on after the idle interval; the ringing there is not modelled), none for a
 *     zero-voltage turn-on; reverse recovery of the rectifier (sync: body diode, only after a dead time with
 *     forward current; PN diode: CCM with forward current at turn-on; Qrr · IF/Itest, Itest = rated load
 *     current when the part states none, losses/reverse-recovery.ts); Schottky Cj like Coss.
 *   rectifier: sync FET conduction + dead-time body diode (forward current at each edge); diode forward
 *     drop, leakage over D at the blocking voltage and over the DCM idle interval at Vout (buck) or
 *     Vout − Vin (boost).
 *   inductor: IL,rms²·DCR(T), ripple AC excess, iGSE on the inductor-current waveform with B = L·i/(N·Ae).
 *   capacitors: bank RMS, ESR(T) per part; sense resistor: its branch RMS; controller: Vin·Iq and the
 *     driver's share of the gate drive.
 */
import type { ConductionParameters } from '../operating-point/types.ts';
import type { PointView } from '../operating-point/lean-point.ts';
import type { RippleSquares } from './ripple-squares.ts';
import { fillPassiveInputs, fillRectifierInputs, fillSwitchInputs } from './kernel-inputs.ts';
import { slotWatts } from './slots.ts';
import type { LedgerContext } from './context.ts';

export { conductionAt, conductionInto, ledgerContext, type LedgerContext } from './context.ts';

/**
 * Computes every loss of `op` at node temperatures T into the slots and ctx outputs. `ripple` holds the
 * slope parts of the branch mean squares (ripple-squares.ts): the resistive losses they carry are moved from
 * the duty-moving sum (pathLossW) to the source sum (sourceLossW), see slots.ts.
 */
export function fillLosses(
  ctx: LedgerContext,
  op: PointView,
  ripple: RippleSquares,
  T: Float64Array,
  cp: ConductionParameters,
): void {
  fillPathLosses(ctx, op, ripple, T, cp);
  completeLosses(ctx);
}

/**
 * The half of fillLosses the duty balance reads: every slot's inputs, the watts of the slots that are not
 * the source's, and ctx.pathLossW. The source's slots (core loss, charge pulses from the source, gate
 * drive, the input bank, bias: slots.ts) keep their old watts and nodePowerW, sourceLossW and offDropLossW
 * their old values until `completeLosses`, which the caller runs once at the duty it keeps: the duty
 * solver tries several duties per electro-thermal step and reads only pathLossW at the others.
 */
export function fillPathLosses(
  ctx: LedgerContext,
  op: PointView,
  ripple: RippleSquares,
  T: Float64Array,
  cp: ConductionParameters,
): void {
  fillSwitchInputs(ctx, op, T, cp);
  fillRectifierInputs(ctx, op, T, cp);
  fillPassiveInputs(ctx, op, T, cp);
  const s = ctx.slots;
  const cOut = s.outputEsr.inputs;
  slotWatts(s, true, false);
  const all = s.all;
  let path = 0;
  for (let i = 0; i < all.length; i++) {
    const slot = all[i]!;
    if (!slot.source && slot !== s.driver) path += slot.watts;
  }
  // Slope part of the resistive conduction losses (paid at an unchanged duty, see slots.ts).
  let slopeW = cp.switchOnOhm * ripple.switchA2 + cp.inductorDcrOhm * ripple.inductorA2;
  slopeW += (ctx.synchronous ? cp.rectifierOnOhm : cp.diodeRdOhm) * ripple.rectifierA2;
  slopeW += (cOut.esrOhm / cOut.count) * ripple.outputCapacitorA2;
  if (s.sense) slopeW += cp.senseOhm * ripple.senseA2;
  ctx.slopeLossW = slopeW;
  if (!(slopeW > 0) || slopeW > path) slopeW = slopeW > path ? path : 0;
  ctx.pathLossW = path - slopeW;
}

/**
 * The other half (see fillPathLosses, which must have run at this point): the source's slots' watts, the
 * driver's, and every sum — the same slots summed in the same order as one pass, so the numbers are those
 * of a single fill.
 */
export function completeLosses(ctx: LedgerContext): void {
  const s = ctx.slots;
  const parts = ctx.design.parts;
  const sw = parts.switch;
  const rect = parts.rectifier;
  const drv = parts.controller;
  slotWatts(s, false, true);
  // Sum: every slot's watts; the driver's share needs the FETs' inside shares first.
  const all = s.all;
  const power = ctx.nodePowerW;
  power.fill(0);
  let path = 0;
  let source = 0;
  let offDrop = 0;
  let insideW = 0;
  for (let i = 0; i < all.length; i++) {
    const slot = all[i]!;
    if (slot === s.driver) continue;
    const watts = slot.watts;
    power[ctx.slotNode[i]!] += watts;
    if (slot.source) source += watts;
    else {
      path += watts;
      if (!slot.drop) offDrop += watts;
    }
    if (slot === s.swGate || slot === s.rectGate) insideW += watts;
  }
  const d = s.driver.inputs;
  d.qgTotalC = sw.qgC + (ctx.synchronous && rect.kind === 'mosfet' ? rect.qgC : 0);
  d.supplyV = drv.driveFromVinLinear ? ctx.vinV : drv.driveV;
  d.frequencyHz = ctx.frequencyHz;
  d.insideFetsW = insideW;
  const dw = s.driver.model.watts(d);
  s.driver.watts = dw;
  power[ctx.net.index.controller] += dw;
  source += dw;
  let slopeW = ctx.slopeLossW;
  if (!(slopeW > 0) || slopeW > path) slopeW = slopeW > path ? path : 0;
  ctx.pathLossW = path - slopeW;
  ctx.sourceLossW = source + slopeW;
  ctx.offDropLossW = offDrop;
}
