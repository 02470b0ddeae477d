/**
 * The application menu (Electron glue around menu/menu-template.ts): roles go to Electron, actions are
 * dispatched here — commands to the renderer, recent files opened by main, quit through the close guard.
 */
import { app, Menu, type MenuItemConstructorOptions } from 'electron';
import { EVENT_CHANNELS } from '../ipc/channels.ts';
import { menuTemplate, type MenuAction, type MenuNode } from '../menu/menu-template.ts';
import type { AppContext } from './context.ts';
import { sendToRenderer } from './window.ts';

function dispatch(context: AppContext, action: MenuAction): void {
  switch (action.kind) {
    case 'command':
      sendToRenderer(context, EVENT_CHANNELS.menuCommand, action.command);
      return;
    case 'open-recent':
      void context.openFromOutside(action.path);
      return;
    case 'clear-recent':
      void context.recent.clear().then((list) => context.rebuildMenu(list));
      if (process.platform !== 'linux') app.clearRecentDocuments();
      return;
    case 'quit':
      app.quit();
      return;
  }
}

function toElectron(context: AppContext, node: MenuNode): MenuItemConstructorOptions {
  if (node.separator) return { type: 'separator' };
  const item: MenuItemConstructorOptions = {};
  if (node.label !== undefined) item.label = node.label;
  if (node.accelerator !== undefined) item.accelerator = node.accelerator;
  if (node.enabled !== undefined) item.enabled = node.enabled;
  if (node.role !== undefined) item.role = node.role;
  const action = node.action;
  if (action) item.click = () => dispatch(context, action);
  if (node.submenu) item.submenu = node.submenu.map((child) => toElectron(context, child));
  return item;
}

export function setupMenu(context: AppContext): void {
  context.rebuildMenu = (recent) => {
    const template = menuTemplate({ platform: process.platform, recent, devTools: !context.packaged });
    Menu.setApplicationMenu(Menu.buildFromTemplate(template.map((node) => toElectron(context, node))));
    if (process.platform !== 'linux') for (const path of [...recent].reverse()) app.addRecentDocument(path);
  };
  context.rebuildMenu([]);
  // Listing a recent file does not make it writable: it is granted when the user opens it again.
  void context.recent.list().then((list) => context.rebuildMenu(list));
}
