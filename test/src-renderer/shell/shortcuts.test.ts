import { describe, expect, it } from 'vitest';
import { commandForKey, shortcutLabel } from '../../../src-renderer/shell/shortcuts.ts';

const chord = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({
  key,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  altKey: false,
  ...mods,
});

describe('keyboard shortcuts', () => {
  it('maps the usual chords on Linux and Windows', () => {
    expect(commandForKey(chord('z', { ctrlKey: true }), false)).toBe('undo'); // common practice: Ctrl+Z undo
    expect(commandForKey(chord('Z', { ctrlKey: true, shiftKey: true }), false)).toBe('redo'); // common practice: Ctrl+Shift+Z redo
    expect(commandForKey(chord('y', { ctrlKey: true }), false)).toBe('redo'); // common practice: Ctrl+Y redo on Windows
    expect(commandForKey(chord('s', { ctrlKey: true }), false)).toBe('save'); // common practice: Ctrl+S save
    expect(commandForKey(chord('S', { ctrlKey: true, shiftKey: true }), false)).toBe('save-as'); // common practice
    expect(commandForKey(chord('o', { ctrlKey: true }), false)).toBe('open'); // common practice
  });

  it('uses Cmd on macOS and ignores Ctrl there', () => {
    expect(commandForKey(chord('z', { metaKey: true }), true)).toBe('undo'); // common practice: Cmd+Z on macOS
    expect(commandForKey(chord('z', { ctrlKey: true }), true)).toBeNull();
    expect(commandForKey(chord('y', { metaKey: true }), true)).toBeNull();
  });

  it('ignores plain keys and Alt chords', () => {
    expect(commandForKey(chord('z'), false)).toBeNull();
    expect(commandForKey(chord('z', { ctrlKey: true, altKey: true }), false)).toBeNull();
  });

  it('labels shortcuts for the buttons', () => {
    expect(shortcutLabel('save-as', false)).toBe('Ctrl+Shift+S');
    expect(shortcutLabel('undo', true)).toBe('⌘Z');
    expect(shortcutLabel('new', false)).toBeNull();
  });
});
