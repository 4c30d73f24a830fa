/**
 * The platform in the desktop app, over the shell's preload bridge (`window.chancewise`,
 * typed by electron/contract/ipc-contract.ts). The shell's dialogs name and place files; a refused
 * request comes back as an Error with the shell's own sentence.
 */
import type { ChancewiseShellApi, ShellResult } from '../../../electron/contract/ipc-contract.ts';
import { browserStorage } from '../state/key-value-storage.ts';
import { download, pickTextFile } from './browser-platform.ts';
import type { OpenedFile, Platform } from './platform.ts';

async function value<T>(request: Promise<ShellResult<T>>): Promise<T> {
  const result = await request;
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

const opened = (document: { text: string; fileName: string } | null): OpenedFile | null =>
  document === null ? null : { name: document.fileName, text: document.text };

/** The desktop platform over the shell's API. */
export function desktopPlatform(shell: ChancewiseShellApi): Platform {
  return {
    kind: 'desktop',
    storage: browserStorage(),
    namesFilesItself: true,
    openTopicFile: async () => opened(await value(shell.openDocument())),
    openRecentTopicFile: async (path) => opened(await value(shell.openRecentDocument(path))),
    saveTopicFile: async (text, _suggestedName, mode) =>
      (await value(mode === 'save-as' ? shell.saveDocumentAs(text) : shell.saveDocument(text)))?.fileName ?? null,
    // The page's own file input, and downloads of its own blob addresses, which the shell allows.
    pickTextFile,
    saveFile: async (suggestedName, contents, type) => download(suggestedName, contents, type),
    saveHandout: async (suggestedName, pdf) =>
      (await value(shell.exportHandoutPdf({ bytes: pdf, suggestedName })))?.fileName ?? null,
    printHandout: async (suggestedName, make) => {
      const pdf = await make();
      return pdf === null ? null : (await value(shell.printHandout({ bytes: pdf, suggestedName }))).fileName;
    },
    topicReplaced: () => void shell.newDocument(),
    snapshot: (content, hasUnsavedChanges) => void shell.saveSnapshot({ content, keepPatient: false, hasUnsavedChanges }),
    connect: (events) => {
      shell.onCommand((command) => events.command(command));
      shell.onDocument((incoming) =>
        events.document(
          incoming.kind === 'file'
            ? { kind: 'file', file: { name: incoming.fileName, text: incoming.text } }
            : { kind: 'snapshot', content: incoming.content, fileName: incoming.fileName },
        ),
      );
      void shell.rendererReady();
    },
  };
}
