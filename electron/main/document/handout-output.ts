import path from 'node:path';
import type { ExportedHandout, HandoutPdfRequest, PrintOutcome } from '../../contract/ipc-contract.ts';
import { writeFileAtomic } from '../files/atomic-write.ts';
import { ShellFailure } from '../ipc/shell-messages.ts';
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

/** The part of Electron's `WebContents` that prints. */
export interface PrintableContents {
  print(options: { printBackground: boolean }, callback: (success: boolean, failureReason: string) => void): void;
}

/** Print the page through the system dialog; a cancelled dialog is not a failure. */
export function printHandout(contents: PrintableContents): Promise<PrintOutcome> {
  return new Promise((resolve, reject) => {
    contents.print({ printBackground: true }, (success, failureReason) => {
      if (success) resolve({ printed: true });
      else if (failureReason === 'cancelled' || failureReason === 'Print job canceled') resolve({ printed: false });
      else reject(new ShellFailure('print-failed', failureReason));
    });
  });
}
