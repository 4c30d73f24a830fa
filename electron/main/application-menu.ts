import path from 'node:path';
import type { MenuItemConstructorOptions } from 'electron';
import type { ShellCommand } from '../contract/ipc-contract.ts';
import { shellMessagesEn } from './messages/en.ts';
import type { ShellMessages } from './messages/shell-messages.ts';

/** What the menu needs from the running shell. */
export interface MenuSettings {
  readonly platform: NodeJS.Platform;
  readonly recentFiles: readonly string[];
  /** Send a command to the renderer (on the one command channel). */
  readonly sendCommand: (command: ShellCommand) => void;
  readonly clearRecentFiles: () => void;
  readonly showAbout: () => void;
  /** The menu's words (English unless given). */
  readonly words?: ShellMessages;
}

function commandItem(
  label: string,
  accelerator: string | null,
  command: ShellCommand,
  settings: MenuSettings,
): MenuItemConstructorOptions {
  return {
    label,
    ...(accelerator === null ? {} : { accelerator }),
    click: () => {
      settings.sendCommand(command);
    },
  };
}

function recentMenu(settings: MenuSettings): MenuItemConstructorOptions {
  const menu = (settings.words ?? shellMessagesEn).menu;
  const files: MenuItemConstructorOptions[] = settings.recentFiles.map((filePath) =>
    commandItem(path.basename(filePath), null, { name: 'open-recent', recentPath: filePath }, settings),
  );
  return {
    label: menu.openRecent,
    submenu: [
      ...(files.length === 0 ? [{ label: menu.noRecent, enabled: false }] : files),
      { type: 'separator' },
      { label: menu.clearRecent, enabled: files.length > 0, click: settings.clearRecentFiles },
    ],
  };
}

/**
 * The application menu with the usual shortcuts. Document commands (new, open, open recent,
 * save, save as, export handout, print) go to the renderer as commands, which decides what
 * to do (for instance about unsaved changes); editing, zoom and full screen are the
 * system's own roles. On macOS the app menu comes first and holds About and Quit.
 */
export function buildMenuTemplate(settings: MenuSettings): MenuItemConstructorOptions[] {
  const isMac = settings.platform === 'darwin';
  const menu = (settings.words ?? shellMessagesEn).menu;
  const about: MenuItemConstructorOptions = { label: menu.about, click: settings.showAbout };
  const fileMenu: MenuItemConstructorOptions = {
    label: menu.file,
    submenu: [
      commandItem(menu.newTopic, 'CmdOrCtrl+N', { name: 'new' }, settings),
      commandItem(menu.open, 'CmdOrCtrl+O', { name: 'open' }, settings),
      recentMenu(settings),
      { type: 'separator' },
      commandItem(menu.save, 'CmdOrCtrl+S', { name: 'save' }, settings),
      commandItem(menu.saveAs, 'CmdOrCtrl+Shift+S', { name: 'save-as' }, settings),
      { type: 'separator' },
      commandItem(menu.exportHandout, 'CmdOrCtrl+E', { name: 'export-handout' }, settings),
      commandItem(menu.printHandout, 'CmdOrCtrl+P', { name: 'print-handout' }, settings),
      { type: 'separator' },
      isMac ? { role: 'close' } : { role: 'quit' },
    ],
  };
  const editMenu: MenuItemConstructorOptions = {
    label: menu.edit,
    submenu: [
      { role: 'undo' },
      { role: 'redo' },
      { type: 'separator' },
      { role: 'cut' },
      { role: 'copy' },
      { role: 'paste' },
      { role: 'selectAll' },
    ],
  };
  const viewMenu: MenuItemConstructorOptions = {
    label: menu.view,
    submenu: [
      { role: 'resetZoom' },
      { role: 'zoomIn' },
      { role: 'zoomOut' },
      { type: 'separator' },
      { role: 'togglefullscreen' },
    ],
  };
  const windowMenu: MenuItemConstructorOptions = { role: 'windowMenu' };
  if (isMac) {
    const appMenu: MenuItemConstructorOptions = {
      label: menu.app,
      submenu: [
        about,
        { type: 'separator' },
        { role: 'hide' },
        { role: 'hideOthers' },
        { role: 'unhide' },
        { type: 'separator' },
        { role: 'quit' },
      ],
    };
    return [appMenu, fileMenu, editMenu, viewMenu, windowMenu];
  }
  const helpMenu: MenuItemConstructorOptions = { label: menu.help, submenu: [about] };
  return [fileMenu, editMenu, viewMenu, windowMenu, helpMenu];
}
