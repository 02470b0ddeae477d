/**
 * Puts another part into one role of a design (any role), returning a new design and leaving the
 * original untouched. A rectifier may change kind: a diode makes the design diode-rectified, a MOSFET
 * makes it synchronous. Capacitor roles keep their count. A part that cannot fill the role is refused
 * with a problem naming the field, the value and what is allowed.
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import { ROLES } from '../design/schema.ts';
import type { OptionProblem } from '../sweep/types.ts';

/** The part kinds each role accepts. */
export const ROLE_KINDS: Readonly<Record<Role, readonly Part['kind'][]>> = {
  switch: ['mosfet'],
  rectifier: ['diode', 'mosfet'],
  inductor: ['inductor'],
  inputCapacitor: ['capacitor'],
  outputCapacitor: ['capacitor'],
  senseResistor: ['resistor'],
  controller: ['controller'],
};

export type Substitution = { ok: true; design: Design } | { ok: false; problem: OptionProblem };

/** The part now in a role of the design (undefined for an absent sense resistor). */
export function partInRole(design: Design, role: Role): Part | undefined {
  const p = design.parts;
  switch (role) {
    case 'inputCapacitor':
      return p.inputCapacitor.part;
    case 'outputCapacitor':
      return p.outputCapacitor.part;
    default:
      return p[role];
  }
}

export function substitutePart(design: Design, role: Role, part: Part): Substitution {
  if (!(ROLES as readonly string[]).includes(role)) {
    return { ok: false, problem: { path: 'role', value: role, allowed: ROLES.join(', '), message: `Unknown role "${String(role)}"; the roles are ${ROLES.join(', ')}.` } };
  }
  const kinds = ROLE_KINDS[role];
  if (!kinds.includes(part.kind)) {
    return {
      ok: false,
      problem: {
        path: `parts.${role}`,
        value: `${part.id} (${part.kind})`,
        allowed: kinds.join(' or '),
        message: `Part "${part.id}" is a ${part.kind}; the ${role} role takes a ${kinds.join(' or a ')}.`,
      },
    };
  }
  if (role === 'senseResistor' && design.topology.senseLocation === 'none') {
    return {
      ok: false,
      problem: {
        path: 'topology.senseLocation',
        value: 'none',
        allowed: 'input, switch, inductor or output',
        message: 'The design has no current-sense resistor (topology.senseLocation is "none"), so there is nothing to replace.',
      },
    };
  }
  const parts = { ...design.parts };
  let topology = design.topology;
  switch (role) {
    case 'inputCapacitor':
    case 'outputCapacitor':
      parts[role] = { ...design.parts[role], part: part as Extract<Part, { kind: 'capacitor' }> };
      break;
    case 'rectifier': {
      const rectifier = part as Extract<Part, { kind: 'diode' | 'mosfet' }>;
      parts.rectifier = rectifier;
      const kind = rectifier.kind === 'diode' ? 'diode' : 'synchronous';
      if (kind !== topology.rectifier) topology = { ...topology, rectifier: kind };
      break;
    }
    case 'switch':
      parts.switch = part as Extract<Part, { kind: 'mosfet' }>;
      break;
    case 'inductor':
      parts.inductor = part as Extract<Part, { kind: 'inductor' }>;
      break;
    case 'senseResistor':
      parts.senseResistor = part as Extract<Part, { kind: 'resistor' }>;
      break;
    case 'controller':
      parts.controller = part as Extract<Part, { kind: 'controller' }>;
      break;
  }
  return { ok: true, design: { ...design, topology, parts } };
}
