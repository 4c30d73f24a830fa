/**
 * A small static file server for the built app: only files under its folder, reached
 * without a symbolic link and not hidden (no name starting with a dot), only GET and HEAD,
 * only for loopback Host names (see `host-policy.ts`), every response with the app's
 * security headers, nothing cached across builds. A file it may not read gets 403, any other
 * failure 500; the process never stops over one request.
 */
import type { FileHandle } from 'node:fs/promises';
import { createServer } from 'node:http';
import type { IncomingMessage, Server, ServerResponse } from 'node:http';
import { extname, join, normalize, relative, resolve, sep } from 'node:path';
import { pipeline } from 'node:stream';
import { nodeRegularFileSystem, openRegularFile, RegularFileError } from '../shared/regular-file.ts';
import type { OpenedRegularFile, RegularFileSystem } from '../shared/regular-file.ts';
import { isAllowedHost } from './host-policy.ts';

const CONTENT_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

export interface StaticServerSettings {
  /** The folder served; nothing outside it is ever read. */
  readonly root: string;
  /** Headers sent with every response (the security policy among them). */
  readonly headers: Readonly<Record<string, string>>;
  /** Host names answered besides localhost, 127.0.0.1 and [::1] (`--allow-host`). */
  readonly allowedHosts?: readonly string[];
  /** The file calls (`node:fs/promises`; a fake in tests, to fail as a file no one may read does). */
  readonly fileSystem?: RegularFileSystem<FileHandle>;
}

/** The file a request path names inside `root`, or null when it would leave `root` or is malformed. */
export function resolveRequestPath(root: string, requestUrl: string): string | null {
  let pathname: string;
  try {
    pathname = decodeURIComponent(new URL(requestUrl, 'http://localhost').pathname);
  } catch {
    return null;
  }
  if (pathname.includes('\0')) return null;
  const base = resolve(root);
  const wanted = resolve(base, `.${normalize(pathname.endsWith('/') ? `${pathname}index.html` : pathname)}`);
  return wanted === base || wanted.startsWith(base + sep) ? wanted : null;
}

function send(response: ServerResponse, status: number, headers: Readonly<Record<string, string>>, body: string): void {
  response.writeHead(status, { ...headers, 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' });
  response.end(body);
}

/** Why a request found no file to send. */
type Unserved = 403 | 404 | 500;

/**
 * The file to send for a path inside the root: every part below the root a real folder or
 * file (a symbolic link anywhere below it is refused, so none can lead outside), no hidden
 * part, a folder served by its index.html. Opened once, judged by its handle.
 */
async function openServedFile(
  root: string,
  file: string,
  fileSystem: RegularFileSystem<FileHandle>,
): Promise<(OpenedRegularFile<FileHandle> & { readonly target: string }) | Unserved> {
  const parts = relative(root, file)
    .split(sep)
    .filter((part) => part !== '');
  if (parts.some((part) => part.startsWith('.'))) return 404;
  let current = root;
  let isFolder = true;
  for (const part of parts) {
    current = join(current, part);
    const entry = await fileSystem.lstat(current).catch(() => null);
    if (entry === null || entry.isSymbolicLink()) return 404;
    isFolder = entry.isDirectory();
  }
  const target = isFolder ? join(current, 'index.html') : current;
  try {
    return { target, ...(await openRegularFile(target, { followLink: false }, fileSystem)) };
  } catch (error) {
    return unservedFor(error);
  }
}

/** 403 for a file the server may not read, 404 for one that is missing or not a plain file, 500 otherwise. */
function unservedFor(error: unknown): Unserved {
  if (!(error instanceof RegularFileError)) return 500;
  if (error.reason !== 'unreadable') return 404;
  return error.systemCode === 'EACCES' || error.systemCode === 'EPERM' ? 403 : 500;
}

const UNSERVED_TEXT: Readonly<Record<Unserved, string>> = {
  403: 'Forbidden: the server may not read this file\n',
  404: 'Not found\n',
  500: 'Server error\n',
};

async function handle(settings: StaticServerSettings, request: IncomingMessage, response: ServerResponse): Promise<void> {
  const { headers } = settings;
  if (!isAllowedHost(request.headers.host, request.socket.localPort ?? 0, settings.allowedHosts)) {
    // RFC 9110 §15.5.20: 421 Misdirected Request, for a server "not able to produce a response" for that host.
    send(response, 421, headers, 'This server answers only to localhost, 127.0.0.1 and [::1] (add names with --allow-host).\n');
    return;
  }
  if (request.method !== 'GET' && request.method !== 'HEAD') {
    send(response, 405, { ...headers, Allow: 'GET, HEAD' }, 'Method not allowed\n');
    return;
  }
  const file = resolveRequestPath(settings.root, request.url ?? '/');
  if (file === null) {
    send(response, 404, headers, 'Not found\n');
    return;
  }
  const opened = await openServedFile(resolve(settings.root), file, settings.fileSystem ?? nodeRegularFileSystem);
  if (typeof opened === 'number') {
    send(response, opened, headers, UNSERVED_TEXT[opened]);
    return;
  }
  const { handle: fileHandle, info, target } = opened;
  response.writeHead(200, {
    ...headers,
    'Content-Type': CONTENT_TYPES[extname(target).toLowerCase()] ?? 'application/octet-stream',
    'Content-Length': String(info.size),
    'Cache-Control': 'no-cache',
  });
  if (request.method === 'HEAD' || info.size === 0) {
    await fileHandle.close();
    response.end();
    return;
  }
  // At most the size announced, even if the file grows; a read error ends this response only.
  pipeline(fileHandle.createReadStream({ start: 0, end: info.size - 1 }), response, () => undefined);
}

/** A server for `root` (not yet listening). */
export function createStaticServer(settings: StaticServerSettings): Server {
  return createServer((request, response) => {
    handle(settings, request, response).catch(() => {
      if (!response.headersSent) send(response, 500, settings.headers, 'Server error\n');
      else response.destroy();
    });
  });
}
