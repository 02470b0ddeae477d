/**
 * `npm run schema`: writes the JSON Schemas generated from the zod schemas to assets/schema/
 * (design document and parts library). A test checks the committed files equal a fresh generation,
 * so run this after changing shared-model/design/*.ts.
 */
import { writeFileSync } from 'node:fs';
import nodePath from 'node:path';
import { fileURLToPath } from 'node:url';
import { DESIGN_SCHEMA_FILE, designJsonSchema, PARTS_SCHEMA_FILE, partsLibraryJsonSchema } from '../../shared-model/index.ts';

export const SCHEMA_DIR = nodePath.resolve(nodePath.dirname(fileURLToPath(import.meta.url)), '../../assets/schema');

/** The text of one schema file exactly as committed (2-space indent, final newline). */
export function schemaText(schema: Record<string, unknown>): string {
  return `${JSON.stringify(schema, null, 2)}\n`;
}

export function schemaFiles(): { file: string; text: string }[] {
  return [
    { file: DESIGN_SCHEMA_FILE, text: schemaText(designJsonSchema()) },
    { file: PARTS_SCHEMA_FILE, text: schemaText(partsLibraryJsonSchema()) },
  ];
}

if (process.argv[1] && fileURLToPath(import.meta.url) === nodePath.resolve(process.argv[1])) {
  for (const { file, text } of schemaFiles()) {
    writeFileSync(nodePath.join(SCHEMA_DIR, file), text);
    console.log(`wrote assets/schema/${file} (${text.length} characters)`);
  }
}
