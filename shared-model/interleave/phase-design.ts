/**
 * One power stage of an interleaved design, as a single-phase design the ledger evaluates unchanged.
 *
 * Phase k of N carries its share of the load; the stage's switch, rectifier, inductor (and a sense resistor
 * in the switch or inductor) are its own. What the phases share is composed afterwards (evaluate-phases.ts),
 * except the heatsinks: a heatsink collects the heat of every phase, Ts = Ta + θSA·ΣP, and for identical
 * phases ΣP = N·P of one phase, so the one-phase design sees θSA·N (exact for identical phases; with a
 * current-sharing mismatch it is conservative for the worst phase). Source: the shared-sink network of
 * docs/methods.md §10.
 */
import type { Design, Role } from '../design/schema.ts';

/** Phases of a design (absent: 1). */
export function phaseCount(design: Design): number {
  return design.topology.phases ?? 1;
}

/** The one-phase design of a stage among `activePhases` switching stages, rated at its share of the load. */
export function phaseDesign(design: Design, activePhases: number): Design {
  const { phases: _n, phaseMismatch: _m, phaseShedding: _s, ...topology } = design.topology;
  return {
    ...design,
    spec: { ...design.spec, ratedLoadA: design.spec.ratedLoadA / activePhases },
    topology,
    thermal: {
      ...design.thermal,
      heatsinks: design.thermal.heatsinks.map((h) => ({ ...h, thetaSaKPerW: h.thetaSaKPerW * activePhases })),
    },
  };
}

/** Roles every phase has its own copy of; the others (capacitor banks, controller, input/output sense) are shared. */
export function perPhaseRoles(design: Design): ReadonlySet<Role> {
  const roles = new Set<Role>(['switch', 'rectifier', 'inductor']);
  const where = design.topology.senseLocation;
  if (where === 'switch' || where === 'inductor') roles.add('senseResistor');
  return roles;
}

/**
 * Load of each active phase: with a sharing mismatch m the worst phase (phase 1) carries (1 + m)·I/N and
 * the other N − 1 share the rest equally; one phase carries everything.
 */
export function phaseLoads(totalA: number, activePhases: number, mismatch: number): number[] {
  if (activePhases <= 1) return [totalA];
  const worst = (totalA / activePhases) * (1 + mismatch);
  const other = (totalA - worst) / (activePhases - 1);
  return [worst, ...Array.from({ length: activePhases - 1 }, () => other)];
}
