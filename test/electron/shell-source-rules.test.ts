// @vitest-environment node
import fs from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const folder = fileURLToPath(new URL('../../electron/', import.meta.url));
const sources = new Map<string, string>();
/** Each source's relative imports, resolved to paths under electron/ (or outside it, with ../). */
const importsByFolder = new Map<string, string[]>();

beforeAll(async () => {
  // Every source in every folder of the shell, by file name (the names are unique across folders).
  for (const entry of await fs.readdir(folder, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile() || !entry.name.endsWith('.ts')) continue;
    if (sources.has(entry.name)) throw new Error(`two shell sources are named ${entry.name}`);
    const text = await fs.readFile(path.join(entry.parentPath, entry.name), 'utf8');
    sources.set(entry.name, text);
    const from = path.relative(folder, entry.parentPath);
    const targets = [...text.matchAll(/from ['"](\.{1,2}\/[^'"]+)['"]/gu)].map((match) => path.join(from, match[1] ?? ''));
    importsByFolder.set(from, [...(importsByFolder.get(from) ?? []), ...targets]);
  }
});

function filesMatching(pattern: RegExp): string[] {
  return [...sources]
    .filter(([, text]) => pattern.test(text))
    .map(([name]) => name)
    .sort();
}

describe('the shell sources', () => {
  it('register IPC handlers in one module only', () => {
    expect(filesMatching(/ipcMain\.(handle|handleOnce|on|once|addListener)\(/u)).toEqual(['ipc-handlers.ts']);
    expect(sources.get('ipc-handlers.ts')).not.toMatch(/ipcMain\.(handleOnce|on|once|addListener)\(/u);
    expect(filesMatching(/registerIpcHandlers(<[^>]*>)?\(/u)).toEqual(['ipc-handlers.ts', 'shell.ts']);
  });

  it('call shell.openExternal only through the allow-listing helper', () => {
    expect(filesMatching(/shell\.openExternal\(/u)).toEqual(['shell.ts']);
    expect(sources.get('shell.ts')).toMatch(
      /openExternalSafely\(url, \{ allowedHosts: EXTERNAL_LINK_HOSTS, openExternal: \(address\) => shell\.openExternal\(address\) \}\)/u,
    );
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

  it('keep the three parts apart: the contract imports nothing, the preload only the contract, and neither the main process', () => {
    // Electron process model docs (docs/tutorial/process-model.md): main, preload and renderer run
    // in separate processes, so the only code they share is the contract's names and types.
    expect(importsByFolder.get('contract') ?? []).toEqual([]);
    const preloadImports = importsByFolder.get('preload') ?? [];
    expect(preloadImports.length).toBeGreaterThan(0);
    for (const target of preloadImports) expect(target, target).toMatch(/^(contract|preload)\//u);
    const mainImports = [...importsByFolder]
      .filter(([from]) => from === 'main' || from.startsWith('main/'))
      .flatMap(([, targets]) => targets);
    expect(mainImports.filter((target) => target.startsWith('preload/'))).toEqual([]);
    expect(mainImports.some((target) => target.startsWith('contract/'))).toBe(true);
  });
});
