// What a hostile review got through the local server before: links out of the served folder,
// a file it could stat but not read, any Host header (DNS rebinding), hidden files.
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import type { FileHandle } from 'node:fs/promises';
import { request } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { nodeRegularFileSystem } from '../../src/shared/regular-file.ts';
import type { RegularFileSystem } from '../../src/shared/regular-file.ts';
import { isAllowedHost, isLoopbackAddress, parseHostHeader } from '../../src/web/host-policy.ts';
import { parseServeArguments, startupLines } from '../../src/web/serve-app.ts';
import { createStaticServer } from '../../src/web/static-server.ts';

const folder = mkdtempSync(join(tmpdir(), 'chancewise-web-hostile-'));
const root = join(folder, 'dist');
mkdirSync(join(root, 'assets'), { recursive: true });
writeFileSync(join(root, 'index.html'), '<!doctype html><title>app</title>');
writeFileSync(join(root, 'assets', 'app.js'), 'export {};');
writeFileSync(join(root, 'locked.js'), 'no one may read this');
writeFileSync(join(root, '.env'), 'SECRET=1');
mkdirSync(join(root, '.git'));
writeFileSync(join(root, '.git', 'config'), '[core]');
writeFileSync(join(folder, 'outside.txt'), 'outside the served folder');
const posix = process.platform !== 'win32';
if (posix) {
  symlinkSync('/etc/passwd', join(root, 'passwd.txt'));
  symlinkSync(folder, join(root, 'up'));
}

/** The real file calls, except that opening locked.js fails as a file without read permission does. */
const lockedFileSystem: RegularFileSystem<FileHandle> = {
  ...nodeRegularFileSystem,
  open: async (filePath, flags) => {
    if (filePath.endsWith('locked.js'))
      throw Object.assign(new Error(`EACCES: permission denied, open '${filePath}'`), { code: 'EACCES' });
    return nodeRegularFileSystem.open(filePath, flags);
  },
};

const server = createStaticServer({
  root,
  headers: { 'Content-Security-Policy': "default-src 'self'" },
  fileSystem: lockedFileSystem,
});
const allowing = createStaticServer({ root, headers: {}, allowedHosts: ['clinic-laptop.local'] });
let port = 0;
let allowingPort = 0;

beforeAll(async () => {
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  await new Promise<void>((resolve) => allowing.listen(0, '127.0.0.1', resolve));
  port = (server.address() as AddressInfo).port;
  allowingPort = (allowing.address() as AddressInfo).port;
});
afterAll(async () => {
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await new Promise<void>((resolve) => allowing.close(() => resolve()));
});

/** A GET with a Host header of our choosing (fetch() does not let one set it). */
function get(path: string, host: string | null, to = port): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const headers = host === null ? {} : { Host: host };
    const sent = request({ host: '127.0.0.1', port: to, path, headers, setHost: host !== null }, (response) => {
      let body = '';
      response.on('data', (chunk: Buffer) => (body += chunk.toString()));
      response.on('end', () => resolve({ status: response.statusCode ?? 0, body }));
    });
    sent.on('error', reject);
    sent.end();
  });
}

const local = () => `127.0.0.1:${port}`;

describe('links inside the served folder', () => {
  test.runIf(posix)('a link to /etc/passwd is not followed', async () => {
    const answer = await get('/passwd.txt', local());
    expect(answer.status).toBe(404);
    expect(answer.body).not.toContain('root:');
  });

  test.runIf(posix)('a linked folder leading out of it is not followed', async () => {
    expect((await get('/up/outside.txt', local())).status).toBe(404);
  });
});

describe('files it may not read', () => {
  test('answers 403 and keeps serving', async () => {
    expect(await get('/locked.js', local())).toEqual({ status: 403, body: 'Forbidden: the server may not read this file\n' });
    expect((await get('/assets/app.js', local())).status).toBe(200);
  });
});

describe('Host header', () => {
  test('answers the loopback names with the right port', async () => {
    for (const host of [`127.0.0.1:${port}`, `localhost:${port}`, `LOCALHOST:${port}`, `[::1]:${port}`]) {
      expect((await get('/', host)).status, host).toBe(200);
    }
  });

  test('refuses any other name, another port, and a missing Host (DNS rebinding)', async () => {
    for (const host of [
      `evil.example:${port}`,
      `127.0.0.1:${port + 1}`,
      'localhost',
      `localhost.evil.example:${port}`,
      `127.0.0.1@evil:${port}`,
    ]) {
      const answer = await get('/', host);
      expect(answer.status, host).toBe(421);
      expect(answer.body).not.toContain('<title>app</title>');
    }
    // Node answers an HTTP/1.1 request without Host with 400 itself (http.createServer, requireHostHeader,
    // default true); the server's own rule refuses it too.
    expect((await get('/', null)).status).toBe(400);
    expect(isAllowedHost(undefined, port)).toBe(false);
  });

  test('answers an extra name only when it was allowed', async () => {
    expect((await get('/', `clinic-laptop.local:${allowingPort}`, allowingPort)).status).toBe(200);
    expect((await get('/', `clinic-laptop.local:${port}`)).status).toBe(421);
  });

  test('reads a Host header by RFC 9110 §7.2 and knows the loopback addresses', () => {
    expect(parseHostHeader('[::1]:8080')).toEqual({ name: '[::1]', port: 8080 });
    expect(parseHostHeader('Example.ORG.')).toEqual({ name: 'example.org', port: null });
    expect(parseHostHeader('a b')).toBeNull();
    expect(isAllowedHost('localhost', 80)).toBe(true);
    expect(isLoopbackAddress('127.0.0.1')).toBe(true);
    expect(isLoopbackAddress('127.3.4.5')).toBe(true);
    expect(isLoopbackAddress('::1')).toBe(true);
    expect(isLoopbackAddress('0.0.0.0')).toBe(false);
    expect(isLoopbackAddress('::')).toBe(false);
    expect(isLoopbackAddress('192.168.1.20')).toBe(false);
  });
});

describe('hidden files', () => {
  test('are never served, nor anything in a hidden folder', async () => {
    for (const path of ['/.env', '/.git/config', '/%2eenv', '/assets/../.env'])
      expect((await get(path, local())).status, path).toBe(404);
  });
});

describe('listening beyond this machine', () => {
  test('prints a warning before the address, and nothing extra on loopback', () => {
    const wide = startupLines('0.0.0.0', 'http://0.0.0.0:8080/');
    expect(wide).toHaveLength(2);
    expect(wide[0]).toMatch(/^Warning: listening on 0\.0\.0\.0 makes the app reachable from other machines/u);
    expect(startupLines('127.0.0.1', 'http://127.0.0.1:8080/')).toEqual([
      'Chancewise is served at http://127.0.0.1:8080/ (press Ctrl+C to stop)',
    ]);
  });

  test('takes extra Host names only through --allow-host', () => {
    expect(parseServeArguments(['--host', '0.0.0.0', '--allow-host', 'Clinic-Laptop.local'])).toEqual({
      port: 4173,
      host: '0.0.0.0',
      build: true,
      allowedHosts: ['clinic-laptop.local'],
    });
    expect(() => parseServeArguments(['--allow-host', 'a/b'])).toThrow(/--allow-host NAME/u);
  });
});
