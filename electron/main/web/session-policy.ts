import { isAllowedRequestUrl, isAppUrl } from './url-policy.ts';

/** The part of Electron's `session` the policy sets. */
export interface PolicySession {
  setPermissionRequestHandler(
    handler: (
      contents: unknown,
      permission: string,
      callback: (granted: boolean) => void,
      details?: { readonly requestingUrl?: string },
    ) => void,
  ): void;
  setPermissionCheckHandler(handler: () => boolean): void;
  setDevicePermissionHandler(handler: () => boolean): void;
  setSpellCheckerEnabled(enabled: boolean): void;
  webRequest: {
    onBeforeRequest(listener: (details: { url: string }, callback: (response: { cancel: boolean }) => void) => void): void;
  };
  on(
    event: 'will-download',
    listener: (event: { preventDefault(): void }, item: { getURL(): string }, contents?: { getURL(): string }) => void,
  ): unknown;
}

/** Whether a download comes from the app itself: its own blob, or a data address from its own page. */
export function isOwnDownload(url: string, contents: { getURL(): string } | undefined): boolean {
  if (url.startsWith('blob:')) return isAllowedRequestUrl(url);
  if (url.startsWith('data:')) return contents !== undefined && isAppUrl(contents.getURL());
  return false;
}

/**
 * Apply the app's session rules: every permission request and check is denied (camera,
 * microphone, location, notifications, USB, HID, serial, clipboard reading, and all the rest),
 * except full screen asked for by the app's own page (the teaching view presents full screen);
 * the spellchecker is off (it would download dictionaries); every request outside the
 * app's own files (http, https, ws, file...) is cancelled; a download is allowed only of a
 * blob address of the app's own origin, or of a data address asked for by a page on the
 * app's own origin (a data address carries no origin of its own, so the page's is checked).
 */
export function applySessionPolicy(session: PolicySession): void {
  session.setPermissionRequestHandler((_contents, permission, callback, details) => {
    callback(permission === 'fullscreen' && isAppUrl(details?.requestingUrl));
  });
  session.setPermissionCheckHandler(() => false);
  session.setDevicePermissionHandler(() => false);
  session.setSpellCheckerEnabled(false);
  session.webRequest.onBeforeRequest((details, callback) => {
    callback({ cancel: !isAllowedRequestUrl(details.url) });
  });
  session.on('will-download', (event, item, contents) => {
    if (!isOwnDownload(item.getURL(), contents)) event.preventDefault();
  });
}
