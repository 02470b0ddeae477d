/**
 * Plain-English names the report prints for the engine's keys: part roles, thermal paths, contact
 * assumptions, rating checks. Wording only; no numbers.
 */
import type { Contact, Design, Role } from '../design/schema.ts';
import type { RatingCheck } from '../ledger/types.ts';

/** Each part role in words: the one table the editor, the results, the report and the command line use. */
export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  switch: 'Control switch',
  rectifier: 'Rectifier',
  inductor: 'Inductor',
  inputCapacitor: 'Input capacitors',
  outputCapacitor: 'Output capacitors',
  senseResistor: 'Current-sense resistor',
  controller: 'Controller and gate driver',
};

export function roleLabel(role: string): string {
  return (ROLE_LABELS as Record<string, string>)[role] ?? role;
}

/**
 * Each contact assumption in words, as the editor offers it and the report states it: the wording of the
 * touch-limit rows chosen for it (hazards/touch-limits.ts), so the label and the limit applied say the same.
 */
export const CONTACT_LABELS: Readonly<Record<Contact, string>> = {
  brief: 'held or touched for short periods',
  held: 'held continuously in normal use',
  'surface-1min': 'skin contact up to 1 minute',
  'surface-10min': 'skin contact up to 10 minutes',
  'surface-8h': 'skin contact up to 8 hours',
};

export const CHECK_LABELS: Readonly<Record<RatingCheck['check'], string>> = {
  temperature: 'Temperature',
  saturation: 'Saturation current',
  voltage: 'Voltage',
  current: 'Current',
  'ripple-current': 'Ripple current',
  'resistor-power': 'Resistor power',
  'capacitor-life': 'Capacitor life',
};

/** The thermal path of a part in words: "θJA 40 K/W", "rise 30 K at 1 W", "heatsink Case wall". */
export function describePath(design: Design, role: Role): string {
  const path = design.thermal.paths[role];
  if (!path) return 'not given';
  switch (path.kind) {
    case 'direct':
      return `direct to ambient, θJA ${path.thetaJaKPerW} K/W${path.psiJtKPerW === undefined ? '' : `, ψJT ${path.psiJtKPerW} K/W`}`;
    case 'rise':
      return `stated rise ${path.riseK} K at ${path.atW} W`;
    case 'heatsink': {
      const sink = design.thermal.heatsinks.find((h) => h.id === path.heatsinkId);
      return `heatsink "${sink?.name ?? path.heatsinkId}", θCS ${path.thetaCsKPerW} K/W${sink ? `, θSA ${sink.thetaSaKPerW} K/W` : ''}`;
    }
  }
}
