// @vitest-environment jsdom
import { describe, expect, it, vi } from 'vitest';
import { PlatformFailure } from '../../../src/ui/platform/platform-failure.ts';
import { printInNewTab } from '../../../src/ui/platform/print-in-tab.ts';
import type { PrintTab } from '../../../src/ui/platform/print-in-tab.ts';

// A PDF file starts with "%PDF-" (ISO 32000-1:2008, 7.5.2).
const PDF = new TextEncoder().encode('%PDF-1.7\n');

function fakeOpener(tab: PrintTab | null) {
  const order: string[] = [];
  return {
    order,
    opener: { open: vi.fn((url: string, target: string) => (order.push(`open ${url || '(blank)'} ${target}`), tab)) },
  };
}
const fakeTab = () => {
  const close = vi.fn<() => void>();
  const tab: PrintTab = { opener: 'the app', location: { href: 'about:blank' }, close };
  return Object.assign(tab, { close });
};

describe('printing the handout in a new tab (browser)', () => {
  it('opens the tab before the PDF is made, cuts it off from the app, then shows the PDF there', async () => {
    const tab = fakeTab();
    const { opener, order } = fakeOpener(tab);
    const later = vi.fn();
    const shown = await printInNewTab(
      async () => {
        order.push('make');
        return PDF;
      },
      opener,
      later,
    );
    expect(shown).toBe(true);
    expect(order).toEqual(['open (blank) _blank', 'make']);
    expect(tab.opener).toBeNull();
    expect(tab.location.href).toMatch(/^blob:/);
    expect(tab.close).not.toHaveBeenCalled();
    // The address is released a minute later.
    expect(later).toHaveBeenCalledWith(expect.any(Function), 60_000);
  });

  it('says what to do when the browser refuses the tab, and makes nothing', async () => {
    const make = vi.fn(async () => PDF);
    const refused = printInNewTab(make, fakeOpener(null).opener);
    await expect(refused).rejects.toBeInstanceOf(PlatformFailure);
    await expect(refused).rejects.toMatchObject({ failure: { kind: 'tab-blocked' }, message: /Allow pop-ups for Chancewise/ });
    expect(make).not.toHaveBeenCalled();
  });

  it('closes the tab again when nothing was made or the making failed', async () => {
    const empty = fakeTab();
    expect(await printInNewTab(async () => null, fakeOpener(empty).opener)).toBe(false);
    expect(empty.close).toHaveBeenCalledOnce();
    const failed = fakeTab();
    await expect(printInNewTab(() => Promise.reject(new Error('a font is missing')), fakeOpener(failed).opener)).rejects.toThrow(
      'a font is missing',
    );
    expect(failed.close).toHaveBeenCalledOnce();
  });
});
