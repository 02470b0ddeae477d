// Turns a spreadsheet of parts saved as CSV (one part per row) into a WattLedger part library file, or
// adds its parts to an existing library file. Columns are matched to part fields by their headers
// ("Rds(on) (mOhm)" → RDS(on) at 25 °C, in mΩ), or by a mapping saved from the app's import screen.
// Nothing is written while any row has a problem: each problem names the row, the column, the value and
// the allowed range.
//
//   node examples/import-parts.js PARTS.csv LIBRARY.json --kind mosfet --set rdsTemperatureLaw.law=linear
//   node examples/import-parts.js PARTS.csv LIBRARY.json --mapping my-mapping.json
//
// Options: --kind K (every row is one kind of part: mosfet, diode, inductor, capacitor, resistor,
// controller; not needed when a column gives the kind), --set FIELD=TEXT (a value for every row, read
// like a cell; repeatable), --mapping FILE (a saved mapping document, "wattledger.part-mapping"),
// --name TEXT (the name of a new library). The engine is the package's own entry (`from 'wattledger'`).
import { existsSync } from 'node:fs';
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { parseArgs } from 'node:util';
import {
  applyImport, guessMapping, idFromName, parsePartsLibraryText, partMappingSchema, PARTS_LIBRARY_FORMAT, PARTS_LIBRARY_VERSION,
  previewImport, readCsv, reuseMapping, serializePartsLibrary,
} from 'wattledger';

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: { kind: { type: 'string' }, set: { type: 'string', multiple: true, default: [] }, mapping: { type: 'string' }, name: { type: 'string' } },
});
const [csvFile, libraryFile] = positionals;
if (!csvFile || !libraryFile) {
  console.error('Usage: node examples/import-parts.js PARTS.csv LIBRARY.json [--kind K] [--set FIELD=TEXT]... [--mapping FILE] [--name TEXT]');
  process.exit(2);
}

/** Prints every problem and stops; nothing has been written. */
function refuse(what, messages) {
  console.error(`${what}; nothing was written:\n${messages.map((m) => `  - ${m}`).join('\n')}`);
  process.exit(1);
}

const table = readCsv(await readFile(csvFile, 'utf8'));
const headers = table.rows[0]?.cells.map((h) => h.trim()) ?? [];
let mapping;
if (values.mapping) {
  const saved = partMappingSchema.safeParse(JSON.parse(await readFile(values.mapping, 'utf8')));
  if (!saved.success) refuse(`${values.mapping} is not a saved part mapping`, saved.error.issues.map((i) => `${i.path.join('.') || 'document'}: ${i.message}`));
  mapping = reuseMapping(headers, saved.data);
} else {
  mapping = guessMapping(headers, values.kind);
}
const fixed = values.set.map((pair) => ({ field: pair.slice(0, pair.indexOf('=')), text: pair.slice(pair.indexOf('=') + 1) }));
mapping = { ...mapping, fixed: [...mapping.fixed.filter((f) => !fixed.some((g) => g.field === f.field)), ...fixed] };

const preview = previewImport(table, mapping);
if (preview.readProblems.length > 0) refuse(`${csvFile} could not be read as CSV`, preview.readProblems.map((p) => p.message));
if (preview.mappingProblems.length > 0) refuse('The columns do not make parts yet', preview.mappingProblems.map((p) => p.message));
if (preview.bad.length > 0) refuse(`${preview.bad.length} of ${preview.rows.length} rows have problems`, preview.bad.flatMap((r) => r.problems.map((p) => p.message)));
if (preview.good.length === 0) refuse(`${csvFile} holds no part`, ['The sheet has a header row but no data rows.']);

let library;
if (existsSync(libraryFile)) {
  const read = parsePartsLibraryText(await readFile(libraryFile, 'utf8'));
  if (!read.ok) refuse(`${libraryFile} is not a part library WattLedger can read`, read.problems.map((p) => p.message));
  library = read.library;
} else {
  const name = values.name ?? path.basename(libraryFile, '.json');
  library = { format: PARTS_LIBRARY_FORMAT, version: PARTS_LIBRARY_VERSION, id: idFromName(name), name, notes: `Imported from ${path.basename(csvFile)}.`, parts: [] };
}

const applied = applyImport(library.parts, preview.good);
const written = serializePartsLibrary({ ...library, parts: applied.parts });
if (!written.ok) refuse(`The library cannot be written as JSON`, written.problems.map((p) => p.message));
await writeFile(libraryFile, written.text);
for (const r of applied.renamed) console.log(`${r.name}: id ${r.from} was taken, stored as ${r.to}.`);
console.log(`Added ${applied.added.length} parts to ${libraryFile} ("${library.name}", ${applied.parts.length} parts in all).`);
console.log('Check each value against its datasheet before you rely on it.');
