import { APP_ORIGIN, APP_SCHEME } from './app-origin.ts';

/** Parse an address, or null when it is not one (never throws). */
function parseUrl(value: unknown): URL | null {
  if (typeof value !== 'string' || value.length === 0 || value.length > 8192) return null;
  try {
    return new URL(value);
  } catch {
    return null;
  }
}

/**
 * Whether an address belongs to the app's own origin (`app://chancewise`). Compares the
 * parsed origin, never a string prefix, so `app://chancewise.evil/` and
 * `app://chancewise@evil/` are refused.
 */
export function isAppUrl(value: unknown): boolean {
  const url = parseUrl(value);
  if (url === null) return false;
  if (url.protocol !== `${APP_SCHEME}:`) return false;
  if (url.username !== '' || url.password !== '' || url.port !== '') return false;
  // Node's URL gives custom schemes the opaque origin "null", so the scheme and host are
  // compared instead (Chromium has already lower-cased the host of a standard scheme).
  return `${url.protocol}//${url.host}` === APP_ORIGIN;
}

/** Whether the page may navigate to an address: only within the app's own origin. */
export function isAllowedNavigation(value: unknown): boolean {
  return isAppUrl(value);
}

/**
 * Whether the session lets a request through: the app's own files, data and blob
 * addresses made by the app's own page, and the developer tools. Everything else (http,
 * https, ws, ftp, file) is cancelled, so no remote or local content outside the app loads.
 */
export function isAllowedRequestUrl(value: unknown): boolean {
  if (isAppUrl(value)) return true;
  const url = parseUrl(value);
  if (url === null) return false;
  if (url.protocol === 'data:') return true;
  if (url.protocol === 'devtools:') return true;
  if (url.protocol === 'blob:') return isAppUrl(url.pathname);
  return false;
}
