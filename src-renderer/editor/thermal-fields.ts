/** Field descriptions of thermal paths and heatsinks. The heatsink choice lists the design's sinks. */
import type { Heatsink } from '../../shared-model/index.ts';
import { SURFACE_OPTIONS } from './design-fields.ts';
import { num, type FieldSpec, type UnionSpec } from './field-spec.ts';

export function thermalPathSpec(heatsinks: readonly Heatsink[]): UnionSpec {
  const variants: UnionSpec['variants'][number][] = [
    {
      value: 'direct',
      label: 'θJA to ambient through the board',
      fields: [num('thetaJaKPerW', 'θJA', 'K/W'), num('psiJtKPerW', 'ΨJT (junction to case top)', 'K/W', { optional: true })],
      defaults: () => ({ thetaJaKPerW: 40 }),
    },
    {
      value: 'rise',
      label: 'Temperature rise stated at a dissipation',
      fields: [num('riseK', 'Rise', 'K'), num('atW', 'At dissipation', 'W')],
      defaults: () => ({ riseK: 40, atW: 1 }),
    },
  ];
  if (heatsinks.length > 0) {
    variants.push({
      value: 'heatsink',
      label: 'θJC + θCS to a heatsink',
      fields: [
        { type: 'choice', key: 'heatsinkId', label: 'Heatsink', options: heatsinks.map((h) => ({ value: h.id, label: h.name })) },
        num('thetaCsKPerW', 'θCS (interface)', 'K/W'),
      ],
      defaults: () => ({ heatsinkId: heatsinks[0]!.id, thetaCsKPerW: 0.5 }),
    });
  }
  return { type: 'union', key: '', label: 'Thermal path', tag: 'kind', variants };
}

/** The identifier is not edited here: thermal paths refer to it (it is shown beside the sink). */
export const HEATSINK_FIELDS: FieldSpec[] = [
  { type: 'text', key: 'name', label: 'Name' },
  num('thetaSaKPerW', 'θSA (sink to ambient)', 'K/W'),
  { type: 'choice', key: 'surface', label: 'Surface', options: SURFACE_OPTIONS },
];
