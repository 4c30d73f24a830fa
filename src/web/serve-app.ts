/**
 * `npm run web -- --port PORT [--host HOST] [--allow-host NAME]... [--no-build]`: build the
 * app when it is missing or older than its sources, then serve it with the app's security
 * headers, answering only loopback Host names unless others are allowed, and warning when
 * it listens beyond this machine.
 */
import { once } from 'node:events';
import { join } from 'node:path';
import { securityHeaders } from '../shared/content-security-policy.ts';
import { isBuildStale } from './build-freshness.ts';
import { exposureWarning, isLoopbackAddress } from './host-policy.ts';
import { createStaticServer } from './static-server.ts';

export interface ServeSettings {
  readonly port: number;
  readonly host: string;
  readonly build: boolean;
  /** Host names answered besides the loopback names; absent when none were given. */
  readonly allowedHosts?: readonly string[];
}

const USAGE = 'Usage: npm run web -- --port PORT [--host HOST] [--allow-host NAME]... [--no-build]';

/** Read the command's flags; throws an Error with a usage line for anything it does not know. */
export function parseServeArguments(args: readonly string[]): ServeSettings {
  let port = 4173;
  let host = '127.0.0.1';
  let build = true;
  const allowedHosts: string[] = [];
  for (let index = 0; index < args.length; index += 1) {
    const flag = args[index];
    const value = args[index + 1];
    if (flag === '--port' && value !== undefined && /^\d+$/.test(value) && Number(value) < 65536) {
      port = Number(value);
      index += 1;
    } else if (flag === '--host' && value !== undefined) {
      host = value;
      index += 1;
    } else if (flag === '--allow-host' && value !== undefined && /^[a-z0-9.-]+$|^\[[0-9a-f:.]+\]$/iu.test(value)) {
      allowedHosts.push(value.toLowerCase());
      index += 1;
    } else if (flag === '--no-build') {
      build = false;
    } else {
      throw new Error(`unknown or incomplete option "${flag ?? ''}". ${USAGE}`);
    }
  }
  return allowedHosts.length === 0 ? { port, host, build } : { port, host, build, allowedHosts };
}

const SOURCES = ['src', 'assets', 'index.html', 'vite.config.ts', 'svelte.config.js', 'package.json'];

/** Build if needed, then serve `dist/` until the process is stopped; resolves with the address. */
export async function serveApp(projectRoot: string, settings: ServeSettings, log: (line: string) => void): Promise<string> {
  const dist = join(projectRoot, 'dist');
  const stale = isBuildStale(
    join(dist, 'index.html'),
    SOURCES.map((source) => join(projectRoot, source)),
  );
  if (settings.build && stale) {
    log('Building the app (sources changed since the last build)…');
    const { build } = await import('vite');
    await build({ root: projectRoot, logLevel: 'warn', configFile: join(projectRoot, 'vite.config.ts') });
  }
  const server = createStaticServer({ root: dist, headers: securityHeaders(), allowedHosts: settings.allowedHosts ?? [] });
  server.listen(settings.port, settings.host);
  await once(server, 'listening');
  const address = `http://${settings.host}:${settings.port}/`;
  for (const line of startupLines(settings.host, address)) log(line);
  return address;
}

/** What is printed once the server listens: a warning first when it listens beyond this machine. */
export function startupLines(host: string, address: string): string[] {
  const served = `Chancewise is served at ${address} (press Ctrl+C to stop)`;
  return isLoopbackAddress(host) ? [served] : [exposureWarning(host), served];
}
