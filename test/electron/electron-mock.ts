// A hand-written stand-in for the `electron` module in main-process tests (the real package would
// try to download Electron). Each test file resets it with `resetElectronMock()`.
import { vi } from 'vitest';

type Listener = (...args: unknown[]) => void;

class Emitter {
  readonly listeners = new Map<string, Listener[]>();

  on(event: string, listener: Listener): this {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }

  once(event: string, listener: Listener): this {
    return this.on(event, listener);
  }

  /** Call every listener of an event; returns whether one of them called preventDefault(). */
  emit(event: string, ...args: unknown[]): boolean {
    let prevented = false;
    const first = { preventDefault: () => (prevented = true) };
    for (const listener of this.listeners.get(event) ?? []) listener(first, ...args);
    return prevented;
  }
}

export class FakeWebContents extends Emitter {
  readonly sent: [string, unknown][] = [];
  readonly print = vi.fn((_options: unknown, callback: (success: boolean, reason: string) => void) => {
    callback(true, '');
  });

  send(channel: string, message: unknown): void {
    this.sent.push([channel, message]);
  }
}

export class FakeBrowserWindow extends Emitter {
  static readonly created: FakeBrowserWindow[] = [];
  readonly webContents = new FakeWebContents();
  readonly loaded: string[] = [];
  title = '';
  destroyed = false;
  readonly close = vi.fn(() => {
    if (!this.emit('close')) this.destroyed = true;
  });

  constructor(readonly options: unknown) {
    super();
    FakeBrowserWindow.created.push(this);
  }

  async loadURL(url: string): Promise<void> {
    this.loaded.push(url);
  }

  isDestroyed(): boolean {
    return this.destroyed;
  }

  setTitle(title: string): void {
    this.title = title;
  }

  getNormalBounds() {
    return { x: 10, y: 20, width: 1000, height: 700 };
  }

  isMaximized(): boolean {
    return false;
  }

  isMinimized(): boolean {
    return false;
  }

  maximize(): void {}
  setRepresentedFilename(): void {}
  setDocumentEdited(): void {}
  restore(): void {}
  show(): void {}
  focus(): void {}
}

export const app = {
  isPackaged: false,
  getPath: vi.fn((name: string) => `/fake/${name}`),
  getVersion: () => '0.1.0',
  addRecentDocument: vi.fn(),
  clearRecentDocuments: vi.fn(),
  showAboutPanel: vi.fn(),
  setAboutPanelOptions: vi.fn(),
  quit: vi.fn(),
  exit: vi.fn(),
  on: vi.fn(),
  whenReady: vi.fn(async () => undefined),
  getAppPath: () => '/app',
  commandLine: { hasSwitch: vi.fn((_name: string) => false) },
  enableSandbox: vi.fn(),
  setPath: vi.fn(),
  requestSingleInstanceLock: vi.fn(() => true),
};

export const protocol = { registerSchemesAsPrivileged: vi.fn(), handle: vi.fn() };
export const ipcMain = { handle: vi.fn() };
export const shell = { openExternal: vi.fn(async () => undefined), openPath: vi.fn(async (_path: string) => '') };
export const session = { defaultSession: {} };

export const dialog = {
  showMessageBox: vi.fn(async () => ({ response: 1, checkboxChecked: false })),
  showSaveDialog: vi.fn(async () => ({ canceled: true, filePath: '' })),
  showOpenDialog: vi.fn(async () => ({ canceled: true, filePaths: [] as string[] })),
  showErrorBox: vi.fn(),
};

export const Menu = {
  buildFromTemplate: vi.fn((template: unknown) => ({ template })),
  setApplicationMenu: vi.fn(),
};

const workArea = { x: 0, y: 0, width: 1920, height: 1040 };
export const screen = {
  getPrimaryDisplay: () => ({ workArea }),
  getAllDisplays: () => [{ workArea }],
};

export const BrowserWindow = FakeBrowserWindow;

/** Forget every window and recorded call. */
export function resetElectronMock(): void {
  FakeBrowserWindow.created.length = 0;
  vi.clearAllMocks();
  dialog.showMessageBox.mockImplementation(async () => ({ response: 1, checkboxChecked: false }));
  dialog.showSaveDialog.mockImplementation(async () => ({ canceled: true, filePath: '' }));
  dialog.showOpenDialog.mockImplementation(async () => ({ canceled: true, filePaths: [] }));
}
