/**
 * Wires the shell to the outside: keyboard shortcuts (browser build), menu commands and files opened
 * from outside (Electron), dropped files (a part library opens beside the others), recovery snapshots and the offer to restore them, the system
 * theme, and the browser's own leave-page warning while there are unsaved changes.
 * Returns one function that undoes all of it.
 */
import { readFile } from '../desktop/browser-files.ts';
import { checkRecovery, openFile, runCommand, startRecoverySnapshots } from '../state/file-actions.ts';
import { LIBRARY_FORMAT } from '../state/library-data.ts';
import type { MenuCommand } from '../../shared-model/index.ts';
import type { Workspace } from '../state/workspace.svelte.ts';
import { listenForDroppedFiles } from './drop-files.ts';
import { commandForKey } from './shortcuts.ts';

export function connectShell(ws: Workspace, isMac: boolean, onDragState: (dragging: boolean) => void): () => void {
  const stops: (() => void)[] = [];

  stops.push(ws.theme.start());

  if (ws.files.kind === 'browser') {
    const onKey = (event: KeyboardEvent) => {
      const command = commandForKey(event, isMac);
      if (!command) return;
      event.preventDefault();
      dispatch(ws, command);
    };
    window.addEventListener('keydown', onKey);
    stops.push(() => window.removeEventListener('keydown', onKey));
  }
  stops.push(ws.files.onMenuCommand((command) => dispatch(ws, command)));
  stops.push(ws.files.onOpenFile((file) => void openFile(ws, file)));

  stops.push(
    listenForDroppedFiles(async (file) => {
      const opened = await readFile(file);
      if (isLibraryFile(opened.text)) {
        const result = ws.library.openText(opened.text, opened);
        if (result.ok) ws.messages.success(result.message);
        else ws.messages.error(result.message, result.details);
        ws.screen = 'library';
        return;
      }
      await openFile(ws, opened);
    }, onDragState),
  );

  void checkRecovery(ws);
  stops.push(startRecoverySnapshots(ws));

  const beforeUnload = (event: BeforeUnloadEvent) => {
    if (ws.doc.dirty && ws.files.kind === 'browser') event.preventDefault();
  };
  window.addEventListener('beforeunload', beforeUnload);
  stops.push(() => window.removeEventListener('beforeunload', beforeUnload));

  return () => stops.forEach((stop) => stop());
}

/**
 * A menu command or shortcut. The report commands show the report screen and act there once the report
 * is built: "print" prints it (a PDF file through DesktopApi.printToPdf in Electron, the browser's print
 * dialog otherwise — the report screen's print rules hide the rest of the app); "export" saves it as one
 * self-contained HTML file.
 */
function dispatch(ws: Workspace, command: MenuCommand): void {
  if (command === 'print-report') ws.requestReport('print');
  else if (command === 'export-report') ws.requestReport('html');
  else void runCommand(ws, command);
}

function isLibraryFile(text: string): boolean {
  try {
    const json = JSON.parse(text) as { format?: unknown };
    return json?.format === LIBRARY_FORMAT;
  } catch {
    return false;
  }
}
