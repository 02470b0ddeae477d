/** Library commands that talk to the user or the file system: add, import, export. */
import { partsToCsv, type PartKind } from '../../shared-model/index.ts';
import { KIND_LABELS } from '../editor/part-fields.ts';
import type { Workspace } from '../state/workspace.svelte.ts';

/** Adds a new part of `kind`, starting from an example's values. Returns its id, or null. */
export function addPart(ws: Workspace, kind: PartKind): string | null {
  const template = ws.library.demoParts.find((p) => p.kind === kind) ?? ws.library.ofKind(kind)[0];
  if (!template) {
    ws.messages.error(`There is no ${KIND_LABELS[kind].one.toLowerCase()} to start from; import one first.`);
    return null;
  }
  const part = ws.library.add({
    ...structuredClone(template),
    id: `new-${kind}`,
    name: `New ${KIND_LABELS[kind].one.toLowerCase()}`,
    invented: true,
    notes: `Values copied from the example “${template.name}”; replace them with your datasheet's and untick “invented”.`,
  });
  ws.messages.info(`Added ${part.name}; edit its values and save.`);
  return part.id;
}

export async function importLibrary(ws: Workspace): Promise<void> {
  try {
    const file = await ws.files.open();
    if (!file) return;
    const result = ws.library.importText(file.text, file.name);
    if (result.ok) ws.messages.success(result.message, result.details);
    else ws.messages.error(result.message, result.details);
  } catch (error) {
    ws.messages.error('The file could not be read; the library is unchanged.', [(error as Error).message]);
  }
}

export async function exportLibrary(ws: Workspace): Promise<void> {
  const outcome = await ws.files
    .exportFile({ suggestedName: 'wattledger-parts.json', content: ws.library.exportText(), encoding: 'utf8', filterName: 'Part library', extensions: ['json'] })
    .catch((error: Error) => ({ ok: false as const, cancelled: false, message: error.message }));
  if (outcome.ok) ws.messages.success(`Exported ${ws.library.parts.length} parts to ${outcome.name}.`);
  else if (!outcome.cancelled) ws.messages.error('The part library was not exported.', [outcome.message]);
}

/** The library as CSV, units in the headers (engine partsToCsv); reads back to the same parts through the import. */
export async function exportLibraryCsv(ws: Workspace): Promise<void> {
  const outcome = await ws.files
    .exportFile({ suggestedName: 'wattledger-parts.csv', content: partsToCsv(ws.library.parts), encoding: 'utf8', filterName: 'CSV', extensions: ['csv'] })
    .catch((error: Error) => ({ ok: false as const, cancelled: false, message: error.message }));
  if (outcome.ok) ws.messages.success(`Exported ${ws.library.parts.length} parts to ${outcome.name}.`);
  else if (!outcome.cancelled) ws.messages.error('The part library was not exported.', [outcome.message]);
}
