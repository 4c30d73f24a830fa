/**
 * The Node-only part of the handout: read DejaVu Sans from the installed
 * `dejavu-fonts-ttf` package (command line, tests). The app passes its own bytes.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { type HandoutFonts, handoutFonts } from './handout-fonts.ts';

/** The folder of the DejaVu TrueType files. */
function dejaVuFolder(): string {
  const packageFile = createRequire(import.meta.url).resolve('dejavu-fonts-ttf/package.json');
  return join(dirname(packageFile), 'ttf');
}

/** DejaVu Sans and DejaVu Sans Bold, read from disk and prepared for `buildHandout`. */
export function loadHandoutFonts(): HandoutFonts {
  const folder = dejaVuFolder();
  return handoutFonts({
    regular: readFileSync(join(folder, 'DejaVuSans.ttf')),
    bold: readFileSync(join(folder, 'DejaVuSans-Bold.ttf')),
  });
}
