// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAppAssetHandler } from '../../../../electron/main/web/serve-app-asset.ts';
import { contentSecurityPolicy } from '../../../../src/shared/content-security-policy.ts';

let base: string;
let appFolder: string;
let handle: (request: Request) => Promise<Response>;

beforeAll(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-asset-'));
  appFolder = path.join(base, 'dist');
  await fs.mkdir(path.join(appFolder, 'assets'), { recursive: true });
  await fs.writeFile(path.join(appFolder, 'index.html'), '<!doctype html><title>t</title>');
  await fs.writeFile(path.join(appFolder, 'assets', 'app.js'), 'export {};');
  await fs.writeFile(path.join(base, 'secret.txt'), 'outside the app folder');
  await fs.symlink(path.join(base, 'secret.txt'), path.join(appFolder, 'assets', 'link.txt'));
  await fs.symlink(base, path.join(appFolder, 'up'));
  handle = createAppAssetHandler({
    appFolder,
    fileSystem: { lstat: (filePath) => fs.lstat(filePath), readFile: (filePath) => fs.readFile(filePath) },
  });
});

afterAll(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

describe('createAppAssetHandler()', () => {
  it('serves the entry page with its content type and the app policy as a response header', async () => {
    const response = await handle(new Request('app://chancewise/'));
    expect(response.status).toBe(200);
    expect(await response.text()).toBe('<!doctype html><title>t</title>');
    expect(response.headers.get('content-type')).toBe('text/html; charset=utf-8');
    // Electron security checklist item 7 (a Content-Security-Policy, here as a response header); the
    // value is the same one the web build uses.
    expect(response.headers.get('content-security-policy')).toBe(contentSecurityPolicy());
    expect(response.headers.get('content-security-policy')).toBe(
      "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
    );
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
  });

  it('serves module scripts as JavaScript (HTML Standard: module scripts need a JavaScript MIME type)', async () => {
    const response = await handle(new Request('app://chancewise/assets/app.js'));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
  });

  it('answers 404 for a missing file, still with the policy header', async () => {
    const response = await handle(new Request('app://chancewise/assets/missing.js'));
    expect(response.status).toBe(404);
    expect(response.headers.get('content-security-policy')).toBe(contentSecurityPolicy());
  });

  it('refuses a symbolic link inside the folder, to a file or to a folder outside it', async () => {
    expect((await handle(new Request('app://chancewise/assets/link.txt'))).status).toBe(404);
    const throughFolderLink = await handle(new Request('app://chancewise/up/secret.txt'));
    expect(throughFolderLink.status).toBe(404);
    expect(await throughFolderLink.text()).not.toContain('outside the app folder');
  });

  it('refuses a folder and a traversal attempt', async () => {
    expect((await handle(new Request('app://chancewise/assets'))).status).toBe(404);
    const traversal = await handle(new Request('app://chancewise/assets/..%2f..%2fsecret.txt'));
    expect(traversal.status).toBe(400);
    expect(await traversal.text()).not.toContain('outside the app folder');
  });

  it('answers HEAD without a body and refuses other methods with 405', async () => {
    const head = await handle(new Request('app://chancewise/index.html', { method: 'HEAD' }));
    expect(head.status).toBe(200);
    expect(await head.text()).toBe('');
    const post = await handle(new Request('app://chancewise/index.html', { method: 'POST', body: 'x' }));
    expect(post.status).toBe(405);
  });
});
