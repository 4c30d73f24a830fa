/**
 * The platform in a plain browser: a file input to open, a download to save, local
 * storage for settings. Nothing is sent anywhere.
 */
import { PICKED_FILE_MAX_BYTES } from '../../shared/picked-file-limit.ts';
import { PlatformFailure } from './platform-failure.ts';
import { browserStorage } from '../state/key-value-storage.ts';
import type { OpenedFile, Platform } from './platform.ts';
import { printInNewTab } from './print-in-tab.ts';
import type { TabOpener } from './print-in-tab.ts';

/**
 * Ask for a file with a file input; null when cancelled. A file over the size limit is
 * refused (rejected with a message saying so) before any of it is read.
 */
export function pickTextFile(accept: string): Promise<OpenedFile | null> {
  return new Promise((resolve, reject) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      if (file === undefined) {
        resolve(null);
        return;
      }
      if (file.size > PICKED_FILE_MAX_BYTES) {
        reject(
          new PlatformFailure({
            kind: 'file-too-large',
            fileName: file.name,
            bytes: file.size,
            limitBytes: PICKED_FILE_MAX_BYTES,
          }),
        );
        return;
      }
      file.text().then(
        (text) => resolve({ name: file.name, text }),
        () => resolve({ name: file.name, text: '' }),
      );
    });
    input.addEventListener('cancel', () => resolve(null));
    input.click();
  });
}

/** Offer bytes or text as a download (the browser saves it in its downloads folder). */
export function download(suggestedName: string, contents: string | Uint8Array, type: string): string {
  const part: BlobPart = typeof contents === 'string' ? contents : new Uint8Array(contents);
  const url = URL.createObjectURL(new Blob([part], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = suggestedName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser time to start the download before the address is released.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return suggestedName;
}

const TOPIC_FILES = '.cwtopic,.json,application/json';

/** The browser platform. */
export function browserPlatform(): Platform {
  return {
    kind: 'browser',
    storage: browserStorage(),
    namesFilesItself: false,
    openTopicFile: () => pickTextFile(TOPIC_FILES),
    openRecentTopicFile: () => pickTextFile(TOPIC_FILES),
    saveTopicFile: async (text, suggestedName) => download(suggestedName, text, 'application/json'),
    pickTextFile,
    saveFile: async (suggestedName, contents, type) => download(suggestedName, contents, type),
    saveHandout: async (suggestedName, pdf) => download(suggestedName, pdf, 'application/pdf'),
    printHandout: async (suggestedName, make) =>
      (await printInNewTab(make, window as unknown as TabOpener)) ? suggestedName : null,
    topicReplaced: () => undefined,
    snapshot: () => undefined,
    connect: () => undefined,
  };
}
