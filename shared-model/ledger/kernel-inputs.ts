/**
 * The kernel's inputs: each slot's input record (slots.ts) filled from the operating point `op`, the node
 * temperatures T and the conduction parameters at T, without allocating. Three functions by part, called
 * by the kernel (kernel.ts) before it sums the watts; the rules for which mechanism applies when are in
 * the kernel's header.
 */
import type { Mosfet } from '../design/parts.ts';
import type { ConductionParameters } from '../operating-point/types.ts';
import type { PointView } from '../operating-point/lean-point.ts';
import { coreLossFactorAt, esrRatioAt, leakageAt } from '../physics/temperature-laws.ts';
import { spectralEsrOhm } from '../curves/esr-spectrum.ts';
import type { Capacitor } from '../design/parts.ts';
import type { Segment } from '../operating-point/types.ts';
import { eossAt, qossAt } from '../losses/output-capacitance.ts';
import { dowellRippleFactor } from '../losses/dowell.ts';
import type { Slots } from './slots.ts';
import type { LedgerContext } from './context.ts';

function fillGate(x: Slots['swGate']['inputs'], fet: Mosfet, ctx: LedgerContext): void {
  const drv = ctx.design.parts.controller;
  x.qgC = fet.qgC;
  x.driveV = drv.driveV;
  x.frequencyHz = ctx.frequencyHz;
  x.gateOhm = fet.rgInternalOhm;
  x.pullUpOhm = drv.pullUpOhm;
  x.pullDownOhm = drv.pullDownOhm;
}

/** The switch-node swing charged at the control switch's turn-on: a hard or DCM turn-on, else 0 (zero-voltage). */
function turnOnSwingV(op: PointView): number {
  const on = op.edges.turnOn;
  return on.hard || op.mode === 'DCM' ? Math.max(on.voltageV, 0) : 0;
}

/** The control switch's own slots: conduction, overlap at both edges, Coss (with a synchronous FET's), gate drive. */
export function fillSwitchInputs(ctx: LedgerContext, op: PointView, T: Float64Array, cp: ConductionParameters): void {
  const { design, slots: s, frequencyHz: fs } = ctx;
  const parts = design.parts;
  const sw = parts.switch;
  const drv = parts.controller;
  const on = op.edges.turnOn;
  const off = op.edges.turnOff;
  const swingV = turnOnSwingV(op);

  const c = s.swConduction.inputs;
  c.irmsA = op.stats.switch.rmsA;
  c.resistanceOhm = cp.switchOnOhm;
  c.temperatureC = T[ctx.net.index.switch]!;

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
  const rect = parts.rectifier;
  if (rect.kind === 'mosfet' && ctx.synchronous) {
    co.syncQossC = qossAt(rect.outputCapacitance, swingV);
    co.syncEossJ = eossAt(rect.outputCapacitance, swingV);
  }
  fillGate(s.swGate.inputs, sw, ctx);
}

/**
 * The rectifier's slots, and those of the switch that the rectifier causes: a synchronous FET's conduction,
 * gate drive and dead-time body diodes (both FETs) and its body diode's recovery; a diode's forward drop,
 * leakage, and its recovery or junction capacitance charged through the switch.
 */
export function fillRectifierInputs(ctx: LedgerContext, op: PointView, T: Float64Array, cp: ConductionParameters): void {
  const { design, slots: s, frequencyHz: fs } = ctx;
  const sw = design.parts.switch;
  const idx = ctx.net.index;
  const on = op.edges.turnOn;
  const off = op.edges.turnOff;
  const swingV = turnOnSwingV(op);
  // Dead times longer than the rectifier's interval are cut to it (the body diode then carries it all).
  let t1 = design.topology.deadTimeAfterOffS;
  let t2 = design.topology.deadTimeBeforeOnS;
  const rectifierS = op.rectifierFraction * op.periodS;
  if (t1 + t2 > rectifierS) {
    const scale = t1 + t2 > 0 ? rectifierS / (t1 + t2) : 0;
    t1 *= scale;
    t2 *= scale;
  }
  const rect = design.parts.rectifier;
  const forwardAtOn = on.hard && on.currentA > 0;
  if (rect.kind === 'mosfet' && ctx.synchronous) {
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
    f.segments = op.waveforms.inductor.segments;
    f.periodS = op.periodS;
    f.fraction = op.rectifierFraction;
    const l = s.diodeLeakage!.inputs;
    l.leakageA = leakageAt(rect, tR);
    l.reverseV = op.stress.rectifierV;
    l.reverseFraction = op.dutyCycle;
    const idle = ctx.topology.rectifierIdleBlocks;
    l.idleV = idle.input * ctx.vinV + idle.output * op.voutV;
    l.idleFraction = op.idleFraction;
    l.temperatureC = tR;
  }
}

/**
 * The passive parts' and the controller's slots: winding DC and AC, core, both capacitor banks' ESR, the sense resistor, the quiescent current.
 */
export function fillPassiveInputs(ctx: LedgerContext, op: PointView, T: Float64Array, cp: ConductionParameters): void {
  const { design, slots: s } = ctx;
  const parts = design.parts;
  const drv = parts.controller;
  const idx = ctx.net.index;
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
    // The Dowell factor's slope with temperature (through the resistivity in the skin depth) is negligible
    // next to DCR's and is left out of ∂P/∂T (kernel-slopes.ts).
    x.factor =
      spec.kind === 'factor'
        ? spec.racOverRdc
        : spec.kind === 'dowell'
          ? dowellRippleFactor(op.waveforms.inductor.segments, op.inductor.acRmsA, spec.layers, spec.conductorThicknessM, spec.porosity, tL, ctx.scratch)
          : 1;
  }
  const k = s.core.inputs;
  k.kiWPerM3 = ctx.core.ki;
  k.alpha = ctx.core.alpha;
  k.beta = ctx.core.beta;
  k.veM3 = ind.veM3;
  k.fluxPerAmpT = op.inductanceH / (ind.turns * ind.aeM2);
  k.segments = op.waveforms.inductor.segments;
  k.temperatureFactor = coreLossFactorAt(ind, tL);
  k.temperatureC = tL;

  const ci = s.inputEsr.inputs;
  const tCi = T[idx.inputCapacitor]!;
  const capIn = parts.inputCapacitor.part;
  ci.irmsA = op.stats.inputCapacitor.rmsA;
  ci.esr25Ohm = esr25Of(capIn, op.waveforms.inputCapacitor.segments, op.periodS);
  ci.esrOhm = ci.esr25Ohm * esrRatioAt(capIn, tCi);
  ci.count = parts.inputCapacitor.count;
  ci.temperatureC = tCi;
  const cOut = s.outputEsr.inputs;
  const tCo = T[idx.outputCapacitor]!;
  const capOut = parts.outputCapacitor.part;
  cOut.irmsA = op.stats.outputCapacitor.rmsA;
  cOut.esr25Ohm = esr25Of(capOut, op.waveforms.outputCapacitor.segments, op.periodS);
  cOut.esrOhm = cOut.esr25Ohm * esrRatioAt(capOut, tCo);
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
  // Pulse skipping: awake (quiescent current) while a pulse runs, the sleep current for the rest.
  const pfm = ctx.pulseSkipping;
  q.quiescentA = pfm && pfm.active ? drv.quiescentA * pfm.awakeFraction + pfm.sleepCurrentA * (1 - pfm.awakeFraction) : drv.quiescentA;
}

/** The last bank current an ESR(f) table was met with and what it gave (the electro-thermal loop refills the
 *  kernel at one operating point many times while only temperatures move). */
interface SpectrumMemo {
  key: Float64Array;
  esrOhm: number;
}
const spectrumMemos = new WeakMap<object, SpectrumMemo>();

/** A capacitor's ESR at 25 °C for the bank current `segments`: the part's ESR, or its ESR(f) table met by the current's harmonics (curves/esr-spectrum.ts). */
function esr25Of(cap: Capacitor, segments: readonly Segment[], periodS: number): number {
  const curve = cap.esrFrequencyCurve;
  if (!curve) return cap.esrOhm;
  let memo = spectrumMemos.get(curve.points);
  if (!memo) {
    memo = { key: new Float64Array(1 + 3 * segments.length), esrOhm: NaN };
    spectrumMemos.set(curve.points, memo);
  }
  const key = memo.key;
  let same = key.length === 1 + 3 * segments.length && key[0] === periodS;
  if (same) {
    for (let k = 0; k < segments.length; k++) {
      const g = segments[k]!;
      if (key[1 + 3 * k] !== g.durationS || key[2 + 3 * k] !== g.i0A || key[3 + 3 * k] !== g.i1A) {
        same = false;
        break;
      }
    }
  }
  if (same && memo.esrOhm === memo.esrOhm) return memo.esrOhm;
  if (key.length !== 1 + 3 * segments.length) memo.key = new Float64Array(1 + 3 * segments.length);
  const kk = memo.key;
  kk[0] = periodS;
  for (let k = 0; k < segments.length; k++) {
    const g = segments[k]!;
    kk[1 + 3 * k] = g.durationS;
    kk[2 + 3 * k] = g.i0A;
    kk[3 + 3 * k] = g.i1A;
  }
  memo.esrOhm = spectralEsrOhm(segments, periodS, curve.points);
  return memo.esrOhm;
}
