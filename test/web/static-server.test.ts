import { mkdirSync, mkdtempSync, utimesSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { isBuildStale } from '../../src/web/build-freshness.ts';
import { parseServeArguments } from '../../src/web/serve-app.ts';
import { createStaticServer, resolveRequestPath } from '../../src/web/static-server.ts';

const folder = mkdtempSync(join(tmpdir(), 'chancewise-web-'));
const root = join(folder, 'dist');
mkdirSync(join(root, 'assets'), { recursive: true });
writeFileSync(join(root, 'index.html'), '<!doctype html><title>app</title>');
writeFileSync(join(root, 'assets', 'app.js'), 'export {};');
writeFileSync(join(folder, 'secret.txt'), 'not to be served');

const server = createStaticServer({ root, headers: { 'Content-Security-Policy': "default-src 'self'" } });
let base = '';

beforeAll(async () => {
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('static server', () => {
  test('serves the page at / with the policy header and its type', async () => {
    const response = await fetch(`${base}/`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toBe("default-src 'self'");
    expect(response.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(await response.text()).toContain('<title>app</title>');
  });

  test('serves scripts as JavaScript, which module scripts require', async () => {
    const response = await fetch(`${base}/assets/app.js`);
    expect(response.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
  });

  test('never serves a file outside its folder', async () => {
    for (const path of ['/../secret.txt', '/%2e%2e/secret.txt', '/assets/%2e%2e/%2e%2e/secret.txt', '/..%2fsecret.txt']) {
      const response = await fetch(`${base}${path}`);
      expect(response.status, path).toBe(404);
    }
    expect(resolveRequestPath(root, '/%00')).toBeNull();
  });

  test('answers 404 for a missing file and 405 for a method other than GET or HEAD', async () => {
    expect((await fetch(`${base}/missing.js`)).status).toBe(404);
    const posted = await fetch(`${base}/`, { method: 'POST', body: 'x' });
    expect(posted.status).toBe(405);
    expect(posted.headers.get('content-security-policy')).toBe("default-src 'self'");
  });
});

describe('isBuildStale', () => {
  test('is true when the build is missing or older than a source, false otherwise', () => {
    const source = join(folder, 'src');
    mkdirSync(source, { recursive: true });
    writeFileSync(join(source, 'main.ts'), 'export {};');
    const built = join(root, 'index.html');
    utimesSync(join(source, 'main.ts'), new Date(1_000_000), new Date(1_000_000));
    utimesSync(source, new Date(1_000_000), new Date(1_000_000));
    utimesSync(built, new Date(2_000_000), new Date(2_000_000));
    expect(isBuildStale(built, [source])).toBe(false);
    utimesSync(join(source, 'main.ts'), new Date(3_000_000), new Date(3_000_000));
    expect(isBuildStale(built, [source])).toBe(true);
    expect(isBuildStale(join(root, 'none.html'), [source])).toBe(true);
  });
});

describe('parseServeArguments', () => {
  test('reads the port, host and build switch', () => {
    expect(parseServeArguments(['--port', '4321'])).toEqual({ port: 4321, host: '127.0.0.1', build: true });
    expect(parseServeArguments(['--port', '80', '--host', '0.0.0.0', '--no-build'])).toEqual({
      port: 80,
      host: '0.0.0.0',
      build: false,
    });
  });

  test('refuses an unknown flag or a port that is not a number', () => {
    expect(() => parseServeArguments(['--port', 'eighty'])).toThrow(/Usage: npm run web/);
    expect(() => parseServeArguments(['--verbose'])).toThrow(/unknown or incomplete option/);
  });
});
