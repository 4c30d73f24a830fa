// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { isAllowedNavigation, isAllowedRequestUrl, isAppUrl } from '../../../../electron/main/web/url-policy.ts';

describe('isAppUrl()', () => {
  it('accepts addresses on the app origin, with any path, query or fragment', () => {
    expect(isAppUrl('app://chancewise/index.html')).toBe(true);
    expect(isAppUrl('app://chancewise/')).toBe(true);
    expect(isAppUrl('app://chancewise/assets/index-abc.js?x=1#top')).toBe(true);
  });

  it('refuses look-alike hosts that a string prefix test would let through', () => {
    // Electron security checklist item 13: "a startsWith('https://example.com') test would let
    // https://example.com.attacker.com through" — compare the parsed origin instead.
    expect(isAppUrl('app://chancewise.evil.test/index.html')).toBe(false);
    expect(isAppUrl('app://chancewise@evil.test/')).toBe(false);
    expect(isAppUrl('app://evil@chancewise/')).toBe(false);
    expect(isAppUrl('app://chancewise:8080/')).toBe(false);
  });

  it('refuses other schemes, relative text and non-strings', () => {
    for (const value of [
      'https://chancewise/',
      'file:///etc/passwd',
      'javascript:alert(1)',
      'chancewise/index.html',
      '/index.html',
      '',
      'app:chancewise/x',
      'app:///chancewise/x',
    ]) {
      expect(isAppUrl(value), value).toBe(false);
    }
    for (const value of [null, undefined, 42, {}, ['app://chancewise/']]) expect(isAppUrl(value)).toBe(false);
  });
});

describe('isAllowedNavigation()', () => {
  it('allows only navigation within the app origin', () => {
    expect(isAllowedNavigation('app://chancewise/index.html')).toBe(true);
    expect(isAllowedNavigation('https://example.org/')).toBe(false);
    expect(isAllowedNavigation('http://127.0.0.1:5173/')).toBe(false);
    expect(isAllowedNavigation('file:///home/user/topic.cwtopic')).toBe(false);
    expect(isAllowedNavigation('data:text/html,<script>1</script>')).toBe(false);
  });
});

describe('isAllowedRequestUrl()', () => {
  it("lets through the app files, data images, the page's own blobs and the developer tools", () => {
    expect(isAllowedRequestUrl('app://chancewise/assets/a.css')).toBe(true);
    expect(isAllowedRequestUrl('data:image/png;base64,iVBORw0KGgo=')).toBe(true);
    expect(isAllowedRequestUrl('blob:app://chancewise/0b7a51d8-1c0e-4f1c-9a55-2f3f4f1c2d11')).toBe(true);
    expect(isAllowedRequestUrl('devtools://devtools/bundled/devtools_app.html')).toBe(true);
  });

  it('cancels every remote or local request outside the app (Electron security checklist item 1)', () => {
    for (const value of [
      'https://example.org/font.woff2',
      'http://example.org/',
      'ws://127.0.0.1:24678/',
      'wss://example.org/',
      'ftp://example.org/x',
      'file:///etc/passwd',
      'blob:https://example.org/123',
      'chrome://gpu',
      'not an address',
    ]) {
      expect(isAllowedRequestUrl(value), value).toBe(false);
    }
  });
});
