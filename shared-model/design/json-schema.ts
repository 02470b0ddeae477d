/**
 * JSON Schemas (draft 2020-12) generated from the zod schemas, for people who script designs and
 * libraries. `npm run schema` writes them to assets/schema/; a test checks the committed files equal a
 * fresh generation. Each number's range (design/numbers.ts) appears as minimum/maximum keywords with its
 * reason as description. Cross-field rules (design/rules-*.ts) cannot be said in JSON Schema: a file that
 * passes the schema may still get problems from validateDesign().
 */
import { z } from 'zod';
import { partsLibrarySchema, PARTS_LIBRARY_VERSION } from './parts-library.ts';
import { designSchema } from './schema.ts';

export const DESIGN_SCHEMA_FILE = 'wattledger-design.v1.schema.json';
export const PARTS_SCHEMA_FILE = `wattledger-parts.v${PARTS_LIBRARY_VERSION}.schema.json`;

const NOTE =
  'Generated from the zod schema by `npm run schema`; do not edit. Units are SI and named by key suffix ' +
  '(V, A, Ohm, H, F, Hz, W, S = seconds, C = coulombs except temperatures in °C on ...C keys, KPerW, PerK). ' +
  'Every number has a lower and an upper bound: sanity limits for discrete converters of a few W to a few ' +
  'hundred W (multiphase rails up to a few hundred A), each with its reason in the description; they refuse ' +
  'typos (a missing prefix) and values from another universe, not poor designs. ' +
  'Relations between fields (e.g. a buck needs voutV < vinMinV; the inductor ripple, the switching edges, the ' +
  'output-bank ripple and the sense-resistor drop must stay where the models mean something) are checked by ' +
  'WattLedger, not by this schema. ' +
  'The schema refuses unknown keys; WattLedger itself ignores them with a notice.';

/** JSON Schema of the design document, version 1. */
export function designJsonSchema(): Record<string, unknown> {
  return { ...z.toJSONSchema(designSchema), title: 'WattLedger design document, version 1', description: NOTE };
}

/** JSON Schema of the parts library document, current version. */
export function partsLibraryJsonSchema(): Record<string, unknown> {
  return { ...z.toJSONSchema(partsLibrarySchema), title: `WattLedger parts library, version ${PARTS_LIBRARY_VERSION}`, description: NOTE };
}
