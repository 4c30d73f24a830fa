/**
 * A small static file server for the built app: only files under its folder, only GET
 * and HEAD, every response with the app's security headers, nothing cached across builds.
 */
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { createServer } from 'node:http';
import type { IncomingMessage, Server, ServerResponse } from 'node:http';
import { extname, join, normalize, resolve, sep } from 'node:path';

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

async function handle(settings: StaticServerSettings, request: IncomingMessage, response: ServerResponse): Promise<void> {
  const { headers } = settings;
  if (request.method !== 'GET' && request.method !== 'HEAD') {
    send(response, 405, { ...headers, Allow: 'GET, HEAD' }, 'Method not allowed\n');
    return;
  }
  const file = resolveRequestPath(settings.root, request.url ?? '/');
  if (file === null) {
    send(response, 404, headers, 'Not found\n');
    return;
  }
  const found = await stat(file).catch(() => null);
  const target = found?.isDirectory() === true ? join(file, 'index.html') : file;
  const info = found?.isDirectory() === true ? await stat(target).catch(() => null) : found;
  if (info === null || !info.isFile()) {
    send(response, 404, headers, 'Not found\n');
    return;
  }
  response.writeHead(200, {
    ...headers,
    'Content-Type': CONTENT_TYPES[extname(target).toLowerCase()] ?? 'application/octet-stream',
    'Content-Length': String(info.size),
    'Cache-Control': 'no-cache',
  });
  if (request.method === 'HEAD') {
    response.end();
    return;
  }
  createReadStream(target).pipe(response);
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
