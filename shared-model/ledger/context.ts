/**
 * The evaluation context of one design, in two parts:
 *   DesignSetup — read-only, depends on the design only: topology record, thermal network, loss slots
 *     (which mechanisms, on which node, who pays), Qgs2 estimate, core coefficients, runaway ceilings;
 *   Workspace — typed per-evaluation values and reused records: the conditions' Vin and fs, the
 *     electro-thermal loop's work records, the outputs of the last kernel fill, the loop and the sweep's
 *     lean records (made on first use).
 * Built once per design, reused for any number of conditions (ledgerEvaluator).
 */
import type { Design } from '../design/schema.ts';
import type { ConductionParameters } from '../operating-point/types.ts';
import { newLeanPoint, type LeanPoint, type PointSummary } from '../operating-point/lean-point.ts';
import { newRippleSquares, type RippleSquares } from './ripple-squares.ts';
import { newShape, type Shape } from '../operating-point/shape.ts';
import { conductionParametersInto, type PartTempIndex } from '../operating-point/conditions.ts';
import { isSynchronous, newCircuit, type Circuit } from '../operating-point/circuit.ts';
import { esrAt } from '../physics/temperature-laws.ts';
import { qgs2Of, type Qgs2Source } from '../losses/gate-charge.ts';
import { coreCoefficients } from '../losses/steinmetz.ts';
import { DOWELL_SCRATCH } from '../losses/dowell.ts';
import { designNetwork, type DesignNetwork } from '../thermal/from-design.ts';
import { RUNAWAY_BAND_K, ThermalWork } from '../thermal/fixed-point.ts';
import { slotsOf, type Slots } from './slots.ts';
import type { TouchPick } from './hazards.ts';
import type { Loop } from './joint-loop.ts';
import type { LeanRecords } from './lean-evaluate.ts';
import { topologyOf } from '../topology/registry.ts';
import type { ConverterTopology } from '../topology/types.ts';
import type { PulseSkipping } from '../light-load/pulse-skipping.ts';

const NO_SCRATCH = new Float64Array(0);

/** What depends on the design only: set once, never written during an evaluation. */
export interface DesignSetup {
  readonly design: Design;
  readonly synchronous: boolean;
  /** The design's topology record. */
  readonly topology: ConverterTopology;
  readonly net: DesignNetwork;
  /** Runaway ceiling of each node (limit + RUNAWAY_BAND_K), °C. */
  readonly ceilingC: Float64Array;
  /** The design's loss slots (the set is fixed; each slot's input record and watts are the kernel's to fill). */
  readonly slots: Slots;
  /** Thermal node of each slot in slots.all. */
  readonly slotNode: Int32Array;
  /** Node of each temperature the conduction parameters read (the sense resistor's, or the controller's without one). */
  readonly tempIndex: PartTempIndex;
  readonly qgs2: { readonly qgs2C: number; readonly source: Qgs2Source };
  readonly core: { readonly k: number; readonly alpha: number; readonly beta: number; readonly ki: number };
}

/** Per-evaluation values, reused work records and the kernel's outputs (typed; no untyped slots). */
export interface Workspace {
  /** The conditions of the evaluation in progress (fs: the pulse rate while pulses skip). */
  frequencyHz: number;
  vinV: number;
  /** The evaluation's pulse-skipping state (null: the design does not skip pulses at this point). */
  pulseSkipping: PulseSkipping | null;
  /** Dowell scratch (empty without a layered winding). */
  scratch: Float64Array;
  /** Reused record of the slope parts of the branch mean squares. */
  ripple: RippleSquares;
  /** Work records of the electro-thermal loop, reused across evaluations of this context. */
  work: LoopWork;
  /** Outputs of the last fill. */
  nodePowerW: Float64Array;
  pathLossW: number;
  sourceLossW: number;
  /** The part of pathLossW the volt-second drops do not carry (slots.ts `drop`). */
  offDropLossW: number;
  /** The slope part of the resistive conduction losses at the last fill, W (kernel.ts), before clipping. */
  slopeLossW: number;
  /** The final point of the last evaluation: the solver's record, or the lean summary in a sweep. */
  op: PointSummary | undefined;
  /** The context's electro-thermal loop (joint-loop.ts), made on first use. */
  loop: Loop | undefined;
  /** The sweep's reused records (lean-evaluate.ts), made on first use. */
  leanRecords: LeanRecords | undefined;
  /** The touch-limit row of each touchable part (hazards.ts), made on first use. */
  touchPicks: TouchPick[] | undefined;
}

/** A design's set-up and its workspace (one object: the hot loop reads both without an indirection). */
export interface LedgerContext extends DesignSetup, Workspace {}

/**
 * Work records reused by every evaluation of one context (nothing here outlives it, and no record handed
 * to a caller refers to them, except the lean sweep records of lean-evaluate.ts, valid until the next call).
 */
export interface LoopWork {
  shape: Shape;
  probe: Shape;
  lean: LeanPoint;
  /** The final point of a sweep evaluation, filled as the record would be (operating-point/lean-point.ts); made on first use. */
  summary: LeanPoint | undefined;
  ambient: Float64Array;
  cp: ConductionParameters;
  circuit: Circuit;
  thermal: ThermalWork;
}

const newConduction = (): ConductionParameters => ({
  switchOnOhm: 0, rectifierOnOhm: 0, diodeVf0V: 0, diodeRdOhm: 0, inductorDcrOhm: 0, senseOhm: 0, outputCapacitorEsrOhm: 0,
});

/**
 * The design-dependent part of an evaluation (network, slots, coefficients), reusable for many conditions
 * of the same, unchanged design; vinV and frequencyHz are set per evaluation.
 */
export function ledgerContext(design: Design, vinV = design.spec.vinNomV, frequencyHz = design.spec.switchingFrequencyHz): LedgerContext {
  const synchronous = isSynchronous(design);
  const net = designNetwork(design);
  const slots = slotsOf(design, synchronous);
  const slotNode = new Int32Array(slots.all.length);
  for (let i = 0; i < slots.all.length; i++) slotNode[i] = net.index[slots.all[i]!.role];
  const ceilingC = new Float64Array(net.nodes.length);
  for (let i = 0; i < net.nodes.length; i++) ceilingC[i] = net.nodes[i]!.limitC + RUNAWAY_BAND_K;
  return {
    design,
    synchronous,
    topology: topologyOf(design),
    frequencyHz,
    pulseSkipping: null,
    vinV,
    net,
    ceilingC,
    slots,
    slotNode,
    tempIndex: {
      switch: net.index.switch,
      rectifier: net.index.rectifier,
      inductor: net.index.inductor,
      sense: net.index.senseResistor >= 0 ? net.index.senseResistor : net.index.controller,
    },
    qgs2: qgs2Of(design.parts.switch, design.parts.controller.driveV),
    core: coreCoefficients(design.parts.inductor.coreLoss),
    // Allocated only for a layered (Dowell) winding: a typed array this size costs a separate buffer.
    scratch: design.parts.inductor.acWinding.kind === 'dowell' ? new Float64Array(DOWELL_SCRATCH) : NO_SCRATCH,
    ripple: newRippleSquares(),
    work: {
      shape: newShape(),
      probe: newShape(),
      lean: newLeanPoint(),
      summary: undefined,
      ambient: new Float64Array(net.nodes.length),
      cp: newConduction(),
      circuit: newCircuit(),
      thermal: new ThermalWork(net.network.size, net.network.sinkKPerW.length),
    },
    nodePowerW: new Float64Array(net.nodes.length),
    pathLossW: 0,
    sourceLossW: 0,
    offDropLossW: 0,
    slopeLossW: 0,
    op: undefined,
    loop: undefined,
    leanRecords: undefined,
    touchPicks: undefined,
  };
}

/** Conduction parameters of the design at node temperatures T (the output bank's ESR at its temperature). */
export function conductionAt(ctx: LedgerContext, T: Float64Array): ConductionParameters {
  return conductionInto(ctx, T, newConduction());
}

/** conductionAt written into `out` (one of the context's reused records); returns out. */
export function conductionInto(ctx: LedgerContext, T: Float64Array, out: ConductionParameters): ConductionParameters {
  const p = ctx.design.parts;
  conductionParametersInto(ctx.design, T, ctx.tempIndex, out);
  out.outputCapacitorEsrOhm = esrAt(p.outputCapacitor.part, T[ctx.net.index.outputCapacitor]!) / p.outputCapacitor.count;
  return out;
}
