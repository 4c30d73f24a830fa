import type { ShellErrorCode } from '../../contract/ipc-contract.ts';

/** The sentence shown for each reason a request failed. */
export const SHELL_MESSAGES: Readonly<Record<ShellErrorCode, string>> = {
  'untrusted-sender': 'The request did not come from the app’s own page, so it was refused.',
  'invalid-request': 'The request was not in the expected form, so nothing was done.',
  'too-large': 'The request was larger than the app accepts, so nothing was done.',
  'not-a-topic-file': 'This file is not a Chancewise topic file, or it is damaged.',
  'not-in-recent-list': 'That file is no longer in the list of recent files.',
  'read-failed': 'The file could not be read.',
  'write-failed': 'The file could not be written. The previous version is unchanged.',
  'print-failed': 'The handout could not be printed.',
};

/** A failure an action reports with one of the codes; the IPC layer turns it into an error reply. */
export class ShellFailure extends Error {
  readonly code: ShellErrorCode;

  constructor(code: ShellErrorCode, detail?: string) {
    super(detail === undefined ? SHELL_MESSAGES[code] : `${SHELL_MESSAGES[code]} (${detail})`);
    this.name = 'ShellFailure';
    this.code = code;
  }
}
