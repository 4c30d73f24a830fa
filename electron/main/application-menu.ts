import path from 'node:path';
import type { MenuItemConstructorOptions } from 'electron';
import type { ShellCommand } from '../contract/ipc-contract.ts';

/** What the menu needs from the running shell. */
export interface MenuSettings {
  readonly platform: NodeJS.Platform;
  readonly recentFiles: readonly string[];
  /** Send a command to the renderer (on the one command channel). */
  readonly sendCommand: (command: ShellCommand) => void;
  readonly clearRecentFiles: () => void;
  readonly showAbout: () => void;
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
  const files: MenuItemConstructorOptions[] = settings.recentFiles.map((filePath) =>
    commandItem(path.basename(filePath), null, { name: 'open-recent', recentPath: filePath }, settings),
  );
  return {
    label: 'Open Recent',
    submenu: [
      ...(files.length === 0 ? [{ label: 'No recent files', enabled: false }] : files),
      { type: 'separator' },
      { label: 'Clear Recent', enabled: files.length > 0, click: settings.clearRecentFiles },
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
  const about: MenuItemConstructorOptions = { label: 'About Chancewise', click: settings.showAbout };
  const fileMenu: MenuItemConstructorOptions = {
    label: 'File',
    submenu: [
      commandItem('New Topic', 'CmdOrCtrl+N', { name: 'new' }, settings),
      commandItem('Open…', 'CmdOrCtrl+O', { name: 'open' }, settings),
      recentMenu(settings),
      { type: 'separator' },
      commandItem('Save', 'CmdOrCtrl+S', { name: 'save' }, settings),
      commandItem('Save As…', 'CmdOrCtrl+Shift+S', { name: 'save-as' }, settings),
      { type: 'separator' },
      commandItem('Export Handout as PDF…', 'CmdOrCtrl+E', { name: 'export-handout' }, settings),
      commandItem('Print Handout…', 'CmdOrCtrl+P', { name: 'print-handout' }, settings),
      { type: 'separator' },
      isMac ? { role: 'close' } : { role: 'quit' },
    ],
  };
  const editMenu: MenuItemConstructorOptions = {
    label: 'Edit',
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
    label: 'View',
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
      label: 'Chancewise',
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
  const helpMenu: MenuItemConstructorOptions = { label: 'Help', submenu: [about] };
  return [fileMenu, editMenu, viewMenu, windowMenu, helpMenu];
}
