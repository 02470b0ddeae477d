/**
 * The application menu as plain data, built per platform with the platform's usual structure and
 * accelerators (macOS: app menu first, Cmd shortcuts, Window menu; Windows: Exit without a shortcut,
 * Ctrl+Y for redo; Linux: Quit on Ctrl+Q, Ctrl+Shift+Z for redo). Items either carry an Electron role
 * (clipboard, zoom, window handling) or an action that main dispatches: a MenuCommand sent to the
 * renderer, opening a recent file, clearing the recent list, or quitting.
 */
import nodePath from 'node:path';
import type { MenuCommand } from '../../shared-model/index.ts';
import { APP_NAME } from '../window/title.ts';

export type MenuAction =
  | { kind: 'command'; command: MenuCommand }
  | { kind: 'open-recent'; path: string }
  | { kind: 'clear-recent' }
  | { kind: 'quit' };

export type MenuRole =
  | 'about'
  | 'services'
  | 'hide'
  | 'hideOthers'
  | 'unhide'
  | 'quit'
  | 'cut'
  | 'copy'
  | 'paste'
  | 'selectAll'
  | 'close'
  | 'minimize'
  | 'zoom'
  | 'front'
  | 'resetZoom'
  | 'zoomIn'
  | 'zoomOut'
  | 'togglefullscreen'
  | 'toggleDevTools';

export interface MenuNode {
  label?: string;
  accelerator?: string;
  role?: MenuRole;
  action?: MenuAction;
  separator?: true;
  enabled?: boolean;
  submenu?: MenuNode[];
}

export interface MenuOptions {
  platform: NodeJS.Platform;
  recent: readonly string[];
  /** Developer tools entry (development builds only). */
  devTools: boolean;
}

const separator: MenuNode = { separator: true };

function command(label: string, name: MenuCommand, accelerator?: string): MenuNode {
  return accelerator ? { label, accelerator, action: { kind: 'command', command: name } } : { label, action: { kind: 'command', command: name } };
}

function recentMenu(recent: readonly string[]): MenuNode {
  const items: MenuNode[] =
    recent.length === 0
      ? [{ label: 'No recent files', enabled: false }]
      : recent.map((path) => ({ label: `${nodePath.basename(path)} — ${nodePath.dirname(path)}`, action: { kind: 'open-recent', path } }));
  return { label: 'Open Recent', submenu: [...items, separator, { label: 'Clear Recent List', enabled: recent.length > 0, action: { kind: 'clear-recent' } }] };
}

export function menuTemplate(options: MenuOptions): MenuNode[] {
  const mac = options.platform === 'darwin';
  const windows = options.platform === 'win32';
  const top = (label: string): string => (mac ? label : `&${label}`);

  const appMenu: MenuNode = {
    label: APP_NAME,
    submenu: [
      { label: `About ${APP_NAME}`, role: 'about' },
      separator,
      { label: 'Services', role: 'services' },
      separator,
      { label: `Hide ${APP_NAME}`, role: 'hide', accelerator: 'Command+H' },
      { label: 'Hide Others', role: 'hideOthers', accelerator: 'Command+Alt+H' },
      { label: 'Show All', role: 'unhide' },
      separator,
      { label: `Quit ${APP_NAME}`, accelerator: 'Command+Q', action: { kind: 'quit' } },
    ],
  };

  const quitItem: MenuNode = windows ? { label: 'Exit', action: { kind: 'quit' } } : { label: 'Quit', accelerator: 'Ctrl+Q', action: { kind: 'quit' } };

  const fileMenu: MenuNode = {
    label: top('File'),
    submenu: [
      command('New Design', 'new', 'CmdOrCtrl+N'),
      command('Open…', 'open', 'CmdOrCtrl+O'),
      recentMenu(options.recent),
      separator,
      command('Save', 'save', 'CmdOrCtrl+S'),
      command('Save As…', 'save-as', 'CmdOrCtrl+Shift+S'),
      separator,
      command('Export Report as HTML…', 'export-report', 'CmdOrCtrl+Shift+E'),
      command('Print Report to PDF…', 'print-report', 'CmdOrCtrl+P'),
      separator,
      ...(mac ? [{ label: 'Close Window', role: 'close', accelerator: 'Command+W' } satisfies MenuNode] : [quitItem]),
    ],
  };

  const editMenu: MenuNode = {
    label: top('Edit'),
    submenu: [
      command('Undo', 'undo', 'CmdOrCtrl+Z'),
      command('Redo', 'redo', windows ? 'Ctrl+Y' : 'CmdOrCtrl+Shift+Z'),
      separator,
      { label: 'Cut', role: 'cut', accelerator: 'CmdOrCtrl+X' },
      { label: 'Copy', role: 'copy', accelerator: 'CmdOrCtrl+C' },
      { label: 'Paste', role: 'paste', accelerator: 'CmdOrCtrl+V' },
      { label: 'Select All', role: 'selectAll', accelerator: 'CmdOrCtrl+A' },
    ],
  };

  const viewMenu: MenuNode = {
    label: top('View'),
    submenu: [
      command('Part Library', 'open-library', 'CmdOrCtrl+L'),
      separator,
      { label: 'Actual Size', role: 'resetZoom', accelerator: 'CmdOrCtrl+0' },
      { label: 'Zoom In', role: 'zoomIn', accelerator: 'CmdOrCtrl+Plus' },
      { label: 'Zoom Out', role: 'zoomOut', accelerator: 'CmdOrCtrl+-' },
      separator,
      { label: 'Full Screen', role: 'togglefullscreen', accelerator: mac ? 'Ctrl+Command+F' : 'F11' },
      ...(options.devTools ? [separator, { label: 'Developer Tools', role: 'toggleDevTools', accelerator: mac ? 'Alt+Command+I' : 'Ctrl+Shift+I' } satisfies MenuNode] : []),
    ],
  };

  const windowMenu: MenuNode = {
    label: top('Window'),
    submenu: mac
      ? [{ label: 'Minimize', role: 'minimize', accelerator: 'Command+M' }, { label: 'Zoom', role: 'zoom' }, separator, { label: 'Bring All to Front', role: 'front' }]
      : [{ label: 'Minimize', role: 'minimize' }, { label: 'Close', role: 'close', accelerator: 'Ctrl+W' }],
  };

  return mac ? [appMenu, fileMenu, editMenu, viewMenu, windowMenu] : [fileMenu, editMenu, viewMenu, windowMenu];
}

/** Every item in a template, depth first (for tests and for accelerator checks). */
export function flattenMenu(nodes: readonly MenuNode[]): MenuNode[] {
  return nodes.flatMap((node) => [node, ...(node.submenu ? flattenMenu(node.submenu) : [])]);
}
