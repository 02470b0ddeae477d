/**
 * The ledger's term slots: which mechanisms a design has, on which part and thermal node, with a reused
 * input record each. The set depends only on the design (topology, rectifier, winding model), never on
 * the operating conditions, so the terms of a sweep line up point by point; a mechanism that does not
 * occur at a point (turn-on overlap in DCM, say) stays in the ledger with 0 W.
 *
 * `source`: the loss is paid by the source at an unchanged duty cycle, so it goes to the solver's
 * `sourceLossOf` (added to the source current) rather than to `lossOf` (which moves the duty):
 *   - controller bias and gate drive (supplied from the input beside the power stage);
 *   - where the topology record says `chargePulsesFromSource` (buck), the charge pulses of Coss, junction
 *     capacitance, reverse recovery and diode leakage, which flow from Vin through the switch, bypassing the
 *     inductor;
 *   - the input capacitor's ESR (the solver holds the input stiff);
 *   - losses of the ripple: core loss, AC winding loss, and the slope part of every resistive conduction
 *     loss (R·Σ(t/T)·Δi²/12, split off in the kernel). For a linear circuit these are paid by the curvature
 *     of the real waveforms at the volt-second duty: a parallel core-loss resistor across L draws
 *     D·(Vin − Vo)/Rp more input current and dissipates exactly that power with no change of volt-seconds
 *     (buck, worked by hand), and the time-domain reference reaches the target output at the duty whose
 *     interval-mean drops balance the volt-seconds (test/shared-model/ledger/time-domain.test.ts).
 * Everything else — the interval-mean part of conduction losses, overlap, dead time, and in a boost the
 * charge pulses drawn from the output — takes volt-seconds from the inductor and moves the duty.
 * `slotWatts` computes every slot's watts (test: every slot of `all` but the driver is set,
 * test/shared-model/sweep/lean-point.test.ts).
 */
import type { Design, Role } from '../design/schema.ts';
import type { LossModel } from '../losses/model.ts';
import { topologyOf } from '../topology/registry.ts';
import { capacitorEsr, type CapacitorEsrInputs } from '../losses/capacitor-esr.ts';
import { conduction, type ConductionInputs } from '../losses/conduction.ts';
import { coreLoss, type CoreLossInputs } from '../losses/core-loss.ts';
import { deadTime, type DeadTimeInputs } from '../losses/dead-time.ts';
import { diodeForward } from '../losses/diode-forward.ts';
import { diodeForwardCurve, type DiodeCurveInputs } from '../losses/diode-forward-curve.ts';
import { driverSupply, type DriverSupplyInputs } from '../losses/driver-supply.ts';
import { gateDrive, type GateDriveInputs } from '../losses/gate-drive.ts';
import { junctionCapacitance, type JunctionCapacitanceInputs } from '../losses/junction-capacitance.ts';
import { outputCapacitance, type OutputCapacitanceInputs } from '../losses/output-capacitance.ts';
import { quiescent, type QuiescentInputs } from '../losses/quiescent.ts';
import { reverseLeakage, type ReverseLeakageInputs } from '../losses/reverse-leakage.ts';
import { reverseRecovery, type ReverseRecoveryInputs } from '../losses/reverse-recovery.ts';
import { senseResistor, type SenseResistorInputs } from '../losses/sense-resistor.ts';
import { turnOff, type TurnOffInputs } from '../losses/turn-off.ts';
import { turnOn, type TurnOnInputs } from '../losses/turn-on.ts';
import { windingAc, type WindingAcInputs } from '../losses/winding-ac.ts';
import { windingDc, type WindingDcInputs } from '../losses/winding-dc.ts';

export interface Slot<I> {
  role: Role;
  model: LossModel<I>;
  inputs: I;
  source: boolean;
  /** The mechanism depends on the part's temperature (RDS(on), Vf0, leakage, DCR, ESR, R). */
  thermal: boolean;
  /**
   * The volt-second equation carries this loss as a drop (its interval-mean part: conduction, forward
   * drop, winding DC, output ESR, sense): at the volt-second duty Vin·Iin already pays it. The other path
   * losses (edges, charge pulses from the output) are paid by the source wherever the duty is not
   * power-balanced (forced PWM, an unregulated point): see ledger/joint-loop.ts.
   */
  drop: boolean;
  watts: number;
}

const conductionIn = (): ConductionInputs => ({ irmsA: 0, resistanceOhm: 0, temperatureC: 0 });
const gateIn = (): GateDriveInputs => ({ qgC: 0, driveV: 0, frequencyHz: 0, gateOhm: 0, pullUpOhm: 0, pullDownOhm: 0 });
const deadIn = (): DeadTimeInputs => ({ vsdV: 0, firstA: 0, firstS: 0, secondA: 0, secondS: 0, frequencyHz: 0 });
const recoveryIn = (): ReverseRecoveryInputs => ({ qrrC: 0, testA: 1, forwardA: 0, voltageV: 0, frequencyHz: 0 });
const capIn = (): CapacitorEsrInputs => ({ irmsA: 0, esrOhm: 0, esr25Ohm: 0, count: 1, temperatureC: 0 });

/**
 * A slot of `model` on part `role`. Node, payer, temperature dependence and drop come from the model
 * (losses/model.ts): a charge pulse is the source's where `pulsesFromSource` (the topology record);
 * `paidBySource` overrides the payer for a model used in two places (the input bank's ESR).
 */
function slot<I>(role: Role, model: LossModel<I>, inputs: I, pulsesFromSource: boolean, paidBySource?: boolean): Slot<I> {
  const source = paidBySource ?? (model.payer === 'source' || (model.payer === 'switch-node' && pulsesFromSource));
  const node = model.heats === 'own' ? role : model.heats;
  return { role: node, model, inputs, source, thermal: model.thermal, drop: !source && model.drop, watts: 0 };
}

/** Every slot of a design, named, plus the ordered list the kernel sums. */
export interface Slots {
  swConduction: Slot<ConductionInputs>;
  swTurnOn: Slot<TurnOnInputs>;
  swTurnOff: Slot<TurnOffInputs>;
  swCoss: Slot<OutputCapacitanceInputs>;
  swGate: Slot<GateDriveInputs>;
  /** Synchronous designs: the switch's own body diode (reverse current in forced PWM). */
  swDeadTime?: Slot<DeadTimeInputs>;
  /** Synchronous rectifier body diode, or a PN rectifier diode. */
  swRecovery?: Slot<ReverseRecoveryInputs>;
  /** Schottky rectifier junction capacitance, charged through the switch. */
  swJunction?: Slot<JunctionCapacitanceInputs>;
  rectConduction?: Slot<ConductionInputs>;
  rectGate?: Slot<GateDriveInputs>;
  rectDeadTime?: Slot<DeadTimeInputs>;
  diodeForward?: Slot<DiodeCurveInputs>;
  diodeLeakage?: Slot<ReverseLeakageInputs>;
  windingDc: Slot<WindingDcInputs>;
  windingAc?: Slot<WindingAcInputs>;
  core: Slot<CoreLossInputs>;
  inputEsr: Slot<CapacitorEsrInputs>;
  outputEsr: Slot<CapacitorEsrInputs>;
  sense?: Slot<SenseResistorInputs>;
  quiescent: Slot<QuiescentInputs>;
  driver: Slot<DriverSupplyInputs>;
  all: Slot<unknown>[];
}

export function slotsOf(design: Design, synchronous: boolean): Slots {
  // The switch-node charge pulses: paid by the source where they bypass the inductor (topology record).
  const pulsesFromSource = topologyOf(design).chargePulsesFromSource;
  const at = <I>(role: Role, model: LossModel<I>, inputs: I, paidBySource?: boolean): Slot<I> =>
    slot(role, model, inputs, pulsesFromSource, paidBySource);
  const rect = design.parts.rectifier;
  const s: Slots = {
    swConduction: at('switch', conduction, conductionIn()),
    swTurnOn: at('switch', turnOn, {
      voltageV: 0, currentA: 0, frequencyHz: 0, driveV: 0, plateauV: 0, pullUpOhm: 0, gateOhm: 0, qgs2C: 0, qgdC: 0,
    }),
    swTurnOff: at('switch', turnOff, {
      voltageV: 0, currentA: 0, frequencyHz: 0, plateauV: 0, pullDownOhm: 0, gateOhm: 0, qgs2C: 0, qgdC: 0,
    }),
    swCoss: at('switch', outputCapacitance, { voltageV: 0, frequencyHz: 0, ctrlEossJ: 0, syncQossC: 0, syncEossJ: 0 }),
    swGate: at('switch', gateDrive, gateIn()),
    windingDc: at('inductor', windingDc, { irmsA: 0, dcrOhm: 0, temperatureC: 0 }),
    core: at('inductor', coreLoss, { kiWPerM3: 0, alpha: 1, beta: 2, veM3: 0, fluxPerAmpT: 0, segments: [], temperatureFactor: 1, temperatureC: 0 }),
    inputEsr: at('inputCapacitor', capacitorEsr, capIn(), true),
    outputEsr: at('outputCapacitor', capacitorEsr, capIn()),
    quiescent: at('controller', quiescent, { vinV: 0, quiescentA: 0 }),
    driver: at('controller', driverSupply, { qgTotalC: 0, supplyV: 0, frequencyHz: 0, insideFetsW: 0 }),
    all: [],
  };
  if (synchronous) {
    s.swDeadTime = at('switch', deadTime, deadIn());
    s.swRecovery = at('switch', reverseRecovery, recoveryIn());
    s.rectConduction = at('rectifier', conduction, conductionIn());
    s.rectGate = at('rectifier', gateDrive, gateIn());
    s.rectDeadTime = at('rectifier', deadTime, deadIn());
  } else {
    if (rect.kind === 'diode' && rect.technology === 'schottky') {
      s.swJunction = at('switch', junctionCapacitance, { cjF: 0, voltageV: 0, frequencyHz: 0 });
    } else {
      s.swRecovery = at('switch', reverseRecovery, recoveryIn());
    }
    const curves = rect.kind === 'diode' ? rect.vfCurves?.points : undefined;
    s.diodeForward = at<DiodeCurveInputs>('rectifier', curves ? diodeForwardCurve : diodeForward, {
      vf0V: 0, rdOhm: 0, iavgA: 0, irmsA: 0, temperatureC: 0, vfCurves: curves, segments: [], periodS: 0, fraction: 0,
    });
    s.diodeLeakage = at('rectifier', reverseLeakage, {
      leakageA: 0, reverseV: 0, reverseFraction: 0, idleV: 0, idleFraction: 0, temperatureC: 0,
    });
  }
  if (design.parts.inductor.acWinding.kind !== 'none') {
    s.windingAc = at('inductor', windingAc, { acRmsA: 0, dcrOhm: 0, factor: 1, temperatureC: 0 });
  }
  if (design.parts.senseResistor) s.sense = at('senseResistor', senseResistor, { irmsA: 0, resistanceOhm: 0, temperatureC: 0 });
  const order = [
    s.swConduction, s.swTurnOn, s.swTurnOff, s.swCoss, s.swDeadTime, s.swRecovery, s.swJunction, s.swGate,
    s.rectConduction, s.diodeForward, s.rectDeadTime, s.diodeLeakage, s.rectGate,
    s.windingDc, s.windingAc, s.core, s.inputEsr, s.outputEsr, s.sense, s.quiescent, s.driver,
  ];
  for (const x of order) if (x !== undefined) s.all.push(x as Slot<unknown>);
  return s;
}

/**
 * Sets `watts` of every slot but the driver (whose input needs the FETs' gate shares first): of the slots
 * that are not the source's when `path`, of the source's (`source` true) when `source`. The duty balance
 * reads only the first (kernel.ts fillPathLosses); the second follow once at the duty kept (completeLosses).
 * One call site per slot on purpose: each site always calls the same model, so the engine can inline
 * it (a shared call site sees every model, and each of its results would be boxed on the heap); three
 * small functions rather than one, so that each has room to inline its models.
 */
export function slotWatts(s: Slots, path = true, source = true): void {
  switchWatts(s, path, source);
  rectifierWatts(s, path, source);
  passiveWatts(s, path, source);
}

function switchWatts(s: Slots, path: boolean, source: boolean): void {
  const x = s.swConduction;
  if (x.source ? source : path) x.watts = x.model.watts(x.inputs);
  const on = s.swTurnOn;
  if (on.source ? source : path) on.watts = on.model.watts(on.inputs);
  const off = s.swTurnOff;
  if (off.source ? source : path) off.watts = off.model.watts(off.inputs);
  const coss = s.swCoss;
  if (coss.source ? source : path) coss.watts = coss.model.watts(coss.inputs);
  const a = s.swDeadTime;
  if (a && (a.source ? source : path)) a.watts = a.model.watts(a.inputs);
  const b = s.swRecovery;
  if (b && (b.source ? source : path)) b.watts = b.model.watts(b.inputs);
  const c = s.swJunction;
  if (c && (c.source ? source : path)) c.watts = c.model.watts(c.inputs);
  const g = s.swGate;
  if (g.source ? source : path) g.watts = g.model.watts(g.inputs);
}

function rectifierWatts(s: Slots, path: boolean, source: boolean): void {
  const d = s.rectConduction;
  if (d && (d.source ? source : path)) d.watts = d.model.watts(d.inputs);
  const e = s.diodeForward;
  if (e && (e.source ? source : path)) e.watts = e.model.watts(e.inputs);
  const f = s.rectDeadTime;
  if (f && (f.source ? source : path)) f.watts = f.model.watts(f.inputs);
  const g = s.diodeLeakage;
  if (g && (g.source ? source : path)) g.watts = g.model.watts(g.inputs);
  const h = s.rectGate;
  if (h && (h.source ? source : path)) h.watts = h.model.watts(h.inputs);
}

function passiveWatts(s: Slots, path: boolean, source: boolean): void {
  const dc = s.windingDc;
  if (dc.source ? source : path) dc.watts = dc.model.watts(dc.inputs);
  const w = s.windingAc;
  if (w && (w.source ? source : path)) w.watts = w.model.watts(w.inputs);
  const k = s.core;
  if (k.source ? source : path) k.watts = k.model.watts(k.inputs);
  const ci = s.inputEsr;
  if (ci.source ? source : path) ci.watts = ci.model.watts(ci.inputs);
  const co = s.outputEsr;
  if (co.source ? source : path) co.watts = co.model.watts(co.inputs);
  const r = s.sense;
  if (r && (r.source ? source : path)) r.watts = r.model.watts(r.inputs);
  const q = s.quiescent;
  if (q.source ? source : path) q.watts = q.model.watts(q.inputs);
}
