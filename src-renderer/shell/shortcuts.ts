/**
 * Keyboard shortcuts of the browser build (in Electron the application menu owns the accelerators and
 * sends the same commands). Ctrl on Linux and Windows, Cmd on macOS. The labels follow the menu
 * (src-main/menu/menu-template.ts): redo is Ctrl+Shift+Z on Linux, Ctrl+Y on Windows, ⇧⌘Z on macOS;
 * the browser build accepts Ctrl+Y as a second redo key on Linux and Windows.
 */
import type { MenuCommand } from '../../shared-model/index.ts';

export interface KeyChord {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

export function commandForKey(event: KeyChord, isMac: boolean): MenuCommand | null {
  const primary = isMac ? event.metaKey : event.ctrlKey;
  if (!primary || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !isMac && !event.shiftKey) return 'redo';
  if (key === 's') return event.shiftKey ? 'save-as' : 'save';
  if (key === 'o' && !event.shiftKey) return 'open';
  if (key === 'p' && !event.shiftKey) return 'print-report';
  if (key === 'e' && event.shiftKey) return 'export-report';
  return null;
}

/** Text shown beside a command, e.g. "Ctrl+Shift+S" (the same chord the menu of that platform uses). */
export function shortcutLabel(command: MenuCommand, isMac: boolean, isWindows = false): string | null {
  const mod = isMac ? '⌘' : 'Ctrl+';
  const shift = isMac ? '⇧' : 'Shift+';
  switch (command) {
    case 'undo':
      return `${mod}Z`;
    case 'redo':
      if (isMac) return `${shift}${mod}Z`;
      return isWindows ? `${mod}Y` : `${mod}${shift}Z`;
    case 'save':
      return `${mod}S`;
    case 'save-as':
      return isMac ? `${shift}${mod}S` : `${mod}${shift}S`;
    case 'open':
      return `${mod}O`;
    case 'print-report':
      return `${mod}P`;
    case 'export-report':
      return isMac ? `${shift}${mod}E` : `${mod}${shift}E`;
    default:
      return null;
  }
}
