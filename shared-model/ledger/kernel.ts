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
import type { Mosfet } from '../design/parts.ts';
import type { ConductionParameters } from '../operating-point/types.ts';
import type { PointView, RippleSquares } from './point-view.ts';
import { esrAt, leakageAt } from '../physics/temperature-laws.ts';
import { eossAt, qossAt } from '../losses/output-capacitance.ts';
import { dowellRippleFactor } from '../losses/dowell.ts';
import type { Slots } from './slots.ts';
import type { LedgerContext } from './context.ts';

export { conductionAt, ledgerContext, type LedgerContext } from './context.ts';

function fillGate(x: Slots['swGate']['inputs'], fet: Mosfet, ctx: LedgerContext): void {
  const drv = ctx.design.parts.controller;
  x.qgC = fet.qgC;
  x.driveV = drv.driveV;
  x.frequencyHz = ctx.frequencyHz;
  x.gateOhm = fet.rgInternalOhm;
  x.pullUpOhm = drv.pullUpOhm;
  x.pullDownOhm = drv.pullDownOhm;
}

/**
 * Computes every loss of `op` at node temperatures T into the slots and ctx outputs (with `thermalOnly`,
 * a refill of the point of the previous call: the slots that do not depend on temperature keep their
 * watts). `ripple` holds the
 * slope parts of the branch mean squares (point-view.ts): the resistive losses they carry are moved from
 * the duty-moving sum (pathLossW) to the source sum (sourceLossW), see slots.ts.
 */
export function fillLosses(
  ctx: LedgerContext,
  op: PointView,
  ripple: RippleSquares,
  T: Float64Array,
  cp: ConductionParameters,
  thermalOnly = false,
): void {
  const { design, slots: s, frequencyHz: fs } = ctx;
  const parts = design.parts;
  const sw = parts.switch;
  const drv = parts.controller;
  const idx = ctx.net.index;
  const on = op.edges.turnOn;
  const off = op.edges.turnOff;
  const capacitiveOn = on.hard || op.mode === 'DCM';
  const swingV = capacitiveOn ? Math.max(on.voltageV, 0) : 0;
  // Dead times longer than the rectifier's interval are cut to it (the body diode then carries it all).
  let t1 = design.topology.deadTimeAfterOffS;
  let t2 = design.topology.deadTimeBeforeOnS;
  const rectifierS = op.rectifierFraction * op.periodS;
  if (t1 + t2 > rectifierS) {
    const scale = t1 + t2 > 0 ? rectifierS / (t1 + t2) : 0;
    t1 *= scale;
    t2 *= scale;
  }

  const c = s.swConduction.inputs;
  c.irmsA = op.stats.switch.rmsA;
  c.resistanceOhm = cp.switchOnOhm;
  c.temperatureC = T[idx.switch]!;

  const a = s.swTurnOn.inputs;
  a.voltageV = on.voltageV;
  a.currentA = on.hard ? Math.max(on.currentA, 0) : 0;
  a.frequencyHz = fs;
  a.driveV = drv.driveV;
  a.plateauV = sw.plateauV;
  a.pullUpOhm = drv.pullUpOhm;
  a.gateOhm = sw.rgInternalOhm;
  a.qgs2C = ctx.qgs2.qgs2C;
  a.qgdC = sw.qgdC;

  const b = s.swTurnOff.inputs;
  b.voltageV = off.voltageV;
  b.currentA = off.hard ? Math.max(off.currentA, 0) : 0;
  b.frequencyHz = fs;
  b.plateauV = sw.plateauV;
  b.pullDownOhm = drv.pullDownOhm;
  b.gateOhm = sw.rgInternalOhm;
  b.qgs2C = ctx.qgs2.qgs2C;
  b.qgdC = sw.qgdC;

  const co = s.swCoss.inputs;
  co.voltageV = swingV;
  co.frequencyHz = fs;
  co.ctrlEossJ = eossAt(sw.outputCapacitance, swingV);
  co.syncQossC = 0;
  co.syncEossJ = 0;

  fillGate(s.swGate.inputs, sw, ctx);
  const rect = parts.rectifier;
  const forwardAtOn = on.hard && on.currentA > 0;
  if (rect.kind === 'mosfet' && ctx.synchronous) {
    co.syncQossC = qossAt(rect.outputCapacitance, swingV);
    co.syncEossJ = eossAt(rect.outputCapacitance, swingV);
    const ds = s.swDeadTime!.inputs;
    ds.vsdV = sw.bodyDiodeVsdV;
    ds.firstA = -off.currentA;
    ds.firstS = t1;
    ds.secondA = -on.currentA;
    ds.secondS = t2;
    ds.frequencyHz = fs;
    const rr = s.swRecovery!.inputs;
    rr.qrrC = rect.bodyDiodeQrrC;
    rr.testA = rect.bodyDiodeQrrTestA ?? design.spec.ratedLoadA;
    rr.forwardA = forwardAtOn && t2 > 0 ? on.currentA : 0;
    rr.voltageV = on.voltageV;
    rr.frequencyHz = fs;
    const rc = s.rectConduction!.inputs;
    rc.irmsA = op.stats.rectifier.rmsA;
    rc.resistanceOhm = cp.rectifierOnOhm;
    rc.temperatureC = T[idx.rectifier]!;
    fillGate(s.rectGate!.inputs, rect, ctx);
    const dr = s.rectDeadTime!.inputs;
    dr.vsdV = rect.bodyDiodeVsdV;
    dr.firstA = off.currentA;
    dr.firstS = t1;
    dr.secondA = op.mode === 'DCM' ? 0 : on.currentA;
    dr.secondS = t2;
    dr.frequencyHz = fs;
  } else if (rect.kind === 'diode') {
    if (s.swJunction) {
      const j = s.swJunction.inputs;
      j.cjF = rect.cjF;
      j.voltageV = swingV;
      j.frequencyHz = fs;
    } else {
      const rr = s.swRecovery!.inputs;
      rr.qrrC = rect.qrrC;
      rr.testA = rect.qrrTestA ?? design.spec.ratedLoadA;
      rr.forwardA = forwardAtOn ? on.currentA : 0;
      rr.voltageV = on.voltageV;
      rr.frequencyHz = fs;
    }
    const tR = T[idx.rectifier]!;
    const f = s.diodeForward!.inputs;
    f.vf0V = cp.diodeVf0V;
    f.rdOhm = cp.diodeRdOhm;
    f.iavgA = op.stats.rectifier.averageA;
    f.irmsA = op.stats.rectifier.rmsA;
    f.temperatureC = tR;
    const l = s.diodeLeakage!.inputs;
    l.leakageA = leakageAt(rect, tR);
    l.reverseV = op.stress.rectifierV;
    l.reverseFraction = op.dutyCycle;
    l.idleV = ctx.boost ? op.voutV - ctx.vinV : op.voutV;
    l.idleFraction = op.idleFraction;
    l.temperatureC = tR;
  }

  const tL = T[idx.inductor]!;
  const ind = parts.inductor;
  const w = s.windingDc.inputs;
  w.irmsA = op.inductor.rmsA;
  w.dcrOhm = cp.inductorDcrOhm;
  w.temperatureC = tL;
  if (s.windingAc) {
    const x = s.windingAc.inputs;
    const spec = ind.acWinding;
    x.acRmsA = op.inductor.acRmsA;
    x.dcrOhm = cp.inductorDcrOhm;
    x.temperatureC = tL;
    // A thermal-only refill keeps the Dowell factor of the previous fill: its slope with temperature
    // (through the resistivity in the skin depth) is negligible next to DCR's and is left out of ∂P/∂T.
    if (!thermalOnly) {
      x.factor =
        spec.kind === 'factor'
          ? spec.racOverRdc
          : spec.kind === 'dowell'
            ? dowellRippleFactor(op.waveforms.inductor.segments, op.inductor.acRmsA, spec.layers, spec.conductorThicknessM, spec.porosity, tL, ctx.scratch)
            : 1;
    }
  }
  const k = s.core.inputs;
  k.kiWPerM3 = ctx.core.ki;
  k.alpha = ctx.core.alpha;
  k.beta = ctx.core.beta;
  k.veM3 = ind.veM3;
  k.fluxPerAmpT = op.inductanceH / (ind.turns * ind.aeM2);
  k.segments = op.waveforms.inductor.segments;

  const ci = s.inputEsr.inputs;
  const tCi = T[idx.inputCapacitor]!;
  ci.irmsA = op.stats.inputCapacitor.rmsA;
  ci.esrOhm = esrAt(parts.inputCapacitor.part, tCi);
  ci.count = parts.inputCapacitor.count;
  ci.temperatureC = tCi;
  const cOut = s.outputEsr.inputs;
  const tCo = T[idx.outputCapacitor]!;
  cOut.irmsA = op.stats.outputCapacitor.rmsA;
  cOut.esrOhm = esrAt(parts.outputCapacitor.part, tCo);
  cOut.count = parts.outputCapacitor.count;
  cOut.temperatureC = tCo;

  if (s.sense) {
    const r = s.sense.inputs;
    r.irmsA = op.stats.sense.rmsA;
    r.resistanceOhm = cp.senseOhm;
    r.temperatureC = T[idx.senseResistor]!;
  }
  const q = s.quiescent.inputs;
  q.vinV = ctx.vinV;
  q.quiescentA = drv.quiescentA;

  // Sum: every slot's watts; the driver's share needs the FETs' inside shares first.
  const all = s.all;
  const power = ctx.nodePowerW;
  power.fill(0);
  let path = 0;
  let source = 0;
  let insideW = 0;
  for (let i = 0; i < all.length; i++) {
    const slot = all[i]!;
    if (slot === s.driver) continue;
    // thermalOnly: a refill of the same point at other temperatures; only temperature-dependent slots change.
    const watts = thermalOnly && !slot.thermal ? slot.watts : slot.model.watts(slot.inputs);
    slot.watts = watts;
    power[ctx.slotNode[i]!] += watts;
    if (slot.source) source += watts;
    else path += watts;
    if (slot === s.swGate || slot === s.rectGate) insideW += watts;
  }
  const d = s.driver.inputs;
  d.qgTotalC = sw.qgC + (ctx.synchronous && rect.kind === 'mosfet' ? rect.qgC : 0);
  d.supplyV = drv.driveFromVinLinear ? ctx.vinV : drv.driveV;
  d.frequencyHz = fs;
  d.insideFetsW = insideW;
  const dw = s.driver.model.watts(d);
  s.driver.watts = dw;
  power[idx.controller] += dw;
  source += dw;
  // Slope part of the resistive conduction losses (paid at an unchanged duty, see slots.ts).
  let slopeW = cp.switchOnOhm * ripple.switch + cp.inductorDcrOhm * ripple.inductor;
  slopeW += (ctx.synchronous ? cp.rectifierOnOhm : cp.diodeRdOhm) * ripple.rectifier;
  slopeW += (cOut.esrOhm / cOut.count) * ripple.outputCapacitor;
  if (s.sense) slopeW += cp.senseOhm * ripple.sense;
  if (!(slopeW > 0) || slopeW > path) slopeW = slopeW > path ? path : 0;
  ctx.pathLossW = path - slopeW;
  ctx.sourceLossW = source + slopeW;
}
