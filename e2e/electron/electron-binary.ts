import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project folder. */
export const projectRoot = fileURLToPath(new URL('../../', import.meta.url));

/** The Electron executable the electron package downloaded, or null (read from its path.txt; the package is never imported). */
export function electronExecutable(): string | null {
  const packageFolder = join(projectRoot, 'node_modules', 'electron');
  const pathFile = join(packageFolder, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const executable = join(
    process.env.ELECTRON_OVERRIDE_DIST_PATH ?? join(packageFolder, 'dist'),
    readFileSync(pathFile, 'utf8').trim(),
  );
  return existsSync(executable) ? executable : null;
}

/** Whether a display is there for a window (Linux needs X or Wayland, e.g. `xvfb-run`). */
export function hasDisplay(): boolean {
  return process.platform !== 'linux' || Boolean(process.env.DISPLAY) || Boolean(process.env.WAYLAND_DISPLAY);
}

/** The environment for a launch: no ELECTRON_RUN_AS_NODE (it would make the binary plain Node), warnings on. */
export function launchEnvironment(userData: string): Record<string, string> {
  const environment: Record<string, string> = {};
  for (const [name, value] of Object.entries(process.env))
    if (value !== undefined && name !== 'ELECTRON_RUN_AS_NODE') environment[name] = value;
  environment.CHANCEWISE_USER_DATA_DIR = userData;
  environment.ELECTRON_ENABLE_SECURITY_WARNINGS = '1';
  return environment;
}
