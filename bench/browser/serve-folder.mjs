/**
 * Serving built pages for the browser benchmark: a folder through the app's own static
 * server with the app's security headers, or the app itself through `scripts/web.mjs`
 * in a child process.
 */
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { createServer } from 'node:net';
import { register } from 'tsx/esm/api';

register();
const { createStaticServer } = await import('../../src/web/static-server.ts');
const { securityHeaders } = await import('../../src/shared/content-security-policy.ts');

/**
 * A port that was free a moment ago on 127.0.0.1.
 * @returns {Promise<number>}
 */
export async function freePort() {
  const probe = createServer();
  probe.listen(0, '127.0.0.1');
  await once(probe, 'listening');
  const address = probe.address();
  const port = typeof address === 'object' && address !== null ? address.port : 0;
  probe.close();
  await once(probe, 'close');
  return port;
}

/**
 * Serve `root` on a free port; resolves with its address and a function that stops it.
 * @param {string} root
 * @returns {Promise<{ url: string, stop: () => Promise<void> }>}
 */
export async function serveFolder(root) {
  const server = createStaticServer({ root, headers: securityHeaders() });
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  const address = server.address();
  const port = typeof address === 'object' && address !== null ? address.port : 0;
  return {
    url: `http://127.0.0.1:${port}/`,
    stop: async () => {
      server.closeAllConnections?.();
      server.close();
      await once(server, 'close').catch(() => undefined);
    },
  };
}

/**
 * Start `node scripts/web.mjs --port PORT` (which builds the app when its sources are newer
 * than dist/) and wait until it says where it serves; resolves with the address and a stop.
 * @param {string} projectRoot
 * @param {number} timeoutMs
 * @returns {Promise<{ url: string, stop: () => Promise<void> }>}
 */
export async function serveApp(projectRoot, timeoutMs = 180_000) {
  const port = await freePort();
  const child = spawn(process.execPath, ['scripts/web.mjs', '--port', String(port)], {
    cwd: projectRoot,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    child.kill('SIGTERM');
    await once(child, 'exit');
  };
  const url = await new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      reject(new Error(`the app server did not start within ${timeoutMs / 1000} s:\n${output}`));
    }, timeoutMs);
    const read = (/** @type {Buffer} */ chunk) => {
      output += chunk.toString();
      const served = /served at (http:\/\/\S+)/.exec(output);
      if (served !== null) {
        clearTimeout(timer);
        resolve(served[1]);
      }
    };
    child.stdout.on('data', read);
    child.stderr.on('data', read);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`the app server stopped (exit ${code}) before serving:\n${output}`));
    });
  }).catch(async (error) => {
    await stop();
    throw error;
  });
  return { url: String(url), stop };
}
