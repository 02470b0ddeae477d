/** Field descriptions of the design-level sections (specification, topology, margins). */
import { CONTACT_LABELS, contactSchema, TOPOLOGIES } from '../../shared-model/index.ts';
import { num, type ChoiceSpec, type FieldSpec } from './field-spec.ts';

export const IDENTITY_FIELDS: FieldSpec[] = [
  { type: 'text', key: 'name', label: 'Design name' },
  { type: 'text', key: 'project', label: 'Project', optional: true },
  { type: 'text', key: 'revision', label: 'Revision' },
  { type: 'text', key: 'author', label: 'Author' },
  { type: 'text', key: 'notes', label: 'Notes', multiline: true },
];

export const SPEC_FIELDS: FieldSpec[] = [
  num('vinMinV', 'Input voltage, lowest', 'V'),
  num('vinNomV', 'Input voltage, nominal', 'V'),
  num('vinMaxV', 'Input voltage, highest', 'V'),
  num('voutV', 'Output voltage', 'V'),
  num('ratedLoadA', 'Rated load current', 'A'),
  num('switchingFrequencyHz', 'Switching frequency', 'Hz'),
  num('ambientC', 'Ambient temperature', '°C'),
  num('maxDuty', 'Largest duty cycle', '', { help: 'A fraction below 1 ("0.9" or "90 %").' }),
];

export const LOAD_KIND_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'loadKind',
  label: 'The load is',
  options: [
    { value: 'constant-current', label: 'A constant current' },
    { value: 'resistive', label: 'A resistor (Vout / load current)' },
    { value: 'constant-power', label: 'A constant power (Vout × load current)' },
  ],
};

/** What the load-kind choice means, shown under it. */
export const LOAD_KIND_HELP =
  'Sets how the output ripple current divides between the output capacitors and the load: a resistor takes a share, a constant-power load pushes more into the capacitors.';

export const TARGET_FIELDS: FieldSpec[] = [
  num('efficiencyAtRated', 'Efficiency at rated load', '', { optional: true, help: 'Checked at nominal input and rated load (Results → Sizing and checks); the Monte Carlo counts the samples that meet it.' }),
  num('outputRippleV', 'Output ripple, peak to peak', 'V', { optional: true, help: 'Sizes the output capacitors and is checked at every input-voltage corner (Results → Sizing and checks).' }),
  num('inductorRippleRatio', 'Inductor ripple / rated current', '', { optional: true, help: 'Sizes the inductor and is checked at every input-voltage corner (empty: 0.3, common practice; Results → Sizing and checks).' }),
];

export const KIND_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'kind',
  label: 'Converter',
  // One option per topology record, named by the record (shared-model/topology/).
  options: Object.values(TOPOLOGIES).map((t) => ({ value: t.kind, label: `${t.title[0]!.toUpperCase()}${t.title.slice(1)}` })),
};

export const RECTIFIER_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'rectifier',
  label: 'Rectifier',
  options: [
    { value: 'diode', label: 'Diode' },
    { value: 'synchronous', label: 'Synchronous MOSFET' },
  ],
};

export const LIGHT_LOAD_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'lightLoad',
  label: 'At light load',
  options: [
    { value: 'forced-pwm', label: 'Keep switching (current may reverse)' },
    { value: 'diode-emulation', label: 'Stop the rectifier at zero current (DCM)' },
    { value: 'pulse-skipping', label: 'Pulse skipping (PFM): pulses at a minimum peak current' },
  ],
};

export const PULSE_SKIPPING_FIELDS: FieldSpec[] = [
  num('minPeakCurrentA', 'Minimum peak current of a pulse', 'A'),
  num('sleepCurrentA', 'Controller current while asleep', 'A'),
];

export const SENSE_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'senseLocation',
  label: 'Current-sense resistor',
  options: [
    { value: 'none', label: 'None' },
    { value: 'input', label: 'In the input line' },
    { value: 'switch', label: 'In series with the switch' },
    { value: 'inductor', label: 'In series with the inductor' },
    { value: 'output', label: 'In the output line' },
  ],
};

export const DEAD_TIME_FIELDS: FieldSpec[] = [
  num('deadTimeBeforeOnS', 'Dead time before switch turn-on', 's'),
  num('deadTimeAfterOffS', 'Dead time after switch turn-off', 's'),
];

export const MARGIN_FIELDS: FieldSpec[] = [
  num('temperatureMarginK', 'Keep below each temperature limit by', 'K'),
  num('rippleCurrentDerating', 'Usable share of capacitor ripple rating', ''),
  num('resistorPowerDerating', 'Usable share of resistor power rating', ''),
  num('voltageDerating', 'Usable share of voltage ratings', ''),
  num('requiredLifeHours', 'Required capacitor life', 'h', { optional: true }),
];

export const SURFACE_OPTIONS = [
  { value: 'metal', label: 'bare metal' },
  { value: 'glass', label: 'glass or ceramic' },
  { value: 'plastic', label: 'plastic' },
] as const;

/** Says which limit the chosen contact brings (the report repeats it beside each touch check). */
export const CONTACT_HELP =
  'Each touchable surface is checked against the strictest row of the touch-limit table for this contact and its material.';

export const CONTACT_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'contact',
  label: 'How a person may touch it',
  // The engine's wording, also printed in the report: the label says what the applied limit is for.
  options: contactSchema.options.map((value) => ({ value, label: CONTACT_LABELS[value] })),
};
