/**
 * The on-screen label of every design-document field: the one table the editor draws its fields with
 * (src-renderer/editor/design-fields.ts, thermal-fields.ts take their labels from here), the validator
 * names fields by (validate.ts, labelled-problems.ts) and the command line names its options by
 * (an option that stands for a design field or an operating condition). Part fields are named by the
 * part-field words of part-import/field-labels.ts (FIELD_WORDS), behind the role's label.
 * Paths are the validator's dotted paths ("spec.voutV", "thermal.heatsinks[1].thetaSaKPerW").
 */
import { FIELD_WORDS } from '../part-import/field-labels.ts';
import { ROLE_LABELS } from '../report/labels.ts';
import type { Role } from './schema.ts';
import { ROLES } from './schema.ts';
import { valueAt } from './problems.ts';

export const IDENTITY_LABELS = {
  name: 'Design name',
  project: 'Project',
  revision: 'Revision',
  author: 'Author',
  notes: 'Notes',
} as const;

export const SPEC_LABELS = {
  vinMinV: 'Input voltage, lowest',
  vinNomV: 'Input voltage, nominal',
  vinMaxV: 'Input voltage, highest',
  voutV: 'Output voltage',
  ratedLoadA: 'Rated load current',
  loadKind: 'The load is',
  switchingFrequencyHz: 'Switching frequency',
  ambientC: 'Ambient temperature',
  maxDuty: 'Largest duty cycle',
} as const;

export const TARGET_LABELS = {
  efficiencyAtRated: 'Efficiency at rated load',
  efficiencyAtLightLoad: 'Efficiency at light load',
  outputRippleV: 'Output ripple, peak to peak',
  inductorRippleRatio: 'Inductor ripple / rated current',
} as const;

export const TOPOLOGY_LABELS = {
  kind: 'Converter',
  rectifier: 'Rectifier',
  lightLoad: 'At light load',
  senseLocation: 'Current-sense resistor',
  deadTimeBeforeOnS: 'Dead time before switch turn-on',
  deadTimeAfterOffS: 'Dead time after switch turn-off',
  phases: 'Interleaved phases',
  phaseMismatch: 'Current-sharing mismatch',
  phaseShedding: 'Shed phases at light load',
} as const;

export const PHASE_SHEDDING_LABELS = {
  hysteresisFraction: 'Shedding hysteresis, share of the crossover load',
} as const;

export const PULSE_SKIPPING_LABELS = {
  minPeakCurrentA: 'Minimum peak current of a pulse',
  sleepCurrentA: 'Controller current while asleep',
} as const;

export const MARGIN_LABELS = {
  temperatureMarginK: 'Keep below each temperature limit by',
  rippleCurrentDerating: 'Usable share of capacitor ripple rating',
  resistorPowerDerating: 'Usable share of resistor power rating',
  voltageDerating: 'Usable share of voltage ratings',
  currentDerating: 'Usable share of current ratings',
  requiredLifeHours: 'Required capacitor life',
} as const;

export const THERMAL_PATH_LABELS = {
  kind: 'Thermal path',
  thetaJaKPerW: 'θJA',
  psiJtKPerW: 'ΨJT (junction to case top)',
  riseK: 'Rise',
  atW: 'At dissipation',
  heatsinkId: 'Heatsink',
  thetaCsKPerW: 'θCS (interface)',
} as const;

export const HEATSINK_LABELS = {
  name: 'Name',
  thetaSaKPerW: 'θSA (sink to ambient)',
  surface: 'Surface',
} as const;

export const CONTACT_LABEL = 'How a person may touch it';

/** The mission profile's own fields (the editor's "Mission profile" section). */
export const MISSION_LABELS = {
  name: 'Profile name',
  hoursPerDay: 'Hours of use per day',
  batteryWh: 'Battery capacity',
} as const;

/** The columns of the mission profile's table. */
export const MISSION_ROW_LABELS = {
  label: 'Doing',
  vinV: 'Vin',
  loadA: 'Load',
  ambientC: 'Ambient',
  fraction: 'Share of time',
} as const;

/** "Mission profile row 2 — Share of time"; `rows` alone is the column of shares (their sum). */
function missionLabel(rest: readonly (string | number)[]): string | undefined {
  if (rest.length === 0) return 'Mission profile';
  const [key, index, field] = rest;
  if (key === 'rows') {
    if (index === undefined) return `Mission profile — ${MISSION_ROW_LABELS.fraction}`;
    if (typeof index !== 'number') return undefined;
    if (field === undefined) return `Mission profile row ${index + 1}`;
    const column = own(MISSION_ROW_LABELS, field);
    return column === undefined ? undefined : `Mission profile row ${index + 1} — ${column}`;
  }
  const label = rest.length === 1 ? own(MISSION_LABELS, key) : undefined;
  return label === undefined ? undefined : `Mission profile — ${label}`;
}

/** The operating conditions as the results show them (and the command-line options that set them). */
export const CONDITION_LABELS = {
  vinV: 'Input voltage',
  loadA: 'Load current',
  switchingFrequencyHz: 'Switching frequency',
  ambientC: 'Ambient temperature',
} as const;

/** "thermal.heatsinks[1].id" → ["thermal", "heatsinks", 1, "id"]. */
export function pathKeys(path: string): (string | number)[] {
  const out: (string | number)[] = [];
  for (const match of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) out.push(match[2] !== undefined ? Number(match[2]) : match[1]!);
  return out;
}

const isRole = (key: unknown): key is Role => typeof key === 'string' && (ROLES as readonly string[]).includes(key);

const own = <T extends object>(table: T, key: unknown): string | undefined =>
  typeof key === 'string' && Object.hasOwn(table, key) ? (table as Record<string, string>)[key] : undefined;

/** The label of a field inside a part ("rdsTemperatureLaw.alphaPerK"), list indices ignored. */
function partFieldLabel(keys: readonly (string | number)[]): string | undefined {
  const names = keys.filter((k): k is string => typeof k === 'string');
  for (let n = names.length; n > 0; n -= 1) {
    const words = FIELD_WORDS[names.slice(0, n).join('.')];
    if (words) return words.label;
  }
  return undefined;
}

function partLabel(role: Role, rest: readonly (string | number)[]): string | undefined {
  const banked = role === 'inputCapacitor' || role === 'outputCapacitor';
  if (banked && rest[0] === 'count') return `${ROLE_LABELS[role]} — Number in parallel`;
  const keys = banked ? (rest[0] === 'part' ? rest.slice(1) : undefined) : rest;
  if (rest.length === 0) return ROLE_LABELS[role];
  if (keys === undefined) return undefined;
  if (keys.length === 0) return ROLE_LABELS[role];
  const field = partFieldLabel(keys);
  return field === undefined ? undefined : `${ROLE_LABELS[role]} — ${field}`;
}

function thermalLabel(doc: unknown, rest: readonly (string | number)[]): string | undefined {
  const [group, which, ...keys] = rest;
  if (group === 'paths' && isRole(which)) {
    if (keys.length === 0) return `Thermal path — ${ROLE_LABELS[which]}`;
    const field = own(THERMAL_PATH_LABELS, keys[0]);
    return field === undefined ? undefined : `Thermal path of the ${ROLE_LABELS[which].toLowerCase()} — ${field}`;
  }
  if (group === 'heatsinks' && typeof which === 'number') {
    const name = valueAt(doc, ['thermal', 'heatsinks', which, 'name']);
    const sink = `Heatsink “${typeof name === 'string' && name !== '' ? name : which + 1}”`;
    if (keys.length === 0) return sink;
    const field = own(HEATSINK_LABELS, keys[0]);
    return field === undefined ? undefined : `${sink} — ${field}`;
  }
  if (group === 'touch' && isRole(which)) return `Touch — ${ROLE_LABELS[which]}`;
  if (group === 'contact') return CONTACT_LABEL;
  return undefined;
}

/**
 * The on-screen label of a design-document path, or undefined where the editor shows no field for it.
 * `doc` is the document the path is in (a heatsink is named by its name there).
 */
export function designFieldLabel(path: string, doc: unknown): string | undefined {
  const [root, ...rest] = pathKeys(path);
  switch (root) {
    case 'spec':
      if (rest[0] === 'targets') {
        const target = own(TARGET_LABELS, rest[1]);
        return target === undefined ? undefined : `Target — ${target}`;
      }
      return rest.length === 1 ? own(SPEC_LABELS, rest[0]) : undefined;
    case 'topology':
      if (rest[0] === 'pulseSkipping') return rest.length === 2 ? own(PULSE_SKIPPING_LABELS, rest[1]) : 'Pulse skipping';
      if (rest[0] === 'phaseShedding') return rest.length === 2 ? own(PHASE_SHEDDING_LABELS, rest[1]) : TOPOLOGY_LABELS.phaseShedding;
      return rest.length === 1 ? own(TOPOLOGY_LABELS, rest[0]) : undefined;
    case 'parts':
      return isRole(rest[0]) ? partLabel(rest[0], rest.slice(1)) : undefined;
    case 'thermal':
      return thermalLabel(doc, rest);
    case 'margins':
      return rest.length === 1 ? own(MARGIN_LABELS, rest[0]) : undefined;
    case 'conditions':
      return rest.length === 1 ? own(CONDITION_LABELS, rest[0]) : undefined;
    case 'missionProfile':
      return missionLabel(rest);
    default:
      return rest.length === 0 ? own(IDENTITY_LABELS, root) : undefined;
  }
}
