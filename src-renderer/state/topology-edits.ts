/**
 * Edits that must change more than one field to keep the document whole, each applied as one undo
 * step: switching the rectifier between a diode and a synchronous MOSFET swaps the rectifier part;
 * moving the current-sense resistor to or from "none" adds or removes the resistor and its thermal path.
 * The part set aside is kept in a stash so switching back restores the user's own part.
 */
import type { Design, Diode, Mosfet, Part, Resistor, ThermalPath } from '../../shared-model/index.ts';

export interface PartStash {
  diode?: Diode;
  mosfet?: Mosfet;
  senseResistor?: Resistor;
  sensePath?: ThermalPath;
}

/** Fallback thermal path for a sense resistor that had none: a small SMD resistor on a board. */
const DEFAULT_SENSE_PATH: ThermalPath = { kind: 'direct', thetaJaKPerW: 100 }; // common practice: order of 100 K/W for a small SMD resistor on FR-4

function firstOfKind<K extends Part['kind']>(parts: readonly Part[], kind: K): Extract<Part, { kind: K }> | undefined {
  return parts.find((p): p is Extract<Part, { kind: K }> => p.kind === kind);
}

/**
 * The design with the rectifier set to `rectifier`, and the part that was replaced (for the stash).
 * A synchronous rectifier without a MOSFET to hand gets a copy of the control switch.
 */
export function withRectifier(
  design: Design,
  rectifier: Design['topology']['rectifier'],
  stash: PartStash,
  library: readonly Part[],
): { design: Design; removed: Diode | Mosfet | null } {
  if (design.topology.rectifier === rectifier) return { design, removed: null };
  const current = design.parts.rectifier;
  let part: Diode | Mosfet;
  if (rectifier === 'synchronous') {
    part = stash.mosfet ?? firstOfKind(library, 'mosfet') ?? { ...design.parts.switch, id: `${design.parts.switch.id}-rectifier` };
  } else {
    const diode = stash.diode ?? firstOfKind(library, 'diode');
    if (!diode) throw new Error('No diode is available: add one to the part library first.');
    part = diode;
  }
  return {
    design: {
      ...design,
      topology: { ...design.topology, rectifier },
      parts: { ...design.parts, rectifier: part },
    },
    removed: current,
  };
}

/** The design with the sense resistor moved; adds one (stash, library) or removes it for "none". */
export function withSenseLocation(
  design: Design,
  location: Design['topology']['senseLocation'],
  stash: PartStash,
  library: readonly Part[],
): { design: Design; removed: { resistor: Resistor; path?: ThermalPath } | null } {
  if (design.topology.senseLocation === location) return { design, removed: null };
  const topology = { ...design.topology, senseLocation: location };
  if (location === 'none') {
    const { senseResistor, ...parts } = design.parts;
    const { senseResistor: sensePath, ...paths } = design.thermal.paths;
    return {
      design: { ...design, topology, parts, thermal: { ...design.thermal, paths } },
      removed: senseResistor ? { resistor: senseResistor, ...(sensePath ? { path: sensePath } : {}) } : null,
    };
  }
  if (design.parts.senseResistor) return { design: { ...design, topology }, removed: null };
  const resistor = stash.senseResistor ?? firstOfKind(library, 'resistor');
  if (!resistor) throw new Error('No resistor is available: add one to the part library first.');
  return {
    design: {
      ...design,
      topology,
      parts: { ...design.parts, senseResistor: resistor },
      thermal: {
        ...design.thermal,
        paths: { ...design.thermal.paths, senseResistor: design.thermal.paths.senseResistor ?? stash.sensePath ?? DEFAULT_SENSE_PATH },
      },
    },
    removed: null,
  };
}

/** Remembers a part set aside by one of the edits above. */
export function stashRemoved(stash: PartStash, removed: Diode | Mosfet | { resistor: Resistor; path?: ThermalPath } | null): PartStash {
  if (!removed) return stash;
  if ('resistor' in removed) return { ...stash, senseResistor: removed.resistor, ...(removed.path ? { sensePath: removed.path } : {}) };
  return removed.kind === 'diode' ? { ...stash, diode: removed } : { ...stash, mosfet: removed };
}
