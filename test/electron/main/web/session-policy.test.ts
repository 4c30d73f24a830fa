// @vitest-environment node
import { describe, expect, it, vi } from 'vitest';
import { applySessionPolicy } from '../../../../electron/main/web/session-policy.ts';
import type { PolicySession } from '../../../../electron/main/web/session-policy.ts';

function fakeSession() {
  const captured: {
    request?: (
      contents: unknown,
      permission: string,
      callback: (granted: boolean) => void,
      details?: { readonly requestingUrl?: string },
    ) => void;
    check?: () => boolean;
    device?: () => boolean;
    beforeRequest?: (details: { url: string }, callback: (response: { cancel: boolean }) => void) => void;
    download?: (event: { preventDefault(): void }, item: { getURL(): string }) => void;
  } = {};
  const session: PolicySession = {
    setPermissionRequestHandler: (handler) => {
      captured.request = handler;
    },
    setPermissionCheckHandler: (handler) => {
      captured.check = handler;
    },
    setDevicePermissionHandler: (handler) => {
      captured.device = handler;
    },
    setSpellCheckerEnabled: vi.fn(),
    webRequest: {
      onBeforeRequest: (listener) => {
        captured.beforeRequest = listener;
      },
    },
    on: (_event, listener) => {
      captured.download = listener;
      return session;
    },
  };
  return { session, captured };
}

describe('applySessionPolicy()', () => {
  it('denies every permission request, check and device request', () => {
    // Electron security checklist item 5: "Electron will automatically approve all permission requests
    // unless the developer has manually configured a custom handler".
    const { session, captured } = fakeSession();
    applySessionPolicy(session);
    for (const permission of [
      'media',
      'geolocation',
      'notifications',
      'clipboard-read',
      'openExternal',
      'fullscreen',
      'hid',
      'serial',
      'usb',
      'unknown',
    ]) {
      const callback = vi.fn();
      captured.request?.({}, permission, callback);
      expect(callback, permission).toHaveBeenCalledExactlyOnceWith(false);
    }
    expect(captured.check?.()).toBe(false);
    expect(captured.device?.()).toBe(false);
  });

  it("grants full screen to the app's own page only, for the teaching view", () => {
    const { session, captured } = fakeSession();
    applySessionPolicy(session);
    const granted = (permission: string, requestingUrl: string): boolean | undefined => {
      let answer: boolean | undefined;
      captured.request?.({}, permission, (value) => (answer = value), { requestingUrl });
      return answer;
    };
    expect(granted('fullscreen', 'app://chancewise/index.html')).toBe(true);
    expect(granted('fullscreen', 'https://example.org/')).toBe(false);
    expect(granted('media', 'app://chancewise/index.html')).toBe(false);
  });

  it('turns the spellchecker off', () => {
    const { session } = fakeSession();
    applySessionPolicy(session);
    expect(session.setSpellCheckerEnabled).toHaveBeenCalledExactlyOnceWith(false);
  });

  it("cancels every request outside the app, and lets the app's own through", () => {
    const { session, captured } = fakeSession();
    applySessionPolicy(session);
    const decide = (url: string): boolean | undefined => {
      let cancel: boolean | undefined;
      captured.beforeRequest?.({ url }, (response) => (cancel = response.cancel));
      return cancel;
    };
    expect(decide('app://chancewise/assets/app.js')).toBe(false);
    expect(decide('https://fonts.example.org/a.woff2')).toBe(true);
    expect(decide('http://127.0.0.1/')).toBe(true);
    expect(decide('file:///etc/hosts')).toBe(true);
  });

  it("allows downloads only of the page's own blobs", () => {
    const { session, captured } = fakeSession();
    applySessionPolicy(session);
    const prevented = (url: string): boolean => {
      let result = false;
      captured.download?.({ preventDefault: () => (result = true) }, { getURL: () => url });
      return result;
    };
    expect(prevented('blob:app://chancewise/5f1c')).toBe(false);
    expect(prevented('https://example.org/setup.exe')).toBe(true);
    expect(prevented('blob:https://example.org/5f1c')).toBe(true);
  });
});
