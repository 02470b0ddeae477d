/**
 * The shape every loss mechanism shares: a record of numbers in, watts out.
 *
 * A `LossModel<I>` names its mechanism and its formula (plain text), computes watts from an input record
 * `I` (SI units, temperatures in °C), and lists the inputs it used so a reviewer can redo the arithmetic.
 * The electro-thermal loop calls `watts` many times on reused input records (no allocation); the ledger
 * record (`LossTerm`) is built once at the end with `lossTerm`.
 *
 * Every model returns a finite number ≥ 0 for any finite input (guards below); it never throws.
 */
import type { Role } from '../design/schema.ts';
import type { LossInput, LossTerm, Mechanism } from '../ledger/types.ts';

/**
 * Who pays a loss (ledger/slots.ts):
 *   'path'        — it takes volt-seconds from the inductor, so the power balance moves the duty;
 *   'source'      — paid by the source at an unchanged duty (controller, gate drive, the ripple's losses);
 *   'switch-node' — a charge pulse at the switch node: paid by the source where the topology record says
 *                   the pulses bypass the inductor (buck), else it takes volt-seconds (boost).
 */
export type LossPayer = 'path' | 'source' | 'switch-node';

export interface LossModel<I> {
  mechanism: Mechanism;
  /** The thermal node the heat goes to: 'own' — the part the mechanism is applied to — or a fixed part. */
  heats: 'own' | 'switch' | 'controller';
  payer: LossPayer;
  /** The watts depend on the part's temperature (RDS(on), VF0, leakage, DCR, ESR, R). */
  thermal: boolean;
  /** On the path, its interval-mean part is a drop of the volt-second equation (operating-point/circuit.ts). */
  drop: boolean;
  /** Short formula in plain text, as it appears in the ledger. */
  formula: string;
  watts(inputs: I): number;
  /**
   * Thermal models only: ∂watts/∂(the one input that follows the part's temperature — RDS(on), Vf0, IR,
   * DCR, ESR or R — with the others held), finite and ≥ 0. The electro-thermal loop multiplies it by that
   * law's exact slope (physics/temperature-slopes.ts) to get ∂P/∂T (ledger/kernel-slopes.ts).
   */
  sensitivity?(inputs: I): number;
  /** The inputs (and derived intermediate values) the formula used, in SI units. */
  describe(inputs: I): LossInput[];
}

/** One entry of a model's input list. */
export function input(name: string, value: number, unit: string): LossInput {
  return { name, value, unit };
}

/** Builds the ledger record of one mechanism of one part. */
export function lossTerm<I>(model: LossModel<I>, part: Role, partName: string, inputs: I): LossTerm {
  return {
    part,
    partName,
    mechanism: model.mechanism,
    watts: model.watts(inputs),
    formula: model.formula,
    inputs: model.describe(inputs),
  };
}

/** A finite, non-negative number: NaN and ±Infinity become 0, negatives become 0. */
export function nonNegativeFinite(x: number): number {
  return x > 0 && x < Infinity ? x : 0;
}

/** a / b, or 0 when the quotient is not finite (b = 0, overflow). */
export function safeRatio(a: number, b: number): number {
  const q = a / b;
  return Number.isFinite(q) ? q : 0;
}
