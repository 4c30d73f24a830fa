// @vitest-environment node
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { resolveAppAsset } from '../../../../electron/main/web/resolve-app-asset.ts';

const root = '/opt/chancewise/resources/app.asar/dist';

describe('resolveAppAsset()', () => {
  it('maps app addresses to files inside the app folder', () => {
    expect(resolveAppAsset('app://chancewise/index.html', root, path.posix)).toEqual({
      ok: true,
      segments: ['index.html'],
      filePath: `${root}/index.html`,
    });
    expect(resolveAppAsset('app://chancewise/assets/index-3f2a.js?v=1#x', root, path.posix)).toEqual({
      ok: true,
      segments: ['assets', 'index-3f2a.js'],
      filePath: `${root}/assets/index-3f2a.js`,
    });
  });

  it('serves index.html for the bare origin', () => {
    const resolved = resolveAppAsset('app://chancewise/', root, path.posix);
    expect(resolved.ok && resolved.filePath).toBe(`${root}/index.html`);
  });

  it('decodes ordinary percent-encoding in names once', () => {
    const resolved = resolveAppAsset('app://chancewise/fonts/DejaVu%20Sans.ttf', root, path.posix);
    expect(resolved.ok && resolved.filePath).toBe(`${root}/fonts/DejaVu Sans.ttf`);
  });

  it('never leaves the folder through dot segments, plain or percent-encoded', () => {
    // The WHATWG URL Standard (§4.4 path state) removes "..", ".%2e", "%2e." and "%2e%2e" segments while
    // parsing, so these land on paths inside the root; what matters is that none resolves outside it.
    for (const address of [
      'app://chancewise/../../etc/passwd',
      'app://chancewise/%2e%2e/%2e%2e/etc/passwd',
      'app://chancewise/assets/%2E%2E/%2E%2E/%2E%2E/etc/passwd',
      'app://chancewise/.%2e/secret',
    ]) {
      const resolved = resolveAppAsset(address, root, path.posix);
      if (resolved.ok) expect(resolved.filePath.startsWith(`${root}/`), address).toBe(true);
    }
  });

  it('refuses a segment that decodes to a dot segment or carries an encoded separator', () => {
    // Double encoding survives URL parsing as %252e; one decode gives "%2e%2e", a plain name — so the
    // dangerous forms are those decoding to "..", "/" or "\" (RFC 3986 §2.4: decode once only).
    expect(resolveAppAsset('app://chancewise/a/..%2f..%2fetc%2fpasswd', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'separator-in-segment',
    });
    expect(resolveAppAsset('app://chancewise/..%5c..%5cwindows%5cwin.ini', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'separator-in-segment',
    });
    expect(resolveAppAsset('app://chancewise/a\\..\\..\\b', root, path.posix).ok).toBe(false);
    const double = resolveAppAsset('app://chancewise/%252e%252e/x', root, path.posix);
    expect(double.ok && double.filePath).toBe(`${root}/%2e%2e/x`);
  });

  it('refuses absolute paths: an empty segment, a drive letter, an encoded leading slash', () => {
    expect(resolveAppAsset('app://chancewise//etc/passwd', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'empty-segment',
    });
    expect(resolveAppAsset('app://chancewise/C:/Windows/win.ini', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'forbidden-character',
    });
    expect(resolveAppAsset('app://chancewise/%2Fetc%2Fpasswd', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'separator-in-segment',
    });
    expect(resolveAppAsset('app://chancewise/assets/', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'empty-segment',
    });
  });

  it('refuses NUL and other control characters, and broken percent-encoding', () => {
    expect(resolveAppAsset('app://chancewise/index.html%00.png', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'forbidden-character',
    });
    expect(resolveAppAsset('app://chancewise/a%0Ab', root, path.posix).ok).toBe(false);
    expect(resolveAppAsset('app://chancewise/%E0%A4%A', root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'bad-encoding',
    });
  });

  it('refuses other hosts, schemes and credentials with 404, and non-addresses with 400', () => {
    expect(resolveAppAsset('app://elsewhere/index.html', root, path.posix)).toEqual({
      ok: false,
      status: 404,
      reason: 'foreign-origin',
    });
    expect(resolveAppAsset('https://chancewise/index.html', root, path.posix)).toEqual({
      ok: false,
      status: 404,
      reason: 'foreign-origin',
    });
    expect(resolveAppAsset('app://user:pw@chancewise/index.html', root, path.posix)).toEqual({
      ok: false,
      status: 404,
      reason: 'foreign-origin',
    });
    expect(resolveAppAsset('not an address', root, path.posix)).toEqual({ ok: false, status: 400, reason: 'not-an-address' });
    expect(resolveAppAsset(`app://chancewise/${'a'.repeat(3000)}`, root, path.posix)).toEqual({
      ok: false,
      status: 400,
      reason: 'not-an-address',
    });
  });

  it('keeps Windows paths inside the folder too: no backslashes, drive letters or stream names', () => {
    const windowsRoot = 'C:\\Program Files\\Chancewise\\resources\\app.asar\\dist';
    const good = resolveAppAsset('app://chancewise/assets/app.js', windowsRoot, path.win32);
    expect(good.ok && good.filePath).toBe(`${windowsRoot}\\assets\\app.js`);
    expect(resolveAppAsset('app://chancewise/..%5C..%5CWindows%5Cwin.ini', windowsRoot, path.win32).ok).toBe(false);
    expect(resolveAppAsset('app://chancewise/D:%5Csecret.txt', windowsRoot, path.win32).ok).toBe(false);
    expect(resolveAppAsset('app://chancewise/index.html::$DATA', windowsRoot, path.win32).ok).toBe(false);
    expect(resolveAppAsset('app://chancewise/%5C%5Cserver%5Cshare', windowsRoot, path.win32).ok).toBe(false);
  });
});
