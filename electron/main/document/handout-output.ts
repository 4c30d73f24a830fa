import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { ExportedHandout, HandoutPdfRequest, PrintOutcome } from '../../contract/ipc-contract.ts';
import { writeFileAtomic } from '../files/atomic-write.ts';
import { ShellFailure } from '../ipc/shell-failure.ts';
import type { ShellDialogs } from '../window/shell-dialogs.ts';

/** The handout's name with ".pdf" added when missing (any case counts). */
export function handoutFileName(suggestedName: string): string {
  return suggestedName.toLowerCase().endsWith('.pdf') ? suggestedName : `${suggestedName}.pdf`;
}

/**
 * Save the handout PDF where the person chooses (the dialog starts in `documentsFolder`
 * with the suggested name); null when the dialog is cancelled.
 */
export async function exportHandoutPdf(
  request: HandoutPdfRequest,
  dialogs: Pick<ShellDialogs, 'chooseHandoutSavePath'>,
  documentsFolder: string,
): Promise<ExportedHandout | null> {
  const target = await dialogs.chooseHandoutSavePath(path.join(documentsFolder, handoutFileName(request.suggestedName)));
  if (target === null) return null;
  try {
    await writeFileAtomic(target, request.bytes);
  } catch (error) {
    throw new ShellFailure('write-failed', error instanceof Error ? error.message : undefined);
  }
  return { fileName: path.basename(target) };
}

/** The part of Electron's `shell` that opens a file in the application the system chose for it. */
export interface PathOpener {
  /** Resolves to "" when the file was opened, else to the reason it was not. */
  openPath(path: string): Promise<string>;
}

/**
 * Print the handout by opening its PDF in the system's PDF viewer, where Print is one step
 * away and prints the page exactly as made. Why not the print dialog: `webContents.print()`
 * prints the window it belongs to (the app, not the handout), and a hidden window showing the
 * PDF would need Chromium's PDF viewer plugin (`webPreferences.plugins`, off by default), whose
 * inner frame `print()` does not print reliably (from memory of Electron's issue tracker). The
 * file goes to `folder` (made private, 0700) under the handout's own name, replacing an earlier
 * copy, so the viewer's title names the handout.
 */
export async function openHandoutForPrinting(
  request: HandoutPdfRequest,
  opener: PathOpener,
  folder: string,
): Promise<PrintOutcome> {
  const fileName = handoutFileName(path.basename(request.suggestedName));
  const target = path.join(folder, fileName);
  try {
    await mkdir(folder, { recursive: true, mode: 0o700 });
    await writeFileAtomic(target, request.bytes);
  } catch (error) {
    throw new ShellFailure('write-failed', error instanceof Error ? error.message : undefined);
  }
  const refusal = await opener.openPath(target);
  if (refusal !== '') throw new ShellFailure('print-failed', refusal);
  return { fileName };
}
