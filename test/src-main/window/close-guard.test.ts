import { describe, expect, it } from 'vitest';
import { afterSaveOutcome, applyChoice, choiceFromResponse, initialCloseGuard, onCloseRequested, unsavedChangesDialog, type CloseGuardState } from '../../../src-main/window/close-guard.ts';

const dirty: CloseGuardState = { ...initialCloseGuard(), document: { name: 'buck.json', dirty: true } };

describe('closing with unsaved changes', () => {
  it('closes at once when everything is saved', () => {
    expect(onCloseRequested(initialCloseGuard())).toBe('allow');
  });

  it('asks when there are unsaved changes, naming the file and whether the app is quitting', () => {
    expect(onCloseRequested(dirty)).toBe('ask');
    const dialog = unsavedChangesDialog(dirty.document, true);
    expect(dialog.message).toBe('Save the changes to "buck.json" before quitting?');
    expect(dialog.buttons[dialog.defaultId]).toBe('Save');
    expect(dialog.buttons[dialog.cancelId]).toBe('Cancel');
    expect(unsavedChangesDialog(dirty.document, false).message).toContain('before closing?');
  });

  it('maps the buttons; Escape or anything unexpected is a cancel', () => {
    expect([0, 1, 2, 7, -1].map(choiceFromResponse)).toEqual(['save', 'discard', 'cancel', 'cancel', 'cancel']);
  });

  it('"Do not save" lets the close through', () => {
    expect(onCloseRequested(applyChoice(dirty, 'discard'))).toBe('allow');
  });

  it('"Cancel" keeps the window open and asks again next time', () => {
    expect(onCloseRequested(applyChoice(dirty, 'cancel'))).toBe('ask');
  });

  it('"Save" closes only after the save succeeded', () => {
    const waiting = applyChoice(dirty, 'save');
    expect(onCloseRequested(waiting)).toBe('ask');
    const failed = afterSaveOutcome(waiting, false);
    expect(failed.closeNow).toBe(false);
    expect(onCloseRequested(failed.state)).toBe('ask');
    expect(failed.state.closeAfterSave).toBe(false);
    const saved = afterSaveOutcome(waiting, true);
    expect(saved.closeNow).toBe(true);
    expect(onCloseRequested(saved.state)).toBe('allow');
  });

  it('an ordinary save (no close pending) never closes the window', () => {
    expect(afterSaveOutcome(dirty, true).closeNow).toBe(false);
  });
});
