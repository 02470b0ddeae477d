/**
 * sizeDesign: from the specification to what each part must be — inductance, capacitance, ESR, ratings,
 * duty range, slope compensation and the small-signal limits — on operating points solved with the
 * design's own losses at the corners of the input range (corners.ts), each result naming its corner.
 * The design's current parts provide the losses that set the duty; the required values are then read
 * against those parts by the design checks (checks.ts).
 * Source: docs/methods.md §23 (and the sections each file names).
 */
import type { Design } from '../design/schema.ts';
import { sizeInputCapacitor, sizeOutputCapacitor } from './capacitors.ts';
import { solveCorners, type SolvedCorner } from './corners.ts';
import { sizeDuty, sizeLoop, sizeSlope } from './control.ts';
import { sizeInductor } from './inductor.ts';
import { sizeStresses } from './stresses.ts';
import type { Sizing } from './types.ts';

export interface SizingOptions {
  /** Fraction of a current rating that may be used (default: the design's margins.currentDerating, else 0.8, common practice). */
  currentDerating?: number;
}

/** Sizes `design` from its specification (evaluates it at every corner). */
export function sizeDesign(design: Design, options?: SizingOptions): Sizing {
  return sizeFromCorners(design, solveCorners(design), options);
}

/** sizeDesign on corners already solved (the checks reuse them). */
export function sizeFromCorners(design: Design, corners: readonly SolvedCorner[], options?: SizingOptions): Sizing {
  const outputCapacitor = sizeOutputCapacitor(design, corners);
  const sizing: Sizing = {
    topology: design.topology.kind,
    corners: corners.map((c) => c.corner),
    duty: sizeDuty(design, corners),
    inductor: sizeInductor(design, corners),
    outputCapacitor,
    inputCapacitorRmsA: sizeInputCapacitor(corners),
    stresses: sizeStresses(design, corners, options?.currentDerating),
    slope: sizeSlope(design, corners),
    loop: sizeLoop(design, corners),
    notes: [],
  };
  const notes = sizing.notes;
  for (const c of corners) {
    if (c.corner.mode === 'DCM') notes.push(`${c.corner.label}: discontinuous conduction at rated load; the ripple ratio and the RHP zero assume CCM and are only indicative there.`);
    if (!c.corner.converged) notes.push(`${c.corner.label}: the electro-thermal iteration did not converge (thermal runaway); the numbers at this corner describe no steady state.`);
    if (!c.corner.regulated) notes.push(`${c.corner.label}: the design does not regulate here (duty or conversion-ratio limit); sizing there uses the point it reaches.`);
  }
  const dv = outputCapacitor.targetRippleV;
  if (dv === undefined) notes.push('No output ripple target in the specification (spec.targets.outputRippleV): output capacitance and ESR are not sized.');
  else {
    if (!outputCapacitor.capacitanceWithBankEsrF) notes.push('With the bank ESR the ESR part alone uses the whole output ripple target: no capacitance meets it; lower the ESR.');
    if (!outputCapacitor.maxEsrWithBankCapacitanceOhm) notes.push('With the bank capacitance the capacitive part alone exceeds the output ripple target: no ESR meets it; add capacitance.');
  }
  notes.push(outputCapacitor.eslNote);
  if (!sizing.slope.senseOhm) notes.push('No sense resistor in the switch or inductor path: the compensating slope is given in A/s of inductor current only.');
  return sizing;
}
