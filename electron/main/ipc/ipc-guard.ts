import { isAppUrl } from '../web/url-policy.ts';

/** The part of an IPC event the sender check reads. */
export interface IpcEventLike {
  readonly sender: unknown;
  readonly senderFrame: { readonly url: string; readonly parent: unknown } | null;
}

/**
 * Whether an IPC message comes from the app itself: sent by the main frame (not a
 * sub-frame) of a web contents the app created, whose page is on the app's own origin. A
 * message from any other frame, page or window is refused before its payload is read.
 */
export function isTrustedSender(event: IpcEventLike, isOwnContents: (contents: unknown) => boolean): boolean {
  const frame = event.senderFrame;
  if (frame === null || frame === undefined) return false;
  if (frame.parent !== null) return false;
  if (!isAppUrl(frame.url)) return false;
  return isOwnContents(event.sender);
}
