// @vitest-environment node
import fs from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const folder = fileURLToPath(new URL('../../electron/', import.meta.url));
const sources = new Map<string, string>();

beforeAll(async () => {
  // Every source in every folder of the shell, by file name (the names are unique across folders).
  for (const entry of await fs.readdir(folder, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile() || !entry.name.endsWith('.ts')) continue;
    if (sources.has(entry.name)) throw new Error(`two shell sources are named ${entry.name}`);
    sources.set(entry.name, await fs.readFile(path.join(entry.parentPath, entry.name), 'utf8'));
  }
});

function filesMatching(pattern: RegExp): string[] {
  return [...sources].filter(([, text]) => pattern.test(text)).map(([name]) => name).sort();
}

describe('the shell sources', () => {
  it('register IPC handlers in one module only', () => {
    expect(filesMatching(/ipcMain\.(handle|handleOnce|on|once|addListener)\(/u)).toEqual(['ipc-handlers.ts']);
    expect(sources.get('ipc-handlers.ts')).not.toMatch(/ipcMain\.(handleOnce|on|once|addListener)\(/u);
    expect(filesMatching(/registerIpcHandlers(<[^>]*>)?\(/u)).toEqual(['ipc-handlers.ts', 'shell.ts']);
  });

  it('call shell.openExternal only through the allow-listing helper', () => {
    expect(filesMatching(/shell\.openExternal\(/u)).toEqual(['shell.ts']);
    expect(sources.get('shell.ts')).toMatch(/openExternalSafely\(url, \{ allowedHosts: EXTERNAL_LINK_HOSTS, openExternal: \(address\) => shell\.openExternal\(address\) \}\)/u);
  });

  it('never load file:// pages, remote pages or turn security features off', () => {
    expect(filesMatching(/loadFile\(|file:\/\/\//u).filter((name) => name !== 'topic-file-type.ts')).toEqual([]);
    expect(filesMatching(/loadURL\(\s*['"`]https?:/u)).toEqual([]);
    expect(filesMatching(/nodeIntegration:\s*true|contextIsolation:\s*false|sandbox:\s*false|webSecurity:\s*false/u)).toEqual([]);
    expect(filesMatching(/allowRunningInsecureContent:\s*true|experimentalFeatures:\s*true|enableBlinkFeatures/u)).toEqual([]);
    expect(filesMatching(/bypassCSP|corsEnabled|allowServiceWorkers/u)).toEqual([]);
  });

  it('import the page API types only from the renderer side (the contract has no Electron import)', () => {
    expect(sources.get('ipc-contract.ts')).not.toMatch(/from ['"]electron['"]/u);
  });
});
