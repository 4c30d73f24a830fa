import path from 'node:path';
import { APP_ORIGIN, APP_SCHEME } from './app-origin.ts';

/** The path functions the resolver needs; `path.win32` or `path.posix` in tests. */
export type PathApi = Pick<typeof path, 'join' | 'relative' | 'isAbsolute' | 'sep'>;

/** Where an app address points: a file inside the app folder, or why it was refused. */
export type AssetResolution =
  | { readonly ok: true; readonly segments: readonly string[]; readonly filePath: string }
  | { readonly ok: false; readonly status: 400 | 404; readonly reason: AssetRefusal };

/** Why an address was refused. */
export type AssetRefusal =
  | 'not-an-address'
  | 'foreign-origin'
  | 'bad-encoding'
  | 'empty-segment'
  | 'dot-segment'
  | 'separator-in-segment'
  | 'forbidden-character'
  | 'outside-app-folder';

/** The file served for the bare origin. */
export const ENTRY_FILE = 'index.html';

const MAX_ADDRESS_LENGTH = 2048;

/** Control characters (including NUL), and characters that mean a drive, a stream or a wildcard on Windows. */
// eslint-disable-next-line no-control-regex -- control characters are exactly what this refuses
const FORBIDDEN_CHARACTERS = /[\u0000-\u001f\u007f:*?"<>|]/u;

function refuse(status: 400 | 404, reason: AssetRefusal): AssetResolution {
  return { ok: false, status, reason };
}

function checkSegment(raw: string): { readonly name: string } | { readonly refusal: AssetRefusal } {
  if (raw === '') return { refusal: 'empty-segment' };
  let decoded: string;
  try {
    decoded = decodeURIComponent(raw);
  } catch {
    return { refusal: 'bad-encoding' };
  }
  if (decoded === '.' || decoded === '..') return { refusal: 'dot-segment' };
  if (decoded.includes('/') || decoded.includes('\\')) return { refusal: 'separator-in-segment' };
  if (FORBIDDEN_CHARACTERS.test(decoded)) return { refusal: 'forbidden-character' };
  return { name: decoded };
}

/**
 * Resolve an `app://chancewise/...` address to a file inside the app folder, purely from
 * the text of the address (no file system access). Every path segment is decoded once and
 * must be a plain name: no `.` or `..` (also encoded as `%2e%2e`), no `/` or `\` (also
 * encoded), no NUL or other control character, no drive letter or `:`, no empty segment
 * (so no `//` absolute path). The joined result is checked to lie inside the folder.
 */
export function resolveAppAsset(address: string, appFolder: string, pathApi: PathApi = path): AssetResolution {
  if (typeof address !== 'string' || address.length > MAX_ADDRESS_LENGTH) return refuse(400, 'not-an-address');
  let url: URL;
  try {
    url = new URL(address);
  } catch {
    return refuse(400, 'not-an-address');
  }
  if (url.protocol !== `${APP_SCHEME}:` || `${url.protocol}//${url.host}` !== APP_ORIGIN) {
    return refuse(404, 'foreign-origin');
  }
  if (url.username !== '' || url.password !== '') return refuse(404, 'foreign-origin');

  const rawSegments = url.pathname === '' || url.pathname === '/' ? [ENTRY_FILE] : url.pathname.slice(1).split('/');
  const segments: string[] = [];
  for (const raw of rawSegments) {
    const checked = checkSegment(raw);
    if ('refusal' in checked) return refuse(400, checked.refusal);
    segments.push(checked.name);
  }

  const filePath = pathApi.join(appFolder, ...segments);
  const relative = pathApi.relative(appFolder, filePath);
  const escapes = relative === '' || relative === '..' || relative.startsWith(`..${pathApi.sep}`) || pathApi.isAbsolute(relative);
  if (escapes) return refuse(400, 'outside-app-folder');
  return { ok: true, segments, filePath };
}
