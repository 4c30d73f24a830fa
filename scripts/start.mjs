#!/usr/bin/env node
// `npm start`: the desktop app on the demo topic where an Electron runtime is present (or can be
// fetched); otherwise one line saying why, and the browser version instead (`npm run web`, which
// prints its address). `npm start -- --web` always starts the browser version.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import net from 'node:net';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const electronPackage = join(root, 'node_modules', 'electron');
const demoTopic = join(root, 'assets', 'demo', '01-kidney-stone.json');
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const FETCH_TIMEOUT_MS = 5 * 60_000;
const EARLY_EXIT_MS = 15_000;

/** The Electron executable as the electron package records it, or null (never imports the package). */
function electronExecutable() {
  const pathFile = join(electronPackage, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const relative = readFileSync(pathFile, 'utf8').trim();
  const distribution = process.env.ELECTRON_OVERRIDE_DIST_PATH ?? join(electronPackage, 'dist');
  const executable = join(distribution, relative);
  return existsSync(executable) ? executable : null;
}

/** Try the electron package's own installer once (it downloads the runtime); quiet unless it works. */
function fetchElectron() {
  const installer = join(electronPackage, 'install.js');
  if (!existsSync(installer)) return { ok: false, why: 'the electron package is not installed (run npm ci)' };
  if (process.env.CHANCEWISE_NO_DOWNLOAD === '1')
    return { ok: false, why: 'downloading is turned off (CHANCEWISE_NO_DOWNLOAD=1)' };
  // On a terminal a progress note is shown and wiped again, so a failure still leaves one line only.
  const note = process.stdout.isTTY === true;
  if (note) process.stdout.write('Fetching the Electron runtime for the desktop app (first start only)…');
  const result = spawnSync(process.execPath, [installer], { cwd: electronPackage, stdio: 'pipe', timeout: FETCH_TIMEOUT_MS });
  if (note) process.stdout.write('\r\u001b[K');
  if (result.status === 0 && electronExecutable() !== null) return { ok: true, why: '' };
  const output = `${result.stderr?.toString() ?? ''}${result.stdout?.toString() ?? ''}`;
  const reason =
    /ENOTFOUND|EAI_AGAIN|fetch failed|ECONNREFUSED|ETIMEDOUT|ENETUNREACH/u.test(output) || result.error !== undefined
      ? 'it could not be downloaded (offline?)'
      : 'its download failed';
  return { ok: false, why: reason };
}

/** Why the desktop app cannot open a window here, or null when it can try. */
function noDisplayReason() {
  if (process.platform !== 'linux') return null;
  return process.env.DISPLAY || process.env.WAYLAND_DISPLAY ? null : 'there is no display (DISPLAY is not set)';
}

/** A free TCP port on 127.0.0.1, starting from the browser version's usual one. */
function freePort(first) {
  return new Promise((resolve) => {
    const probe = (port) => {
      const server = net.createServer();
      server.once('error', () => probe(port + 1));
      server.listen(port, '127.0.0.1', () => server.close(() => resolve(port)));
    };
    probe(first);
  });
}

function runNpm(args) {
  return spawnSync(npm, args, { cwd: root, stdio: ['ignore', 'ignore', 'inherit'], shell: process.platform === 'win32' });
}

async function startWeb(reason) {
  if (reason !== null) process.stdout.write(`No desktop app: ${reason}; starting the browser version instead.\n`);
  const port = await freePort(4173);
  const web = spawn(npm, ['run', '--silent', 'web', '--', '--port', String(port)], {
    cwd: root,
    stdio: 'inherit',
    shell: process.platform === 'win32',
  });
  const stop = (signal) => web.kill(signal);
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  web.on('exit', (code, signal) => {
    process.exitCode = signal === null ? (code ?? 0) : 0;
  });
}

function startDesktop(executable) {
  for (const [script, label] of [
    ['build', 'the app page'],
    ['build:electron', 'the desktop shell'],
  ]) {
    const built = runNpm(['run', '--silent', script]);
    if (built.status !== 0) return Promise.resolve(`building ${label} failed`);
  }
  const environment = { ...process.env };
  delete environment.ELECTRON_RUN_AS_NODE;
  const started = Date.now();
  const desktop = spawn(executable, ['.', demoTopic], { cwd: root, stdio: ['ignore', 'inherit', 'pipe'], env: environment });
  let errors = '';
  desktop.stderr.on('data', (chunk) => {
    errors += chunk.toString();
    process.stderr.write(chunk);
  });
  const stop = (signal) => desktop.kill(signal);
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  return new Promise((resolve) => {
    desktop.on('error', (error) => resolve(`Electron could not be started (${error.message})`));
    desktop.on('exit', (code, signal) => {
      process.off('SIGINT', stop);
      process.off('SIGTERM', stop);
      const early = Date.now() - started < EARLY_EXIT_MS;
      if (early && code !== 0 && signal === null) {
        const line =
          errors
            .split('\n')
            .map((text) => text.trim())
            .find((text) => text !== '') ?? `exit code ${code}`;
        resolve(`Electron stopped at start-up (${line.slice(0, 160)})`);
        return;
      }
      process.exitCode = code ?? 0;
      resolve(null);
    });
  });
}

const wantsWeb = process.argv.includes('--web');
if (wantsWeb) {
  await startWeb(null);
} else {
  let executable = electronExecutable();
  let reason = null;
  if (executable === null) {
    const fetched = fetchElectron();
    executable = fetched.ok ? electronExecutable() : null;
    if (executable === null) reason = `no Electron runtime on this machine and ${fetched.why}`;
  }
  reason ??= noDisplayReason();
  if (reason === null && executable !== null) reason = await startDesktop(executable);
  if (reason !== null) await startWeb(reason);
}
