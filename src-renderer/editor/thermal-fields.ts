/**
 * Field descriptions of thermal paths and heatsinks (labels from the engine's table, design/field-labels.ts).
 * The heatsink choice lists the design's sinks.
 */
import { HEATSINK_LABELS, THERMAL_PATH_LABELS, type Heatsink } from '../../shared-model/index.ts';
import { SURFACE_OPTIONS } from './design-fields.ts';
import { num, type FieldSpec, type UnionSpec } from './field-spec.ts';

export function thermalPathSpec(heatsinks: readonly Heatsink[]): UnionSpec {
  const variants: UnionSpec['variants'][number][] = [
    {
      value: 'direct',
      label: 'θJA to ambient through the board',
      fields: [num('thetaJaKPerW', THERMAL_PATH_LABELS.thetaJaKPerW, 'K/W'), num('psiJtKPerW', THERMAL_PATH_LABELS.psiJtKPerW, 'K/W', { optional: true })],
      defaults: () => ({ thetaJaKPerW: 40 }),
    },
    {
      value: 'rise',
      label: 'Temperature rise stated at a dissipation',
      fields: [num('riseK', THERMAL_PATH_LABELS.riseK, 'K'), num('atW', THERMAL_PATH_LABELS.atW, 'W')],
      defaults: () => ({ riseK: 40, atW: 1 }),
    },
  ];
  if (heatsinks.length > 0) {
    variants.push({
      value: 'heatsink',
      label: 'θJC + θCS to a heatsink',
      fields: [
        { type: 'choice', key: 'heatsinkId', label: THERMAL_PATH_LABELS.heatsinkId, options: heatsinks.map((h) => ({ value: h.id, label: h.name })) },
        num('thetaCsKPerW', THERMAL_PATH_LABELS.thetaCsKPerW, 'K/W'),
      ],
      defaults: () => ({ heatsinkId: heatsinks[0]!.id, thetaCsKPerW: 0.5 }),
    });
  }
  return { type: 'union', key: '', label: THERMAL_PATH_LABELS.kind, tag: 'kind', variants };
}

/** The identifier is not edited here: thermal paths refer to it (it is shown beside the sink). */
export const HEATSINK_FIELDS: FieldSpec[] = [
  { type: 'text', key: 'name', label: HEATSINK_LABELS.name },
  num('thetaSaKPerW', HEATSINK_LABELS.thetaSaKPerW, 'K/W'),
  { type: 'choice', key: 'surface', label: HEATSINK_LABELS.surface, options: SURFACE_OPTIONS },
];
