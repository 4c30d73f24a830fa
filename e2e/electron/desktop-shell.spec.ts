import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import { join } from 'node:path';
import { _electron as electron, expect, test } from '@playwright/test';
import type { ElectronApplication, Page } from '@playwright/test';
import { electronExecutable, hasDisplay, launchEnvironment, projectRoot } from './electron-binary.ts';

const executable = electronExecutable();
const hasBinary = executable !== null;
const demoTopic = join(projectRoot, 'assets', 'demo', '01-kidney-stone.json');

test.describe('the desktop shell', () => {
  test.skip(!hasBinary, 'no Electron binary on this machine (offline)');
  test.skip(!hasDisplay(), 'no display for an Electron window (run under xvfb-run)');
  test.describe.configure({ mode: 'serial' });

  let application: ElectronApplication;
  let page: Page;
  let userData: string;
  const warnings: string[] = [];

  test.beforeAll(async () => {
    test.setTimeout(180_000);
    for (const script of ['build', 'build:electron']) {
      const built = spawnSync(process.platform === 'win32' ? 'npm.cmd' : 'npm', ['run', '--silent', script], {
        cwd: projectRoot,
        stdio: 'inherit',
      });
      expect(built.status, `npm run ${script}`).toBe(0);
    }
    userData = mkdtempSync(join(os.tmpdir(), 'chancewise-e2e-'));
    application = await electron.launch({
      executablePath: executable ?? undefined,
      args: ['.', demoTopic],
      cwd: projectRoot,
      env: launchEnvironment(userData),
    });
    page = await application.firstWindow();
    page.on('console', (message) => {
      if (message.text().includes('Electron Security Warning')) warnings.push(message.text());
    });
    await page.waitForLoadState('load');
  });

  test.afterAll(async () => {
    await application?.close();
    if (userData !== undefined) rmSync(userData, { recursive: true, force: true });
  });

  test('loads the page from the app scheme, not from files or the network', async () => {
    // Electron security checklist items 1 and 18.
    expect(await page.evaluate(() => location.origin)).toBe('app://chancewise');
    const addresses = await page.evaluate(() => performance.getEntriesByType('resource').map((entry) => entry.name));
    for (const address of addresses)
      expect(address.startsWith('app://chancewise/') || address.startsWith('data:'), address).toBe(true);
  });

  test('gives the page no Node.js and only the shell API', async () => {
    // Checklist items 2, 3 and 20.
    expect(
      await page.evaluate(() => [
        typeof (globalThis as { require?: unknown }).require,
        typeof (globalThis as { process?: unknown }).process,
      ]),
    ).toEqual(['undefined', 'undefined']);
    expect(await page.evaluate(() => Object.keys(window.chancewise ?? {}).sort())).toEqual([
      'exportHandoutPdf',
      'newDocument',
      'onCommand',
      'onDocument',
      'openDocument',
      'openRecentDocument',
      'printHandout',
      'rendererReady',
      'saveDocument',
      'saveDocumentAs',
      'saveSnapshot',
    ]);
  });

  test('enforces the policy: eval is blocked', async () => {
    // Checklist item 7 (script-src 'self' without 'unsafe-eval').
    expect(
      await page.evaluate(() => {
        try {
          eval('1');
          return 'allowed';
        } catch {
          return 'blocked';
        }
      }),
    ).toBe('blocked');
  });

  test('stays on the app page when the page tries to navigate away or open a window', async () => {
    // Checklist items 13 and 14.
    await page.evaluate(() => {
      location.href = 'https://example.org/';
    });
    await page.waitForTimeout(500);
    expect(new URL(page.url()).origin).toBe('app://chancewise');
    expect(await page.evaluate(() => window.open('https://example.org/') === null)).toBe(true);
    expect(application.windows()).toHaveLength(1);
  });

  test('denies permissions', async () => {
    // Checklist item 5.
    expect(await page.evaluate(() => Notification.requestPermission())).toBe('denied');
  });

  test('answers a request from the page through the checked IPC channel', async () => {
    const result = await page.evaluate(() =>
      window.chancewise?.saveSnapshot({ content: { title: 'x' }, keepPatient: false, hasUnsavedChanges: false }),
    );
    expect(result?.ok).toBe(true);
  });

  test('prints no Electron security warning', async () => {
    expect(warnings).toEqual([]);
  });

  test('comes back on the app page after the renderer crashes', async () => {
    await application.evaluate(({ webContents }) => {
      webContents.getAllWebContents()[0]?.forcefullyCrashRenderer();
    });
    await expect.poll(async () => new URL(page.url()).origin, { timeout: 20_000 }).toBe('app://chancewise');
    await page.waitForLoadState('load');
    expect(await page.evaluate(() => typeof window.chancewise?.rendererReady)).toBe('function');
  });

  test('lets a second launch hand over and quit, keeping one window', async () => {
    // Chromium refuses to run as root without --no-sandbox (Playwright adds it to its own launches).
    const asRoot = typeof process.getuid === 'function' && process.getuid() === 0 ? ['--no-sandbox'] : [];
    const second = spawn(executable ?? '', [...asRoot, '.', demoTopic], {
      cwd: projectRoot,
      env: launchEnvironment(userData),
      stdio: 'ignore',
    });
    const code = await new Promise<number | null>((resolve) => second.once('exit', (exitCode) => resolve(exitCode)));
    expect(code).toBe(0);
    expect(application.windows()).toHaveLength(1);
  });
});
