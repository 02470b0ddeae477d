/**
 * The window title: an unsaved marker, the file name, then the app name ("● buck.json — WattLedger"),
 * the same format the browser version puts in the tab (src-renderer/desktop/browser-files.ts).
 */
import type { DocumentState } from '../../shared-model/index.ts';

export const APP_NAME = 'WattLedger';
export const UNSAVED_MARKER = '●';

export function windowTitle(state: DocumentState): string {
  const name = state.name.trim() || 'Untitled';
  return `${state.dirty ? `${UNSAVED_MARKER} ` : ''}${name} — ${APP_NAME}`;
}
