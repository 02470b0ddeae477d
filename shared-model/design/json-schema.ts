/**
 * JSON Schemas (draft 2020-12) generated from the zod schemas, for people who script designs and
 * libraries. `npm run schema` writes them to assets/schema/; a test checks the committed files equal a
 * fresh generation. Cross-field rules (design/rules-*.ts) cannot be said in JSON Schema: a file that
 * passes the schema may still get problems from validateDesign().
 */
import { z } from 'zod';
import { partsLibrarySchema } from './parts-library.ts';
import { designSchema } from './schema.ts';

export const DESIGN_SCHEMA_FILE = 'wattledger-design.v1.schema.json';
export const PARTS_SCHEMA_FILE = 'wattledger-parts.v1.schema.json';

const NOTE =
  'Generated from the zod schema by `npm run schema`; do not edit. Units are SI and named by key suffix ' +
  '(V, A, Ohm, H, F, Hz, W, S = seconds, C = coulombs except temperatures in °C on ...C keys, KPerW, PerK). ' +
  'Relations between fields (e.g. a buck needs voutV < vinMinV) are checked by WattLedger, not by this schema. ' +
  'The schema refuses unknown keys; WattLedger itself ignores them with a notice.';

/** JSON Schema of the design document, version 1. */
export function designJsonSchema(): Record<string, unknown> {
  return { ...z.toJSONSchema(designSchema), title: 'WattLedger design document, version 1', description: NOTE };
}

/** JSON Schema of the parts library document, version 1. */
export function partsLibraryJsonSchema(): Record<string, unknown> {
  return { ...z.toJSONSchema(partsLibrarySchema), title: 'WattLedger parts library, version 1', description: NOTE };
}
