/**
 * The platform in a plain browser: a file input to open, a download to save, local
 * storage for settings. Nothing is sent anywhere.
 */
import { browserStorage } from '../state/key-value-storage.ts';
import type { OpenedFile, Platform } from './platform.ts';

function pickTextFile(accept: string): Promise<OpenedFile | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      if (file === undefined) {
        resolve(null);
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

async function saveFile(suggestedName: string, contents: string | Uint8Array, type: string): Promise<string> {
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

/** The browser platform. */
export function browserPlatform(): Platform {
  return { kind: 'browser', pickTextFile, saveFile, storage: browserStorage(), reopensByName: false };
}
