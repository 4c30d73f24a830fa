// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { isTrustedSender } from '../../../../electron/main/ipc/ipc-guard.ts';

const ownContents = { id: 1 };
const otherContents = { id: 2 };
const isOwn = (contents: unknown): boolean => contents === ownContents;

describe('isTrustedSender()', () => {
  // Electron security checklist item 17: "validate the sender of all IPC messages".
  it('trusts the main frame of the app window on the app origin', () => {
    expect(
      isTrustedSender({ sender: ownContents, senderFrame: { url: 'app://chancewise/index.html', parent: null } }, isOwn),
    ).toBe(true);
  });

  it('refuses another web contents even on the app origin', () => {
    expect(
      isTrustedSender({ sender: otherContents, senderFrame: { url: 'app://chancewise/index.html', parent: null } }, isOwn),
    ).toBe(false);
  });

  it('refuses a frame on another origin, or with no address', () => {
    for (const url of [
      'https://evil.test/',
      'file:///tmp/x.html',
      'app://chancewise.evil.test/',
      'about:blank',
      'data:text/html,x',
      '',
    ]) {
      expect(isTrustedSender({ sender: ownContents, senderFrame: { url, parent: null } }, isOwn), url).toBe(false);
    }
  });

  it('refuses a sub-frame, and an event whose frame is gone', () => {
    expect(isTrustedSender({ sender: ownContents, senderFrame: { url: 'app://chancewise/x.html', parent: {} } }, isOwn)).toBe(
      false,
    );
    expect(isTrustedSender({ sender: ownContents, senderFrame: null }, isOwn)).toBe(false);
  });
});
