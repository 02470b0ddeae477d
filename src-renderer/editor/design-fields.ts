/**
 * Field descriptions of the design-level sections (specification, topology, margins). Labels come from
 * the engine's one label table (shared-model design/field-labels.ts), which the validator's messages and
 * the command line use too.
 */
import {
  CONTACT_LABEL,
  CONTACT_LABELS,
  contactSchema,
  IDENTITY_LABELS,
  MARGIN_LABELS,
  PHASE_SHEDDING_LABELS,
  PULSE_SKIPPING_LABELS,
  SPEC_LABELS,
  TARGET_LABELS,
  TOPOLOGIES,
  TOPOLOGY_LABELS,
} from '../../shared-model/index.ts';
import { num, type ChoiceSpec, type FieldSpec } from './field-spec.ts';

export const IDENTITY_FIELDS: FieldSpec[] = [
  { type: 'text', key: 'name', label: IDENTITY_LABELS.name },
  { type: 'text', key: 'project', label: IDENTITY_LABELS.project, optional: true },
  { type: 'text', key: 'revision', label: IDENTITY_LABELS.revision },
  { type: 'text', key: 'author', label: IDENTITY_LABELS.author },
  { type: 'text', key: 'notes', label: IDENTITY_LABELS.notes, multiline: true },
];

export const SPEC_FIELDS: FieldSpec[] = [
  num('vinMinV', SPEC_LABELS.vinMinV, 'V'),
  num('vinNomV', SPEC_LABELS.vinNomV, 'V'),
  num('vinMaxV', SPEC_LABELS.vinMaxV, 'V'),
  num('voutV', SPEC_LABELS.voutV, 'V'),
  num('ratedLoadA', SPEC_LABELS.ratedLoadA, 'A'),
  num('switchingFrequencyHz', SPEC_LABELS.switchingFrequencyHz, 'Hz'),
  num('ambientC', SPEC_LABELS.ambientC, '°C'),
  num('maxDuty', SPEC_LABELS.maxDuty, '%', { help: 'In percent: "90" or "90 %".' }),
];

export const LOAD_KIND_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'loadKind',
  label: SPEC_LABELS.loadKind,
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
  num('efficiencyAtRated', TARGET_LABELS.efficiencyAtRated, '%', { optional: true, help: 'Checked at nominal input and rated load (Results → Sizing and checks); the Monte Carlo counts the samples that meet it.' }),
  num('efficiencyAtLightLoad', TARGET_LABELS.efficiencyAtLightLoad, '%', {
    optional: true,
    help: 'Checked at the lightest loaded row of the mission profile, else at 10 % of rated load and nominal input (Results → Sizing and checks).',
  }),
  num('outputRippleV', TARGET_LABELS.outputRippleV, 'V', { optional: true, help: 'Sizes the output capacitors and is checked at every input-voltage corner (Results → Sizing and checks).' }),
  num('inductorRippleRatio', TARGET_LABELS.inductorRippleRatio, '%', { optional: true, help: 'Sizes the inductor and is checked at every input-voltage corner (empty: 30 %, common practice; Results → Sizing and checks).' }),
];

export const KIND_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'kind',
  label: TOPOLOGY_LABELS.kind,
  // One option per topology record, named by the record (shared-model/topology/).
  options: Object.values(TOPOLOGIES).map((t) => ({ value: t.kind, label: `${t.title[0]!.toUpperCase()}${t.title.slice(1)}` })),
};

export const RECTIFIER_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'rectifier',
  label: TOPOLOGY_LABELS.rectifier,
  options: [
    { value: 'diode', label: 'Diode' },
    { value: 'synchronous', label: 'Synchronous MOSFET' },
  ],
};

export const LIGHT_LOAD_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'lightLoad',
  label: TOPOLOGY_LABELS.lightLoad,
  options: [
    { value: 'forced-pwm', label: 'Keep switching (current may reverse)' },
    { value: 'diode-emulation', label: 'Stop the rectifier at zero current (DCM)' },
    { value: 'pulse-skipping', label: 'Pulse skipping (PFM): pulses at a minimum peak current' },
  ],
};

export const PULSE_SKIPPING_FIELDS: FieldSpec[] = [
  num('minPeakCurrentA', PULSE_SKIPPING_LABELS.minPeakCurrentA, 'A'),
  num('sleepCurrentA', PULSE_SKIPPING_LABELS.sleepCurrentA, 'A'),
];

export const SENSE_CHOICE: ChoiceSpec = {
  type: 'choice',
  key: 'senseLocation',
  label: TOPOLOGY_LABELS.senseLocation,
  options: [
    { value: 'none', label: 'None' },
    { value: 'input', label: 'In the input line' },
    { value: 'switch', label: 'In series with the switch' },
    { value: 'inductor', label: 'In series with the inductor' },
    { value: 'output', label: 'In the output line' },
  ],
};

export const DEAD_TIME_FIELDS: FieldSpec[] = [
  num('deadTimeBeforeOnS', TOPOLOGY_LABELS.deadTimeBeforeOnS, 's'),
  num('deadTimeAfterOffS', TOPOLOGY_LABELS.deadTimeAfterOffS, 's'),
];

/**
 * Interleaving (issue 13 §1): the number of power stages, how unevenly they share the load (applied to the
 * worst phase), and whether the controller sheds phases at light load. Empty phases = 1, empty mismatch = 0.
 */
export const PHASE_FIELDS: FieldSpec[] = [
  num('phases', TOPOLOGY_LABELS.phases, '', {
    optional: true,
    integer: true,
    help: 'Identical power stages switched 360°/N apart, sharing the input and output capacitors, the controller and the heatsinks (1 … 8; empty: 1).',
  }),
  num('phaseMismatch', TOPOLOGY_LABELS.phaseMismatch, '', {
    optional: true,
    help: 'The worst phase carries (1 + m) × its even share ("0.05" or "5 %"; 0 … 0.5; empty: 0). Its temperatures are the ones checked.',
  }),
  {
    type: 'group',
    key: 'phaseShedding',
    label: TOPOLOGY_LABELS.phaseShedding,
    fields: [
      num('hysteresisFraction', PHASE_SHEDDING_LABELS.hysteresisFraction, '', {
        help: 'A band centred on each crossover load so a load near it does not toggle a phase ("0.1" or "10 %"; 0 … 0.5).',
      }),
    ],
    defaults: () => ({ hysteresisFraction: 0.1 }),
  },
];

export const MARGIN_FIELDS: FieldSpec[] = [
  num('temperatureMarginK', MARGIN_LABELS.temperatureMarginK, 'K'),
  num('rippleCurrentDerating', MARGIN_LABELS.rippleCurrentDerating, '%'),
  num('resistorPowerDerating', MARGIN_LABELS.resistorPowerDerating, '%'),
  num('voltageDerating', MARGIN_LABELS.voltageDerating, '%'),
  num('currentDerating', MARGIN_LABELS.currentDerating, '%', {
    optional: true,
    help: 'Switch, rectifier and inductor RMS current ratings; empty: 80 % (common practice). Isat is not derated.',
  }),
  num('requiredLifeHours', MARGIN_LABELS.requiredLifeHours, 'h', { optional: true }),
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
  label: CONTACT_LABEL,
  // The engine's wording, also printed in the report: the label says what the applied limit is for.
  options: contactSchema.options.map((value) => ({ value, label: CONTACT_LABELS[value] })),
};
