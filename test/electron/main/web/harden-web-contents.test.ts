// @vitest-environment node
import { describe, expect, it, vi } from 'vitest';
import { hardenWebContents } from '../../../../electron/main/web/harden-web-contents.ts';
import type { HardenableContents } from '../../../../electron/main/web/harden-web-contents.ts';

type AnyListener = (event: { preventDefault(): void; url?: string }) => void;

function fakeContents() {
  const listeners = new Map<string, AnyListener>();
  let openHandler: ((details: { url: string }) => { action: 'deny' }) | null = null;
  const contents = {
    on: (event: string, listener: AnyListener) => {
      listeners.set(event, listener);
      return contents;
    },
    setWindowOpenHandler: (handler: (details: { url: string }) => { action: 'deny' }) => {
      openHandler = handler;
    },
  };
  const fire = (name: string, url?: string): boolean => {
    let prevented = false;
    listeners.get(name)?.({ preventDefault: () => (prevented = true), ...(url === undefined ? {} : { url }) });
    return prevented;
  };
  return {
    contents: contents as unknown as HardenableContents,
    listeners,
    fire,
    openWindow: (url: string) => openHandler?.({ url }),
  };
}

describe('hardenWebContents()', () => {
  it('blocks navigation away from the app origin, in the top frame, sub-frames and redirects', () => {
    // Electron security checklist item 13: limit navigation (will-navigate, and will-frame-navigate for frames).
    const { contents, fire } = fakeContents();
    hardenWebContents(contents, vi.fn());
    for (const event of ['will-navigate', 'will-frame-navigate', 'will-redirect']) {
      expect(fire(event, 'https://example.org/'), event).toBe(true);
      expect(fire(event, 'file:///etc/passwd'), event).toBe(true);
      expect(fire(event, 'app://chancewise.evil/'), event).toBe(true);
      expect(fire(event, 'app://chancewise/index.html'), event).toBe(false);
    }
  });

  it('denies every new window and hands the address to the link checker', () => {
    // Electron security checklist item 14: disable or limit creation of new windows.
    const { contents, openWindow } = fakeContents();
    const openLink = vi.fn();
    hardenWebContents(contents, openLink);
    expect(openWindow('https://example.org/')).toEqual({ action: 'deny' });
    expect(openWindow('app://chancewise/index.html')).toEqual({ action: 'deny' });
    expect(openLink.mock.calls).toEqual([['https://example.org/'], ['app://chancewise/index.html']]);
  });

  it('prevents any <webview> from attaching', () => {
    // Electron security checklist item 12: verify WebView options before creation (here: allow none).
    const { contents, fire } = fakeContents();
    hardenWebContents(contents, vi.fn());
    expect(fire('will-attach-webview')).toBe(true);
  });
});
