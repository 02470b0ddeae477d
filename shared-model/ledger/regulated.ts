/**
 * Whether an evaluated point is regulated, and whether it may speak for the design.
 *
 * Regulated: the output voltage reached equals the specified output voltage (within REGULATION_RTOL,
 * relative). A point at the duty limit, past a boost's highest conversion ratio or asked to step down
 * with a boost reaches a lower Vout (operating-point/checks.ts, `cannot-regulate`): it is a real state of
 * the circuit, but not the design doing its job.
 * Usable (for the peak, knee, figures of merit, headline figures, ranking and comparison): regulated
 * and converged (a point without an electro-thermal fixed point, thermal runaway or an iteration that
 * stopped, describes no steady state).
 * The definitions are our own rule; the voltage test is the one the solver's volt-second balance uses.
 */

/** Relative tolerance within which the output counts as held at its target (far above rounding). */
const REGULATION_RTOL = 1e-6;

/** Regulated: the output reached is the target within REGULATION_RTOL. */
export function isRegulated(voutV: number, targetVoutV: number): boolean {
  return Math.abs(voutV - targetVoutV) <= REGULATION_RTOL * Math.abs(targetVoutV);
}

/** What a point needs to be judged: its own flags and the output it reached. */
export interface RegulationFlags {
  regulated: boolean;
  converged: boolean;
}

/** The point may stand for the design: regulated and converged. */
export function isUsablePoint(p: RegulationFlags): boolean {
  return p.regulated && p.converged;
}

/**
 * Why a point may not stand for the design, in one sentence (empty when it may). `voutV`/`targetVoutV`
 * name the output reached; the sentence says it in volts with four significant figures.
 */
export function unusableReason(p: RegulationFlags & { voutV: number; targetVoutV: number; loadA: number }): string {
  const at = `at ${p.loadA.toPrecision(4)} A`;
  if (!p.regulated) {
    return `not regulated ${at}: the output reaches only ${p.voutV.toPrecision(4)} V instead of ${p.targetVoutV.toPrecision(4)} V`;
  }
  if (!p.converged) return `no electro-thermal steady state ${at} (thermal runaway or an iteration that did not converge)`;
  return '';
}
