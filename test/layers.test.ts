import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

// The layers of the contributor guide, checked on the real import statements: each layer may
// import only the layers listed for it; the code the renderer bundles never imports a `node:`
// module; `src/` imports `electron/` for its types only. (A project rule: common practice for
// layered code, written down in DEVELOPERS.md.)

const ROOT = fileURLToPath(new URL('../', import.meta.url));

/** What each top-level folder may import (besides itself and packages). */
const ALLOWED: Readonly<Record<string, readonly string[]>> = {
  'src/core': [],
  'src/render': ['src/core'],
  'src/handout': ['src/core', 'src/render'],
  'src/teaching': ['src/core', 'src/render', 'src/handout'],
  'src/cli': ['src/core', 'src/render', 'src/handout', 'src/teaching', 'src/shared'],
  'src/shared': ['src/core'],
  'src/web': ['src/core', 'src/shared'],
  'src/locale': ['src/core', 'src/render', 'src/handout', 'src/teaching', 'src/ui', 'electron'],
  'src/ui': ['src/core', 'src/render', 'src/handout', 'src/teaching', 'src/shared', 'src/locale'],
  electron: ['src/core', 'src/shared'],
};

interface ImportLine {
  readonly file: string;
  readonly specifier: string;
  readonly typeOnly: boolean;
}

const SOURCE = /\.(ts|svelte|mjs)$/;

function filesUnder(folder: string): string[] {
  const absolute = join(ROOT, folder);
  if (!existsSync(absolute)) return [];
  return readdirSync(absolute).flatMap((name) => {
    const path = join(folder, name);
    if (statSync(join(ROOT, path)).isDirectory()) return filesUnder(path);
    return SOURCE.test(name) && !name.endsWith('.d.ts') ? [path] : [];
  });
}

const STATEMENT =
  /(?:^|[\s;])(import|export)\s+(type\s+)?(?:[^'"`;]*?\s+from\s+)?['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g;

function importsOf(file: string): ImportLine[] {
  const text = readFileSync(join(ROOT, file), 'utf8')
    .replace(/\/\*[\s\S]*?\*\//g, '')
    .replace(/^\s*\/\/.*$/gm, '');
  const found: ImportLine[] = [];
  for (const match of text.matchAll(STATEMENT)) {
    const specifier = match[3] ?? match[4];
    if (specifier === undefined) continue;
    found.push({ file, specifier, typeOnly: match[2] !== undefined });
  }
  return found;
}

/** The top-level layer folder of a repository path, or null outside the layers. */
function layerOf(path: string): string | null {
  if (path.startsWith('electron/')) return 'electron';
  const match = /^src\/([^/]+)\//.exec(path);
  return match === null ? null : `src/${match[1]}`;
}

function resolveLocal(from: string, specifier: string): string | null {
  if (!specifier.startsWith('.')) return null;
  const base = resolve(ROOT, dirname(from), specifier);
  for (const candidate of [base, `${base}.ts`, join(base, 'index.ts')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return relative(ROOT, candidate);
  }
  return relative(ROOT, base);
}

const LAYER_FILES = Object.keys(ALLOWED).flatMap(filesUnder);

describe('the layers', () => {
  it('finds the source files', () => {
    expect(LAYER_FILES.length).toBeGreaterThan(150);
  });

  it('import only the layers listed for them', () => {
    const breaches: string[] = [];
    for (const file of LAYER_FILES) {
      const layer = layerOf(file);
      if (layer === null) continue;
      for (const line of importsOf(file)) {
        const target = resolveLocal(file, line.specifier);
        if (target === null) continue;
        const targetLayer = layerOf(target);
        if (targetLayer === null || targetLayer === layer) continue;
        // The renderer may read the desktop shell's contract, for its types only.
        if (layer === 'src/ui' && targetLayer === 'electron' && line.typeOnly) continue;
        // The locale bundle gathers the desktop shell's words with every other layer's, and nothing else of the shell.
        // and the interface's words from the app, and nothing else of either.
        const gathered =
          targetLayer === 'electron' ? 'electron/main/messages/' : targetLayer === 'src/ui' ? 'src/ui/messages/' : null;
        if (layer === 'src/locale' && gathered !== null && !target.startsWith(gathered)) {
          breaches.push(`${file} imports ${target}`);
          continue;
        }
        if (!(ALLOWED[layer] ?? []).includes(targetLayer)) breaches.push(`${file} imports ${target}`);
      }
    }
    expect(breaches).toEqual([]);
  });

  it('bundle no node: module into the renderer (everything reachable from src/ui/main.ts)', () => {
    const seen = new Set<string>();
    const nodeImports: string[] = [];
    const queue = ['src/ui/main.ts'];
    while (queue.length > 0) {
      const file = queue.pop() ?? '';
      if (seen.has(file) || !existsSync(join(ROOT, file))) continue;
      seen.add(file);
      for (const line of importsOf(file)) {
        if (line.specifier.startsWith('node:') || ['fs', 'path', 'jsdom'].includes(line.specifier)) {
          if (!line.typeOnly) nodeImports.push(`${file} imports ${line.specifier}`);
          continue;
        }
        const target = resolveLocal(file, line.specifier);
        if (target !== null && !line.typeOnly) queue.push(target);
      }
    }
    expect(seen.size).toBeGreaterThan(100);
    expect(nodeImports).toEqual([]);
  });

  it('keep no entry file that cross-layer imports pass by', () => {
    const entries = LAYER_FILES.filter((file) => /^src\/[^/]+\/index\.ts$/.test(file));
    const bypassing: string[] = [];
    for (const entry of entries) {
      const layer = layerOf(entry) ?? '';
      for (const file of LAYER_FILES) {
        if (layerOf(file) === layer) continue;
        for (const line of importsOf(file)) {
          const target = resolveLocal(file, line.specifier);
          if (target !== null && layerOf(target) === layer && target !== entry)
            bypassing.push(`${file} imports ${target}, not ${entry}`);
        }
      }
    }
    expect(bypassing).toEqual([]);
  });
});
