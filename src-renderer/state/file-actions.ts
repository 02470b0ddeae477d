/**
 * New, open, save, save as, drag-and-drop, menu commands and recovery snapshots. Nothing here changes
 * the open design unless the new one is wholly good; every failure is a message naming the file.
 */
import type { MenuCommand, OpenedFile } from '../../shared-model/index.ts';
import { designText, readDesignText, readRecoveryText, recoveryText, suggestFileName } from './design-file.ts';
import { UNTITLED } from './document.svelte.ts';
import type { DesignTemplate } from './new-design.ts';
import type { Workspace } from './workspace.svelte.ts';

/** Tag of the messages that concern the draft's invalid fields: they leave when it is valid. */
export const INVALID_DRAFT = 'invalid-draft';

/** How often a changed draft is written as a recovery snapshot. */
export const RECOVERY_INTERVAL_MS = 3000;

/** Resolves true when there is nothing unsaved or the user agrees to discard it. */
export async function confirmDiscard(ws: Workspace, action: string): Promise<boolean> {
  if (!ws.doc.dirty) return true;
  return ws.messages.ask(
    'Discard unsaved changes?',
    `“${ws.doc.fileName}” has changes that are not saved. ${action} will discard them.`,
    'Discard changes',
    'Keep editing',
  );
}

/** "New": asks first when there are unsaved changes, then offers the blanks and demos (NewDesignDialog). */
export async function newDesign(ws: Workspace): Promise<void> {
  if (!(await confirmDiscard(ws, 'Starting a new design'))) return;
  ws.choosingNew = true;
}

/** Starts the chosen blank or demo copy as an unsaved, untitled document. */
export async function startDesign(ws: Workspace, template: DesignTemplate): Promise<void> {
  const design = structuredClone(template.design);
  ws.doc.load(design, suggestFileName(UNTITLED, design.name), null);
  ws.stash = {};
  ws.results.reset();
  ws.screen = 'design';
  ws.resultsWide = false;
  await clearRecovery(ws);
  ws.messages.info(
    template.id.startsWith('blank-')
      ? `New blank design: fill in the ${ws.doc.problems.length} fields marked in the editor (or replace each part with one from the library).`
      : `New design from the demo “${template.label}”.`,
  );
}

export async function openDesign(ws: Workspace): Promise<void> {
  let file: OpenedFile | null;
  try {
    file = await ws.files.open();
  } catch (error) {
    ws.messages.error('The file could not be read. Your current design is unchanged.', [(error as Error).message]);
    return;
  }
  if (file) await openFile(ws, file);
}

/** Opens a file already read (file dialog, drag-and-drop, command line, recent list). */
export async function openFile(ws: Workspace, file: OpenedFile): Promise<boolean> {
  const read = readDesignText(file.text, file.name);
  if (!read.ok) {
    ws.messages.error(read.message, read.details);
    return false;
  }
  if (!(await confirmDiscard(ws, `Opening ${file.name}`))) return false;
  ws.doc.load(read.design, file.name, file.path);
  ws.results.reset();
  ws.screen = 'design';
  await clearRecovery(ws);
  ws.messages.success(`Opened ${file.name}.`, read.notes);
  return true;
}

/** Each workspace's saves run one after another (see saveDesign). */
const saveChains = new WeakMap<Workspace, Promise<unknown>>();

/**
 * Saves the draft. Saves never overlap: a save asked while another is running waits for it, so the
 * newest draft is always written last and the unsaved mark ends up describing the file on disk (each
 * save marks saved only the revision it wrote). A read-only file is left alone and Save As is offered.
 */
export function saveDesign(ws: Workspace, asNew: boolean): Promise<boolean> {
  const previous = saveChains.get(ws) ?? Promise.resolve();
  const next = previous.then(() => saveNow(ws, asNew));
  saveChains.set(ws, next.catch(() => undefined));
  return next;
}

async function saveNow(ws: Workspace, asNew: boolean): Promise<boolean> {
  const doc = ws.doc;
  // Saving is intent: a value still being typed is kept first.
  doc.commitPreview();
  if (!doc.valid) {
    // One message, replaced by the next refusal and gone once the draft is valid (MessageList).
    ws.messages.show(
      'error',
      `“${doc.fileName}” was not saved: ${doc.problems.length} field${doc.problems.length === 1 ? ' is' : 's are'} invalid. Correct them first (the recovery snapshot keeps your draft meanwhile).`,
      doc.placed.map((p) => p.text),
      INVALID_DRAFT,
    );
    return false;
  }
  const written = designText(doc.design);
  if (!written.ok) {
    ws.messages.error(`“${doc.fileName}” was not saved.`, written.details);
    return false;
  }
  const revision = doc.revision;
  const outcome = await ws.files
    .save({ path: asNew ? null : doc.filePath, suggestedName: suggestFileName(doc.fileName, doc.design.name), text: written.text })
    .catch((error: Error) => ({ ok: false as const, cancelled: false, message: error.message, readOnly: false }));
  if (!outcome.ok) {
    if (outcome.readOnly && !asNew) {
      const saveAs = await ws.messages.ask('The file is read-only', `${outcome.message}`, 'Save As…', 'Keep editing');
      return saveAs ? saveNow(ws, true) : false;
    }
    if (!outcome.cancelled) ws.messages.error(`“${doc.fileName}” was not saved; the file on disk is unchanged.`, [outcome.message]);
    return false;
  }
  doc.markSaved(outcome.name, outcome.path, revision); // edits made while saving stay unsaved
  await clearRecovery(ws);
  ws.messages.success(ws.files.kind === 'browser' ? `Downloaded ${outcome.name}.` : `Saved ${outcome.name}.`);
  return true;
}

export async function runCommand(ws: Workspace, command: MenuCommand): Promise<void> {
  switch (command) {
    case 'new':
      return newDesign(ws);
    case 'open':
      return openDesign(ws);
    case 'save':
      return void (await saveDesign(ws, false));
    case 'save-as':
      return void (await saveDesign(ws, true));
    case 'undo':
      if (!ws.doc.undo()) ws.messages.info('Nothing to undo.');
      return;
    case 'redo':
      if (!ws.doc.redo()) ws.messages.info('Nothing to redo.');
      return;
    case 'open-library':
      ws.screen = 'library';
      return;
    default:
      ws.messages.info('The design-review report is not available yet in this build.');
  }
}

// --- recovery snapshots ---

export async function writeRecovery(ws: Workspace): Promise<void> {
  const doc = ws.doc;
  await ws.files.writeRecovery(recoveryText({ fileName: doc.fileName, filePath: doc.filePath, design: doc.committed }));
}

async function clearRecovery(ws: Workspace): Promise<void> {
  await ws.files.clearRecovery().catch(() => undefined);
}

/** Every RECOVERY_INTERVAL_MS, writes the draft if it changed and is unsaved. Returns a stop function. */
export function startRecoverySnapshots(ws: Workspace): () => void {
  let written = ws.doc.revision;
  const tick = () => {
    if (!ws.doc.dirty || ws.doc.revision === written || ws.recoveryOffer) return;
    written = ws.doc.revision;
    writeRecovery(ws).catch((error: Error) => ws.messages.error('The recovery snapshot could not be written.', [error.message]));
  };
  const timer = setInterval(tick, RECOVERY_INTERVAL_MS);
  const onHide = () => tick();
  window.addEventListener('pagehide', onHide);
  return () => {
    clearInterval(timer);
    window.removeEventListener('pagehide', onHide);
  };
}

/** At start: if a snapshot from an earlier session exists, offer to restore it. */
export async function checkRecovery(ws: Workspace): Promise<void> {
  const snapshot = await ws.files.readRecovery().catch(() => null);
  if (!snapshot) return;
  const recovered = readRecoveryText(snapshot.text);
  if (!recovered) {
    await clearRecovery(ws);
    return;
  }
  ws.recoveryOffer = { recovered, savedAt: snapshot.savedAt };
}

export async function acceptRecovery(ws: Workspace): Promise<void> {
  const offer = ws.recoveryOffer;
  if (!offer) return;
  ws.recoveryOffer = null;
  ws.doc.load(offer.recovered.design, offer.recovered.fileName, offer.recovered.filePath, true);
  ws.results.reset();
  ws.screen = 'design';
  ws.messages.success(`Restored your unsaved work on “${offer.recovered.fileName}”. Save it to keep it.`);
}

export async function declineRecovery(ws: Workspace): Promise<void> {
  ws.recoveryOffer = null;
  await clearRecovery(ws);
  ws.messages.info('The recovered work was discarded.');
}
