import path from 'node:path';
import { securityHeaders } from '../../../src/shared/content-security-policy.ts';
import { contentTypeFor } from './content-types.ts';
import { resolveAppAsset } from './resolve-app-asset.ts';
import type { PathApi } from './resolve-app-asset.ts';

/** What the handler needs to know about a path without following links. */
export interface EntryKind {
  isFile(): boolean;
  isSymbolicLink(): boolean;
}

/** The file access the app-scheme handler uses (`node:fs/promises` in the app). */
export interface AssetFileSystem {
  lstat(filePath: string): Promise<EntryKind>;
  readFile(filePath: string): Promise<Uint8Array>;
}

/** Settings of the app-scheme handler. */
export interface AppAssetHandlerSettings {
  /** The folder holding the built renderer (index.html and assets/). */
  readonly appFolder: string;
  readonly fileSystem: AssetFileSystem;
  readonly pathApi?: PathApi;
}

function errorCode(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

function plainResponse(status: number, text: string, method: string): Response {
  return new Response(method === 'HEAD' ? null : text, {
    status,
    headers: { ...securityHeaders(), 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' },
  });
}

/**
 * Whether the path from the app folder down to the file is made of real folders and ends
 * in a regular file: a symbolic link anywhere below the folder is refused, so a link can
 * never lead outside it.
 */
async function isPlainFileBelow(
  appFolder: string,
  segments: readonly string[],
  fileSystem: AssetFileSystem,
  pathApi: PathApi,
): Promise<boolean> {
  let current = appFolder;
  for (const [index, segment] of segments.entries()) {
    current = pathApi.join(current, segment);
    const entry = await fileSystem.lstat(current);
    if (entry.isSymbolicLink()) return false;
    if (index === segments.length - 1) return entry.isFile();
  }
  return false;
}

/**
 * Build the handler of the `app:` scheme (for `protocol.handle`). It serves only files
 * inside the app folder, only for GET and HEAD, with the app's Content-Security-Policy and
 * the other security headers on every response, errors included.
 */
export function createAppAssetHandler(settings: AppAssetHandlerSettings): (request: Request) => Promise<Response> {
  const pathApi = settings.pathApi ?? path;
  return async (request) => {
    const method = request.method.toUpperCase();
    if (method !== 'GET' && method !== 'HEAD') return plainResponse(405, 'Method not allowed', method);
    const resolution = resolveAppAsset(request.url, settings.appFolder, pathApi);
    if (!resolution.ok) return plainResponse(resolution.status, 'Not found', method);
    try {
      const plain = await isPlainFileBelow(settings.appFolder, resolution.segments, settings.fileSystem, pathApi);
      if (!plain) return plainResponse(404, 'Not found', method);
      const body = await settings.fileSystem.readFile(resolution.filePath);
      const name = resolution.segments[resolution.segments.length - 1] ?? '';
      // File reads never give shared memory, so the bytes are a plain ArrayBuffer view.
      return new Response(method === 'HEAD' ? null : (body as Uint8Array<ArrayBuffer>), {
        status: 200,
        headers: { ...securityHeaders(), 'Content-Type': contentTypeFor(name), 'Cache-Control': 'no-cache' },
      });
    } catch (error) {
      const code = errorCode(error);
      if (code === 'ENOENT' || code === 'ENOTDIR' || code === 'EISDIR') return plainResponse(404, 'Not found', method);
      return plainResponse(500, 'Could not read the file', method);
    }
  };
}
