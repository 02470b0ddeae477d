/**
 * The evaluation context of one design: everything that depends on the design only (thermal network,
 * loss slots, Qgs2 estimate, core coefficients, runaway ceilings) plus the reused work records of the
 * electro-thermal loop and the outputs of the last kernel fill. Built once per design, reused for any
 * number of conditions (ledgerEvaluator); vinV and frequencyHz are set per evaluation.
 */
import type { Design } from '../design/schema.ts';
import type { ConductionParameters, OperatingPoint } from '../operating-point/types.ts';
import { newLeanPoint, type LeanPoint, type RippleSquares } from './point-view.ts';
import { newShape, type Shape } from '../operating-point/shape.ts';
import { conductionParameters } from '../operating-point/conditions.ts';
import { isSynchronous } from '../operating-point/circuit.ts';
import { esrAt } from '../physics/temperature-laws.ts';
import { qgs2Of, type Qgs2Source } from '../losses/gate-charge.ts';
import { coreCoefficients } from '../losses/steinmetz.ts';
import { DOWELL_SCRATCH } from '../losses/dowell.ts';
import { designNetwork, type DesignNetwork } from '../thermal/from-design.ts';
import { RUNAWAY_BAND_K } from '../thermal/fixed-point.ts';
import { slotsOf, type Slots } from './slots.ts';

const NO_SCRATCH = new Float64Array(0);

export interface LedgerContext {
  design: Design;
  synchronous: boolean;
  boost: boolean;
  frequencyHz: number;
  vinV: number;
  net: DesignNetwork;
  /** Runaway ceiling of each node (limit + RUNAWAY_BAND_K), °C. */
  ceilingC: Float64Array;
  slots: Slots;
  /** Thermal node of each slot in slots.all. */
  slotNode: Int32Array;
  qgs2: { qgs2C: number; source: Qgs2Source };
  core: { k: number; alpha: number; beta: number; ki: number };
  scratch: Float64Array;
  /** Reused record of the slope parts of the branch mean squares. */
  ripple: RippleSquares;
  /** Work records of the electro-thermal loop, reused across evaluations of this context. */
  work: { shape: Shape; probe: Shape; lean: LeanPoint; raised: Float64Array; base: Float64Array };
  /** Outputs of the last fill. */
  nodePowerW: Float64Array;
  pathLossW: number;
  sourceLossW: number;
  /** The solver's record of the final point (set by evaluate). */
  op: OperatingPoint | undefined;
}

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
    boost: design.topology.kind === 'boost',
    frequencyHz,
    vinV,
    net,
    ceilingC,
    slots,
    slotNode,
    qgs2: qgs2Of(design.parts.switch, design.parts.controller.driveV),
    core: coreCoefficients(design.parts.inductor.coreLoss),
    // Allocated only for a layered (Dowell) winding: a typed array this size costs a separate buffer.
    scratch: design.parts.inductor.acWinding.kind === 'dowell' ? new Float64Array(DOWELL_SCRATCH) : NO_SCRATCH,
    ripple: { switch: 0, rectifier: 0, inductor: 0, inputCapacitor: 0, outputCapacitor: 0, sense: 0 },
    work: {
      shape: newShape(),
      probe: newShape(),
      lean: newLeanPoint(),
      raised: new Float64Array(net.nodes.length),
      base: new Float64Array(net.nodes.length),
    },
    nodePowerW: new Float64Array(net.nodes.length),
    pathLossW: 0,
    sourceLossW: 0,
    op: undefined,
  };
}

/** Conduction parameters of the design at node temperatures T (the output bank's ESR at its temperature). */
export function conductionAt(ctx: LedgerContext, T: Float64Array): ConductionParameters {
  const i = ctx.net.index;
  const p = ctx.design.parts;
  const cp = conductionParameters(ctx.design, {
    switchC: T[i.switch]!,
    rectifierC: T[i.rectifier]!,
    inductorC: T[i.inductor]!,
    senseC: i.senseResistor >= 0 ? T[i.senseResistor]! : T[i.controller]!,
  });
  cp.outputCapacitorEsrOhm = esrAt(p.outputCapacitor.part, T[i.outputCapacitor]!) / p.outputCapacitor.count;
  return cp;
}
