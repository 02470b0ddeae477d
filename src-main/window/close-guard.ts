/**
 * What happens when the user closes the window or quits with unsaved changes. The window's close event
 * asks `onCloseRequested`; when it says "ask", main shows `unsavedChangesDialog` and feeds the button
 * index to `choiceFromResponse`. "save" sends the save command to the renderer and closes only after
 * main has seen that save succeed (`afterSaveOutcome`); a cancelled or failed save keeps the window open.
 */
import type { DocumentState } from '../../shared-model/index.ts';

export type CloseChoice = 'save' | 'discard' | 'cancel';

export interface CloseGuardState {
  document: DocumentState;
  /** The user already chose to discard, or a save-then-close just succeeded. */
  closeApproved: boolean;
  /** A save was requested by the close dialog and its outcome is awaited. */
  closeAfterSave: boolean;
}

export function initialCloseGuard(): CloseGuardState {
  return { document: { name: 'Untitled', dirty: false }, closeApproved: false, closeAfterSave: false };
}

export function onCloseRequested(state: CloseGuardState): 'allow' | 'ask' {
  return state.closeApproved || !state.document.dirty ? 'allow' : 'ask';
}

export interface MessageBoxSpec {
  type: 'warning';
  message: string;
  detail: string;
  buttons: string[];
  defaultId: number;
  cancelId: number;
  noLink: true;
}

const BUTTONS: readonly CloseChoice[] = ['save', 'discard', 'cancel'];

export function unsavedChangesDialog(document: DocumentState, quitting: boolean): MessageBoxSpec {
  const name = document.name.trim() || 'Untitled';
  return {
    type: 'warning',
    message: `Save the changes to "${name}" before ${quitting ? 'quitting' : 'closing'}?`,
    detail: 'If you do not save, your changes since the last save are lost.',
    buttons: ['Save', 'Do not save', 'Cancel'],
    defaultId: 0,
    cancelId: 2,
    noLink: true,
  };
}

/** Maps the dialog's button index; anything unexpected (Escape, closed dialog) is a cancel. */
export function choiceFromResponse(response: number): CloseChoice {
  return BUTTONS[response] ?? 'cancel';
}

/** State after the user's choice. */
export function applyChoice(state: CloseGuardState, choice: CloseChoice): CloseGuardState {
  switch (choice) {
    case 'save':
      return { ...state, closeAfterSave: true, closeApproved: false };
    case 'discard':
      return { ...state, closeAfterSave: false, closeApproved: true };
    case 'cancel':
      return { ...state, closeAfterSave: false, closeApproved: false };
  }
}

/** After a design save finishes: close now when the close dialog asked for it and the save worked. */
export function afterSaveOutcome(state: CloseGuardState, saved: boolean): { state: CloseGuardState; closeNow: boolean } {
  if (!state.closeAfterSave) return { state, closeNow: false };
  if (!saved) return { state: { ...state, closeAfterSave: false }, closeNow: false };
  return { state: { ...state, closeAfterSave: false, closeApproved: true, document: { ...state.document, dirty: false } }, closeNow: true };
}
