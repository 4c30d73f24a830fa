/**
 * The hosts the app may hand to the system browser. Empty: the app has no outside links.
 * A host added here must be an exact host name (no wildcard), reached over https.
 */
export const EXTERNAL_LINK_HOSTS: readonly string[] = [];

const MAX_EXTERNAL_ADDRESS_LENGTH = 2048;

/**
 * Whether an address may be opened in the system browser: a string that parses as an
 * absolute https address, with no user name, password or port, whose host is exactly one of
 * the allowed hosts (so `example.org.evil.test` or `evil.test/?example.org` do not pass).
 */
export function isAllowedExternalUrl(value: unknown, allowedHosts: readonly string[]): boolean {
  if (typeof value !== 'string' || value.length === 0 || value.length > MAX_EXTERNAL_ADDRESS_LENGTH) return false;
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    return false;
  }
  if (url.protocol !== 'https:') return false;
  if (url.username !== '' || url.password !== '' || url.port !== '') return false;
  return allowedHosts.includes(url.hostname);
}

/** What the external opener needs: the allow-list and Electron's `shell.openExternal`. */
export interface ExternalOpenerSettings {
  readonly allowedHosts: readonly string[];
  readonly openExternal: (url: string) => Promise<void>;
}

/**
 * Open an address in the system browser only when it is allowed; the one place in the app
 * that calls `shell.openExternal`. Returns whether it was opened. The address is passed on
 * in its parsed, normalised form, never as the text the page gave.
 */
export async function openExternalSafely(value: unknown, settings: ExternalOpenerSettings): Promise<boolean> {
  if (!isAllowedExternalUrl(value, settings.allowedHosts)) return false;
  const normalised = new URL(value as string).href;
  try {
    await settings.openExternal(normalised);
    return true;
  } catch {
    return false;
  }
}
