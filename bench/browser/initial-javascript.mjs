/**
 * The JavaScript a built page loads before it can run: the module scripts that
 * dist/index.html names, and every chunk they import statically (not the ones behind a
 * dynamic `import()`), with their sizes raw and gzipped (zlib, default level 6).
 */
import { readFileSync, readdirSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { gzipSync } from 'node:zlib';

/** The class name jsPDF's own code defines; its presence marks a chunk as the PDF code. */
const PDF_MARK = 'jsPDF';

/**
 * Static import specifiers of a built chunk: `import{a as b}from"./x.js"` and
 * `import"./x.js"`, but never `import("./x.js")`.
 * @param {string} code
 * @returns {string[]}
 */
export function staticImports(code) {
  const found = [];
  for (const match of code.matchAll(/\bimport\s*(?:[^'"();]*?\bfrom\s*)?["']([^"']+\.js)["']/g)) {
    if (match[1] !== undefined) found.push(match[1]);
  }
  return found;
}

/**
 * The module scripts and module preloads an HTML page names, as paths relative to it.
 * @param {string} html
 * @returns {string[]}
 */
export function pageScripts(html) {
  const scripts = [...html.matchAll(/<script\b[^>]*\btype="module"[^>]*\bsrc="([^"]+)"/g)].map((match) => match[1] ?? '');
  const preloads = [...html.matchAll(/<link\b[^>]*\brel="modulepreload"[^>]*\bhref="([^"]+)"/g)].map((match) => match[1] ?? '');
  return [...scripts, ...preloads].filter((source) => source !== '');
}

/**
 * Sizes of the initial JavaScript of the page `indexFile`, whether any of it is PDF code,
 * and which chunks of its assets/ folder hold the PDF code.
 * @param {string} indexFile
 */
export function initialJavaScript(indexFile) {
  const root = dirname(indexFile);
  const queue = pageScripts(readFileSync(indexFile, 'utf8')).map((source) => normalize(join(root, source)));
  /** @type {Map<string, { file: string, bytes: number, gzipBytes: number, pdfCode: boolean }>} */
  const files = new Map();
  while (queue.length > 0) {
    const file = /** @type {string} */ (queue.shift());
    if (files.has(file)) continue;
    const code = readFileSync(file);
    const text = code.toString('utf8');
    files.set(file, {
      file: relative(root, file),
      bytes: code.length,
      gzipBytes: gzipSync(code).length,
      pdfCode: text.includes(PDF_MARK),
    });
    for (const specifier of staticImports(text)) queue.push(normalize(join(dirname(file), specifier)));
  }
  const list = [...files.values()];
  const assets = join(root, 'assets');
  const pdfChunks = readdirSync(assets)
    .filter((name) => name.endsWith('.js') && readFileSync(join(assets, name), 'utf8').includes(PDF_MARK))
    .map((name) => `assets/${name}`);
  return {
    pdfChunks,
    files: list,
    bytes: list.reduce((sum, entry) => sum + entry.bytes, 0),
    gzipBytes: list.reduce((sum, entry) => sum + entry.gzipBytes, 0),
    pdfCodeInitial: list.some((entry) => entry.pdfCode),
  };
}
