import { describe, expect, it } from 'vitest';
import type { MenuCommand } from '../../../shared-model/index.ts';
import { flattenMenu, menuTemplate, type MenuNode } from '../../../src-main/menu/menu-template.ts';

const ALL_COMMANDS: MenuCommand[] = ['new', 'open', 'save', 'save-as', 'export-report', 'print-report', 'undo', 'redo', 'open-library'];
const platforms: NodeJS.Platform[] = ['darwin', 'win32', 'linux'];

function items(platform: NodeJS.Platform, recent: string[] = []): MenuNode[] {
  return flattenMenu(menuTemplate({ platform, recent, devTools: false }));
}
function byCommand(platform: NodeJS.Platform, command: MenuCommand): MenuNode | undefined {
  return items(platform).find((node) => node.action?.kind === 'command' && node.action.command === command);
}

describe('menuTemplate()', () => {
  it('offers every MenuCommand exactly once on every platform', () => {
    for (const platform of platforms) {
      const commands = items(platform).flatMap((node) => (node.action?.kind === 'command' ? [node.action.command] : []));
      expect(commands.sort(), platform).toEqual([...ALL_COMMANDS].sort());
    }
  });

  it('uses the usual accelerators', () => {
    for (const platform of platforms) {
      expect(byCommand(platform, 'new')?.accelerator).toBe('CmdOrCtrl+N'); // Apple HIG menus / Windows UX guidelines standard shortcuts [from memory]
      expect(byCommand(platform, 'open')?.accelerator).toBe('CmdOrCtrl+O');
      expect(byCommand(platform, 'save')?.accelerator).toBe('CmdOrCtrl+S');
      expect(byCommand(platform, 'save-as')?.accelerator).toBe('CmdOrCtrl+Shift+S');
      expect(byCommand(platform, 'print-report')?.accelerator).toBe('CmdOrCtrl+P');
      expect(byCommand(platform, 'undo')?.accelerator).toBe('CmdOrCtrl+Z');
    }
    expect(byCommand('darwin', 'redo')?.accelerator).toBe('CmdOrCtrl+Shift+Z'); // Apple HIG: Redo ⇧⌘Z [from memory]
    expect(byCommand('win32', 'redo')?.accelerator).toBe('Ctrl+Y'); // Windows guidelines: Redo Ctrl+Y [from memory]
    expect(byCommand('linux', 'redo')?.accelerator).toBe('CmdOrCtrl+Shift+Z'); // GNOME HIG keyboard shortcuts: Redo Shift+Ctrl+Z [from memory]
  });

  it('has no accelerator twice', () => {
    for (const platform of platforms) {
      const accelerators = items(platform).flatMap((node) => (node.accelerator ? [node.accelerator] : []));
      expect(new Set(accelerators).size, platform).toBe(accelerators.length);
    }
  });

  it('puts the app menu first on macOS with Quit on Cmd+Q, and Quit or Exit in the File menu elsewhere', () => {
    const mac = menuTemplate({ platform: 'darwin', recent: [], devTools: false });
    expect(mac.map((menu) => menu.label)).toEqual(['WattLedger', 'File', 'Edit', 'View', 'Window']); // Apple HIG: app menu, File, Edit, View, Window [from memory]
    expect(mac[0]?.submenu?.find((node) => node.action?.kind === 'quit')?.accelerator).toBe('Command+Q');
    const win = menuTemplate({ platform: 'win32', recent: [], devTools: false });
    expect(win.map((menu) => menu.label)).toEqual(['&File', '&Edit', '&View', '&Window']); // Windows access keys with & [from memory]
    const exit = win[0]?.submenu?.at(-1);
    expect(exit).toMatchObject({ label: 'Exit', action: { kind: 'quit' } }); // Windows: File ▸ Exit, closed by Alt+F4 [from memory]
    expect(exit?.accelerator).toBeUndefined();
    expect(menuTemplate({ platform: 'linux', recent: [], devTools: false })[0]?.submenu?.at(-1)).toMatchObject({ label: 'Quit', accelerator: 'Ctrl+Q' }); // GNOME HIG: Quit Ctrl+Q [from memory]
  });

  it('lists recent files by name and folder, newest first, with a way to clear them', () => {
    const recent = items('linux', ['/home/u/designs/buck.json', '/home/u/old/boost.json']);
    const opens = recent.filter((node) => node.action?.kind === 'open-recent');
    expect(opens.map((node) => node.label)).toEqual(['buck.json — /home/u/designs', 'boost.json — /home/u/old']);
    expect(recent.find((node) => node.action?.kind === 'clear-recent')?.enabled).toBe(true);
    const none = items('linux');
    expect(none.find((node) => node.label === 'No recent files')?.enabled).toBe(false);
    expect(none.find((node) => node.action?.kind === 'clear-recent')?.enabled).toBe(false);
  });

  it('shows developer tools only in development builds', () => {
    expect(items('linux').some((node) => node.role === 'toggleDevTools')).toBe(false);
    expect(flattenMenu(menuTemplate({ platform: 'linux', recent: [], devTools: true })).some((node) => node.role === 'toggleDevTools')).toBe(true);
  });
});
