// @vitest-environment node
import { describe, expect, it, vi } from 'vitest';
import { EXTERNAL_LINK_HOSTS, isAllowedExternalUrl, openExternalSafely } from '../../../../electron/main/web/open-external.ts';

const hosts = ['www.example.org'];

describe('isAllowedExternalUrl()', () => {
  it('accepts https addresses on an allowed host', () => {
    expect(isAllowedExternalUrl('https://www.example.org/guide?x=1#part', hosts)).toBe(true);
    expect(isAllowedExternalUrl('https://WWW.EXAMPLE.ORG/', hosts)).toBe(true);
  });

  it('refuses every other scheme (Electron security checklist item 15: openExternal with untrusted content)', () => {
    for (const value of [
      'http://www.example.org/',
      'file:///C:/Windows/System32/calc.exe',
      'smb://www.example.org/share',
      'javascript:alert(1)',
      'data:text/html,hi',
      'ms-msdt:/id PCWDiagnostic',
      'mailto:someone@www.example.org',
    ]) {
      expect(isAllowedExternalUrl(value, hosts), value).toBe(false);
    }
  });

  it('refuses look-alike hosts, credentials, ports and relative text', () => {
    for (const value of [
      'https://www.example.org.evil.test/',
      'https://evil.test/?www.example.org',
      'https://evil.test/www.example.org',
      'https://www.example.org@evil.test/',
      'https://user:pw@www.example.org/',
      'https://www.example.org:8443/',
      'https://www.example.org./',
      'https://example.org/',
      '//www.example.org/',
      'www.example.org',
      '',
    ]) {
      expect(isAllowedExternalUrl(value, hosts), value).toBe(false);
    }
    expect(isAllowedExternalUrl(`https://www.example.org/${'a'.repeat(3000)}`, hosts)).toBe(false);
    expect(isAllowedExternalUrl({ href: 'https://www.example.org/' }, hosts)).toBe(false);
  });

  it("allows nothing with the app's own list, which is empty", () => {
    expect(EXTERNAL_LINK_HOSTS).toEqual([]);
    expect(isAllowedExternalUrl('https://www.example.org/', EXTERNAL_LINK_HOSTS)).toBe(false);
  });
});

describe('openExternalSafely()', () => {
  it('hands an allowed address to the system browser in its normalised form', async () => {
    const openExternal = vi.fn(async () => undefined);
    expect(await openExternalSafely('https://WWW.example.org/a b', { allowedHosts: hosts, openExternal })).toBe(true);
    expect(openExternal).toHaveBeenCalledExactlyOnceWith('https://www.example.org/a%20b');
  });

  it('never calls the system for a refused address', async () => {
    const openExternal = vi.fn(async () => undefined);
    for (const value of ['file:///etc/passwd', 'https://evil.test/', 42, null]) {
      expect(await openExternalSafely(value, { allowedHosts: hosts, openExternal })).toBe(false);
    }
    expect(openExternal).not.toHaveBeenCalled();
  });

  it('reports false when the system could not open it', async () => {
    const openExternal = vi.fn(async () => {
      throw new Error('no browser');
    });
    expect(await openExternalSafely('https://www.example.org/', { allowedHosts: hosts, openExternal })).toBe(false);
  });
});
