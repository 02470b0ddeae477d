import { describe, expect, it } from 'vitest';
import type { MenuCommand } from '../../../shared-model/index.ts';
import { flattenMenu, menuTemplate } from '../../../src-main/menu/menu-template.ts';
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
    expect(commandForKey(chord('p', { ctrlKey: true }), false)).toBe('print-report'); // common practice: Ctrl+P print; same chord as the menu's Print Report to PDF
    expect(commandForKey(chord('E', { ctrlKey: true, shiftKey: true }), false)).toBe('export-report'); // the menu's Export Report accelerator (menu-template.ts)
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
    expect(shortcutLabel('save-as', false)).toBe('Ctrl+Shift+S'); // common practice
    expect(shortcutLabel('undo', true)).toBe('⌘Z'); // common practice: Cmd+Z on macOS
    expect(shortcutLabel('redo', false)).toBe('Ctrl+Shift+Z'); // common practice on Linux (GNOME/KDE); Ctrl+Y still works as a second key
    expect(commandForKey(chord('y', { ctrlKey: true }), false)).toBe('redo'); // the second redo key is kept
    expect(shortcutLabel('new', false)).toBeNull();
  });
});

/** An Electron accelerator ("CmdOrCtrl+Shift+Z") written the way shortcutLabel writes it. */
function acceleratorLabel(accelerator: string, isMac: boolean): string {
  const keys = accelerator.split('+');
  const key = keys.pop()!;
  const mods = new Set(keys.map((k) => (k === 'CmdOrCtrl' ? (isMac ? 'Command' : 'Ctrl') : k)));
  if (isMac) return `${mods.has('Shift') ? '⇧' : ''}${mods.has('Command') ? '⌘' : ''}${key}`;
  return `${['Ctrl', 'Shift'].filter((m) => mods.has(m)).map((m) => `${m}+`).join('')}${key}`;
}

describe.each([
  ['linux', false, false],
  ['win32', false, true],
  ['darwin', true, false],
] as const)('the labels on %s', (platform, isMac, isWindows) => {
  const commands: MenuCommand[] = ['undo', 'redo', 'save', 'save-as', 'open', 'print-report', 'export-report'];
  it.each(commands)('show the chord of the application menu for %s', (command) => {
    const item = flattenMenu(menuTemplate({ platform, recent: [], devTools: false })).find((n) => n.action?.kind === 'command' && n.action.command === command);
    expect(item?.accelerator, `menu item for ${command}`).toBeDefined();
    expect(shortcutLabel(command, isMac, isWindows)).toBe(acceleratorLabel(item!.accelerator!, isMac)); // the menu template (src-main/menu/menu-template.ts) is the reference
  });
});
