// @vitest-environment node
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { TOPIC_EXTENSION, TOPIC_MEDIA_TYPE } from '../../electron/main/document/topic-file-type.ts';

const configPath = fileURLToPath(new URL('../../electron-builder.yml', import.meta.url));
// The YAML reader electron-builder itself uses, found from electron-builder's own folder.
const fromBuilder = createRequire(createRequire(import.meta.url).resolve('electron-builder'));
const yaml = fromBuilder('js-yaml') as { load(text: string): unknown };
const config = yaml.load(readFileSync(configPath, 'utf8')) as Record<string, unknown>;

describe('the packaging configuration', () => {
  it('flips the Electron fuses of the packaged binary', () => {
    // Electron docs/tutorial/fuses.md and the security checklist item 19 ("Use fuses"): no
    // ELECTRON_RUN_AS_NODE, no NODE_OPTIONS, no --inspect, asar integrity, app only from the asar,
    // encrypted cookies, no extra file:// privileges.
    expect(config.electronFuses).toEqual({
      runAsNode: false,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
      enableCookieEncryption: true,
      grantFileProtocolExtraPrivileges: false,
    });
    expect(config.asar).toBe(true);
  });

  it('builds AppImage and deb for Linux, NSIS for Windows and dmg for macOS', () => {
    expect((config.linux as { target: unknown }).target).toEqual(['AppImage', 'deb']);
    expect((config.win as { target: unknown }).target).toEqual(['nsis']);
    expect((config.mac as { target: unknown }).target).toEqual(['dmg']);
  });

  it('associates the .cwtopic topic files with the app', () => {
    expect(config.fileAssociations).toEqual([
      {
        ext: 'cwtopic',
        name: 'Chancewise topic',
        description: 'Chancewise topic file',
        mimeType: 'application/x-chancewise-topic',
        role: 'Editor',
      },
    ]);
    // The same extension and media type as the shell's open and save dialogs.
    expect(TOPIC_EXTENSION).toBe('cwtopic');
    expect(TOPIC_MEDIA_TYPE).toBe('application/x-chancewise-topic');
  });

  it('packs only the built renderer and shell, no node_modules', () => {
    expect(config.files).toEqual([
      'package.json',
      'dist/**/*',
      'dist-electron/main.cjs',
      'dist-electron/preload.cjs',
      '!node_modules/**/*',
    ]);
  });
});
