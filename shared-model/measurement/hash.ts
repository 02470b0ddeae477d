/**
 * The identity of a measurement: SHA-256 (FIPS 180-4, report/sha256.ts) of its canonical text —
 * the validated record as JSON.stringify writes it (keys in the schema's order, two-space indent, one
 * final LF), the same rule as the design's canonical text (design/canonical.ts). A calibrated design
 * records this hash, so anyone can tell which measurement it was fitted to.
 */
import { sha256Hex } from '../report/sha256.ts';
import { measurementSchema, type Measurement } from './schema.ts';

function measurementText(m: Measurement): string {
  return `${JSON.stringify(measurementSchema.parse(m), null, 2)}\n`;
}

export function measurementHash(m: Measurement): string {
  return sha256Hex(measurementText(m));
}
