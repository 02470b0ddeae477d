/**
 * Design edits that touch several fields at once, each recorded as one undo step: rectifier and
 * sense-resistor switches, picking a part from the library, heatsinks.
 */
import { partInRole, ROLE_LABELS, takeLibraryPart, unlinkPart, updateFromLibrary } from '../../shared-model/index.ts';
import type { Design, Heatsink, Part, Role, ThermalPath } from '../../shared-model/index.ts';
import { uniqueId } from './library-data.ts';
import { stashRemoved, withRectifier, withSenseLocation } from './topology-edits.ts';
import type { Workspace } from './workspace.svelte.ts';


/** The part kinds that may fill a role in the current design. */
export function kindForRole(design: Design, role: Role): Part['kind'] {
  switch (role) {
    case 'switch':
      return 'mosfet';
    case 'rectifier':
      return design.topology.rectifier === 'synchronous' ? 'mosfet' : 'diode';
    case 'inductor':
      return 'inductor';
    case 'inputCapacitor':
    case 'outputCapacitor':
      return 'capacitor';
    case 'senseResistor':
      return 'resistor';
    case 'controller':
      return 'controller';
  }
}

export function setRectifier(ws: Workspace, rectifier: Design['topology']['rectifier']): void {
  try {
    const { design, removed } = withRectifier(ws.doc.design, rectifier, ws.stash, ws.library.parts);
    ws.stash = stashRemoved(ws.stash, removed);
    ws.doc.commit(unlinkPart(design, 'rectifier'), rectifier === 'synchronous' ? 'Use a synchronous rectifier' : 'Use a diode rectifier');
  } catch (error) {
    ws.messages.error((error as Error).message);
  }
}

/** Starting values of pulse skipping's parameters when a design first chooses it (invented, round numbers). */
export const PULSE_SKIPPING_DEFAULTS = { minPeakCurrentA: 0.5, sleepCurrentA: 20e-6 } as const;

/** Sets the light-load behaviour; choosing pulse skipping adds its parameters when absent (one undo step). */
export function setLightLoad(ws: Workspace, lightLoad: Design['topology']['lightLoad']): void {
  const design = ws.doc.design;
  const pulseSkipping = design.topology.pulseSkipping ?? (lightLoad === 'pulse-skipping' ? { ...PULSE_SKIPPING_DEFAULTS } : undefined);
  const topology = { ...design.topology, lightLoad, ...(pulseSkipping ? { pulseSkipping } : {}) };
  ws.doc.commit({ ...design, topology }, 'Set the light-load behaviour');
}

export function setSenseLocation(ws: Workspace, location: Design['topology']['senseLocation']): void {
  try {
    const { design, removed } = withSenseLocation(ws.doc.design, location, ws.stash, ws.library.parts);
    ws.stash = stashRemoved(ws.stash, removed);
    ws.doc.commit(location === 'none' ? unlinkPart(design, 'senseResistor') : design, 'Move the current-sense resistor');
  } catch (error) {
    ws.messages.error((error as Error).message);
  }
}

/** The picker's value for part `partId` of library `libraryId` (library ids never hold "/"). */
export function choiceValue(libraryId: string, partId: string): string {
  return `${libraryId}/${partId}`;
}

/** Copies a library part into the design for `role` and links the role to it (engine takeLibraryPart); `choice` from choiceValue. */
export function usePart(ws: Workspace, role: Role, choice: string): void {
  const cut = choice.indexOf('/');
  const library = ws.library.book(choice.slice(0, cut))?.library;
  const part = library?.parts.find((p) => p.id === choice.slice(cut + 1));
  if (!library || !part) {
    ws.messages.error(`That part is not in any open part library (looked for “${choice}”).`);
    return;
  }
  const design = ws.doc.design;
  if (part.kind !== kindForRole(design, role)) {
    ws.messages.error(`${part.name} is a ${part.kind} and cannot be the ${ROLE_LABELS[role].toLowerCase()}.`);
    return;
  }
  const linked = takeLibraryPart(design, role, library, part.id);
  if (linked) ws.doc.commit(linked, `Use ${part.name} from “${library.name}” as ${ROLE_LABELS[role].toLowerCase()}`);
}

/** Replaces the linked part of `role` by its library entry's current values (one undo step). */
export function updatePartFromLibrary(ws: Workspace, role: Role): void {
  const source = ws.doc.design.sources?.[role];
  const library = source ? ws.library.book(source.libraryId)?.library : undefined;
  const updated = library ? updateFromLibrary(ws.doc.design, role, library) : undefined;
  if (!library || !updated) {
    ws.messages.error(`The ${ROLE_LABELS[role].toLowerCase()} cannot be updated: its library entry is not open.`);
    return;
  }
  ws.doc.commit(updated, `Update the ${ROLE_LABELS[role].toLowerCase()} from “${library.name}”`);
}

/** Forgets where the part of `role` came from; its values stay (one undo step). */
export function unlinkRole(ws: Workspace, role: Role): void {
  ws.doc.commit(unlinkPart(ws.doc.design, role), `Unlink the ${ROLE_LABELS[role].toLowerCase()} from its library`);
}

export function partPath(role: Role): string[] {
  return role === 'inputCapacitor' || role === 'outputCapacitor' ? ['parts', role, 'part'] : ['parts', role];
}

export function addToLibrary(ws: Workspace, role: Role): void {
  const part = partInRole(ws.doc.design, role);
  if (!part) return;
  const stored = ws.library.add(structuredClone(part));
  ws.messages.success(`Added ${stored.name} to the part library${stored.id === part.id ? '' : ` as ${stored.id}`}.`);
}

export function addHeatsink(ws: Workspace): void {
  const design = ws.doc.design;
  const id = uniqueId('sink-1', new Set(design.thermal.heatsinks.map((h) => h.id)));
  const sink: Heatsink = { id, name: `Heatsink ${design.thermal.heatsinks.length + 1}`, thetaSaKPerW: 10, surface: 'metal' };
  ws.doc.commit({ ...design, thermal: { ...design.thermal, heatsinks: [...design.thermal.heatsinks, sink] } }, 'Add a heatsink');
}

/** Roles whose thermal path leads to heatsink `id`. */
export function rolesOnHeatsink(design: Design, id: string): Role[] {
  const paths = design.thermal.paths as Partial<Record<Role, ThermalPath>>;
  return (Object.keys(paths) as Role[]).filter((role) => {
    const path = paths[role];
    return path?.kind === 'heatsink' && path.heatsinkId === id;
  });
}

export function removeHeatsink(ws: Workspace, id: string): void {
  const design = ws.doc.design;
  const users = rolesOnHeatsink(design, id);
  if (users.length > 0) {
    ws.messages.error(
      `The heatsink “${id}” still cools: ${users.map((r) => ROLE_LABELS[r].toLowerCase()).join(', ')}. Give those parts another thermal path first.`,
    );
    return;
  }
  const heatsinks = design.thermal.heatsinks.filter((h) => h.id !== id);
  ws.doc.commit({ ...design, thermal: { ...design.thermal, heatsinks } }, 'Remove a heatsink');
}
