/**
 * Every topology the engine knows, by the design document's `topology.kind`. Adding a topology: a new
 * file beside buck.ts and boost.ts, one line here, the kind in design/schema.ts (DEVELOPERS.md).
 */
import type { Design } from '../design/schema.ts';
import { boost } from './boost.ts';
import { buck } from './buck.ts';
import type { ConverterTopology } from './types.ts';

export const TOPOLOGIES: Readonly<Record<Design['topology']['kind'], ConverterTopology>> = { buck, boost };

/** The topology record of a design. */
export function topologyOf(design: Pick<Design, 'topology'>): ConverterTopology {
  return TOPOLOGIES[design.topology.kind];
}

/** The topology record of a kind read from an unvalidated document (undefined when unknown). */
export function topologyOfKind(kind: string | undefined): ConverterTopology | undefined {
  return kind !== undefined && Object.hasOwn(TOPOLOGIES, kind) ? TOPOLOGIES[kind as Design['topology']['kind']] : undefined;
}
