// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import vm from 'node:vm';
import { build } from 'vite';
import type { UserConfig } from 'vite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import makeConfig from '../../vite.electron.config.ts';

const root = fileURLToPath(new URL('../../', import.meta.url));
let outDir: string;

async function buildEntry(mode: 'main' | 'preload'): Promise<string> {
  const config = (
    typeof makeConfig === 'function' ? makeConfig({ mode, command: 'build', isSsrBuild: true, isPreview: false }) : makeConfig
  ) as UserConfig;
  await build({ ...config, root, configFile: false, mode, build: { ...config.build, outDir, emptyOutDir: false } });
  return fs.readFile(path.join(outDir, `${mode}.cjs`), 'utf8');
}

let main = '';
let preload = '';

beforeAll(async () => {
  outDir = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-bundle-'));
  main = await buildEntry('main');
  preload = await buildEntry('preload');
}, 30_000);

afterAll(async () => {
  await fs.rm(outDir, { recursive: true, force: true });
});

function requiredModules(code: string): string[] {
  return [...code.matchAll(/require\((["'])([^"']+)\1\)/gu)].map((match) => match[2] ?? '');
}

describe('the shell build', () => {
  it('makes the preload one CommonJS file whose only import is electron', async () => {
    // Electron sandbox docs (docs/tutorial/sandbox.md, "Preload scripts"): a sandboxed preload gets a
    // polyfilled require for a few modules only and "you will not be able to use CommonJS modules to
    // separate your preload script into multiple files".
    expect(requiredModules(preload)).toEqual(['electron']);
    expect(preload).not.toMatch(/\bimport\s*\(|^import\s/mu);
    expect(preload).toContain('exposeInMainWorld');
    expect((await fs.readdir(outDir)).sort()).toEqual(['main.cjs', 'preload.cjs']);
  });

  it('keeps electron and Node modules external in main and bundles everything else', () => {
    const modules = new Set(requiredModules(main));
    for (const name of modules) expect(name === 'electron' || name.startsWith('node:'), name).toBe(true);
    expect(modules.has('electron')).toBe(true);
    expect(main).toContain('chancewise-topic');
  });

  it('exposes only the shell API on window.chancewise when run, never ipcRenderer', () => {
    // Electron security checklist item 20 and context-isolation docs: expose one function per message,
    // never ipcRenderer or its methods.
    const exposed = new Map<string, unknown>();
    const ipcRenderer = {
      invoke: () => Promise.resolve(null),
      on: () => undefined,
      removeListener: () => undefined,
      send: () => undefined,
    };
    const electron = {
      contextBridge: { exposeInMainWorld: (key: string, value: unknown) => exposed.set(key, value) },
      ipcRenderer,
    };
    const module = { exports: {} };
    const context = vm.createContext({
      require: (name: string) => {
        if (name !== 'electron') throw new Error(`the preload asked for ${name}`);
        return electron;
      },
      module,
      exports: module.exports,
    });
    new vm.Script(preload, { filename: 'preload.cjs' }).runInContext(context);
    expect([...exposed.keys()]).toEqual(['chancewise']);
    const api = exposed.get('chancewise') as Record<string, unknown>;
    for (const value of Object.values(api)) {
      expect(typeof value).toBe('function');
      expect(value).not.toBe(ipcRenderer.invoke);
      expect(value).not.toBe(ipcRenderer.on);
      expect(value).not.toBe(ipcRenderer.send);
    }
    expect(Object.values(api)).not.toContain(ipcRenderer);
    expect(Object.keys(api)).toHaveLength(11);
  });
});
