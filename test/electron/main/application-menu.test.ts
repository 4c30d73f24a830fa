// @vitest-environment node
import type { MenuItemConstructorOptions } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import { buildMenuTemplate } from '../../../electron/main/application-menu.ts';
import type { MenuSettings } from '../../../electron/main/application-menu.ts';

function flatten(items: readonly MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return items.flatMap((item) => [item, ...(Array.isArray(item.submenu) ? flatten(item.submenu) : [])]);
}

function settings(overrides: Partial<MenuSettings> = {}): MenuSettings {
  return {
    platform: 'linux',
    recentFiles: [],
    sendCommand: vi.fn(),
    clearRecentFiles: vi.fn(),
    showAbout: vi.fn(),
    ...overrides,
  };
}

function click(item: MenuItemConstructorOptions | undefined): void {
  (item?.click as (() => void) | undefined)?.();
}

describe('buildMenuTemplate()', () => {
  it('gives the document commands their usual shortcuts and sends each to the renderer', () => {
    const menu = settings();
    const items = flatten(buildMenuTemplate(menu));
    // Shortcuts as in the platforms' guidelines (Apple Human Interface Guidelines, "Keyboard shortcuts";
    // Microsoft, "Guidelines for keyboard accelerators"): N new, O open, S save, Shift+S save as, P print.
    const expected: [string, string, string][] = [
      ['New Topic', 'CmdOrCtrl+N', 'new'],
      ['Open…', 'CmdOrCtrl+O', 'open'],
      ['Save', 'CmdOrCtrl+S', 'save'],
      ['Save As…', 'CmdOrCtrl+Shift+S', 'save-as'],
      ['Export Handout as PDF…', 'CmdOrCtrl+E', 'export-handout'],
      ['Print Handout…', 'CmdOrCtrl+P', 'print-handout'],
    ];
    for (const [label, accelerator, name] of expected) {
      const item = items.find((entry) => entry.label === label);
      expect(item?.accelerator, label).toBe(accelerator);
      click(item);
      expect(menu.sendCommand).toHaveBeenLastCalledWith({ name });
    }
  });

  it('uses the system roles for undo, redo, clipboard, zoom and full screen', () => {
    const roles = flatten(buildMenuTemplate(settings()))
      .map((item) => item.role)
      .filter((role) => role !== undefined);
    for (const role of [
      'undo',
      'redo',
      'cut',
      'copy',
      'paste',
      'selectAll',
      'resetZoom',
      'zoomIn',
      'zoomOut',
      'togglefullscreen',
      'quit',
    ]) {
      expect(roles, role).toContain(role);
    }
  });

  it('lists recent files by name and sends their full path when chosen', () => {
    const menu = settings({ recentFiles: ['/home/a/heart.cwtopic', '/home/a/bowel.cwtopic'] });
    const items = flatten(buildMenuTemplate(menu));
    const recent = items.find((item) => item.label === 'Open Recent');
    const entries = (recent?.submenu as MenuItemConstructorOptions[]).map((item) => item.label ?? item.type);
    expect(entries).toEqual(['heart.cwtopic', 'bowel.cwtopic', 'separator', 'Clear Recent']);
    click(items.find((item) => item.label === 'bowel.cwtopic'));
    expect(menu.sendCommand).toHaveBeenLastCalledWith({ name: 'open-recent', recentPath: '/home/a/bowel.cwtopic' });
    click(items.find((item) => item.label === 'Clear Recent'));
    expect(menu.clearRecentFiles).toHaveBeenCalledOnce();
  });

  it('shows a disabled placeholder when there are no recent files', () => {
    const items = flatten(buildMenuTemplate(settings()));
    expect(items.find((item) => item.label === 'No recent files')?.enabled).toBe(false);
    expect(items.find((item) => item.label === 'Clear Recent')?.enabled).toBe(false);
  });

  it('puts About in Help on Windows and Linux, and in the app menu on macOS', () => {
    const linux = buildMenuTemplate(settings());
    expect(linux.map((item) => item.label ?? item.role)).toEqual(['File', 'Edit', 'View', 'windowMenu', 'Help']);
    const mac = settings({ platform: 'darwin' });
    const macMenu = buildMenuTemplate(mac);
    expect(macMenu.map((item) => item.label ?? item.role)).toEqual(['Chancewise', 'File', 'Edit', 'View', 'windowMenu']);
    click(flatten(macMenu).find((item) => item.label === 'About Chancewise'));
    expect(mac.showAbout).toHaveBeenCalledOnce();
    expect(flatten(macMenu).filter((item) => item.role === 'close')).toHaveLength(1);
  });
});
