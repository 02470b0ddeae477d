/**
 * Keyboard shortcuts of the browser build (in Electron the application menu owns the accelerators and
 * sends the same commands). Ctrl on Linux and Windows, Cmd on macOS.
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
  return null;
}

/** Text shown beside a command, e.g. "Ctrl+Shift+S". */
export function shortcutLabel(command: MenuCommand, isMac: boolean): string | null {
  const mod = isMac ? '⌘' : 'Ctrl+';
  const shift = isMac ? '⇧' : 'Shift+';
  switch (command) {
    case 'undo':
      return `${mod}Z`;
    case 'redo':
      return isMac ? `${shift}${mod}Z` : `${mod}Y`;
    case 'save':
      return `${mod}S`;
    case 'save-as':
      return isMac ? `${shift}${mod}S` : `${mod}${shift}S`;
    case 'open':
      return `${mod}O`;
    default:
      return null;
  }
}
