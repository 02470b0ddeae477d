import { describe, expect, it } from 'vitest';
import { History } from '../../../src-renderer/state/history.ts';

describe('History (undo/redo of the design document)', () => {
  it('undo returns the previous snapshot and redo the undone one', () => {
    const h = new History('a');
    h.apply('b', 'edit 1');
    h.apply('c', 'edit 2');
    expect(h.undo()).toBe('b'); // issue 5: undo for every edit
    expect(h.undo()).toBe('a'); // issue 5: undo for every edit
    expect(h.undo()).toBeNull(); // nothing left to undo
    expect(h.redo()).toBe('b'); // issue 5: redo for every edit
    expect(h.present).toBe('b');
  });

  it('keystrokes into one field merge into one step until sealed', () => {
    const h = new History('4');
    h.apply('4.', 'Edit L', 'parts.inductor.inductanceH');
    h.apply('4.7', 'Edit L', 'parts.inductor.inductanceH');
    h.seal();
    h.apply('4.70', 'Edit L', 'parts.inductor.inductanceH');
    expect(h.undo()).toBe('4.7'); // the sealed run is one step
    expect(h.undo()).toBe('4'); // the typed run before it is one step
    expect(h.canUndo).toBe(false);
  });

  it('edits to different fields never merge', () => {
    const h = new History(0);
    h.apply(1, 'Edit a', 'a');
    h.apply(2, 'Edit b', 'b');
    expect(h.undo()).toBe(1);
    expect(h.undoLabel).toBe('Edit a');
  });

  it('a new edit after undo clears the redo list', () => {
    const h = new History(0);
    h.apply(1, 'one');
    h.undo();
    h.apply(2, 'two');
    expect(h.canRedo).toBe(false);
    expect(h.redo()).toBeNull();
  });

  it('gives each snapshot a revision so undoing to the saved one reads as clean', () => {
    const h = new History('saved');
    const saved = h.revision;
    h.apply('changed', 'edit');
    expect(h.revision).not.toBe(saved);
    h.undo();
    expect(h.revision).toBe(saved);
  });

  it('records nothing when the value is unchanged', () => {
    const h = new History('same');
    expect(h.apply('same', 'no-op')).toBe(false);
    expect(h.canUndo).toBe(false);
  });

  it('keeps at most `limit` steps', () => {
    const h = new History(0, 3);
    for (let i = 1; i <= 10; i++) h.apply(i, `edit ${i}`);
    let steps = 0;
    while (h.undo() !== null) steps++;
    expect(steps).toBe(3);
    expect(h.present).toBe(7);
  });
});
